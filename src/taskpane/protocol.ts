/**
 * The bench protocol beside a recipe table: steps, predictions, warnings and cautions for
 * one chosen row. The pane calls the core's planner (src/chem/planner) for that row, with
 * the same library the table's names were checked against, and writes its words as values
 * marked with the time they were computed; the table's numbers stay live formulas (a live
 * protocol is one =PROTON.RECIPE(…) away).
 */
import { planRecipe, GENERAL_CAUTION } from '../chem/planner';
import type { RecipePlan } from '../chem/planner';
import type { SubstanceLibrary } from '../chem/library';
import type { CellBlock, CellWrite } from '../workbook/port';
import type { TableRequest } from './form';
import type { TableRow } from './recipeTable';

/** Column and first row of the protocol block (beside the settings). */
export const PROTOCOL_COL = 4;
export const PROTOCOL_ROW = 3;
/** Rows the block may use before the table header. */
export const PROTOCOL_MAX_ROWS = 15;

/** The line every recipe ends with, whatever the planner says. */
export const VERIFY_LINE = 'Verify the final pH with a calibrated meter at the working temperature; follow your safety data sheets and local rules.';

/** The planner's answer for one row, or the reason it has none. */
export function planForRow(request: TableRequest, row: TableRow, library?: SubstanceLibrary): RecipePlan | Error {
  try {
    return planRecipe({
      buffer: request.buffer,
      targetPh: row.targetPh,
      useTemperatureC: row.useTemperatureC,
      concentrationMm: row.concentrationMm,
      volumeMl: request.volumeMl,
      route: 'titrate',
      form: request.form,
      formPurityPercent: request.purityPercent,
      titrant: { form: request.titrant, concentrationM: request.titrantStockM },
      salts: request.saltForm && request.saltMm > 0 ? [{ form: request.saltForm, concentrationMm: request.saltMm }] : [],
      benchTemperatureC: request.benchTemperatureC,
      partVolumeFraction: request.partVolumeFraction,
      activityModel: request.activityModel,
    }, library);
  } catch (error) {
    return error instanceof Error ? error : new Error(String(error));
  }
}

/** The protocol block for the chosen row (1-based as the user counts table rows). */
export function protocolBlock(request: TableRequest, row: TableRow, rowNumber: number, computedAt: string, library?: SubstanceLibrary): CellBlock {
  const plan = planForRow(request, row, library);
  const heading: CellWrite = {
    value: `Bench protocol, table row ${rowNumber}: pH ${row.targetPh} at ${row.useTemperatureC} °C, ${row.concentrationMm} mM`,
    style: 'subtitle',
  };
  const lines: CellWrite[] = [];
  if (plan instanceof Error) {
    lines.push({ value: `No protocol for this row: ${plan.message}`, style: 'warning' });
  } else {
    plan.steps.forEach((step, i) => lines.push({ value: `${i + 1}. ${step}`, style: 'label' }));
    for (const w of plan.warnings) lines.push({ value: `Warning: ${w.message}`, style: 'warning' });
    for (const c of plan.cautions.filter((c) => c !== GENERAL_CAUTION)) lines.push({ value: `Caution: ${c}`, style: 'caution' });
  }
  const room = PROTOCOL_MAX_ROWS - 3;
  const kept = lines.length > room ? [...lines.slice(0, room - 1), { value: `(${lines.length - room + 1} more lines: see the planner's full text.)`, style: 'note' } as CellWrite] : lines;
  return {
    row: PROTOCOL_ROW,
    col: PROTOCOL_COL,
    cells: [
      [heading],
      ...kept.map((l) => [l]),
      [{ value: VERIFY_LINE, style: 'caution' }],
      [{ value: `Protocol words computed ${computedAt} by the planner for this row; rebuild the table to refresh them.`, style: 'note' }],
    ],
  };
}
