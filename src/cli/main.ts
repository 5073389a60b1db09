#!/usr/bin/env node
/**
 * proton-ledger command line.
 *
 *   proton-ledger solve [--json '<composition>'] [--pretty]   (composition on stdin otherwise)
 *   proton-ledger recipe [--json '<recipe>'] [--text]
 *   proton-ledger recipe --batch inputs.csv [-o out.csv|.jsonl|.xlsx]
 *
 * Output is JSON on stdout; on bad input a JSON error ({kind, code, message, field, allowed})
 * and exit code 2. The workbook libraries load only for `calc` and .xlsx output, so the
 * other commands start fast.
 */
import { readFileSync, writeFileSync } from 'fs';
import { extname } from 'path';
import { ChemError, MESSAGES } from '../chem';
import { FIELDS, allowedOf } from '../chem/input';
import { defaultLibrary } from '../chem/library';
import { formatRecipe, planRecipe } from '../chem/planner';
import { libraryFor } from './compositionInput';
import { MIX_HELP, mixCommand } from './mix';
import { formatMix } from '../chem/mixing';
import { DEMO_COMPOSITION } from './demo';
import { toRecipeInput } from './recipeInput';
import { asMade, benchCorrection } from '../chem/batch';
import { toBatchInput } from './batchInput';
import { solveComposition } from './solve';

/** The package version, for --version (read from package.json beside lib/). */
function version(): string {
  try {
    return (JSON.parse(readFileSync(`${__dirname}/../../package.json`, 'utf8')) as { version: string }).version;
  } catch {
    return 'unknown';
  }
}

const USAGE = `Usage: proton-ledger <command> [options]

Commands:
  solve [--json '<composition JSON>'] [--pretty]     the equilibrium of a composition: pH, species, ionic strength, conductivity
  solve --batch <file.csv|.jsonl> [-o <out>]         many compositions at once, one output row each
  recipe [--json '<recipe JSON>'] [--text]           plan a buffer: amounts, bench steps, meter reading, predictions
  recipe --batch <file.csv|.jsonl> [-o <out>]        a what-if table: one recipe row per input row (CSV, JSON lines or .xlsx out)
  mix [--shelf <shelf.json>] [--json '<mix>'] [--text]  a working buffer from stock solutions: mL of each, the pH it lands on
  substances [--json]                                list the substance library (a table, or JSON)
  demo [--pretty]                                    solve the demo composition (our QC lab's HEPES saline)
  calc <book.xlsx|.csv> -o <filled.xlsx|.csv> [--force]  evaluate a workbook's formulas (PROTON functions included), write values
  record [--json '<recipe JSON>'] -o <record.xlsx>   a batch record to print and fill in: .xlsx with live checks, and a printable .html beside it
  as-made [--json '<batch JSON>'] [--pretty]         check a batch as made: actual amounts in, concentrations, pH, conductivity, pass/fail out
  correct [--json '<batch JSON>'] [--pretty]         what to add next at the bench, from the titrant added so far and the meter's reading
  help [command]                                     this text, or one command's fields

Options: --help (any command), --version. Input JSON may also come on standard input.
Numbers may be text with units and decimal commas: "20 mM", "0,5 L", "4 °C" (docs/input.md).`;

const SOLVE_HELP = `Usage: proton-ledger solve [--json '<composition JSON>'] [--pretty]
       proton-ledger solve --batch <file.csv|.jsonl> [-o <out.csv|.jsonl|.xlsx>]

A composition (JSON object):
  temperatureC      °C, 0 to 100 (default 25)
  activityModel     pitzer (default), davies, ideal, bates-guggenheim
  forms             [{"form": "<library name>", "mM": <amount>} or {"form", "grams", "volumeMl"}]
  systems           [{"name", "chargeOfMostProtonated", "pKa": [..], "deltaHkJ": [..], "deltaCpJ": [..], "totalMm"}]
  strongIonsMm      {"Na+": <mM>, "Cl-": <mM>, ...}
  userSubstances    your own substances (see docs/functions.md)

Example (our own): proton-ledger solve --json '{"forms": [{"form": "tris base", "mM": "50 mM"}, {"form": "HCl", "mM": 30}], "temperatureC": "4 °C"}'`;

