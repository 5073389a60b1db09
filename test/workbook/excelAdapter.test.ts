/**
 * The Office.js adapter against office-addin-mock: which Excel calls it makes for a table,
 * a chart and a values copy; nothing written on invalid input; a unique sheet name when one
 * exists. The mock records what the adapter set; the functions in it record the calls.
 */
import { OfficeMockObject } from 'office-addin-mock';

// office-addin-mock reads only the OfficeApp host names from office-addin-manifest, whose
// ESM-only dependencies jest (on Node 20) cannot load; give it those names alone.
jest.mock('office-addin-manifest', () => ({
  OfficeApp: { Excel: 'excel', OneNote: 'onenote', Outlook: 'outlook', PowerPoint: 'powerpoint', Project: 'project', Word: 'word' },
}));
import { defaultInput } from '../../src/taskpane/form';
import { buildRecipeTable, valuesCopy } from '../../src/taskpane/writer';
import { ExcelAdapter, SETTINGS_KEY } from '../../src/workbook/excelAdapter';
import type { ChartSpec } from '../../src/workbook/port';

interface Call {
  readonly what: string;
  readonly args: unknown[];
}

/** A small Excel stand-in: sheets by name, ranges by address, charts; every call recorded. */
function fakeExcel(sheetNames: string[], values: unknown[][] = [[1]]) {
  const calls: Call[] = [];
  const ranges = new Map<string, Record<string, unknown>>();
  const range = (sheet: string, address: string) => {
    const key = `${sheet}!${address}`;
    if (!ranges.has(key)) {
      ranges.set(key, {
        address: key,
        values,
        rowIndex: 0,
        columnIndex: 0,
        rowCount: values.length,
        columnCount: values[0].length,
        isNullObject: false,
        load: () => undefined,
        format: { font: {}, fill: {}, columnWidth: 0, wrapText: false },
        worksheet: { name: sheet, load: () => undefined },
      });
    }
    return ranges.get(key)!;
  };
  const seriesAdded: Record<string, unknown>[] = [];
  const series = () => {
    const s: Record<string, unknown> = {
      format: { line: {} },
      setXAxisValues: (r: unknown) => calls.push({ what: 'setXAxisValues', args: [r] }),
      setValues: (r: unknown) => calls.push({ what: 'setValues', args: [r] }),
    };
    seriesAdded.push(s);
    return s;
  };
  const worksheet = (name: string) => ({
    name,
    getRange: (address: string) => range(name, address),
    getUsedRangeOrNullObject: () => range(name, 'USED'),
    activate: () => calls.push({ what: 'activate', args: [name] }),
    charts: {
      add: (type: string, _source: unknown, by: string) => {
        calls.push({ what: 'charts.add', args: [name, type, by] });
        return {
          title: {},
          legend: {},
          axes: { categoryAxis: { title: {} }, valueAxis: { title: {} } },
          series: { getItemAt: () => series(), add: (n: string) => (calls.push({ what: 'series.add', args: [n] }), series()) },
          setPosition: (from: string, to: string) => calls.push({ what: 'setPosition', args: [from, to] }),
        };
      },
    },
  });
  const names = [...sheetNames];
  // The mock gives the context (sync, and recording of what is set); the collections the
  // adapter loads with paths such as 'items/name' are plain objects with a no-op load().
  const context = new OfficeMockObject({ workbook: { getSelectedRange: () => range(names[0], 'A1') }, sync: async () => undefined }) as unknown as {
    workbook: Record<string, unknown>;
    sync(): Promise<void>;
  };
  context.workbook.worksheets = {
    get items() {
      return names.map((n) => ({ name: n }));
    },
    load: () => undefined,
    getItemOrNullObject: (name: string) => ({ isNullObject: !names.includes(name), load: () => undefined }),
    getItem: (name: string) => worksheet(name),
    add: (name: string) => {
      calls.push({ what: 'worksheets.add', args: [name] });
      names.push(name);
    },
  };
  const run = async <T>(batch: (c: Excel.RequestContext) => Promise<T>) => batch(context as unknown as Excel.RequestContext);
  const stored = new Map<string, unknown>();
  const settings = {
    get: (k: string) => stored.get(k),
    set: (k: string, v: unknown) => void stored.set(k, v),
    saveAsync: (cb?: (r: { status: unknown }) => void) => cb?.({ status: 'succeeded' }),
  };
  return { adapter: new ExcelAdapter(run, settings), calls, ranges, stored, names };
}

beforeAll(() => {
  // The enum values the adapter reads from the Excel global.
  (globalThis as Record<string, unknown>).Excel = {
    ChartType: { xyscatterLinesNoMarkers: 'XYScatterLinesNoMarkers', xyscatter: 'XYScatter' },
    ChartSeriesBy: { columns: 'Columns' },
    ChartLegendPosition: { bottom: 'Bottom' },
    ChartMarkerStyle: { diamond: 'Diamond' },
    ChartLineStyle: { dash: 'Dash' },
  };
});

