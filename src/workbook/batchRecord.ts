/**
 * The batch record sheet: from a recipe, a sheet laid out to print on one page, with input
 * cells for what the bench records (lots, purities, actual grams, titrant added and its
 * standardised strength, the meter's calibration and reading, final checks, sign-off) and a
 * live PROTON.AS.MADE check that computes as it is filled in.
 *
 * `batchRecordLayout` only plans cells (pure: the pane, the preview and the command line all
 * call it); `writeBatchRecord` writes them through the workbook port, so the same record
 * appears in Excel, in the preview and in the command line's .xlsx. The recipe itself sits
 * on the sheet (buffer, target, concentration, volume, temperature, salts, options), so the
 * check's formula reads it from there and the record stands alone.
 *
 * While the pH is adjusted, the bench enters the titrant added so far and the meter's reading,
 * and a live PROTON.TITRANT.NEXT row says what to add next (it waits while either is blank).
 *
 * The check reads a three-column actuals block right of the print area (name, value, purity);
 * each of its cells mirrors an input cell with `IF(ISBLANK(cell), "", cell)`, so an input not
 * yet filled is blank to the check rather than 0.
 */
import { osmolalityOf } from '../chem/batch';
import { DEFAULT_PKA_UNCERTAINTY, RecipeInput, RecipePlan } from '../chem/planner';
import { formatGrams, formatMl } from '../chem/planner/protocol';
import { AS_MADE_ROWS } from '../functions/batch';
import { call } from '../taskpane/formulas';
import { CellBlock, CellWrite, RangeRef, WorkbookPort, cellAddress, rangeAddress } from './port';

/** Columns of the printed record (A–F), in characters. */
export const RECORD_COLUMN_WIDTHS = [30, 24, 14, 13, 13, 14] as const;
/** Printed columns. */
const PRINT_COLUMNS = RECORD_COLUMN_WIDTHS.length;
/** First column of the actuals block the check reads (H), right of the print area. */
const ACTUALS_COL = PRINT_COLUMNS + 1;
/** Rows kept for the check's spill: the most AS.MADE spills. */
const CHECK_ROWS = AS_MADE_ROWS;
/** TITRANT.NEXT's columns (TITRANT_NEXT_HEADER), worded to fit the printed columns. */
const RECORD_NEXT_HEADER = ['add', 'next (mL)', 'first portion (mL)', 'end point (pH)', 'expected (pH)', 'note'] as const;
/** Acceptance of a pH electrode's slope after calibration, % of the Nernst slope (common practice: 95–105 %). */
export const ELECTRODE_SLOPE_RANGE_PERCENT = [95, 105] as const;
/** Default acceptance: pH ± this at use, conductivity ± this % (the declared defaults of tolerance.ph and tolerance.conductivityPercent). */
const DEFAULT_PH_TOLERANCE = 0.05;
const DEFAULT_CONDUCTIVITY_TOLERANCE_PERCENT = 5;
const DEFAULT_AMOUNT_TOLERANCE_PERCENT = 2;

/** Where the record keeps what a filler types (zero-based cells), for hosts and tests. */
export interface RecordInputs {
  /** Actual grams, one per weighed form, in plan order. */
  readonly grams: readonly { readonly form: string; readonly at: CellAt }[];
  readonly purity: readonly CellAt[];
  readonly titrantMl?: CellAt;
  readonly titrantStandardisedM?: CellAt;
  readonly finalVolumeMl: CellAt;
  readonly benchTemperatureC: CellAt;
  readonly meterPh: CellAt;
  readonly finalPh: CellAt;
  readonly conductivity25: CellAt;
  readonly tolerancePh: CellAt;
  /** With a titrant: where the bench enters the titrant added so far and the reading now, and where the next amount (PROTON.TITRANT.NEXT, 1 × 6) appears. */
  readonly adjusting?: { readonly titrantAddedMl: CellAt; readonly readingPh: CellAt; readonly nextAt: CellAt };
}

export interface CellAt {
  readonly row: number;
  readonly col: number;
}

