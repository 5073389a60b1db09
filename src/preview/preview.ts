/**
 * The preview page: a worksheet grid computed in the browser by HyperFormula with every
 * PROTON function registered (src/functions/formulaEngine.ts), the task pane beside it on
 * the preview adapter, and a download of the workbook as .xlsx. The workbook is kept in the
 * browser's storage as the user works (storage.ts) and comes back on reload; the demo prep
 * sheet is what a first visit shows.
 */
import type { RawCellContent } from 'hyperformula';
import { createFormulaEngine } from '../functions/formulaEngine';
import { mountPane } from '../taskpane/pane';
import { VERSION } from '../taskpane/version';
import { PreviewAdapter } from '../workbook/previewAdapter';
import { DEMO_CELLS, DEMO_COLUMN_WIDTHS, DEMO_SHEET } from './demo';
import { Grid } from './grid';
import { openWorkbookFile, OpenRefused } from './openFile';
import { Autosave, clearSaved, readSaved, SaveState } from './storage';
import { PreviewWorkbook } from './workbook';
import { workbookToXlsx, xlsxFileName } from './xlsx';
import { mountPrintView } from './recordPrintView';

/** Rows the preview's engine allows (HyperFormula's default). */
const MAX_ROWS = 40000;

/** An engine for the preview, from sheet name → rows. */
export function previewEngine(sheets: Record<string, RawCellContent[][]>) {
  return createFormulaEngine(sheets, { maxRows: MAX_ROWS, undoLimit: 100 });
}

function demoWorkbook(): PreviewWorkbook {
  const book = new PreviewWorkbook(previewEngine({ [DEMO_SHEET]: [] }));
  book.batch(() => {
    for (const cell of DEMO_CELLS) {
      const address = book.engine.simpleCellAddressFromString(cell.at, 0);
      if (!address) continue;
      book.setContents(DEMO_SHEET, address.row, address.col, [[cell.content]]);
      if (cell.style || cell.numberFormat) book.setMeta(DEMO_SHEET, address.row, address.col, { style: cell.style, numberFormat: cell.numberFormat });
    }
  });
  book.setColumnWidths(DEMO_SHEET, DEMO_COLUMN_WIDTHS);
  book.engine.clearUndoStack();
  return book;
}

/** A new, empty workbook. */
function emptyWorkbook(): PreviewWorkbook {
  return new PreviewWorkbook(previewEngine({ Sheet1: [] }));
}

function saveStateText(state: SaveState): string {
  if (state.state === 'saved') return 'Saved in this browser';
  if (state.state === 'pending') return 'Saving…';
  return `Not saved: ${state.reason}. Download the workbook to keep your work.`;
}

