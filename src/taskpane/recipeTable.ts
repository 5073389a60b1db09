/**
 * What a recipe table sheet holds, as plain data: the settings block, one row per target
 * (pH × temperature of use × concentration) whose inputs are cells and whose results are
 * PROTON formulas, the working compositions those formulas read, and the data and specs of
 * two charts (titration curve; capacity against pH with the usable range). No DOM and no
 * workbook calls: src/taskpane/writer.ts writes the plan through the workbook port.
 */
import { CellBlock, CellWrite, ChartSpec, cellAddress, rangeAddress } from '../workbook/port';
import { MAX_TABLE_SALTS, SALT_TARGET_GOALS } from './form';
import type { TableRequest, TableRoute } from './form';
import { BUFFERING_HALF_WIDTH } from '../chem';
import { DEFAULT_PKA_UNCERTAINTY, DEFAULT_STOCK_TOLERANCE_PERCENT } from '../chem/planner';
import * as F from './formulas';

/** pH span of the curves either side of the targets, and their step. */
const CURVE_MARGIN_PH = 1.5;
const CURVE_STEP_PH = 0.1;
/** Curve points written per block (the writer gives the page back between blocks). */
const CURVE_POINTS_PER_BLOCK = 4;

/**
 * Settings block: label, then value, in rows from LAYOUT.settingsRow. The rows from "Route"
 * to "pKa uncertainty (±)" are the recipe options every row formula reads as its options
 * range: their labels are the options' declared labels (src/chem/input), so the block reads
 * as a two-column range of option names and values. A blank value is no option (the
 * planner's default, or a route that does not use it).
 */
export const SETTING_ROWS = [
  'Buffer system',
  'Route',
  'Form weighed',
  'Form purity (%)',
  'Titrant',
  'Titrant stock (M)',
  'Stock tolerance (%)',
  'Titrant of the buffer',
  'Acid form',
  'Base form',
  'Stock fold (×)',
  'Stock volume (mL)',
  'Salt to a target',
  ...SALT_TARGET_GOALS.map((g) => g.label),
  'Activity model',
  'Bench temp. (°C)',
  'Adjust at (fraction)',
  'pKa uncertainty (±)',
  'Your substances',
  'Built with',
  'Built on',
] as const;

export type SettingLabel = string;

/** The settings that are recipe options, first to last (a contiguous run of SETTING_ROWS). */
export const OPTION_SETTINGS: readonly SettingLabel[] = SETTING_ROWS.slice(SETTING_ROWS.indexOf('Route'), SETTING_ROWS.indexOf('pKa uncertainty (±)') + 1);

/** Column of the settings' values (B, beside their labels in A: the options range is A:B). */
export const SETTING_VALUE_COL = 1;

/** Salts block beside the settings: a header row, then MAX_TABLE_SALTS rows of name | mM | grams for the first row's volume. */
export const SALTS_BLOCK = { row: 3, col: 3, rows: MAX_TABLE_SALTS } as const;

/** Layout: fixed rows and columns, zero-based. */
export const LAYOUT = {
  settingsRow: 3,
  tableHeaderRow: 3 + SETTING_ROWS.length + 2,
  firstDataRow: 3 + SETTING_ROWS.length + 3,
  /** The table's input columns; from the first result column on, one PROTON.RECIPE.ROW formula fills the row. */
  columns: [
    'Target pH at use',
    'Use at (°C)',
    'Buffer (mM)',
    'Final volume (mL)',
    'Form to weigh (g)',
    'Base form (g)',
    'Titrant (mL)',
    'Titrant low (mL)',
    'Titrant high (mL)',
    'Meter reads at bench (pH)',
    'pH at use (check)',
    'Capacity (mM base per +0.1 pH)',
    'Capacity (mM acid per −0.1 pH)',
    'Ionic strength (mM)',
    'Ideal osmolarity (mOsm/L)',
    'Osmolality (mOsm/kg)',
    'Conductivity at use temp. (mS/cm)',
    'Conductivity at 25 °C (mS/cm)',
    'Salt to target (g)',
    'Stock per batch (mL)',
    'Warnings',
  ],
  chartCol: 22,
  chartWidthCols: 9,
  chartHeightRows: 17,
  /** First column of the working area to the right of the charts. */
  workCol: 32,
} as const;

