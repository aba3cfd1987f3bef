/**
 * Command line for the physics core: `npm run -s assess -- FILE` (or `-` for standard input).
 * One case prints its result JSON; a list of cases prints a JSON list, one element per line,
 * streamed as each case is solved: the result, or `{"error": {...}}` for a case that is bad or
 * cannot be solved. Exit 0 when every case solved, 1 when some could not be solved, 2 when the
 * input or any case is bad (one line per wrong field on standard error). Bundled by
 * scripts/bundle.mjs into .build/assess.mjs; scripts/assess.mjs runs it.
 */
import { readFileSync } from 'node:fs';
import { PhysicsInputError, PhysicsSolveError, simulateDrop } from '@/lib/physics';
import { dropCaseIssues, dropCaseSchema, physicsIssue } from '@/lib/schemas/drop-case';

const USAGE = 'usage: npm run -s assess -- FILE   (FILE is a drop-case JSON file or a list of cases, or - for standard input)';

/** A batch is solved case by case in one process; past this it should be split. */
export const MAX_CASES = 100_000;

type CaseError = { kind: 'input'; issues: { path: string; message: string }[] } | { kind: 'solve'; message: string };

const EXIT = { ok: 0, solve: 1, input: 2 } as const;

function fail(lines: string[]): never {
  for (const line of lines) process.stderr.write(line + '\n');
  process.exit(EXIT.input);
}

function readInput(arg: string): string {
  try {
    return arg === '-' ? readFileSync(0, 'utf8') : readFileSync(arg, 'utf8');
  } catch (e) {
    return fail([`cannot read ${arg === '-' ? 'standard input' : arg}: ${(e as Error).message}`]);
  }
}

/** The JSON text for one case and what became of it. */
function solveOne(input: unknown): { text: (indent?: number) => string; error: CaseError | null } {
  const parsed = dropCaseSchema.safeParse(input);
  let error: CaseError;
  if (parsed.success) {
    try {
      // simulateDrop refuses to return a non-finite number (PhysicsSolveError), so plain JSON never prints null for one.
      const result = simulateDrop(parsed.data);
      return { text: (indent) => JSON.stringify(result, null, indent), error: null };
    } catch (e) {
      if (e instanceof PhysicsInputError) error = { kind: 'input', issues: [physicsIssue(e)] };
      else if (e instanceof PhysicsSolveError) error = { kind: 'solve', message: e.message };
      else throw e;
    }
  } else {
    error = { kind: 'input', issues: dropCaseIssues(parsed.error) };
  }
  return { text: (indent) => JSON.stringify({ error }, null, indent), error };
}

function describe(error: CaseError, where: string): string[] {
  return error.kind === 'input' ? error.issues.map((i) => `${where}${i.path}: ${i.message}`) : [`${where}cannot solve: ${error.message}`];
}

/** Output goes out in pieces of about 64 KB: one write per case would cost a system call each. */
let pending = '';
async function write(text: string, flush = false): Promise<void> {
  pending += text;
  if (pending.length < 65_536 && !flush) return;
  const piece = pending;
  pending = '';
  if (!process.stdout.write(piece)) await new Promise<void>((resolve) => process.stdout.once('drain', resolve));
}

async function main(argv: string[]): Promise<number> {
  const args = argv.filter((a) => a !== '--');
  if (args.length !== 1 || args[0] === '-h' || args[0] === '--help') fail([USAGE]);
  let json: unknown;
  try {
    json = JSON.parse(readInput(args[0]));
  } catch (e) {
    fail([`input is not valid JSON: ${(e as Error).message}`]);
  }
  if (!Array.isArray(json)) {
    const one = solveOne(json);
    if (one.error) for (const line of describe(one.error, '')) process.stderr.write(line + '\n');
    await write(one.text(2) + '\n', true);
    return one.error ? EXIT[one.error.kind] : EXIT.ok;
  }
  if (json.length === 0) fail(['the list of cases is empty']);
  if (json.length > MAX_CASES) fail([`at most ${MAX_CASES} cases in one run, got ${json.length}: split the list`]);
  let code: number = EXIT.ok;
  await write('[\n');
  for (let i = 0; i < json.length; i++) {
    const one = solveOne(json[i]);
    if (one.error) {
      for (const line of describe(one.error, `case ${i}: `)) process.stderr.write(line + '\n');
      code = Math.max(code, EXIT[one.error.kind]);
    }
    await write(one.text() + (i + 1 < json.length ? ',\n' : '\n'));
  }
  await write(']\n', true);
  return code;
}

main(process.argv.slice(2)).then((code) => {
  process.exitCode = code;
});