function recipeHelp(): string {
  const rows = FIELDS.filter((f) => f.scope === 'recipe').map((f) => {
    const def =
      f.kind === 'number'
        ? f.default !== undefined
          ? String(f.default)
          : (f.defaultText ?? (f.required ? 'required' : '—'))
        : f.kind === 'choice'
          ? f.default
          : f.kind === 'text'
            ? f.required
              ? 'required'
              : (f.defaultText ?? '—')
            : '—';
    return `  ${f.name.padEnd(32)} ${allowedOf(f)}; default: ${def}. ${f.description}`;
  });
  return [
    `Usage: proton-ledger recipe [--json '<recipe JSON>'] [--text]`,
    `       proton-ledger recipe --batch <file.csv|.jsonl> [-o <out.csv|.jsonl|.xlsx>]`,
    '',
    'Fields of the recipe JSON (dotted names are nested objects: "titrant": {"form": "NaOH", "concentrationM": 5};',
    'in a batch CSV, use the dotted names as column headers):',
    ...rows,
    '  userSubstances                   your own substances (see docs/functions.md)',
    '',
    `Example (our own): proton-ledger recipe --text --json '{"buffer": "HEPES", "targetPh": 7.4, "concentrationMm": "25 mM", "volumeMl": "0.5 L", "useTemperatureC": 4, "benchTemperatureC": 22, "salts": "NaCl 150 mM"}'`,
  ].join('\n');
}

const CALC_HELP = `Usage: proton-ledger calc <book.xlsx|.csv> -o <filled.xlsx|.csv> [--force]

Evaluates every formula of the workbook (PROTON functions included) and writes a copy with
values. Prints a JSON report: formulas evaluated, errors (each with its cell and message),
and the deliberate #N/A cells that formulas return by design. Refuses to overwrite an
existing output unless --force.`;

const BATCH_HELP = `Usage: proton-ledger as-made [--json '<batch JSON>'] [--pretty]
       proton-ledger correct [--json '<batch JSON>'] [--pretty]
       proton-ledger record [--json '<recipe JSON>'] -o <record.xlsx> [--html <record.html>]

A batch (JSON object; the recipe as for proton-ledger recipe):
  recipe            the recipe the batch was planned from
  actual            {"weighed": [{"form", "grams", "purityPercent", "lot"}], "titrantMl", "titrantConcentrationM",
                    "finalVolumeMl", "benchTemperatureC", "meterPh", "finalPh", "conductivity25MsPerCm"}
  tolerance         {"ph", "concentrationPercent", "conductivityPercent", "meterPh"}
  reading           (correct) {"ph", "temperatureC", "volumeMl"}: the meter now
  counterTitrant    (correct) {"form", "concentrationM"}: after an overshoot
${FIELDS.filter((f) => f.scope === 'batch')
  .map(
    (f) =>
      `  ${f.name.padEnd(32)} ${allowedOf(f)}; default: ${f.kind === 'number' && f.default !== undefined ? f.default : ((f as { defaultText?: string }).defaultText ?? '—')}. ${f.description}`,
  )
  .join('\n')}

as-made prints the check (components, predictions, checks with pass/fail, warnings) and exits 1 when the batch fails.
correct prints what to add next, a safe first portion, the end-point reading and, off the plan, the likely causes.
record writes the .xlsx (formulas with values, print area on one A4 page) and the .html page (default: beside it);
given a batch ({"recipe", "actual"}) instead of a recipe, it writes the record filled in with the actual values.

Example (our own): proton-ledger correct --json '{"recipe": {"buffer": "tris", "targetPh": 7.5, "useTemperatureC": 4, "benchTemperatureC": 22, "concentrationMm": 50, "volumeMl": 500, "titrant": "HCl"}, "actual": {"titrantMl": 20}, "reading": {"ph": 7.35}}'`;