export const COL = {
  targetPh: 0,
  useTemperatureC: 1,
  concentrationMm: 2,
  volumeMl: 3,
  /** Where the RECIPE.ROW formula sits; the columns after it are its spill. */
  formGrams: 4,
  baseFormGrams: 5,
  titrantMl: 6,
  titrantLowMl: 7,
  titrantHighMl: 8,
  meter: 9,
  check: 10,
  capacity: 11,
  capacityAcid: 12,
  ionicStrength: 13,
  osmolarity: 14,
  osmolality: 15,
  conductivity: 16,
  conductivity25: 17,
  saltTargetGrams: 18,
  stockPerBatchMl: 19,
  warnings: 20,
} as const;

/** Number formats of the RECIPE.ROW spill, in its column order (form g … warnings). */
const RECIPE_ROW_FORMATS = ['0.000', '0.000', '0.00', '0.00', '0.00', '0.00', '0.00', '0.00', '0.00', '0.0', '0', '0', '0.00', '0.00', '0.000', '0.0', ''] as const;

/** The table's headers for a route: the result columns say what they hold on that route. */
export function columnsFor(route: TableRoute): string[] {
  return LAYOUT.columns.map((h, i) => {
    if (route === 'two-forms' && i === COL.formGrams) return 'Acid form (g)';
    if (route === 'stock' && i === COL.formGrams) return 'Form for the stock (g)';
    if (route === 'stock' && i === COL.titrantMl) return 'Titrant into the stock (mL)';
    if (route === 'stock' && i === COL.meter) return 'Stock meter reads at bench (pH)';
    return h;
  });
}

/** Zero-based row of a setting's value. */
export function settingRow(label: SettingLabel): number {
  const i = SETTING_ROWS.indexOf(label as (typeof SETTING_ROWS)[number]);
  if (i < 0) throw new Error(`No setting "${label}" on a recipe sheet.`);
  return LAYOUT.settingsRow + 1 + i;
}

const settingRef = (label: SettingLabel) => cellAddress(settingRow(label), SETTING_VALUE_COL, true);

/** One row of the table: its inputs. */
export interface TableRow {
  readonly targetPh: number;
  readonly useTemperatureC: number;
  readonly concentrationMm: number;
}

/** Every combination, pH fastest, so rows for one temperature and concentration sit together. */
export function tableRows(request: TableRequest): TableRow[] {
  const rows: TableRow[] = [];
  for (const concentrationMm of request.concentrationsMm)
    for (const useTemperatureC of request.useTemperaturesC) for (const targetPh of request.targetPhs) rows.push({ targetPh, useTemperatureC, concentrationMm });
  return rows;
}

/** The sheet's plan: blocks in writing order (the data rows in batches), charts, widths. */
export interface SheetPlan {
  readonly baseName: string;
  readonly head: readonly CellBlock[];
  /** Data rows, each one CellBlock of one row, written in batches. */
  readonly rows: readonly CellBlock[];
  /** The rows' salt cells and the charts' data, written after the rows. */
  readonly tail: readonly CellBlock[];
  readonly charts: readonly ChartSpec[];
  readonly columnWidths: readonly number[];
}

const input = (value: number | string, numberFormat?: string): CellWrite => ({ value, style: 'input', ...(numberFormat ? { numberFormat } : {}) });
const result = (formula: string, numberFormat: string): CellWrite => ({ formula, numberFormat, style: 'result' });
const label = (value: string, style: CellWrite['style'] = 'label'): CellWrite => ({ value, style });

/** A number as written in a sheet name: at most `decimals` decimals, none trailing (6.6, 7). */
function shortNumber(value: number, decimals: number): string {
  return String(Number(value.toFixed(decimals)));
}

/** Decimals needed to tell the values of a list apart (a pH series by 0.05 needs 2). */
function decimalsOf(values: readonly number[]): number {
  return Math.min(3, Math.max(0, ...values.map((v) => (String(v).split('.')[1] ?? '').length)));
}

