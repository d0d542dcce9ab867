/**
 * The Nightloom command line (`npx nightloom`):
 *   nightloom check <plan.yaml | -> [--date YYYY-MM-DD] [--json]   validate and dry-run offline
 *   nightloom schema                                                print the plan's JSON Schema
 * Exit codes: 0 clean, 1 findings with severity stop, 2 invalid plan, unreadable file or bad arguments.
 */
import fs from 'node:fs';
import { runDryRun } from '@/shared/dry-run';
import { checkReport, formatCheckReport, formatPlanErrors, importPlan, planDryRunInput, planJsonSchemaText, PLAN_LIMITS, type InvalidReport } from '@/shared/plan';
import { nightDateSchema } from '@/shared/schemas/night';

const USAGE = `Usage:
  nightloom check <plan.yaml | -> [--date YYYY-MM-DD] [--json]
      Validate a plan and dry-run its recipe offline (site, rig and targets from the plan;
      the night from --date or the plan's night.date).
      Exit code 0: clean; 1: findings with severity stop; 2: the plan is invalid.
  nightloom schema
      Print the JSON Schema of the plan format (nightloom.plan/1).
`;

interface CheckArgs {
  file: string;
  date?: string;
  json: boolean;
}

/** Parses `check` arguments, or returns a usage error. */
function parseCheckArgs(args: string[]): CheckArgs | string {
  let file: string | undefined;
  let date: string | undefined;
  let json = false;
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    if (arg === '--json') json = true;
    else if (arg === '--date') date = args[++i];
    else if (arg.startsWith('--date=')) date = arg.slice('--date='.length);
    else if (arg.startsWith('--') || file !== undefined) return `Unknown argument: ${arg}`;
    else file = arg;
  }
  if (file === undefined) return 'Name the plan file (or - for standard input)';
  if (date !== undefined && !nightDateSchema.safeParse(date).success) return `--date wants a date as YYYY-MM-DD, not ${JSON.stringify(date ?? '')}`;
  return { file, date, json };
}

/** The file's text; null (after reporting) when it cannot be read or is over the size limit. */
function readPlanText(file: string): string | { error: string } {
  try {
    if (file === '-') return fs.readFileSync(0, 'utf8');
    const size = fs.statSync(file).size;
    if (size > PLAN_LIMITS.maxBytes) return { error: `The plan is ${(size / 1048576).toFixed(1)} MB; at most ${PLAN_LIMITS.maxBytes / 1048576} MB is read` };
    return fs.readFileSync(file, 'utf8');
  } catch (err) {
    return { error: `Cannot read ${file}: ${(err as NodeJS.ErrnoException).code === 'ENOENT' ? 'no such file' : (err as Error).message}` };
  }
}

function check(args: CheckArgs): number {
  const text = readPlanText(args.file);
  const imported = typeof text === 'string' ? importPlan(text.replace(/^\uFEFF/, '')) : { ok: false as const, errors: [{ line: null, column: null, path: '', message: text.error }] };
  if (!imported.ok) {
    const report: InvalidReport = { file: args.file, valid: false, errors: imported.errors };
    if (args.json) process.stdout.write(`${JSON.stringify(report, null, 2)}\n`);
    else process.stderr.write(formatPlanErrors(args.file, imported.errors));
    return 2;
  }
  const nightDate = args.date ?? imported.plan.night.date;
  const result = runDryRun(planDryRunInput(imported.plan, nightDate));
  const report = checkReport(args.file, imported.plan, result, nightDate, new Date());
  process.stdout.write(args.json ? `${JSON.stringify(report, null, 2)}\n` : formatCheckReport(report));
  return report.counts.stop > 0 ? 1 : 0;
}

/** Runs one command; returns the exit code. */
export function main(argv: string[]): number {
  const [command, ...rest] = argv;
  if (command === 'schema' && rest.length === 0) {
    process.stdout.write(planJsonSchemaText());
    return 0;
  }
  if (command === 'check') {
    const args = parseCheckArgs(rest);
    if (typeof args !== 'string') return check(args);
    process.stderr.write(`${args}\n\n${USAGE}`);
    return 2;
  }
  if (command === '--help' || command === '-h' || command === 'help') {
    process.stdout.write(USAGE);
    return 0;
  }
  process.stderr.write(USAGE);
  return 2;
}

// A closed pipe (`nightloom schema | head`) is not an error of ours.
process.stdout.on('error', (err: NodeJS.ErrnoException) => {
  if (err.code === 'EPIPE') process.exit(process.exitCode ?? 0);
  throw err;
});
process.exitCode = main(process.argv.slice(2));
