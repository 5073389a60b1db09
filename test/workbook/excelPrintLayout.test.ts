/**
 * The Excel adapter's page setup for a batch record: print area, portrait, fit to one page,
 * and nothing at all where the host lacks ExcelApi 1.9 (page layout).
 */
import { ExcelAdapter, ExcelRun } from '../../src/workbook/excelAdapter';

function fake(supported: boolean) {
  const page: Record<string, unknown> = {};
  const calls: string[] = [];
  (globalThis as unknown as { Office: unknown }).Office = {
    context: { requirements: { isSetSupported: (set: string, version: string) => supported && set === 'ExcelApi' && version === '1.9' } },
  };
  const context = {
    workbook: {
      worksheets: {
        getItem: (name: string) => (
          calls.push(`sheet ${name}`),
          {
            pageLayout: {
              ...{ setPrintArea: (a: string) => calls.push(`area ${a}`) },
              set orientation(v: string) {
                page.orientation = v;
              },
              set zoom(z: unknown) {
                page.zoom = z;
              },
            },
          }
        ),
      },
    },
    sync: async () => undefined,
  };
  const run: ExcelRun = (batch) => batch(context as unknown as Excel.RequestContext);
  const settings = { get: () => undefined, set: () => undefined, saveAsync: () => undefined };
  return { adapter: new ExcelAdapter(run, settings), page, calls };
}

afterEach(() => delete (globalThis as { Office?: unknown }).Office);

describe('ExcelAdapter.setPrintLayout', () => {
  it('sets the print area, portrait and fit to one page on ExcelApi 1.9', async () => {
    const { adapter, page, calls } = fake(true);
    await adapter.setPrintLayout('Batch HEPES pH 7.4', { area: { row: 0, col: 0, rowCount: 72, colCount: 6 }, onePage: true, orientation: 'portrait' });
    expect(calls).toEqual(['sheet Batch HEPES pH 7.4', 'area A1:F72']);
    expect(page).toEqual({ orientation: 'Portrait', zoom: { horizontalFitToPages: 1, verticalFitToPages: 1 } });
  });

  it('does nothing on an older host', async () => {
    const { adapter, calls } = fake(false);
    await adapter.setPrintLayout('x', { area: { row: 0, col: 0, rowCount: 1, colCount: 1 }, onePage: true, orientation: 'portrait' });
    expect(calls).toEqual([]);
  });
});
