/**
 * `npm run -s leg -- solve FILE` / `npm run -s leg -- optimize FILE`
 * `npm run -s leg -- curves FILE` / `npm run -s leg -- module FILE`
 * `npm run -s leg -- couple FILE` / `npm run -s leg -- cascade FILE`
 *
 * Reads one JSON case, prints one JSON object on stdout. Invalid input
 * (unreadable file, bad JSON, a field out of range, a case with no steady
 * state): exit code 2, one line `field: message` on stderr, nothing on
 * stdout. Anything else that goes wrong is a bug: exit code 1.
 * The contract and the case fields are in shared/engine/PHYSICS.md.
 */
import { readFileSync } from 'node:fs';
import { CaseError, optimizeLeg, parseCascadeCase, parseCase, parseCoupleCase, parseCurvesCase, parseModuleCase, runCascade, runCouple, runCurves, runModule, solveLeg } from '../../shared/engine';

const USAGE = 'usage: npm run -s leg -- solve|optimize|curves|module|couple|cascade FILE';
const COMMANDS = ['solve', 'optimize', 'curves', 'module', 'couple', 'cascade'] as const;
type Command = (typeof COMMANDS)[number];

const isCommand = (c: string | undefined): c is Command => (COMMANDS as readonly (string | undefined)[]).includes(c);

function run(command: Command, json: unknown): unknown {
  switch (command) {
    case 'solve':
      return solveLeg(parseCase(json, 'solve'));
    case 'optimize':
      return optimizeLeg(parseCase(json, 'optimize'));
    case 'curves':
      return runCurves(parseCurvesCase(json));
    case 'module':
      return runModule(parseModuleCase(json));
    case 'couple':
      return runCouple(parseCoupleCase(json));
    case 'cascade':
      return runCascade(parseCascadeCase(json));
  }
}

class InputError extends Error {}

function fail(code: number, line: string): never {
  process.stderr.write(`${line.replace(/\s*\n\s*/g, ' ')}\n`);
  process.exit(code);
}

function readCase(file: string): unknown {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    throw new InputError(`FILE: cannot read ${file} (${(e as NodeJS.ErrnoException).code ?? 'error'})`);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new InputError(`(case): ${file} is not valid JSON (${(e as Error).message})`);
  }
}

function main(argv: string[]): void {
  const [command, file, ...rest] = argv;
  if (!isCommand(command)) fail(2, `command: expected solve, optimize, curves, module, couple or cascade, got ${command ?? 'nothing'} (${USAGE})`);
  if (!file || rest.length > 0) fail(2, `FILE: give exactly one case file (${USAGE})`);
  try {
    const result = run(command, readCase(file));
    process.stdout.write(`${JSON.stringify(result, null, 2)}\n`);
  } catch (e) {
    if (e instanceof CaseError || e instanceof InputError) fail(2, e.message);
    fail(1, `internal error: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
  }
}

main(process.argv.slice(2));
