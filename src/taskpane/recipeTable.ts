/**
 * What a recipe table sheet holds, as plain data: the settings block, one row per target
 * (pH × temperature of use × concentration) whose inputs are cells and whose results are
 * PROTON formulas, the working compositions those formulas read, and the data and specs of
 * two charts (titration curve; capacity against pH with the usable range). No DOM and no
 * workbook calls: src/taskpane/writer.ts writes the plan through the workbook port.
 */
import { CellBlock, CellWrite, ChartSpec, cellAddress, rangeAddress } from '../workbook/port';
import type { TableRequest } from './form';
import { DEFAULT_PKA_UNCERTAINTY, DEFAULT_STOCK_TOLERANCE_PERCENT } from '../chem/planner';
import * as F from './formulas';

/** pKa uncertainty (pH units) and stock tolerance (%) are written as editable cells, starting from the planner's defaults. */
/** pH span of the curves either side of the targets, and their step. */
const CURVE_MARGIN_PH = 1.5;
const CURVE_STEP_PH = 0.1;

/** Layout: fixed rows and columns, zero-based. */
export const LAYOUT = {
  settingsRow: 3,
  tableHeaderRow: 19,
  firstDataRow: 20,
  /** Columns of the table (A…Q); from "Form to weigh" on, one PROTON.RECIPE.ROW formula fills the row. */
  columns: [
    'Target pH at use',
    'Use at (°C)',
    'Buffer (mM)',
    'Salt (mM)',
    'Final volume (mL)',
    'Salt to weigh (g)',
    'Form to weigh (g)',
    'Titrant (mL)',
    'Titrant low (mL)',
    'Titrant high (mL)',
    'Meter reads at bench (pH)',
    'pH at use (check)',
    'Capacity (mM base per +0.1 pH)',
    'Capacity (mM acid per −0.1 pH)',
    'Ionic strength (mM)',
    'Ideal osmolarity (mOsm/L)',
    'Warnings',
  ],
  /** First column of the working area to the right of the charts. */
  workCol: 27,
  chartCol: 17,
  chartWidthCols: 9,
  chartHeightRows: 17,
} as const;

export const COL = {
  targetPh: 0,
  useTemperatureC: 1,
  concentrationMm: 2,
  saltMm: 3,
  volumeMl: 4,
  saltGrams: 5,
  /** Where the RECIPE.ROW formula sits; the columns after it are its spill. */
  formGrams: 6,
  titrantMl: 7,
  titrantLowMl: 8,
  titrantHighMl: 9,
  meter: 10,
  check: 11,
  capacity: 12,
  capacityAcid: 13,
  ionicStrength: 14,
  osmolarity: 15,
  warnings: 16,
} as const;

/** Number formats of the RECIPE.ROW spill, in its column order (form g … warnings). */
const RECIPE_ROW_FORMATS = ['0.000', '0.00', '0.00', '0.00', '0.00', '0.00', '0.00', '0.00', '0.0', '0', ''] as const;

/**
 * Settings block: label, then value, in rows from LAYOUT.settingsRow. The rows from "Form
 * weighed" to "pKa uncertainty (±)" are the recipe options every row formula reads as its
 * options range: their labels are the options' declared labels (src/chem/input), so the
 * block reads as a two-column range of option names and values.
 */
export const SETTING_ROWS = [
  'Buffer system',
  'Form weighed',
  'Form purity (%)',
  'Titrant',
  'Titrant stock (M)',
  'Stock tolerance (%)',
  'Activity model',
  'Bench temp. (°C)',
  'Adjust at (fraction)',
  'pKa uncertainty (±)',
  'Salt',
  'Your substances',
  'Built with',
  'Built on',
] as const;

export type SettingLabel = (typeof SETTING_ROWS)[number];

/** The settings that are recipe options, first to last (a contiguous run of SETTING_ROWS). */
export const OPTION_SETTINGS: readonly SettingLabel[] = SETTING_ROWS.slice(SETTING_ROWS.indexOf('Form weighed'), SETTING_ROWS.indexOf('pKa uncertainty (±)') + 1);

/** Column of the settings' values (B, beside their labels in A: the options range is A:B). */
export const SETTING_VALUE_COL = 1;

