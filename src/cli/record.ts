/**
 * `proton-ledger record`: a recipe's batch record as an .xlsx workbook (formulas with their
 * computed values, formats, input shading, print area on one A4 page) and a printable HTML
 * page. The record is laid out by the same module as in Excel and the preview
 * (src/workbook/batchRecord.ts), written through the same workbook port into the preview's
 * workbook (HyperFormula with the PROTON functions), and saved from there. Loaded only for
 * this command: exceljs and the formula engine never slow the others' start.
 */
import { writeFileSync } from 'fs';
import ExcelJS from 'exceljs';
import { BatchActuals } from '../chem/batch';
import { RecipeInput, RecipePlan } from '../chem/planner';
import { createFormulaEngine } from '../functions/formulaEngine';
import { printCells } from '../preview/printArea';
import { PreviewWorkbook } from '../preview/workbook';
import { batchRecordLayout, writeBatchRecord } from '../workbook/batchRecord';
import { cellAddress, rangeAddress } from '../workbook/port';
import { printPageHtml } from '../workbook/printPage';
import { PreviewAdapter } from '../workbook/previewAdapter';

const FILLS: Partial<Record<string, string>> = { input: 'FFEEF5F3', header: 'FFE4EAEC', warning: 'FFFFF4DC', provenance: 'FFF3F3F0' };
const BOLD = new Set(['title', 'subtitle', 'header', 'caution']);
/** A4 in the page-setup codes of the .xlsx format. */
const PAPER_A4 = 9;

/** Puts recorded values into the record's input cells, as a filler would type them (forms by name, in the plan's order otherwise). */
function fillRecord(book: PreviewWorkbook, sheet: string, inputs: ReturnType<typeof batchRecordLayout>['inputs'], a: BatchActuals): void {
  const put = (at: { row: number; col: number } | undefined, value: unknown) => {
    if (at && value !== undefined && value !== null && value !== '') book.setContents(sheet, at.row, at.col, [[value as string | number]]);
  };
  book.batch(() => {
    (a.weighed ?? []).forEach((w, i) => {
      const j = inputs.grams.findIndex((g) => g.form.toLowerCase() === String(w.form).toLowerCase());
      const k = j >= 0 ? j : i;
      put(inputs.grams[k]?.at, w.grams);
      put(inputs.purity[k], w.purityPercent);
      if (w.lot && inputs.grams[k]) put({ row: inputs.grams[k].at.row, col: 2 }, w.lot);
    });
    put(inputs.titrantMl, a.titrantMl);
    put(inputs.titrantStandardisedM, a.titrantConcentrationM);
    put(inputs.finalVolumeMl, a.finalVolumeMl);
    put(inputs.benchTemperatureC, a.benchTemperatureC);
    put(inputs.meterPh, a.meterPh);
    put(inputs.finalPh, a.finalPh);
    put(inputs.conductivity25, a.conductivity25MsPerCm);
  });
}

/** What `record` wrote. */
export interface RecordSummary {
  readonly sheet: string;
  readonly xlsx?: string;
  readonly html?: string;
  readonly rows: number;
}

/**
 * Writes the record.
 *
 * @param input - the recipe as given
 * @param plan - planRecipe(input)
 * @param out - the .xlsx and/or .html paths
 * @param version - printed in the footer
 * @param actuals - what was done, to fill in the record's input cells (a filled record; default: blank)
 */
export async function writeRecord(input: RecipeInput, plan: RecipePlan, out: { xlsx?: string; html?: string }, version: string, actuals?: BatchActuals): Promise<RecordSummary> {
  const book = new PreviewWorkbook(createFormulaEngine({ Sheet1: [] }));
  const port = new PreviewAdapter(
    book,
    () => ({ sheet: 'Sheet1', range: { row: 0, col: 0, rowCount: 1, colCount: 1 } }),
    () => undefined,
  );
  const sheet = await writeBatchRecord(port, input, plan, version);
  const layout = batchRecordLayout(input, plan, version);
  if (actuals) fillRecord(book, sheet, layout.inputs, actuals);
  if (out.html) writeFileSync(out.html, printPageHtml(sheet, printCells(book, sheet), layout.widths.slice(0, layout.printArea.colCount)));
  if (out.xlsx) {
    const wb = new ExcelJS.Workbook();
    wb.creator = `Proton Ledger ${version}`;
    wb.lastModifiedBy = 'Proton Ledger';
    const ws = wb.addWorksheet(sheet, {
      pageSetup: {
        paperSize: PAPER_A4,
        orientation: 'portrait',
        fitToPage: true,
        fitToWidth: 1,
        fitToHeight: 1,
        printArea: rangeAddress(layout.printArea),
        margins: { left: 0.5, right: 0.5, top: 0.5, bottom: 0.5, header: 0.3, footer: 0.3 },
      },
    });
    const { rows, cols } = book.dimensions(sheet);
    for (let c = 0; c < cols; c++) ws.getColumn(c + 1).width = book.columnWidth(sheet, c);
    for (let r = 0; r < rows; r++) {
      for (let c = 0; c < cols; c++) {
        const formula = book.formula(sheet, r, c);
        const value = book.value(sheet, r, c);
        const meta = book.meta(sheet, r, c);
        if (formula === undefined && value === null && !meta) continue;
        const cell = ws.getCell(r + 1, c + 1);
        const result = value !== null && typeof value === 'object' ? ({ error: value.error } as ExcelJS.CellErrorValue) : value;
        if (formula !== undefined) {
          const size = book.spillSize(sheet, r, c);
          const ref = size.rows * size.cols > 1 ? `${cellAddress(r, c)}:${cellAddress(r + size.rows - 1, c + size.cols - 1)}` : undefined;
          cell.value = { formula: formula.replace(/^=/, ''), result: result ?? undefined, ...(ref ? { shareType: 'array', ref } : {}) } as ExcelJS.CellFormulaValue;
        } else if (value !== null) {
          cell.value = result as ExcelJS.CellValue;
        }
        if (meta?.numberFormat) cell.numFmt = meta.numberFormat;
        if (meta?.style && BOLD.has(meta.style))
          cell.font = { bold: true, ...(meta.style === 'title' ? { size: 14 } : {}), ...(meta.style === 'caution' ? { color: { argb: 'FF8A1C1C' } } : {}) };
        const fill = meta?.style ? FILLS[meta.style] : undefined;
        if (fill) cell.fill = { type: 'pattern', pattern: 'solid', fgColor: { argb: fill } };
        if (meta?.style === 'input') cell.border = { bottom: { style: 'thin', color: { argb: 'FF9DBDB5' } } };
      }
    }
    await wb.xlsx.writeFile(out.xlsx);
  }
  return { sheet, ...(out.xlsx ? { xlsx: out.xlsx } : {}), ...(out.html ? { html: out.html } : {}), rows: layout.printArea.rowCount };
}