const HELP: Readonly<Record<string, () => string>> = {
  'as-made': () => BATCH_HELP,
  correct: () => BATCH_HELP,
  record: () => BATCH_HELP,
  solve: () => SOLVE_HELP,
  recipe: recipeHelp,
  calc: () => CALC_HELP,
  mix: () => MIX_HELP,
  substances: () => 'Usage: proton-ledger substances [--json]\n\nLists every substance of the library: name, pKa values at 25 °C, forms.',
  demo: () => 'Usage: proton-ledger demo [--pretty]\n\nSolves the demo composition: the QC bench’s 25 mM HEPES / 150 mM NaCl wash buffer at 4 °C.',
};

/** Where the input comes from: --json, a file for --batch, or standard input (never a terminal, which would wait). */
function readText(args: string[], write: (text: string) => void, command: string): string | undefined {
  const i = args.indexOf('--json');
  if (i >= 0) return args[i + 1] ?? '';
  if (process.stdin.isTTY) {
    write(HELP[command]() + '\n');
    return undefined;
  }
  return readFileSync(0, 'utf8');
}

function parseJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new ChemError('invalid-input', 'notJson', MESSAGES.notJson((e as Error).message), 'input', 'one JSON object');
  }
}

const solveCommand = solveComposition;

function recipeCommand(raw: unknown) {
  const { recipe, userSubstances } = toRecipeInput(raw);
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

function optionValue(args: string[], name: string): string | undefined {
  const i = args.indexOf(name);
  return i >= 0 ? args[i + 1] : undefined;
}

/** Runs a batch; returns the exit code: 0 when every row was planned, 1 when some rows hold errors. */
async function batchCommand(command: 'recipe' | 'solve', args: string[], write: (text: string) => void): Promise<number> {
  const batch = await import('./batch');
  const file = optionValue(args, '--batch');
  if (!file) throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('--batch', 'a CSV or JSON-lines file (or - for standard input)'), '--batch', 'a file');
  const text = file === '-' ? readFileSync(0, 'utf8') : readFileSync(file, 'utf8');
  const inputs = batch.readBatch(text);
  const rows = command === 'recipe' ? batch.recipeBatch(inputs) : batch.solveBatch(inputs);
  const out = optionValue(args, '-o');
  const kind = out ? extname(out).toLowerCase() : '.csv';
  if (kind === '.xlsx') {
    const { writeTableXlsx } = await import('./tableXlsx');
    await writeTableXlsx(out!, `${command} batch`, batch.batchTable(command, rows));
  } else {
    const body = kind === '.jsonl' || kind === '.json' ? batch.batchJsonLines(command, rows) : batch.batchCsv(command, rows);
    if (out) writeFileSync(out, body);
    else write(body);
  }
  const failed = rows.filter((r) => r.error).length;
  if (out) write(JSON.stringify({ rows: rows.length, planned: rows.length - failed, failed, output: out }) + '\n');
  return failed > 0 ? 1 : 0;
}

/** Writes a recipe's batch record (.xlsx and .html); the workbook libraries load only here. */
async function recordCommand(args: string[], write: (text: string) => void): Promise<number> {
  const xlsx = optionValue(args, '-o');
  if (!xlsx || extname(xlsx).toLowerCase() !== '.xlsx')
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('-o', 'the record file to write, ending .xlsx'), '-o', 'a path ending .xlsx');
  const html = optionValue(args, '--html') ?? xlsx.replace(/\.xlsx$/i, '.html');
  const text = readText(args, write, 'record');
  if (text === undefined) return 0;
  // A recipe, or a batch ({"recipe", "actual"}) whose actual values fill the record in.
  const raw = parseJson(text) as Record<string, unknown>;
  const filled = raw !== null && typeof raw === 'object' && 'recipe' in raw ? toBatchInput(raw) : undefined;
  const { recipe, userSubstances } = filled ?? toRecipeInput(raw);
  const plan = planRecipe(recipe, libraryFor(userSubstances));
  const { writeRecord } = await import('./record');
  write(JSON.stringify(await writeRecord(recipe, plan, { xlsx, html }, version(), filled?.actuals)) + '\n');
  return 0;
}