/** Zero-based row of a setting's value. */
export function settingRow(label: SettingLabel): number {
  return LAYOUT.settingsRow + 1 + SETTING_ROWS.indexOf(label);
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

/** A sheet name from the request, e.g. `HEPES 25 mM pH 7.0–7.6`. */
export function sheetBaseName(request: TableRequest): string {
  const ph = request.targetPhs;
  const phText = ph.length === 1 ? `pH ${ph[0]}` : `pH ${Math.min(...ph)}–${Math.max(...ph)}`;
  const mM = request.concentrationsMm.length === 1 ? ` ${request.concentrationsMm[0]} mM` : '';
  return `${request.buffer}${mM} ${phText}`;
}

/** A table row's salt for the formulas: one row × 2 columns (name, mM), blank without a salt. */
function saltBlock(top: number, settings: F.SettingCells, r: F.RowCells): { block: CellBlock; range: string } {
  const c = LAYOUT.workCol;
  return {
    block: { row: top, col: c, cells: [[{ formula: F.saltName(settings) }, { formula: F.saltAmount(settings, r), numberFormat: '0.000' }]] },
    range: rangeAddress({ row: top, col: c, rowCount: 1, colCount: 2 }),
  };
}

/** The recipe sheet for a checked request. `builtWith` names the add-in and version for the provenance lines. */
export function planRecipeSheet(request: TableRequest, options: { builtWith: string; builtOn: string; pKaStep: number }): SheetPlan {
  const settings: F.SettingCells = {
    buffer: settingRef('Buffer system'),
    form: settingRef('Form weighed'),
    purityPercent: settingRef('Form purity (%)'),
    titrant: settingRef('Titrant'),
    titrantStockM: settingRef('Titrant stock (M)'),
    salt: settingRef('Salt'),
    activityModel: settingRef('Activity model'),
    benchTemperatureC: settingRef('Bench temp. (°C)'),
    pKaUncertainty: settingRef('pKa uncertainty (±)'),
    stockTolerancePercent: settingRef('Stock tolerance (%)'),
    userSubstances: request.userSubstances,
    options: `${cellAddress(settingRow(OPTION_SETTINGS[0]), 0, true)}:${cellAddress(settingRow(OPTION_SETTINGS[OPTION_SETTINGS.length - 1]), SETTING_VALUE_COL, true)}`,
  };
  const partRef = settingRef('Adjust at (fraction)');
  const values: Record<SettingLabel, CellWrite> = {
    'Buffer system': input(request.buffer),
    'Form weighed': input(request.form),
    'Form purity (%)': input(request.purityPercent, '0.0'),
    Titrant: input(request.titrant),
    'Titrant stock (M)': input(request.titrantStockM, '0.000'),
    Salt: input(request.saltForm),
    'Activity model': input(request.activityModel),
    'Bench temp. (°C)': input(request.benchTemperatureC, '0.0'),
    'Adjust at (fraction)': input(request.partVolumeFraction, '0.00'),
    'pKa uncertainty (±)': input(DEFAULT_PKA_UNCERTAINTY, '0.000'),
    'Stock tolerance (%)': input(DEFAULT_STOCK_TOLERANCE_PERCENT, '0.0'),
    'Your substances': label(request.userSubstances || '(none)'),
    'Built with': label(options.builtWith),
    'Built on': label(options.builtOn),
  };
  const head: CellBlock[] = [
    {
      row: 0,
      col: 0,
      cells: [
        [label(`Recipe table: ${request.buffer}, adjusted with ${request.titrant}`, 'title')],
        [label('Shaded cells are inputs. Every other number is a live PROTON formula: change an input and its row recomputes.', 'note')],
      ],
    },
    {
      row: LAYOUT.settingsRow,
      col: 0,
      cells: [[label('Settings', 'subtitle')], ...SETTING_ROWS.map((name) => [label(name), values[name]])],
    },
    { row: LAYOUT.tableHeaderRow, col: 0, cells: [LAYOUT.columns.map((h) => label(h, 'header'))] },
  ];

  const rowsIn = tableRows(request);
  const rowCells = (row: number): F.RowCells => ({
    targetPh: cellAddress(row, COL.targetPh),
    useTemperatureC: cellAddress(row, COL.useTemperatureC),
    concentrationMm: cellAddress(row, COL.concentrationMm),
    saltMm: cellAddress(row, COL.saltMm),
    volumeMl: cellAddress(row, COL.volumeMl),
    titrantMl: cellAddress(row, COL.titrantMl),
    partVolumeFraction: partRef,
  });
  const tail: CellBlock[] = [];
  const workTop = LAYOUT.firstDataRow;
  tail.push({
    row: LAYOUT.tableHeaderRow - 1,
    col: LAYOUT.workCol,
    cells: [[label('Salt of each table row (name, mM), as the row formulas read it; it follows the inputs.', 'note')]],
  });
  const rows: CellBlock[] = rowsIn.map((tr, i) => {
    const row = LAYOUT.firstDataRow + i;
    const r = rowCells(row);
    const salt = saltBlock(workTop + i, settings, r);
    tail.push(salt.block);
    // The spill cells stay empty (a value there would block the spill); they carry formats only.
    const spill: CellWrite[] = RECIPE_ROW_FORMATS.map((numberFormat, k) =>
      k === 0 ? result(F.recipeRow(settings, r, salt.range), numberFormat) : numberFormat ? { numberFormat, style: 'result' } : { style: 'warning' },
    );
    const cells: CellWrite[] = [
      input(tr.targetPh, '0.00'),
      input(tr.useTemperatureC, '0.0'),
      input(tr.concentrationMm, '0.0'),
      input(request.saltMm, '0.0'),
      input(request.volumeMl, '0.0'),
      result(F.saltGrams(settings, r), '0.000'),
      ...spill,
    ];
    return { row, col: 0, cells: [cells] };
  });

  // Curves for the first row: pH grid, titrant mL at each pH, capacity of that mixture.
  const first = rowCells(LAYOUT.firstDataRow);
  const firstSalt = rangeAddress({ row: workTop, col: LAYOUT.workCol, rowCount: 1, colCount: 2 });
  const lo = Math.max(1, Math.min(...request.targetPhs) - CURVE_MARGIN_PH);
  const hi = Math.min(13, Math.max(...request.targetPhs) + CURVE_MARGIN_PH);
  const grid: number[] = [];
  for (let p = Math.round(lo * 10) / 10; p <= hi + 1e-9; p = Math.round((p + CURVE_STEP_PH) * 10) / 10) grid.push(p);
  const curveCol = LAYOUT.workCol + 5;
  const curveTop = LAYOUT.firstDataRow;
  const curveHeader: CellBlock = {
    row: curveTop - 1,
    col: curveCol,
    cells: [[label('pH', 'header'), label('Titrant (mL)', 'header'), label('Capacity (mM/0.1 pH)', 'header')]],
  };
  const curveCompCol = curveCol + 4;
  const curveRows: CellWrite[][] = [];
  grid.forEach((ph, i) => {
    const row = curveTop + i;
    const phRef = cellAddress(row, curveCol);
    const mlRef = cellAddress(row, curveCol + 1);
    const compTop = curveTop + 3 * i;
    const rAtPh: F.RowCells = { ...first, titrantMl: mlRef };
    tail.push({
      row: compTop,
      col: curveCompCol,
      cells: [
        [{ formula: `=${settings.form}` }, { formula: `=${first.concentrationMm}`, numberFormat: '0.000' }],
        [{ formula: `=${settings.titrant}` }, { formula: `=IFERROR(${F.titrantMm(settings, rAtPh).slice(1)},0)`, numberFormat: '0.000' }],
        [{ formula: F.nameOrBlank(settings.salt) }, { formula: F.amountOrBlank(settings.salt, first.saltMm), numberFormat: '0.000' }],
      ],
    });
    const comp = rangeAddress({ row: compTop, col: curveCompCol, rowCount: 3, colCount: 2 });
    curveRows.push([
      { value: ph, numberFormat: '0.0' },
      { formula: F.curveTitrantMl(settings, first, phRef, firstSalt), numberFormat: '0.00' },
      { formula: `=IF(ISNA(${mlRef}),NA(),${F.curveCapacity(settings, first, comp).slice(1)})`, numberFormat: '0.00' },
    ]);
  });
  tail.push(curveHeader, { row: curveTop, col: curveCol, cells: curveRows });
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
      [{ formula: `=${first.targetPh}`, numberFormat: '0.00' }, { formula: `=${first.titrantMl}`, numberFormat: '0.00' }],
    ],
  });
  // Usable range: pKa′ ± 1 of the step nearest the target, at the first row's temperature and ionic strength.
  const bandTop = targetTop + 3;
  const pKaRef = cellAddress(bandTop, curveCol + 1);
  const capCol = rangeAddress(gridRange(curveCol + 2));
  tail.push({
    row: bandTop - 1,
    col: curveCol,
    cells: [
      [label('Usable range', 'header'), label('pKa′', 'header')],
      [label('pKa′ ± 1'), { formula: F.pKaPrime(settingRef('Buffer system'), options.pKaStep, first, settings, cellAddress(LAYOUT.firstDataRow, COL.ionicStrength)), numberFormat: '0.00' }],
      [{ formula: `=${pKaRef}-1`, numberFormat: '0.00' }, { formula: '=0', numberFormat: '0.00' }],
      [{ formula: `=${pKaRef}-1`, numberFormat: '0.00' }, { formula: `=MAX(${capCol})`, numberFormat: '0.00' }],
      [{ formula: `=${pKaRef}+1`, numberFormat: '0.00' }, { formula: `=MAX(${capCol})`, numberFormat: '0.00' }],
      [{ formula: `=${pKaRef}+1`, numberFormat: '0.00' }, { formula: '=0', numberFormat: '0.00' }],
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
      xBand: { x: { row: bandTop + 1, col: curveCol, rowCount: 4, colCount: 1 }, y: { row: bandTop + 1, col: curveCol + 1, rowCount: 4, colCount: 1 }, label: 'usable range (pKa′ ± 1)' },
      anchor: { row: chartTop + LAYOUT.chartHeightRows + 1, col: LAYOUT.chartCol, rowCount: LAYOUT.chartHeightRows, colCount: LAYOUT.chartWidthCols },
    },
  ];
  return {
    baseName: sheetBaseName(request),
    head,
    rows,
    tail,
    charts,
    columnWidths: [19, 12, 9, 9, 11, 11, 11, 10, 10, 10, 13, 11, 13, 13, 11, 12, 44, 2],
  };
}
