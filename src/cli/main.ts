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
import { ChemError, solutionWarnings, speciate } from '../chem';
import { defaultLibrary } from '../chem/library';
import { formatRecipe, planRecipe } from '../chem/planner';
import { compositionInputSchema, describeSchemaError, libraryFor, toComposition } from './compositionInput';
import { runCalc } from './calc';
import { DEMO_COMPOSITION } from './demo';
import { recipeInputSchema, toRecipeInput } from './recipeInput';

const USAGE = `Usage:
  proton-ledger solve [--json '<composition JSON>'] [--pretty]   read a composition (stdin if no --json), print the equilibrium
  proton-ledger recipe [--json '<recipe JSON>'] [--text]         plan a buffer: amounts, bench steps, meter reading, predictions
  proton-ledger substances [--json]                              list the substance library (a table, or JSON)
  proton-ledger demo [--pretty]                                  solve the demo composition (our QC lab's HEPES saline)
  proton-ledger calc <book.xlsx|.csv> -o <filled.xlsx|.csv> [--force]  evaluate a workbook's formulas (PROTON functions included), write values
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
  const composition = toComposition(parsed.data);
  const result = speciate(composition);
  // The solver's own warnings plus the plain-words checks (weak buffering, metal complexes).
  return { ...result, warnings: solutionWarnings(composition, result) };
}

function recipeCommand(raw: unknown) {
  const parsed = recipeInputSchema.safeParse(raw);
  if (!parsed.success) throw new CliFailure(describeSchemaError(parsed.error));
  const { recipe, userSubstances } = toRecipeInput(parsed.data);
  return planRecipe(recipe, libraryFor(userSubstances));
}

/** The library as a plain-text table: name, pKa values at 25 °C, forms. */
function substanceTable(): string {
  const rows = defaultLibrary()
    .list()
    .map((s) => [s.name, s.kind === 'strong' ? 'strong' : s.pKa.map((p) => p.toFixed(2)).join(', '), s.forms.join('; ')]);
  const width = [Math.max(...rows.map((r) => r[0].length)), Math.max(...rows.map((r) => r[1].length))];
  const head = ['substance'.padEnd(width[0]), 'pKa at 25 °C'.padEnd(width[1]), 'forms'].join('  ');
  return [head, ...rows.map((r) => [r[0].padEnd(width[0]), r[1].padEnd(width[1]), r[2]].join('  '))].join('\n') + '\n';
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
      case 'recipe': {
        const plan = recipeCommand(readInput(args));
        if (args.includes('--text')) write(formatRecipe(plan) + '\n');
        else print(plan);
        return 0;
      }
      case 'substances':
        if (args.includes('--json')) print(defaultLibrary().list());
        else write(substanceTable());
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

/** Runs any command, the asynchronous `calc` included; resolves to the exit code. */
export async function main(args: string[], write: (text: string) => void): Promise<number> {
  if (args[0] === 'calc') return runCalc(args.slice(1), write);
  return run(args, write);
}

if (require.main === module) {
  void main(process.argv.slice(2), (t) => process.stdout.write(t)).then((code) => {
    process.exitCode = code;
  });
}