/** What a record sheet holds. */
export interface BatchRecordLayout {
  /** Sheet name to start from (made unique by the host). */
  readonly sheetName: string;
  readonly blocks: readonly CellBlock[];
  readonly widths: readonly number[];
  /** The part to print, on one page. */
  readonly printArea: RangeRef;
  readonly inputs: RecordInputs;
  /** Top-left cell of the AS.MADE spill. */
  readonly checkAt: CellAt;
}

const v = (value: string | number, style: CellWrite['style'] = 'label', numberFormat?: string): CellWrite => ({ value, style, ...(numberFormat ? { numberFormat } : {}) });
const blankInput = (numberFormat?: string): CellWrite => ({ value: null, style: 'input', ...(numberFormat ? { numberFormat } : {}) });
const f = (formula: string, style: CellWrite['style'] = 'result', numberFormat?: string): CellWrite => ({
  formula: `=${formula}`,
  style,
  ...(numberFormat ? { numberFormat } : {}),
});
const mirror = (at: CellAt) => `IF(ISBLANK(${cellAddress(at.row, at.col)}),"",${cellAddress(at.row, at.col)})`;

/** The recipe options a plan was made with, as option rows (name, value), positional fields and salts left out. */
function optionRows(input: RecipeInput): [string, string | number][] {
  const rows: [string, string | number][] = [];
  const skip = new Set(['buffer', 'targetPh', 'concentrationMm', 'volumeMl', 'useTemperatureC', 'salts', 'purityPercent']);
  const walk = (prefix: string, value: unknown) => {
    if (value === undefined || value === null) return;
    if (typeof value === 'object' && !Array.isArray(value)) {
      for (const [k, x] of Object.entries(value)) walk(prefix ? `${prefix}.${k}` : k, x);
      return;
    }
    if (!skip.has(prefix) && (typeof value === 'string' || typeof value === 'number')) rows.push([prefix, value]);
  };
  walk('', input);
  return rows;
}

/**
 * Plans the record sheet of a recipe.
 *
 * @param input - the recipe as given (its options are written on the sheet for the check's formula)
 * @param plan - planRecipe(input)
 * @param version - the add-in's version, printed in the footer
 */
