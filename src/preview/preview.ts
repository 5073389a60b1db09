/**
 * The preview page: a worksheet grid computed in the browser by HyperFormula with every
 * PROTON function registered (src/functions/formulaEngine.ts), the task pane beside it on
 * the preview adapter, the demo prep sheet, and a download of the workbook as .xlsx.
 */
import { createFormulaEngine } from '../functions/formulaEngine';
import { mountPane } from '../taskpane/pane';
import { VERSION } from '../taskpane/version';
import { PreviewAdapter } from '../workbook/previewAdapter';
import { DEMO_CELLS, DEMO_COLUMN_WIDTHS, DEMO_SHEET } from './demo';
import { Grid } from './grid';
import { PreviewWorkbook } from './workbook';
import { workbookToXlsx } from './xlsx';

function loadDemo(book: PreviewWorkbook): void {
  book.batch(() => {
    for (const cell of DEMO_CELLS) {
      const address = book.engine.simpleCellAddressFromString(cell.at, 0);
      if (!address) continue;
      book.setContents(DEMO_SHEET, address.row, address.col, [[cell.content]]);
      if (cell.style || cell.numberFormat) book.setMeta(DEMO_SHEET, address.row, address.col, { style: cell.style, numberFormat: cell.numberFormat });
    }
  });
  book.setColumnWidths(DEMO_SHEET, DEMO_COLUMN_WIDTHS);
}

function start(): void {
  const book = new PreviewWorkbook(createFormulaEngine({ [DEMO_SHEET]: [] }, { maxRows: 40000 }));
  loadDemo(book);
  const grid = new Grid(book, document.body);
  const port = new PreviewAdapter(book, () => grid.selection(), (sheet) => grid.showSheet(sheet));
  const paneRoot = document.getElementById('pane-root') as HTMLElement;
  const showPane = document.getElementById('show-pane') as HTMLButtonElement;
  const setPaneHidden = (hidden: boolean) => {
    paneRoot.hidden = hidden;
    showPane.hidden = !hidden;
  };
  showPane.addEventListener('click', () => setPaneHidden(false));
  void mountPane(paneRoot, { port, version: VERSION, onWritten: (sheet) => grid.showSheet(sheet), onHide: () => setPaneHidden(true) });

  const status = document.getElementById('page-status') as HTMLElement;
  const download = document.getElementById('download-xlsx') as HTMLButtonElement;
  download.addEventListener('click', () => {
    download.disabled = true;
    status.textContent = 'Preparing the .xlsx file…';
    workbookToXlsx(book, VERSION)
      .then((bytes) => {
        const blob = new Blob([bytes], { type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet' });
        const url = URL.createObjectURL(blob);
        const a = document.createElement('a');
        a.href = url;
        a.download = 'proton-ledger-workbook.xlsx';
        document.body.appendChild(a);
        a.click();
        a.remove();
        setTimeout(() => URL.revokeObjectURL(url), 10000);
        status.textContent = 'Downloaded: formulas with their computed values (charts are not included in the file).';
      })
      .catch((error: unknown) => (status.textContent = `Download failed: ${(error as Error).message}`))
      .finally(() => (download.disabled = false));
  });
  document.body.dataset.ready = 'true';
}

if (document.readyState === 'loading') document.addEventListener('DOMContentLoaded', start);
else start();
