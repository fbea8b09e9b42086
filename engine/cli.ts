/**
 * The command line: `npm run simulate -- <scenario.json> [--json] [--duration <value>] [--out <series.csv>]`.
 * Exit status 0 on a completed run, 2 on invalid input (each problem on stderr with its field
 * path, never a stack trace), 1 on an internal failure.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { parseQuantity, parseScenario } from '../shared/scenario';
import { simulate, ScenarioModelError } from './index';
import { formatRunSummary } from './results/format-run-summary';
import { seriesCsv } from './results/series-csv';

/** Invalid input: the messages go to stderr and the exit status is 2. */
class InputError extends Error {
  readonly code = 'invalid-input';
  constructor(readonly problems: string[]) {
    super(problems.join('\n'));
  }
}

interface CliArguments {
  file: string;
  json: boolean;
  durationS?: number;
  out?: string;
}

const USAGE =
  'Usage: npm run simulate -- <scenario.json> [--json] [--duration <value>] [--out <series.csv>]';

function parseArguments(argv: readonly string[]): CliArguments {
  const args: Partial<CliArguments> & { json: boolean } = { json: false };
  for (let i = 0; i < argv.length; i += 1) {
    const arg = argv[i] as string;
    if (arg === '--json') args.json = true;
    else if (arg === '--duration' || arg === '--out') {
      const value = argv[i + 1];
      if (value === undefined) throw new InputError([`${arg} needs a value. ${USAGE}`]);
      i += 1;
      if (arg === '--out') args.out = value;
      else {
        const parsed = parseQuantity(value, 'time', '--duration');
        if (!parsed.success) throw new InputError([`--duration: ${parsed.issue.message}`]);
        if (!(parsed.value > 0))
          throw new InputError(['--duration: the duration must be positive.']);
        args.durationS = parsed.value;
      }
    } else if (arg.startsWith('--')) throw new InputError([`Unknown option ${arg}. ${USAGE}`]);
    else if (args.file === undefined) args.file = arg;
    else
      throw new InputError([
        `Only one scenario file can be given (got "${args.file}" and "${arg}"). ${USAGE}`,
      ]);
  }
  if (args.file === undefined) throw new InputError([`No scenario file given. ${USAGE}`]);
  return { ...args, file: args.file };
}

function readScenario(file: string) {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (error) {
    throw new InputError([
      `${file}: cannot read the file (${error instanceof Error ? error.message : String(error)}).`,
    ]);
  }
  let document: unknown;
  try {
    document = JSON.parse(text);
  } catch (error) {
    throw new InputError([
      `${file}: not valid JSON (${error instanceof Error ? error.message : String(error)}).`,
    ]);
  }
  const parsed = parseScenario(document);
  if (!parsed.success)
    throw new InputError(
      parsed.issues.map((issue) => `${issue.path || '(document)'}: ${issue.message}`),
    );
  return parsed.scenario;
}

function run(argv: readonly string[]): number {
  const args = parseArguments(argv);
  const scenario = readScenario(args.file);
  const started = performance.now();
  let outcome;
  try {
    outcome = simulate(scenario, args.durationS === undefined ? {} : { durationS: args.durationS });
  } catch (error) {
    if (error instanceof ScenarioModelError) throw new InputError([error.message]);
    throw error;
  }
  outcome.result.stats.wall_ms = performance.now() - started;
  if (args.out !== undefined) writeFileSync(args.out, seriesCsv(outcome.result.series));
  if (args.json) {
    const { series: _series, ...rest } = outcome.result;
    process.stdout.write(
      `${JSON.stringify({ status: outcome.status, ...(outcome.reason && { reason: outcome.reason }), ...rest })}\n`,
    );
  } else {
    process.stdout.write(`${formatRunSummary(scenario.name, outcome)}\n`);
  }
  if (outcome.status !== 'completed')
    process.stderr.write(`The run ${outcome.status}: ${outcome.reason ?? 'no reason given'}\n`);
  return outcome.status === 'completed' ? 0 : 1;
}

function main(): void {
  try {
    process.exitCode = run(process.argv.slice(2));
  } catch (error) {
    if (error instanceof InputError) {
      for (const problem of error.problems) process.stderr.write(`${problem}\n`);
      process.exitCode = 2;
      return;
    }
    process.stderr.write(
      `Internal error: ${error instanceof Error ? error.message : String(error)}\n`,
    );
    if (process.env['TIDEWRIGHT_DEBUG'] && error instanceof Error)
      process.stderr.write(`${error.stack ?? ''}\n`);
    process.exitCode = 1;
  }
}

main();
