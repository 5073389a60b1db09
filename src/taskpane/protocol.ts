/**
 * The bench protocol of a recipe table row, as live formulas: a sheet beside the table
 * whose one PROTON.RECIPE formula reads the chosen row's inputs (by INDEX on the table's
 * input columns, with the row number in a shaded cell), the table's salts and its options
 * range. Edit the row, a setting or the row number and the protocol follows; nothing in it
 * is a stale copy. The pane also plans each row once before a table is written (planRows),
 * through the same options the row formulas read, to list the rows that cannot be made.
 */
import { ChemError } from '../chem';
import { planRecipe } from '../chem/planner';
import type { RecipeInput, RecipePlan } from '../chem/planner';
import type { SubstanceLibrary } from '../chem/library';
import { RECIPE_TABLE_ROWS } from '../functions/functions';
import { recipeOptions } from '../functions/recipeOptions';
import { CellBlock, cellAddress, quoteSheet } from '../workbook/port';
import type { TableRequest } from './form';
import * as F from './formulas';
import { COL, LAYOUT, TableRow, optionValues, rowCells, sheetCells } from './recipeTable';

/** Where a table sheet names its protocol sheet (zero-based row and column of the name). */
export const PROTOCOL_LINK = { row: 2, labelCol: 0, nameCol: 1 } as const;
/** The protocol sheet's row-number cell (zero-based) and the first row of the RECIPE spill. */
export const PROTOCOL_ROW_CELL = { row: 2, col: 1 } as const;
export const PROTOCOL_FIRST_ROW = 5;

/** The planner input a table row's formula describes: the same options range and salts the sheet holds. */
export function rowInput(request: TableRequest, row: TableRow): RecipeInput {
  const { input } = recipeOptions(optionValues(request));
  return {
    ...input,
    buffer: request.buffer,
    targetPh: row.targetPh,
    concentrationMm: row.concentrationMm,
    volumeMl: request.volumeMl,
    useTemperatureC: row.useTemperatureC,
    salts: request.salts.map((s) => ({ form: s.form, concentrationMm: s.concentrationMm })),
  };
}

/** The planner's answer for one row, or the reason it has none. */
export function planForRow(request: TableRequest, row: TableRow, library?: SubstanceLibrary): RecipePlan | ChemError {
  try {
    return planRecipe(rowInput(request, row), library);
  } catch (error) {
    if (error instanceof ChemError) return error;
    throw error;
  }
}

/** A row that cannot be made: its place in the table (1-based), its inputs, and the planner's reason. */
export interface UnmakeableRow {
  readonly index: number;
  readonly row: TableRow;
  readonly code: string;
  readonly field?: string;
  readonly message: string;
}

/** Rows planned between two yields to the page (a few ms each: well under 200 ms per slice on a slow machine). */
export const PLAN_SLICE = 25;

/**
 * Plans every row before anything is written, yielding to the page between slices.
 *
 * @returns the rows that cannot be made, with the planner's error code and message
 */
export async function planRows(
  request: TableRequest,
  rows: readonly TableRow[],
  library: SubstanceLibrary,
  hooks: { onProgress?: (done: number, total: number) => void; yieldToPage?: () => Promise<void>; cancelled?: () => boolean } = {},
): Promise<UnmakeableRow[] | 'cancelled'> {
  const failed: UnmakeableRow[] = [];
  for (let i = 0; i < rows.length; i++) {
    if (i % PLAN_SLICE === 0 && i > 0) {
      hooks.onProgress?.(i, rows.length);
      await hooks.yieldToPage?.();
      if (hooks.cancelled?.()) return 'cancelled';
    }
    const plan = planForRow(request, rows[i], library);
    if (plan instanceof ChemError) failed.push({ index: i + 1, row: rows[i], code: plan.code, ...(plan.field ? { field: plan.field } : {}), message: plan.message });
  }
  hooks.onProgress?.(rows.length, rows.length);
  return failed;
}

/**
 * The protocol sheet of a table: a row number (shaded, 1 = the table's first row), the row's
 * inputs read back by INDEX, and one PROTON.RECIPE formula over them.
 *
 * @param tableSheet - the recipe table's sheet name
 * @param rowCount - rows in the table (the INDEX ranges cover them all)
 * @param rowNumber - the row shown first
 */
export function protocolBlocks(tableSheet: string, rowCount: number, rowNumber: number, userSubstances: string): CellBlock[] {
  const at = (ref: string) =>
    ref
      .split(':')
      .map((part) => `${quoteSheet(tableSheet)}!${part}`)
      .join(':');
  const table = sheetCells(userSubstances);
  const settings: F.SettingCells = { ...table, buffer: at(table.buffer), options: at(table.options), salts: at(table.salts) };
  const first = LAYOUT.firstDataRow;
  const last = first + Math.max(1, rowCount) - 1;
  const n = cellAddress(PROTOCOL_ROW_CELL.row, PROTOCOL_ROW_CELL.col, true);
  const column = (col: number) => `INDEX(${at(`${cellAddress(first, col, true)}:${cellAddress(last, col, true)}`)},${n})`;
  const inputs = rowCells(first);
  const r: F.RowCells = {
    ...inputs,
    targetPh: column(COL.targetPh),
    useTemperatureC: column(COL.useTemperatureC),
    concentrationMm: column(COL.concentrationMm),
    volumeMl: column(COL.volumeMl),
  };
  return [
    {
      row: 0,
      col: 0,
      cells: [
        [{ value: `Bench protocol for a row of "${tableSheet}"`, style: 'title' }],
        [{ value: 'Type another row number to see its protocol. Every line is one live PROTON.RECIPE formula over that row and the table’s settings.', style: 'note' }],
        [
          { value: 'Table row', style: 'label' },
          { value: rowNumber, style: 'input', numberFormat: '0' },
          { value: `of ${rowCount}`, style: 'note' },
        ],
        [
          { value: 'Row inputs', style: 'label' },
          { formula: `=${r.targetPh}`, numberFormat: '0.00', style: 'result' },
          { formula: `=${r.useTemperatureC}`, numberFormat: '0.0', style: 'result' },
          { formula: `=${r.concentrationMm}`, numberFormat: '0.0', style: 'result' },
          { formula: `=${r.volumeMl}`, numberFormat: '0.0', style: 'result' },
        ],
      ],
    },
    {
      row: PROTOCOL_FIRST_ROW,
      col: 0,
      // The spill's cells carry formats only (a value would block it): the value column wraps its long steps and warnings.
      cells: Array.from({ length: RECIPE_TABLE_ROWS }, (_, i) => [
        i === 0 ? { formula: F.recipeProtocol(settings, r), style: 'label' as const } : { style: 'label' as const },
        { style: 'label' as const },
        { style: 'text' as const, numberFormat: '0.000' },
      ]),
    },
  ];
}

/** Widths of the protocol sheet's columns (section, item, value or step text, unit). */
export const PROTOCOL_WIDTHS = [11, 44, 70, 10] as const;