/** A sheet name from the request, e.g. `HEPES 25 mM pH 7.0–7.6`: both ends of a pH range keep the decimals of the series. */
export function sheetBaseName(request: TableRequest): string {
  const ph = request.targetPhs;
  const decimals = Math.max(1, decimalsOf(ph));
  const phText = ph.length === 1 ? `pH ${shortNumber(ph[0], 3)}` : `pH ${Math.min(...ph).toFixed(decimals)}–${Math.max(...ph).toFixed(decimals)}`;
  const mM = request.concentrationsMm.length === 1 ? ` ${shortNumber(request.concentrationsMm[0], 3)} mM` : '';
  const stock = request.route === 'stock' && request.stockFold !== undefined ? ` ${shortNumber(request.stockFold, 2)}x stock` : '';
  return `${request.buffer}${mM}${stock} ${phText}`;
}

/** The values of the settings block, label by label (inputs shaded; a blank input is no option). */
function settingValues(request: TableRequest, options: { builtWith: string; builtOn: string }): Map<SettingLabel, CellWrite> {
  const v = new Map<SettingLabel, CellWrite>();
  const blank: CellWrite = { style: 'input' };
  const titrates = request.route !== 'two-forms';
  v.set('Buffer system', input(request.buffer));
  v.set('Route', input(request.route));
  v.set('Form weighed', titrates ? input(request.form) : blank);
  v.set('Form purity (%)', input(request.purityPercent, '0.0'));
  v.set('Titrant', titrates ? input(request.titrant) : blank);
  v.set('Titrant stock (M)', titrates ? input(request.titrantStockM, '0.000') : blank);
  v.set('Stock tolerance (%)', input(DEFAULT_STOCK_TOLERANCE_PERCENT, '0.0'));
  v.set('Titrant of the buffer', titrates ? input(request.titrantInBuffer) : blank);
  v.set('Acid form', titrates ? blank : input(request.acidForm));
  v.set('Base form', titrates ? blank : input(request.baseForm));
  v.set('Stock fold (×)', request.stockFold !== undefined && request.route === 'stock' ? input(request.stockFold, '0') : blank);
  v.set('Stock volume (mL)', request.stockVolumeMl !== undefined && request.route === 'stock' ? input(request.stockVolumeMl, '0.0') : blank);
  v.set('Salt to a target', request.saltTarget ? input(request.saltTarget.form) : blank);
  for (const g of SALT_TARGET_GOALS) v.set(g.label, request.saltTarget?.goal === g.name ? input(request.saltTarget.value, '0.000') : blank);
  v.set('Activity model', input(request.activityModel));
  v.set('Bench temp. (°C)', input(request.benchTemperatureC, '0.0'));
  v.set('Adjust at (fraction)', input(request.partVolumeFraction, '0.00'));
  v.set('pKa uncertainty (±)', input(DEFAULT_PKA_UNCERTAINTY, '0.000'));
  v.set('Your substances', label(request.userSubstances || '(none)'));
  v.set('Built with', label(options.builtWith));
  v.set('Built on', label(options.builtOn));
  return v;
}

/** The options range as the row formulas will read it: label and value of each option row (blank value: no option). */
export function optionValues(request: TableRequest): (string | number | null)[][] {
  const values = settingValues(request, { builtWith: '', builtOn: '' });
  return OPTION_SETTINGS.map((name) => [name, (values.get(name)?.value as string | number | undefined) ?? null]);
}

/** The salts block's range (name, mM), as the row formulas read it. */
export const saltsRange = (): string => rangeAddress({ row: SALTS_BLOCK.row + 1, col: SALTS_BLOCK.col, rowCount: SALTS_BLOCK.rows, colCount: 2 });

/** The sheet's recipe options as a range reference (labels and values, A:B). */
const optionsRange = () =>
  `${cellAddress(settingRow(OPTION_SETTINGS[0]), 0, true)}:${cellAddress(settingRow(OPTION_SETTINGS[OPTION_SETTINGS.length - 1]), SETTING_VALUE_COL, true)}`;