function start(): void {
  const status = document.getElementById('page-status') as HTMLElement;
  const saveStatus = document.getElementById('save-status') as HTMLElement;
  const title = document.getElementById('workbook-title') as HTMLInputElement;

  const restoreStarted = performance.now();
  const found = readSaved();
  let book: PreviewWorkbook;
  let restored = false;
  let restoreFailure: string | undefined;
  if ('saved' in found && found.saved) {
    try {
      book = PreviewWorkbook.fromSaved(found.saved, previewEngine);
      restored = true;
    } catch (error) {
      restoreFailure = `the saved workbook could not be rebuilt (${(error as Error).message})`;
      book = demoWorkbook();
    }
  } else {
    if ('failed' in found) restoreFailure = found.failed;
    book = demoWorkbook();
  }
  const grid = new Grid(book, document.body);
  const restoreMs = performance.now() - restoreStarted;

  const port = new PreviewAdapter(
    book,
    () => grid.selection(),
    (sheet) => grid.showSheet(sheet),
  );
  const paneRoot = document.getElementById('pane-root') as HTMLElement;
  const showPane = document.getElementById('show-pane') as HTMLButtonElement;
  const setPaneHidden = (hidden: boolean) => {
    paneRoot.hidden = hidden;
    showPane.hidden = !hidden;
  };
  showPane.addEventListener('click', () => setPaneHidden(false));
  void mountPane(paneRoot, { port, version: VERSION, onWritten: (sheet) => grid.showSheet(sheet), onHide: () => setPaneHidden(true) });

  const showSave = (state: SaveState) => {
    saveStatus.textContent = saveStateText(state);
    saveStatus.className = `save-status save-${state.state}`;
    document.body.dataset.saveState = state.state;
  };
  const autosave = new Autosave(book, showSave);
  if (restoreFailure) showSave({ state: 'failed', reason: restoreFailure });

  title.value = book.title();
  title.addEventListener('input', () => book.setTitle(title.value));
  title.addEventListener('change', () => (title.value = book.title()));

  /** Puts another workbook in the page (new, or opened from a file) and saves it at once. */
  const replaceBook = (next: PreviewWorkbook) => {
    autosave.pause();
    book = next;
    grid.setBook(next);
    port.useBook(next);
    title.value = next.title();
    autosave.resume();
    autosave.follow(next);
  };

  mountPrintView(
    document.querySelector('.topbar-actions') as HTMLElement,
    () => book,
    () => grid.activeSheet(),
  );

  const buttons: Record<string, () => void> = {
    'edit-undo': () => grid.undo(),
    'edit-redo': () => grid.redo(),
    'edit-fill-down': () => grid.fill('down'),
    'edit-fill-right': () => grid.fill('right'),
    'edit-insert-rows': () => grid.shiftRows(true),
    'edit-delete-rows': () => grid.shiftRows(false),
    'edit-rename-sheet': () => grid.renameSheet(),
  };
  for (const [id, action] of Object.entries(buttons)) document.getElementById(id)!.addEventListener('click', action);

  document.getElementById('new-workbook')!.addEventListener('click', () => {
    if (!window.confirm('Start a new, empty workbook? The workbook in this page (and kept in this browser) will be replaced; download it first to keep a copy.')) return;
    const refused = clearSaved();
    replaceBook(emptyWorkbook());
    status.textContent = refused ? `New workbook started, but the old one could not be removed from the browser: ${refused}.` : 'New workbook started.';
  });

  const openInput = document.getElementById('open-file-input') as HTMLInputElement;
  document.getElementById('open-file')!.addEventListener('click', () => openInput.click());
  openInput.addEventListener('change', () => {
    const file = openInput.files?.[0];
    openInput.value = '';
    if (!file) return;
    if (!window.confirm(`Open "${file.name}"? It replaces the workbook in this page (and kept in this browser); download that first to keep a copy.`)) return;
    status.textContent = `Opening "${file.name}"…`;
    document.body.dataset.opened = 'pending';
    openWorkbookFile(file, previewEngine)
      .then((next) => {
        replaceBook(next);
        status.textContent = `Opened "${file.name}": ${next.sheetNames().length} sheet${next.sheetNames().length === 1 ? '' : 's'}.`;
        document.body.dataset.opened = 'done';
      })
      .catch((error: unknown) => {
        status.textContent = error instanceof OpenRefused ? error.message : `"${file.name}" was not opened: ${(error as Error).message}`;
        document.body.dataset.opened = 'refused';
      });
  });

  const download = document.getElementById('download-xlsx') as HTMLButtonElement;
  download.addEventListener('click', () => {
    download.disabled = true;
    status.textContent = 'Preparing the .xlsx file…';
    workbookToXlsx(book, VERSION)
      .then((bytes) => {
        const blob = new Blob([bytes as Uint8Array<ArrayBuffer>], { type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet' });
        const url = URL.createObjectURL(blob);
        const a = document.createElement('a');
        a.href = url;
        a.download = xlsxFileName(book.title());
        document.body.appendChild(a);
        a.click();
        a.remove();
        setTimeout(() => URL.revokeObjectURL(url), 10000);
        status.textContent = 'Downloaded: formulas with their computed values (charts are not included in the file).';
      })
      .catch((error: unknown) => (status.textContent = `Download failed: ${(error as Error).message}`))
      .finally(() => (download.disabled = false));
  });

  if (restored) {
    status.textContent = `Restored your workbook from this browser (${book.sheetNames().length} sheet${book.sheetNames().length === 1 ? '' : 's'}, ${Math.round(restoreMs)} ms).`;
    document.body.dataset.restored = 'true';
  }
  document.body.dataset.restoreMs = String(Math.round(restoreMs));
  document.body.dataset.ready = 'true';
}

if (document.readyState === 'loading') document.addEventListener('DOMContentLoaded', start);
else start();