export function batchRecordLayout(input: RecipeInput, plan: RecipePlan, version = ''): BatchRecordLayout {
  const rows: (CellWrite | null)[][] = [];
  const actuals: (CellWrite | null)[][] = [];
  const add = (...cells: (CellWrite | null)[]) => rows.push(cells) - 1;
  const here = () => rows.length;
  const p = plan.predictions;
  const t = plan.titration;
  const useT = p.useTemperatureC;
  const madeMl = plan.stock?.stockVolumeMl ?? plan.volumeMl;

  add(v(`Batch record: ${plan.buffer} ${plan.concentrationMm} mM, pH ${plan.targetPh} at ${useT} °C, ${plan.volumeMl} mL`, 'title'));
  add(v('Batch no.', 'label'), blankInput(), v('Date', 'label'), blankInput(), v('Prepared by', 'label'), blankInput());
  add();

  // The recipe: the check's formula reads these cells.
  add(v('Recipe', 'subtitle'));
  const recipeAt: Record<string, CellAt> = {};
  const recipeLine = (key: string, label: string, value: string | number, fmt?: string) => {
    recipeAt[key] = { row: here(), col: 1 };
    add(v(label), { value, style: 'provenance', ...(fmt ? { numberFormat: fmt } : {}) });
  };
  recipeLine('buffer', 'Buffer system', plan.buffer);
  recipeLine('targetPh', 'Target pH at use', plan.targetPh, '0.00');
  recipeLine('concentrationMm', 'Buffer (mM)', plan.concentrationMm);
  recipeLine('volumeMl', 'Final volume (mL)', plan.volumeMl);
  recipeLine('useTemperatureC', 'Use at (°C)', useT);
  const salts = plan.components.filter((c) => c.role === 'salt' && input.saltTarget === undefined);
  const fixedSalts = Array.isArray(input.salts)
    ? input.salts
    : typeof input.salts === 'string'
      ? salts.map((s) => ({ form: s.name, concentrationMm: s.concentrationMm ?? 0 }))
      : [];
  const saltStart = here();
  add(v('Salts (form, mM)', 'header'), v('', 'header'));
  for (const s of fixedSalts) add({ value: s.form, style: 'provenance' }, { value: Number(s.concentrationMm) || (s.concentrationMm as unknown as string), style: 'provenance' });
  const saltRange = fixedSalts.length ? rangeAddress({ row: saltStart + 1, col: 0, rowCount: fixedSalts.length, colCount: 2 }) : '';
  const options = optionRows(input);
  const optionStart = here();
  add(v('Options (name, value)', 'header'), v('', 'header'));
  for (const [name, value] of options) add({ value: name, style: 'provenance' }, { value, style: 'provenance' });
  const optionRange = options.length ? rangeAddress({ row: optionStart + 1, col: 0, rowCount: options.length, colCount: 2 }) : '';
  add();

  // Materials.
  add(v('Materials', 'subtitle'));
  add(v('Material', 'header'), v('Formula', 'header'), v('Lot', 'header'), v('Purity (%)', 'header'), v('Planned', 'header'), v('Actual', 'header'));
  const grams: { form: string; at: CellAt }[] = [];
  const purity: CellAt[] = [];
  for (const c of plan.components.filter((x) => x.grams !== undefined)) {
    const row = here();
    add(
      v(`${c.role}: ${c.name}`),
      v(c.formula ?? ''),
      blankInput(),
      { value: c.purityPercent ?? 100, style: 'input', numberFormat: '0.0' },
      v(`${formatGrams(c.grams!)} g`, 'result'),
      blankInput('0.000'),
    );
    grams.push({ form: c.name, at: { row, col: 5 } });
    purity.push({ row, col: 3 });
    actuals.push([v(c.name), f(mirror({ row, col: 5 }), 'note'), f(mirror({ row, col: 3 }), 'note')]);
  }
  let titrantMl: CellAt | undefined;
  let titrantStandardisedM: CellAt | undefined;
  if (t) {
    const row = here();
    add(
      v(`titrant: ${t.stockM} M ${t.titrant}`),
      v(plan.components.find((c) => c.role === 'titrant')?.formula ?? ''),
      blankInput(),
      v('—'),
      v(`${formatMl(t.volumeMl)} mL`, 'result'),
      blankInput('0.00'),
    );
    titrantMl = { row, col: 5 };
    actuals.push([v('actual.titrantMl'), f(mirror(titrantMl), 'note')]);
    const srow = here();
    add(v('titrant stock (M): nominal, standardised'), v(''), v(''), v(`±${t.tolerancePercent} %`), v(t.stockM, 'result', '0.000'), blankInput('0.000'));
    titrantStandardisedM = { row: srow, col: 5 };
    actuals.push([v('actual.titrantConcentrationM'), f(mirror(titrantStandardisedM), 'note')]);
  }
  const vrow = here();
  add(v('made up to (mL)'), v(''), v(''), v(''), v(madeMl, 'result', '0.0'), blankInput('0.0'));
  const finalVolumeMl = { row: vrow, col: 5 };
  actuals.push([v('actual.finalVolumeMl'), f(mirror(finalVolumeMl), 'note')]);
  add();

  // Meter calibration and the adjustment.
  add(v('pH meter', 'subtitle'));
  add(v('Standards used (pH)'), blankInput(), v('at (°C)'), blankInput(), v('Slope (%)'), blankInput('0.0'));
  add(v(`Slope accepted ${ELECTRODE_SLOPE_RANGE_PERCENT[0]}–${ELECTRODE_SLOPE_RANGE_PERCENT[1]} %`, 'note'));
  const brow = here();
  add(v('Bench temperature (°C)'), v('planned'), v(plan.meter.benchTemperatureC, 'result', '0.0'), v('actual'), blankInput('0.0'));
  const benchTemperatureC = { row: brow, col: 4 };
  actuals.push([v('actual.benchTemperatureC'), f(mirror(benchTemperatureC), 'note')]);
  let nextRecipeRow: number | undefined;
  const band = (t?.pKaUncertainty ?? DEFAULT_PKA_UNCERTAINTY) + 0.03;
  const mrow = here();
  add(v(`Meter reads in ${formatMl(plan.meter.partVolumeMl)} mL`), v(`pH ${plan.meter.pH.toFixed(2)} ± ${band.toFixed(2)}`, 'result'), v(''), v('actual'), blankInput('0.00'));
  const meterPh = { row: mrow, col: 4 };
  actuals.push([v('actual.meterPh'), f(mirror(meterPh), 'note')]);
  // The bench's read-back of the mirrored bench temperature: the correction reads the meter at it.
  actuals.push([v('reading.temperatureC'), f(mirror(benchTemperatureC), 'note')]);
  let adjusting: RecordInputs['adjusting'];
  if (t) {
    add(v(`First portion ${formatMl(t.firstPortionMl)} mL; expected ${formatMl(t.lowMl)}–${formatMl(t.highMl)} mL in all`, 'note'));
    // While adjusting: the titrant added so far and the meter's reading now give the next amount (PROTON.TITRANT.NEXT), live.
    const wrow = here();
    add(v('Titrant so far (mL)'), blankInput('0.00'), v('meter reads now'), blankInput('0.00'));
    adjusting = { titrantAddedMl: { row: wrow, col: 1 }, readingPh: { row: wrow, col: 3 }, nextAt: { row: wrow + 2, col: 0 } };
    add(...RECORD_NEXT_HEADER.map((h) => v(h, 'header')));
    nextRecipeRow = here();
    add();
  }
  add();

  // Final checks with acceptance ranges.
  add(v('Final checks', 'subtitle'));
  add(v('Check', 'header'), v('Acceptance', 'header'), v('Measured', 'header'), v('', 'header'), v('Tolerance', 'header'), v('Result', 'header'));
  const prow = here();
  const tolPh = { row: prow, col: 4 };
  const finalPh = { row: prow, col: 2 };
  const phCell = cellAddress(finalPh.row, finalPh.col);
  const tolCell = cellAddress(tolPh.row, tolPh.col);
  const target = cellAddress(recipeAt.targetPh.row, recipeAt.targetPh.col);
  add(
    v(`pH at ${useT} °C`),
    v(`${plan.targetPh.toFixed(2)} ± tolerance`),
    blankInput('0.00'),
    v(''),
    { value: DEFAULT_PH_TOLERANCE, style: 'input', numberFormat: '0.00' },
    f(`IF(ISBLANK(${phCell}),"",IF(ABS(${phCell}-${target})<=${tolCell},"PASS","FAIL"))`),
  );
  actuals.push([v('actual.finalPh'), f(mirror(finalPh), 'note')]);
  actuals.push([v('tolerance.ph'), f(mirror(tolPh), 'note')]);
  const krow = here();
  const conductivity25 = { row: krow, col: 2 };
  const tolK = { row: krow, col: 4 };
  const kCell = cellAddress(krow, 2);
  const kTol = cellAddress(krow, 4);
  const kappa = Number(p.conductivity25MsPerCm.toPrecision(4));
  add(
    v('Conductivity at 25 °C (mS/cm)'),
    v(`${kappa} ± tolerance %`),
    blankInput('0.00'),
    v(''),
    { value: DEFAULT_CONDUCTIVITY_TOLERANCE_PERCENT, style: 'input', numberFormat: '0' },
    f(`IF(ISBLANK(${kCell}),"",IF(ABS(${kCell}-${kappa})<=${kappa}*${kTol}/100,"PASS","FAIL"))`),
  );
  actuals.push([v('actual.conductivity25MsPerCm'), f(mirror(conductivity25), 'note')]);
  actuals.push([v('tolerance.conductivityPercent'), f(mirror(tolK), 'note')]);
  const osmolality = osmolalityOf(plan);
  if (typeof osmolality === 'number') add(v('Osmolality (mOsm/kg)'), v(`${osmolality.toFixed(0)} (predicted)`), blankInput('0'), v(''), v(''), v(''));
  const arow = here();
  add(v('Weighed amounts, each (± %)'), v('as planned'), v(''), v(''), { value: DEFAULT_AMOUNT_TOLERANCE_PERCENT, style: 'input', numberFormat: '0' });
  actuals.push([v('tolerance.concentrationPercent'), f(mirror({ row: arow, col: 4 }), 'note')]);
  add();

  // The live check.
  add(v('As-made check (computes as the record is filled in)', 'subtitle'));
  const checkAt = { row: here(), col: 0 };
  const actualsRange = rangeAddress({ row: 0, col: ACTUALS_COL, rowCount: actuals.length, colCount: 3 });
  const cell = (k: string) => cellAddress(recipeAt[k].row, recipeAt[k].col);
  if (adjusting && nextRecipeRow !== undefined) {
    const recipeCells = [cell('buffer'), cell('targetPh'), cell('concentrationMm'), cell('volumeMl')];
    rows[nextRecipeRow] = [
      f(
        call('TITRANT.NEXT', ...recipeCells, mirror(adjusting.titrantAddedMl), mirror(adjusting.readingPh), cell('useTemperatureC'), saltRange, optionRange, actualsRange),
        'result',
      ),
    ];
  }
  add(
    f(`${call('AS.MADE', cell('buffer'), cell('targetPh'), cell('concentrationMm'), cell('volumeMl'), actualsRange, cell('useTemperatureC'), saltRange, optionRange)}`, 'result'),
  );
  for (let i = 1; i < CHECK_ROWS; i++) add();

  add(v('Sign-off', 'subtitle'));
  add(v('Prepared by (name, signature)'), blankInput(), v('Date'), blankInput());
  add(v('Checked by (name, signature)'), blankInput(), v('Date'), blankInput());
  add(v('Released for use by'), blankInput(), v('Date'), blankInput());
  add();
  add(v('Cautions', 'subtitle'));
  for (const c of plan.cautions) add(v(c, 'caution'));
  for (const w of plan.warnings) add(v(w.message, 'warning'));
  add(v(`Proton Ledger ${version}: a planning aid; the meter at the temperature of use, the lab's safety data sheets and its procedures decide.`, 'note'));

  const width = PRINT_COLUMNS;
  const printArea = { row: 0, col: 0, rowCount: rows.length, colCount: width };
  return {
    sheetName: `Batch ${plan.buffer} pH ${plan.targetPh}`,
    blocks: [
      { row: 0, col: 0, cells: rows },
      { row: 0, col: ACTUALS_COL, cells: actuals },
    ],
    widths: [...RECORD_COLUMN_WIDTHS, 2, 30, 10, 10],
    printArea,
    inputs: {
      grams,
      purity,
      ...(titrantMl ? { titrantMl } : {}),
      ...(titrantStandardisedM ? { titrantStandardisedM } : {}),
      finalVolumeMl,
      benchTemperatureC,
      meterPh,
      finalPh,
      conductivity25,
      tolerancePh: tolPh,
      ...(adjusting ? { adjusting } : {}),
    },
    checkAt,
  };
}

/**
 * Writes a recipe's batch record as a new sheet through the workbook port.
 *
 * @returns the sheet's name
 */
export async function writeBatchRecord(port: WorkbookPort, input: RecipeInput, plan: RecipePlan, version = ''): Promise<string> {
  const layout = batchRecordLayout(input, plan, version);
  const sheet = await port.uniqueSheetName(layout.sheetName);
  await port.addSheet(sheet);
  for (const block of layout.blocks) await port.writeTable(sheet, block);
  await port.setColumnWidths(sheet, layout.widths);
  if (port.setPrintLayout) await port.setPrintLayout(sheet, { area: layout.printArea, onePage: true, orientation: 'portrait' });
  await port.activateSheet(sheet);
  return sheet;
}
