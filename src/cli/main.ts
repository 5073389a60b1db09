#!/usr/bin/env node
/**
 * proton-ledger command line.
 *
 *   proton-ledger solve [--json '<composition>'] [--pretty]   (composition on stdin otherwise)
 *   proton-ledger demo                                          (solve our demo composition)
 *
 * Output is one JSON object on stdout; on bad input a JSON error on stdout and exit code 2.
 */
import { readFileSync } from 'fs';
import { ChemError, speciate } from '../chem';
import { compositionInputSchema, describeSchemaError, toComposition } from './compositionInput';
import { DEMO_COMPOSITION } from './demo';

const USAGE = `Usage:
  proton-ledger solve [--json '<composition JSON>'] [--pretty]   read a composition (stdin if no --json), print the equilibrium
  proton-ledger demo [--pretty]                                  solve the demo composition (our QC lab's HEPES saline)
  proton-ledger help                                             this text`;

/** A failure to report as JSON with an exit code. */
class CliFailure extends Error {
  constructor(message: string, readonly field?: string, readonly kind = 'invalid-input') {
    super(message);
  }
}

function readInput(args: string[]): unknown {
  const i = args.indexOf('--json');
  const text = i >= 0 ? args[i + 1] ?? '' : readFileSync(0, 'utf8');
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new CliFailure(`The input is not valid JSON: ${(e as Error).message}`);
  }
}

function solveCommand(raw: unknown): unknown {
  const parsed = compositionInputSchema.safeParse(raw);
  if (!parsed.success) throw new CliFailure(describeSchemaError(parsed.error));
  return speciate(toComposition(parsed.data));
}

/** Runs one command; returns the process exit code. Exported for tests. */
export function run(args: string[], write: (text: string) => void): number {
  const pretty = args.includes('--pretty');
  const print = (value: unknown) => write(JSON.stringify(value, null, pretty ? 2 : undefined) + '\n');
  const command = args[0];
  try {
    switch (command) {
      case 'solve':
        print(solveCommand(readInput(args)));
        return 0;
      case 'demo':
        print({ composition: DEMO_COMPOSITION, result: solveCommand(DEMO_COMPOSITION) });
        return 0;
      case undefined:
      case 'help':
      case '--help':
        write(USAGE + '\n');
        return 0;
      default:
        throw new CliFailure(`Unknown command "${command}".\n${USAGE}`);
    }
  } catch (e) {
    if (e instanceof ChemError) {
      print({ error: { kind: e.kind, message: e.message, field: e.field, allowed: e.allowed } });
    } else if (e instanceof CliFailure) {
      print({ error: { kind: e.kind, message: e.message, field: e.field } });
    } else {
      print({ error: { kind: 'invalid-input', message: (e as Error).message } });
    }
    return 2;
  }
}

if (require.main === module) {
  process.exitCode = run(process.argv.slice(2), (t) => process.stdout.write(t));
}
