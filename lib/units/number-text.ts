/**
 * The one reading of a number someone typed: in a form, a CSV cell or a calculator field. It follows the SI
 * Brochure's rule for writing numbers: the decimal marker is a point or a comma, and long numbers may be split
 * into groups of three digits by a space (a plain, no-break or thin space), never by a point or a comma. So
 * "1,500" and "1.500" are refused as ambiguous (1.5 to some readers, 1500 to others) rather than guessed, and hex,
 * words and "Infinity" are not numbers.
 */
export type NumberReading = { value: number } | { problem: string };

const GROUP_SPACE = /[ \u00a0\u2009\u202f]/;
const GROUPED = /^([+-]?)(\d{1,3}(?:[ \u00a0\u2009\u202f]\d{3})+)([.,]\d+)?([eE][+-]?\d+)?$/;
const PLAIN = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/;
/** One to three digits (not a lone 0), one mark and exactly three digits: a decimal or a thousands group. */
const AMBIGUOUS = /^[+-]?[1-9]\d{0,2}[.,]\d{3}$/;

export const NOT_A_NUMBER = 'must be a number';

/** null for blank text; otherwise the value, or what is wrong with the text as a short phrase. */
export function readNumberText(raw: string): NumberReading | null {
  const text = raw.trim();
  if (text === '') return null;
  if (text.includes('.') && text.includes(',')) {
    return { problem: 'must use one decimal mark, a point or a comma, and no thousands separator (write 1500.5 or 1 500,5)' };
  }
  let plain = text;
  if (GROUP_SPACE.test(text)) {
    const grouped = GROUPED.exec(text);
    if (!grouped) return { problem: `${NOT_A_NUMBER}; spaces may only split the whole part into groups of three digits (1 500)` };
    plain = `${grouped[1]}${grouped[2].replace(/[^\d]/g, '')}${grouped[3] ?? ''}${grouped[4] ?? ''}`;
  } else if (AMBIGUOUS.test(text)) {
    const [whole, part] = text.replace(/^[+-]/, '').split(/[.,]/);
    const decimal = unambiguous(`${whole}.${part.replace(/0+$/, '')}`.replace(/\.$/, ''));
    return { problem: `"${text}" could be read as ${whole}.${part} or as ${whole}${part}: write ${decimal} for the one, ${whole} ${part} or ${whole}${part} for the other` };
  }
  if (!PLAIN.test(plain)) return { problem: NOT_A_NUMBER };
  const value = Number(plain.replace(',', '.'));
  return { value };
}

/** Three decimals after one to three digits read both ways, so a trailing zero (exact, and unambiguous) goes on. */
function unambiguous(text: string): string {
  return AMBIGUOUS.test(text) ? `${text}0` : text;
}

/**
 * A number as text this parser reads back to the same value: the shortest exact form, or `significant` figures,
 * never "1.234" (which it would refuse as ambiguous) but "1.2340". Forms, PATCH merges and CSV exports write
 * numbers through here so what Plumbline writes, it can read.
 */
export function writeNumberText(value: number, significant?: number): string {
  return unambiguous(String(significant === undefined ? value : Number(value.toPrecision(significant))));
}