describe('ExcelAdapter on office-addin-mock', () => {
  test('a unique sheet name when the name exists (case-insensitive, as Excel compares)', async () => {
    const { adapter } = fakeExcel(['HEPES 25 mM pH 7.4', 'hepes 25 mM pH 7.4 (2)']);
    await expect(adapter.uniqueSheetName('HEPES 25 mM pH 7.4')).resolves.toBe('HEPES 25 mM pH 7.4 (3)');
  });

  test('addSheet refuses an existing name instead of overwriting it', async () => {
    const { adapter, calls } = fakeExcel(['Prep']);
    await expect(adapter.addSheet('Prep')).rejects.toThrow(/exists already/);
    expect(calls.filter((c) => c.what === 'worksheets.add')).toHaveLength(0);
  });

  test('a table: formulas and number formats set on one range, styles applied', async () => {
    const { adapter, ranges } = fakeExcel(['Prep']);
    await adapter.writeTable('Prep', {
      row: 1,
      col: 0,
      cells: [
        [
          { value: 'Target pH', style: 'header' },
          { value: 'Titrant (mL)', style: 'header' },
        ],
        [
          { value: 7.4, style: 'input', numberFormat: '0.00' },
          { formula: '=PROTON.TITRANT.ML("HEPES",25,1000,A3,"NaOH",1)', numberFormat: '0.00' },
        ],
      ],
    });
    const r = ranges.get('Prep!A2:B3')!;
    expect(r.formulas).toEqual([
      ['Target pH', 'Titrant (mL)'],
      [7.4, '=PROTON.TITRANT.ML("HEPES",25,1000,A3,"NaOH",1)'],
    ]);
    expect(r.numberFormat).toEqual([
      ['General', 'General'],
      ['0.00', '0.00'],
    ]);
    expect((ranges.get('Prep!A2:B2')!.format as { font: { bold: boolean } }).font.bold).toBe(true);
    expect((ranges.get('Prep!A3')!.format as { fill: { color: string } }).fill.color).toBe('#EEF5F3');
  });

  test('a chart: an x–y scatter from the data ranges, titled, with a target marker and positioned', async () => {
    const { adapter, calls } = fakeExcel(['Prep']);
    const chart: ChartSpec = {
      title: 'Titration curve',
      xTitle: 'NaOH (mL)',
      yTitle: 'pH',
      series: [
        { name: 'pH against titrant', x: { row: 1, col: 5, rowCount: 10, colCount: 1 }, y: { row: 1, col: 4, rowCount: 10, colCount: 1 } },
        { name: 'target', x: { row: 13, col: 5, rowCount: 1, colCount: 1 }, y: { row: 13, col: 4, rowCount: 1, colCount: 1 }, markersOnly: true },
      ],
      anchor: { row: 0, col: 8, rowCount: 15, colCount: 6 },
    };
    await adapter.addChart('Prep', chart);
    expect(calls.find((c) => c.what === 'charts.add')!.args).toEqual(['Prep', 'XYScatterLinesNoMarkers', 'Columns']);
    expect(calls.filter((c) => c.what === 'series.add').map((c) => c.args[0])).toEqual(['target']);
    expect(calls.find((c) => c.what === 'setPosition')!.args).toEqual(['I1', 'N15']);
  });

  test('invalid input writes nothing at all', async () => {
    const { adapter, calls, ranges } = fakeExcel(['Prep']);
    const result = await buildRecipeTable(adapter, { ...defaultInput(), concentrationsMm: 'twenty' }, { version: '0.1.0' });
    expect(result.ok).toBe(false);
    expect(calls).toEqual([]);
    expect(ranges.size).toBe(0);
  });

  test('a recipe table: new sheet, rows written, two charts, settings saved in the document, sheet activated', async () => {
    const { adapter, calls, stored } = fakeExcel(['Prep']);
    const result = await buildRecipeTable(adapter, defaultInput(), { version: '0.1.0' });
    expect(result.ok).toBe(true);
    expect(calls[0]).toEqual({ what: 'worksheets.add', args: ['HEPES 25 mM pH 7.0–7.6'] });
    expect(calls.filter((c) => c.what === 'charts.add')).toHaveLength(2);
    expect(calls[calls.length - 1]).toEqual({ what: 'activate', args: ['HEPES 25 mM pH 7.0–7.6'] });
    expect(JSON.parse(String(stored.get(SETTINGS_KEY)))).toEqual({ activityModel: 'pitzer', benchTemperatureC: 22, titrant: 'NaOH', titrantStockM: 1, partVolumeFraction: 0.8 });
  });

  test('a values copy: reads the used range values and writes them, with provenance, on a new sheet', async () => {
    const { adapter, calls, ranges } = fakeExcel(
      ['Recipe'],
      [
        ['a', 1.23456],
        [null, 2],
      ],
    );
    const copy = await valuesCopy(adapter, { version: '0.1.0', now: new Date('2026-03-02T09:30:00Z') });
    expect(copy).toEqual({ sheet: 'Recipe values', source: 'Recipe' });
    expect(calls[0]).toEqual({ what: 'worksheets.add', args: ['Recipe values'] });
    const provenance = ranges.get('Recipe values!A1:B8')!.formulas as unknown[][];
    expect(provenance[1]).toEqual(['Add-in', 'Proton Ledger 0.1.0']);
    expect(provenance[6]).toEqual(['Copied on', '2026-03-02 09:30 UTC']);
    expect(ranges.get('Recipe values!A10:B11')!.formulas).toEqual([
      ['a', 1.23456],
      ['', 2],
    ]);
  });
});