/** The cells the row formulas read on every recipe sheet (the pane writes a protocol against them too). */
export function sheetCells(userSubstances: string): F.SettingCells {
  return {
    buffer: settingRef('Buffer system'),
    form: settingRef('Form weighed'),
    purityPercent: settingRef('Form purity (%)'),
    titrant: settingRef('Titrant'),
    titrantStockM: settingRef('Titrant stock (M)'),
    activityModel: settingRef('Activity model'),
    benchTemperatureC: settingRef('Bench temp. (°C)'),
    pKaUncertainty: settingRef('pKa uncertainty (±)'),
    stockTolerancePercent: settingRef('Stock tolerance (%)'),
    userSubstances,
    options: optionsRange(),
    salts: saltsRange().replace(/([A-Z]+)(\d+)/g, '$$$1$$$2'),
  };
}

/** Cells of one table row (zero-based sheet row). */
export function rowCells(row: number): F.RowCells {
  return {
    targetPh: cellAddress(row, COL.targetPh),
    useTemperatureC: cellAddress(row, COL.useTemperatureC),
    concentrationMm: cellAddress(row, COL.concentrationMm),
    volumeMl: cellAddress(row, COL.volumeMl),
    titrantMl: cellAddress(row, COL.titrantMl),
    partVolumeFraction: settingRef('Adjust at (fraction)'),
  };
}

