/**
 * Command line for the physics core: `npm run -s assess -- FILE` (or `-` for standard input).
 * Prints the result JSON (an array of results for an array of cases). Bad input exits 2 with one
 * line per wrong field on standard error; a case that cannot be solved exits 1.
 */
import { readFileSync } from 'node:fs';
import { z } from 'zod';
import { PhysicsInputError, PhysicsSolveError, simulateDrop, type DropResult } from '@/lib/physics';
import { dropCaseIssues, dropCaseSchema, physicsIssue } from '@/lib/schemas/drop-case';

const USAGE = 'usage: npm run -s assess -- FILE   (FILE is a drop-case JSON file, or - for standard input)';

function fail(code: number, lines: string[]): never {
  for (const line of lines) process.stderr.write(line + '\n');
  process.exit(code);
}

function readInput(arg: string): string {
  try {
    return arg === '-' ? readFileSync(0, 'utf8') : readFileSync(arg, 'utf8');
  } catch (e) {
    return fail(2, [`cannot read ${arg === '-' ? 'standard input' : arg}: ${(e as Error).message}`]);
  }
}

function main(argv: string[]): void {
  const args = argv.filter((a) => a !== '--');
  if (args.length !== 1 || args[0] === '-h' || args[0] === '--help') fail(2, [USAGE]);
  const text = readInput(args[0]);
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    fail(2, [`input is not valid JSON: ${(e as Error).message}`]);
  }
  const batch = Array.isArray(json);
  const parsed = (batch ? z.array(dropCaseSchema).min(1, 'the list of cases is empty') : dropCaseSchema).safeParse(json);
  if (!parsed.success) {
    fail(
      2,
      dropCaseIssues(parsed.error).map(({ path, message }) => {
        if (!batch) return `${path}: ${message}`;
        const [index, ...rest] = path.split('.');
        return /^\d+$/.test(index) ? `case ${index}: ${rest.join('.') || '(case)'}: ${message}` : `${path}: ${message}`;
      }),
    );
  }
  const cases = batch ? (parsed.data as z.output<typeof dropCaseSchema>[]) : [parsed.data as z.output<typeof dropCaseSchema>];
  const results: DropResult[] = [];
  cases.forEach((c, i) => {
    const where = batch ? `case ${i}: ` : '';
    try {
      results.push(simulateDrop(c));
    } catch (e) {
      if (e instanceof PhysicsInputError) {
        const issue = physicsIssue(e);
        fail(2, [`${where}${issue.path}: ${issue.message}`]);
      }
      if (e instanceof PhysicsSolveError) fail(1, [`${where}cannot solve: ${e.message}`]);
      throw e;
    }
  });
  process.stdout.write(JSON.stringify(batch ? results : results[0], null, 2) + '\n');
}

main(process.argv.slice(2));