function printError(e: unknown, print: (value: unknown) => void): void {
  if (e instanceof ChemError) print({ error: { kind: e.kind, code: e.code, message: e.message, field: e.field, allowed: e.allowed } });
  else if ((e as NodeJS.ErrnoException)?.code === 'ENOENT') print({ error: { kind: 'invalid-input', code: 'fileNotFound', message: (e as Error).message, field: 'file' } });
  else print({ error: { kind: 'invalid-input', code: 'unexpected', message: `Unexpected failure (please report it): ${(e as Error).message}` } });
}

/** Runs one command (not calc or batch); returns the process exit code. Exported for tests. */
export function run(args: string[], write: (text: string) => void): number {
  const pretty = args.includes('--pretty');
  const print = (value: unknown) => write(JSON.stringify(value, null, pretty ? 2 : undefined) + '\n');
  const command = args[0];
  try {
    if (command !== undefined && args.includes('--help') && HELP[command]) {
      write(HELP[command]() + '\n');
      return 0;
    }
    switch (command) {
      case 'solve': {
        const text = readText(args, write, 'solve');
        if (text === undefined) return 0;
        print(solveCommand(parseJson(text)));
        return 0;
      }
      case 'recipe': {
        const text = readText(args, write, 'recipe');
        if (text === undefined) return 0;
        const plan = recipeCommand(parseJson(text));
        if (args.includes('--text')) write(formatRecipe(plan) + '\n');
        else print(plan);
        return 0;
      }
      case 'mix': {
        const text = readText(args, write, 'mix');
        if (text === undefined) return 0;
        const plan = mixCommand(parseJson(text), optionValue(args, '--shelf'));
        if (args.includes('--text')) write(formatMix(plan) + '\n');
        else print(plan);
        return 0;
      }
      case 'as-made': {
        const text = readText(args, write, 'as-made');
        if (text === undefined) return 0;
        const b = toBatchInput(parseJson(text));
        const library = libraryFor(b.userSubstances);
        const { composition: _composition, ...result } = asMade(planRecipe(b.recipe, library), b.actuals, b.tolerances, library);
        print(result);
        return result.pass ? 0 : 1;
      }
      case 'correct': {
        const text = readText(args, write, 'correct');
        if (text === undefined) return 0;
        const b = toBatchInput(parseJson(text));
        const library = libraryFor(b.userSubstances);
        print(benchCorrection(planRecipe(b.recipe, library), b.bench, library));
        return 0;
      }
      case 'substances':
        if (args.includes('--json')) print(defaultLibrary().list());
        else write(substanceTable());
        return 0;
      case 'demo':
        print({ composition: DEMO_COMPOSITION, result: solveCommand(DEMO_COMPOSITION) });
        return 0;
      case '--version':
      case 'version':
        write(`proton-ledger ${version()}\n`);
        return 0;
      case undefined:
      case '--help':
        write(USAGE + '\n');
        return 0;
      case 'help':
        write((args[1] && HELP[args[1]] ? HELP[args[1]]() : USAGE) + '\n');
        return 0;
      default:
        throw new ChemError('invalid-input', 'unknownField', MESSAGES.unknownCommand(command, Object.keys(HELP).concat('help')), 'command', Object.keys(HELP).join(', '));
    }
  } catch (e) {
    printError(e, print);
    return 2;
  }
}

/** Runs any command, the asynchronous `calc` and batches included; resolves to the exit code. */
export async function main(args: string[], write: (text: string) => void): Promise<number> {
  if (args[0] === 'calc') {
    if (args.includes('--help')) {
      write(CALC_HELP + '\n');
      return 0;
    }
    const { runCalc } = await import('./calc');
    return runCalc(args.slice(1), write);
  }
  if (args[0] === 'record' && !args.includes('--help')) {
    try {
      return await recordCommand(args, write);
    } catch (e) {
      printError(e, (v) => write(JSON.stringify(v) + '\n'));
      return 2;
    }
  }
  if ((args[0] === 'recipe' || args[0] === 'solve') && args.includes('--batch') && !args.includes('--help')) {
    try {
      return await batchCommand(args[0], args, write);
    } catch (e) {
      printError(e, (v) => write(JSON.stringify(v) + '\n'));
      return 2;
    }
  }
  return run(args, write);
}

if (require.main === module) {
  void main(process.argv.slice(2), (t) => process.stdout.write(t)).then((code) => {
    process.exitCode = code;
  });
}