/** The recipe sheet for a checked request. `builtWith` names the add-in and version for the provenance lines; `rows` (default: every combination) are the rows to write. */
export function planRecipeSheet(request: TableRequest, options: { builtWith: string; builtOn: string; pKaStep: number; rows?: readonly TableRow[] }): SheetPlan {
  const settings = sheetCells(request.userSubstances);
  const values = settingValues(request, options);
  const adjustedWith = request.route === 'two-forms' ? `${request.acidForm} + ${request.baseForm}` : `${request.form}, adjusted with ${request.titrant}`;
  const routeText = request.route === 'stock' ? `, ${request.stockFold}× stock` : request.route === 'two-forms' ? ', two forms weighed' : '';
  const head: CellBlock[] = [
    {
      row: 0,
      col: 0,
      cells: [
        [label(`Recipe table: ${request.buffer}${routeText}: ${adjustedWith}`, 'title')],
        [label('Shaded cells are inputs. Every other number is a live PROTON formula: change an input and its row recomputes.', 'note')],
      ],
    },
    {
      row: LAYOUT.settingsRow,
      col: 0,
      cells: [[label('Settings', 'subtitle')], ...SETTING_ROWS.map((name) => [label(name), values.get(name)!])],
    },
    { row: LAYOUT.tableHeaderRow, col: 0, cells: [columnsFor(request.route).map((h) => label(h, 'header'))] },
  ];
  const rowsIn = options.rows ?? tableRows(request);
  const firstVolume = cellAddress(LAYOUT.firstDataRow, COL.volumeMl, true);
  // Salts: name | mM inputs (blank rows are no salt), grams for the first row's volume.
  // A stock holds its salts at the stock's strength: their grams are in the protocol, not here.
  const stock = request.route === 'stock';
  const saltLines: CellWrite[][] = [[label('Salts (name, mM)', 'header'), label('mM', 'header'), label(stock ? 'g: see protocol' : 'g for row 1', 'header')]];
  for (let i = 0; i < SALTS_BLOCK.rows; i++) {
    const salt = request.salts[i];
    const nameRef = cellAddress(SALTS_BLOCK.row + 1 + i, SALTS_BLOCK.col);
    const mmRef = cellAddress(SALTS_BLOCK.row + 1 + i, SALTS_BLOCK.col + 1);
    saltLines.push([
      salt ? input(salt.form) : { style: 'input' },
      salt ? input(salt.concentrationMm, '0.0') : { style: 'input', numberFormat: '0.0' },
      stock ? { style: 'result' } : result(F.saltGrams(nameRef, mmRef, firstVolume, settings.userSubstances), '0.000'),
    ]);
  }
  head.push({ row: SALTS_BLOCK.row, col: SALTS_BLOCK.col, cells: saltLines });

  const tail: CellBlock[] = [];
  const rows: CellBlock[] = rowsIn.map((tr, i) => {
    const row = LAYOUT.firstDataRow + i;
    const r = rowCells(row);
    // The spill cells stay empty (a value there would block the spill); they carry formats only.
    const spill: CellWrite[] = RECIPE_ROW_FORMATS.map((numberFormat, k) =>
      k === 0 ? result(F.recipeRow(settings, r), numberFormat) : numberFormat ? { numberFormat, style: 'result' } : { style: 'warning' },
    );
    const cells: CellWrite[] = [input(tr.targetPh, '0.00'), input(tr.useTemperatureC, '0.0'), input(tr.concentrationMm, '0.0'), input(request.volumeMl, '0.0'), ...spill];
    return { row, col: 0, cells: [cells] };
  });
  const base = { baseName: sheetBaseName(request), head, rows, columnWidths: [21, 16, 12, 22, 11, 11, 10, 10, 10, 13, 11, 13, 13, 11, 12, 12, 14, 13, 11, 11, 60, 2] };
  // Curves and charts follow the titration of the first row: only the titrate route has one.
  if (request.route !== 'titrate') {
    tail.push({
      row: LAYOUT.tableHeaderRow - 1,
      col: COL.formGrams,
      cells: [[label('No titration curve: this route weighs its amounts (two forms) or titrates a stock; each row’s protocol has the steps.', 'note')]],
    });
    return { ...base, tail, charts: [] };
  }

  // Curves for the first row: pH grid, titrant mL at each pH, capacity of that mixture.
  const first = rowCells(LAYOUT.firstDataRow);
  const lo = Math.max(1, Math.min(...request.targetPhs) - CURVE_MARGIN_PH);
  const hi = Math.min(13, Math.max(...request.targetPhs) + CURVE_MARGIN_PH);
  const grid: number[] = [];
  for (let p = Math.round(lo * 10) / 10; p <= hi + 1e-9; p = Math.round((p + CURVE_STEP_PH) * 10) / 10) grid.push(p);
  const curveCol = LAYOUT.workCol;
  const curveTop = LAYOUT.firstDataRow;
  const curveHeader: CellBlock = {
    row: curveTop - 1,
    col: curveCol,
    cells: [[label('pH', 'header'), label('Titrant (mL)', 'header'), label('Capacity (mM/0.1 pH)', 'header')]],
  };
  const curveCompCol = curveCol + 4;
  const compRows = 2 + SALTS_BLOCK.rows;
  const curveRows: CellWrite[][] = [];
  grid.forEach((ph, i) => {
    const row = curveTop + i;
    const phRef = cellAddress(row, curveCol);
    const mlRef = cellAddress(row, curveCol + 1);
    const compTop = curveTop + compRows * i;
    const rAtPh: F.RowCells = { ...first, titrantMl: mlRef };
    const saltRows: CellWrite[][] = [];
    for (let k = 0; k < SALTS_BLOCK.rows; k++) {
      const nameRef = cellAddress(SALTS_BLOCK.row + 1 + k, SALTS_BLOCK.col, true);
      const mmRef = cellAddress(SALTS_BLOCK.row + 1 + k, SALTS_BLOCK.col + 1, true);
      saltRows.push([{ formula: F.nameOrBlank(nameRef) }, { formula: F.amountOrBlank(nameRef, mmRef), numberFormat: '0.000' }]);
    }
    tail.push({
      row: compTop,
      col: curveCompCol,
      cells: [
        [{ formula: `=${settings.form}` }, { formula: `=${first.concentrationMm}`, numberFormat: '0.000' }],
        [{ formula: `=${settings.titrant}` }, { formula: `=IFERROR(${F.titrantMm(settings, rAtPh).slice(1)},0)`, numberFormat: '0.000' }],
        ...saltRows,
      ],
    });
    const comp = rangeAddress({ row: compTop, col: curveCompCol, rowCount: compRows, colCount: 2 });
    curveRows.push([
      { value: ph, numberFormat: '0.0' },
      { formula: F.curveTitrantMl(settings, first, phRef), numberFormat: '0.00' },
      { formula: `=IF(ISNA(${mlRef}),NA(),${F.curveCapacity(settings, first, comp).slice(1)})`, numberFormat: '0.00' },
    ]);
  });
  // A few curve points per block: each point solves a titration and a capacity, and the writer yields between blocks.
  tail.push(curveHeader);
  for (let i = 0; i < curveRows.length; i += CURVE_POINTS_PER_BLOCK) tail.push({ row: curveTop + i, col: curveCol, cells: curveRows.slice(i, i + CURVE_POINTS_PER_BLOCK) });
  tail.push({
    row: curveTop - 2,
    col: curveCol,
    cells: [[label('Curves for the first table row (change that row and they follow).', 'note')]],
  });
  const gridRange = (col: number) => ({ row: curveTop, col, rowCount: grid.length, colCount: 1 });
  // Target point: the first row's titrant volume and target pH.
  const targetTop = curveTop + grid.length + 2;
  tail.push({
    row: targetTop - 1,
    col: curveCol,
    cells: [
      [label('Target', 'header'), label('Titrant (mL)', 'header')],
      [
        { formula: `=${first.targetPh}`, numberFormat: '0.00' },
        { formula: `=${first.titrantMl}`, numberFormat: '0.00' },
      ],
    ],
  });
  // Usable range: the planner's one criterion for buffering (pKa′ ± BUFFERING_HALF_WIDTH of the
  // step nearest the target, at the first row's temperature and ionic strength).
  const bandTop = targetTop + 3;
  const pKaRef = cellAddress(bandTop, curveCol + 1);
  const capCol = rangeAddress(gridRange(curveCol + 2));
  const half = BUFFERING_HALF_WIDTH;
  const bandText = `pKa′ ± ${half}`;
  tail.push({
    row: bandTop - 1,
    col: curveCol,
    cells: [
      [label('Usable range', 'header'), label('pKa′', 'header')],
      [
        label(bandText),
        { formula: F.pKaPrime(settingRef('Buffer system'), options.pKaStep, first, settings, cellAddress(LAYOUT.firstDataRow, COL.ionicStrength)), numberFormat: '0.00' },
      ],
      [
        { formula: `=${pKaRef}-${half}`, numberFormat: '0.00' },
        { formula: '=0', numberFormat: '0.00' },
      ],
      [
        { formula: `=${pKaRef}-${half}`, numberFormat: '0.00' },
        { formula: `=MAX(${capCol})`, numberFormat: '0.00' },
      ],
      [
        { formula: `=${pKaRef}+${half}`, numberFormat: '0.00' },
        { formula: `=MAX(${capCol})`, numberFormat: '0.00' },
      ],
      [
        { formula: `=${pKaRef}+${half}`, numberFormat: '0.00' },
        { formula: '=0', numberFormat: '0.00' },
      ],
    ],
  });
  const chartTop = LAYOUT.tableHeaderRow;
  const charts: ChartSpec[] = [
    {
      title: `Titration curve, row 1: ${request.form} with ${request.titrant}`,
      xTitle: `${request.titrant} stock added (mL)`,
      yTitle: 'pH at use',
      series: [
        { name: 'pH against titrant', x: gridRange(curveCol + 1), y: gridRange(curveCol) },
        { name: 'target', x: { row: targetTop, col: curveCol + 1, rowCount: 1, colCount: 1 }, y: { row: targetTop, col: curveCol, rowCount: 1, colCount: 1 }, markersOnly: true },
      ],
      anchor: { row: chartTop, col: LAYOUT.chartCol, rowCount: LAYOUT.chartHeightRows, colCount: LAYOUT.chartWidthCols },
    },
    {
      title: 'Capacity against pH, row 1',
      xTitle: 'pH at use',
      yTitle: 'mM base per +0.1 pH',
      series: [{ name: 'capacity', x: gridRange(curveCol), y: gridRange(curveCol + 2) }],
      xBand: {
        x: { row: bandTop + 1, col: curveCol, rowCount: 4, colCount: 1 },
        y: { row: bandTop + 1, col: curveCol + 1, rowCount: 4, colCount: 1 },
        label: `buffers well (${bandText})`,
      },
      anchor: { row: chartTop + LAYOUT.chartHeightRows + 1, col: LAYOUT.chartCol, rowCount: LAYOUT.chartHeightRows, colCount: LAYOUT.chartWidthCols },
    },
  ];
  return { ...base, tail, charts };
}
