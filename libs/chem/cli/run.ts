/**
 * The command line of the chemistry engine, as a function of its arguments and I/O so that
 * tests can run it in-process. `main.ts` wires it to the process.
 */
import { parseArgs } from 'node:util';
import {
  balanceEquation,
  balanceToJson,
  checkEquation,
  checkToJson,
  combineReactions,
  combineToJson,
  isChemError,
  massToJson,
  type CombineInput,
} from '../src/index';
import { describeBalance, describeCheck, describeCombine, describeMass } from './describe';
import { runCo2, runMassBalance, runOxides } from './site-commands';

/** What the command line may touch. */
export interface CliIo {
  readonly stdout: (text: string) => void;
  readonly stderr: (text: string) => void;
  readonly readFile: (path: string) => string;
}

const USAGE = `Usage: npm run --silent chem -- <command> ... [--json]
  balance "<equation>" [--normalize <formula>] [--pin <formula>=<coefficient> ...]
  check "<equation with coefficients>" [--reference <formula>] [--percent <wt%>]
  mass "<formula>"
  combine <file.json>     {"reactions":[{"equation":"...","multiplier":"1"}],"cancel":["Fe^2+"]}
  mass-balance <file.json> {"initial":{..},"final":{..},"phases":[{"name","formula"|"equation","rule"}],"constraints":[..]}
  oxides <file.json>      {"oxides":{"SiO2":40.2,...},"oxygens":4,"ferric":"droop","cations":3}
  co2 "<formula>"
Exit code 0 when the status is balanced (combined; exact with a valid model; computed), 1 otherwise.`;

interface Parsed {
  readonly command: string;
  readonly argument: string;
  readonly isJson: boolean;
  readonly normalize?: string;
  readonly pins: Record<string, string>;
  readonly reference?: string;
  readonly percent?: number;
}

function parse(argv: readonly string[]): Parsed {
  const { values, positionals } = parseArgs({
    args: [...argv],
    allowPositionals: true,
    options: {
      json: { type: 'boolean', default: false },
      normalize: { type: 'string' },
      pin: { type: 'string', multiple: true },
      reference: { type: 'string' },
      percent: { type: 'string' },
    },
  });
  const pins: Record<string, string> = {};
  for (const pin of values.pin ?? []) {
    const at = pin.lastIndexOf('=');
    if (at <= 0) throw new Error(`--pin expects <formula>=<coefficient>, got "${pin}"`);
    pins[pin.slice(0, at)] = pin.slice(at + 1);
  }
  return {
    command: positionals[0] ?? '',
    argument: positionals.slice(1).join(' '),
    isJson: values.json === true,
    normalize: values.normalize,
    pins,
    reference: values.reference,
    percent: values.percent === undefined ? undefined : Number(values.percent),
  };
}

function emit(io: CliIo, isJson: boolean, json: unknown, text: string): void {
  io.stdout(isJson ? `${JSON.stringify(json)}\n` : `${text}\n`);
}

function runBalance(io: CliIo, args: Parsed): number {
  const result = balanceEquation(args.argument, { normalizeTo: args.normalize, pins: args.pins });
  emit(io, args.isJson, balanceToJson(result), describeBalance(result));
  return result.status === 'balanced' ? 0 : 1;
}

function runCheck(io: CliIo, args: Parsed): number {
  const result = checkEquation(args.argument, { reference: args.reference, rockWeightPercent: args.percent });
  emit(io, args.isJson, checkToJson(result), describeCheck(result));
  return result.status === 'balanced' ? 0 : 1;
}

function runMass(io: CliIo, args: Parsed): number {
  try {
    const json = massToJson(args.argument);
    emit(io, args.isJson, json, describeMass(json));
    return 0;
  } catch (error) {
    if (!isChemError(error)) throw error;
    emit(io, args.isJson, { status: 'invalid', error: error.toIssue() }, `invalid: ${error.message}`);
    return 1;
  }
}

function runCombine(io: CliIo, args: Parsed): number {
  const input = JSON.parse(io.readFile(args.argument)) as CombineInput;
  const result = combineReactions({ reactions: input.reactions ?? [], cancel: input.cancel ?? [] });
  emit(io, args.isJson, combineToJson(result), describeCombine(result));
  return result.status === 'combined' ? 0 : 1;
}

const COMMANDS: Readonly<Record<string, (io: CliIo, args: Parsed) => number>> = {
  balance: runBalance,
  check: runCheck,
  mass: runMass,
  combine: runCombine,
  'mass-balance': (io, args) => runMassBalance(io, io.readFile(args.argument), args.isJson),
  oxides: (io, args) => runOxides(io, io.readFile(args.argument), args.isJson),
  co2: (io, args) => runCo2(io, args.argument, args.isJson),
};

/**
 * Runs one command and returns the exit code: 0 when the status is `balanced` (or `combined`),
 * 1 otherwise, 2 for a usage error (unknown command, unreadable file, bad flag).
 * @example run(['balance', 'H2 + O2 -> H2O', '--json'], io); // prints {"status":"balanced",...}, returns 0
 */
export function run(argv: readonly string[], io: CliIo): number {
  let args: Parsed;
  try {
    args = parse(argv);
    const command = COMMANDS[args.command];
    if (command === undefined || args.argument === '') {
      io.stderr(`${USAGE}\n`);
      return 2;
    }
    return command(io, args);
  } catch (error) {
    if (isChemError(error)) throw error;
    io.stderr(`${error instanceof Error ? error.message : String(error)}\n${USAGE}\n`);
    return 2;
  }
}
