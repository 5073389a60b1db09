/**
 * The actuals range of AS.MADE and TITRANT.NEXT, and the tables they spill.
 *
 * An actuals range has two or three columns. A row whose first cell names a batch field (its
 * name, e.g. `actual.titrantMl`, or its label, e.g. `Titrant added (mL)`; docs/input.md) gives
 * that field's value; any other row names a form weighed, with its grams and, in a third
 * column, the lot's purity. Blank rows, and rows whose value is blank, are skipped, so a
 * batch record's half-filled table reads as what has been entered so far. Every value is
 * read by its field's one declaration (src/chem/input) in the core.
 */
import { ChemError, MESSAGES } from '../chem';
import { AsMadeResult, BatchActuals, BatchTolerances, BenchCorrection, BenchState, WeighedActual, plannedWeighings } from '../chem/batch';
import type { RecipePlan } from '../chem/planner';
import { batchFieldOf } from '../chem/input';
import { isBlank, toRange, toText } from './coerce';
import { invalid } from './errors';
import { SHEET_MESSAGES } from './messages';

/** The argument's name, as the functions declare it. */
export const ACTUALS_ARGUMENT = 'actuals';
/** Most rows an actuals range may hold. */
export const MAX_ACTUALS_ROWS = 100;

/** What an actuals range holds, sorted into the core's inputs. */
export interface ActualsRange {
  readonly actuals: Omit<BatchActuals, 'weighed'>;
  readonly weighed: readonly WeighedActual[];
  readonly tolerances: BatchTolerances;
  readonly bench: Partial<BenchState>;
}

/**
 * Reads an actuals range.
 *
 * @param range - the range as the host passed it (blank: nothing entered)
 * @throws ChemError givenTwice for a field named twice; SheetError for too many rows or columns
 */
export function readActualsRange(range: unknown): ActualsRange {
  const rows = isBlank(range) ? [] : toRange(range).filter((row) => !row.every(isBlank));
  if (rows.length > MAX_ACTUALS_ROWS)
    throw invalid('tooManyRows', ACTUALS_ARGUMENT, SHEET_MESSAGES.tooManyRows(ACTUALS_ARGUMENT, rows.length, MAX_ACTUALS_ROWS), `up to ${MAX_ACTUALS_ROWS} rows`);
  const actuals: Record<string, unknown> = {};
  const tolerances: Record<string, unknown> = {};
  const bench: Record<string, unknown> = {};
  const weighed: WeighedActual[] = [];
  const seen = new Set<string>();
  for (const row of rows) {
    if (row.length < 2)
      throw invalid(
        'tooFewColumns',
        ACTUALS_ARGUMENT,
        SHEET_MESSAGES.tooFewColumns(ACTUALS_ARGUMENT, row.length, 'two or three: a name, its value, and a form’s purity'),
        'two or three columns',
      );
    const name = toText(ACTUALS_ARGUMENT, row[0]);
    const value = row[1];
    const f = batchFieldOf(name);
    if (f && seen.has(f.name)) throw new ChemError('invalid-input', 'givenTwice', MESSAGES.givenTwice(name), name, 'each field once');
    if (f) seen.add(f.name);
    if (isBlank(value)) continue;
    if (!f) {
      weighed.push({ form: name, grams: value as number | string, ...(isBlank(row[2]) ? {} : { purityPercent: row[2] as number | string }) });
      continue;
    }
    const [group, key] = f.name.split('.');
    if (group === 'actual') actuals[key] = value;
    else if (group === 'tolerance') tolerances[key] = value;
    else if (group === 'reading') bench[key === 'ph' ? 'readingPh' : key] = value;
    else if (group === 'counterTitrant') bench.counterTitrant = { ...(bench.counterTitrant as object), [key]: value };
  }
  if (tolerances.meterPh !== undefined) bench.meterTolerancePh = tolerances.meterPh;
  return { actuals: actuals as Omit<BatchActuals, 'weighed'>, weighed, tolerances: tolerances as BatchTolerances, bench: bench as Partial<BenchState> };
}

