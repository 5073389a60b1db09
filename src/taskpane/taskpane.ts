/**
 * Excel entry of the task pane (also the shared-runtime page, which loads the functions
 * bundle beside it). Mounts the pane on the Office.js adapter once Office is ready.
 */
import { ExcelAdapter } from '../workbook/excelAdapter';
import { mountPane } from './pane';
import { VERSION } from './version';

Office.onReady((info) => {
  const root = document.getElementById('pane-root') as HTMLElement;
  if (info.host !== Office.HostType.Excel) {
    root.textContent = 'Proton Ledger runs in Excel. For a browser preview, run npm start.';
    return;
  }
  const port = new ExcelAdapter((batch) => Excel.run(batch), Office.context.document.settings);
  // Excel shows the pane again from the add-in's ribbon button (shared runtime).
  void mountPane(root, { port, version: VERSION, onHide: () => void Office.addin.hide() });
});
