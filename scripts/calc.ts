// Command-line entry to the science core: `--list`, or NAME --param value … ; prints one JSON line.
import { describeCatalogue, evaluateByName } from '@shared/science';
import { ScienceRangeError } from '@shared/science';

/** What a run of the command produced: the text for standard output and the exit code. */
export interface CalcResult {
  exitCode: number;
  output: string;
}

class UsageError extends Error {}

function parseValue(name: string, raw: string | undefined): unknown {
  if (raw === undefined) throw new UsageError(`--${name} needs a value`);
  if (raw.startsWith('[') || raw.startsWith('{')) {
    try {
      return JSON.parse(raw);
    } catch {
      throw new UsageError(`--${name} is not valid JSON: ${raw}`);
    }
  }
  // Anything that is not a number stays text; the function's catalogue entry says what it takes.
  const value = Number(raw);
  if (raw === 'NaN') return Number.NaN;
  return raw.trim() === '' || Number.isNaN(value) ? raw : value;
}

function parseArguments(argv: string[]): { name?: string; list: boolean; args: Record<string, unknown> } {
  const args: Record<string, unknown> = {};
  let name: string | undefined;
  let list = false;
  for (let i = 0; i < argv.length; i++) {
    const token = argv[i];
    if (token === '--list') { list = true; continue; }
    if (token.startsWith('--')) {
      const eq = token.indexOf('=');
      const key = eq > 0 ? token.slice(2, eq) : token.slice(2);
      args[key] = parseValue(key, eq > 0 ? token.slice(eq + 1) : argv[++i]);
      continue;
    }
    if (name !== undefined) throw new UsageError(`unexpected argument "${token}"; give one function name`);
    name = token;
  }
  return { name, list, args };
}

function errorJson(error: unknown): string {
  if (error instanceof ScienceRangeError) {
    const { parameter, value, min, max, unit, reason, message } = error;
    return JSON.stringify({ error: { code: 'out-of-range', reason, parameter, value: Number.isFinite(value) ? value : String(value), min, max, unit, message } });
  }
  const code = error instanceof UsageError ? 'usage' : 'bad-request';
  return JSON.stringify({ error: { code, message: error instanceof Error ? error.message : String(error) } });
}

/** Runs the command on its arguments (without the node and script paths) and returns what to print. */
export function runCalc(argv: string[]): CalcResult {
  try {
    const { name, list, args } = parseArguments(argv);
    if (list) return { exitCode: 0, output: JSON.stringify(describeCatalogue(), null, 2) };
    if (!name) throw new UsageError('give a function name (see --list) or --list');
    return { exitCode: 0, output: JSON.stringify({ name, result: evaluateByName(name, args) }) };
  } catch (error) {
    return { exitCode: error instanceof UsageError ? 2 : 1, output: errorJson(error) };
  }
}

if (require.main === module) {
  const { exitCode, output } = runCalc(process.argv.slice(2));
  process.stdout.write(output + '\n');
  process.exitCode = exitCode;
}