/** Columns of AS.MADE. */
export const AS_MADE_HEADER = ['check', 'planned', 'as made', 'deviation', 'tolerance', 'result'] as const;
/** Most rows of AS.MADE, header and verdict included: Excel spills only the rows a batch has; the formula engine pads to this. */
export const AS_MADE_ROWS = 24;

const verdict = (pass: boolean) => (pass ? 'PASS' : 'FAIL');

/**
 * The as-made table: one row per weighed component (mM), the titrant (mM, no tolerance: it is
 * titrated to the meter), each check of the finished batch, the other predictions, the
 * warnings, and the verdict last.
 */
export function asMadeTable(r: AsMadeResult): (number | string)[][] {
  const rows: (number | string)[][] = [[...AS_MADE_HEADER]];
  for (const c of r.components) rows.push([`${c.name} (mM)`, c.plannedMm, c.actualMm, c.deviationPercent, c.tolerancePercent, verdict(c.pass)]);
  if (r.titrant) rows.push([`${r.titrant.name} (mM)`, r.titrant.plannedMm, r.titrant.actualMm, r.titrant.deviationPercent, '', 'titrated to the meter']);
  for (const c of r.checks) rows.push([`${c.label} (${c.unit})`, c.planned, c.value, c.deviation, c.tolerance, verdict(c.pass)]);
  const p = r.predictions;
  rows.push([`pH at ${r.benchTemperatureC} °C, as made (pH)`, '', p.pHAtBench, '', '', '']);
  rows.push(['ionic strength, as made (mM)', '', p.ionicStrengthM * 1000, '', '', '']);
  rows.push(['ideal osmolarity, as made (mOsm/L)', '', p.idealOsmolarityMosm, '', '', '']);
  if (p.osmolalityMosmPerKg !== undefined) rows.push(['osmolality, as made (mOsm/kg)', '', p.osmolalityMosmPerKg, '', '', 'at the plan’s osmotic coefficient']);
  for (const w of r.warnings) rows.push(['warning', '', '', '', '', w.message]);
  if (rows.length >= AS_MADE_ROWS) rows.length = AS_MADE_ROWS - 1;
  rows.push(['batch', '', '', '', '', verdict(r.pass)]);
  return rows;
}

/**
 * The table of a record not yet filled in: each planned amount, entered or not, and the
 * verdict `INCOMPLETE` (a batch record computes as it is filled in; until every planned form
 * and the titrant have an amount, there is nothing to check). Undefined when all are entered.
 */
export function incompleteTable(plan: RecipePlan, read: ActualsRange): (number | string)[][] | undefined {
  const planned = plannedWeighings(plan);
  const titrantMissing = plan.titration !== undefined && read.actuals.titrantMl === undefined;
  if (read.weighed.length >= planned.length && !titrantMissing) return undefined;
  const entered = new Set(read.weighed.map((w) => w.form.trim().toLowerCase()));
  const rows: (number | string)[][] = [[...AS_MADE_HEADER]];
  for (const c of planned) rows.push([`${c.name} (g)`, c.grams!, '', '', '', entered.has(c.name.toLowerCase()) ? 'entered' : 'not entered']);
  if (plan.titration) rows.push([`${plan.titration.stockM} M ${plan.titration.titrant} (mL)`, plan.titration.volumeMl, '', '', '', titrantMissing ? 'not entered' : 'entered']);
  rows.push(['batch', '', '', '', '', 'INCOMPLETE']);
  return rows;
}

/** Columns of TITRANT.NEXT. */
export const TITRANT_NEXT_HEADER = ['add', 'next (mL)', 'first portion (mL)', 'end point reads (pH)', 'expected now (pH)', 'note'] as const;

/** What TITRANT.NEXT says before the bench has a reading: nothing to add yet, and what the meter should read at the end point as planned. */
export function waitingRow(plan: RecipePlan): (number | string)[] {
  return ['waiting for a reading', '', '', plan.meter.pH, '', SHEET_MESSAGES.waitingForReading()];
}

/** The correction as one row. */
export function titrantNextRow(c: BenchCorrection): (number | string)[] {
  const what = c.action === 'on-target' ? 'nothing' : `${c.stockM} M ${c.add}`;
  return [what, c.nextMl, c.firstPortionMl, c.endPointPh, c.expectedPh, c.warnings.map((w) => w.message).join(' ')];
}
