/**
 * Writes plans through the workbook port: a recipe table (in batches, with progress) and a
 * values copy with its provenance block. Nothing is written unless the request checked out;
 * every table goes on a new sheet with a name not yet used.
 */
import { ChemError, MESSAGES } from '../chem';
import { SubstanceLibrary, defaultLibrary, findSystem, titrantFromForm } from '../chem/library';
import { bufferSystemOf, formContains } from '../chem/planner';
import { libraryFor } from '../functions/userRange';
import { CellBlock, CellValue, CellWrite, PaneSettings, WorkbookPort, parseRangeText, qualifiedAddress, uniqueName } from '../workbook/port';
import { checkForm, FormInput, FieldErrors, settingsOf, TableRequest } from './form';
import { PROTOCOL_LINK, PROTOCOL_ROW_CELL, PROTOCOL_WIDTHS, UnmakeableRow, planRows, protocolBlocks } from './protocol';
import { COL, planRecipeSheet, SETTING_ROWS, SETTING_VALUE_COL, settingRow, tableRows, LAYOUT } from './recipeTable';

/**
 * Table rows written per port call: keeps each Excel batch small, and each recalculation of
 * the preview's engine (one RECIPE.ROW plan per row) well under the 200 ms a page may hold.
 */
export const ROWS_PER_BATCH = 25;
/** Blocks of the curves' working cells written between two yields (each holds a few titrant and capacity formulas). */
const TAIL_BLOCKS_PER_SLICE = 2;

export type BuildResult =
  | { readonly ok: true; readonly sheet: string; readonly protocolSheet: string; readonly rows: number; readonly dropped: readonly UnmakeableRow[] }
  | {
      readonly ok: false;
      readonly errors: FieldErrors;
      /** Rows the planner cannot make (nothing written): drop them or fix the inputs. */
      readonly unmakeable?: readonly UnmakeableRow[];
      readonly allRows?: number;
      /** Stopped by the user; `sheet` is the sheet begun, if any. */
      readonly cancelled?: true;
      readonly sheet?: string;
    };

/** Step of the buffer whose pKa lies nearest the first target (1-based); 1 for substances outside the library. */
export function nearestStep(buffer: string, targetPh: number): number {
  try {
    const steps = findSystem(buffer).steps;
    let best = 0;
    steps.forEach((s, i) => {
      if (Math.abs(s.pKa - targetPh) < Math.abs(steps[best].pKa - targetPh)) best = i;
    });
    return best + 1;
  } catch {
    return 1;
  }
}

/** An error's message without the argument name the core puts first ("form: …"): the pane shows it under its own field. */
function fieldMessage(error: unknown): string {
  const message = error instanceof Error ? error.message : String(error);
  return message.replace(/^[\w.[\]]+: /, '');
}

/**
 * Checks the names in a request against the library (the user's substances included) and
 * gives back the request with each name as the library spells it (the form used, not the
 * text typed): the buffer is an acid–base system, the forms weighed contain it, the titrant
 * is a strong acid or base or one weak one, the salts are on the shelf. A misspelt name gets
 * the library's nearest names, under its own field, before anything is written.
 */
function checkNames(request: TableRequest, library: SubstanceLibrary): { errors: FieldErrors; request: TableRequest } {
  const errors: FieldErrors = {};
  let system: ReturnType<SubstanceLibrary['findSystem']> | undefined;
  try {
    system = bufferSystemOf(library, request.buffer);
  } catch (error) {
    // The planner's own check: a strong electrolyte (NaCl) named as the buffer is told so rather than offered look-alikes.
    errors.buffer =
      error instanceof ChemError && error.code === 'outOfRange' ? `${request.buffer} is a strong electrolyte, not a buffer system; give it as the salt.` : fieldMessage(error);
  }
  // A name that leaves the hydration state open is not resolved silently: the pane asks which form is on the shelf.
  const askHydrate = (field: keyof FieldErrors, typed: string): boolean => {
    const others = library.hydrateAlternatives(typed);
    if (others.length === 0) return false;
    errors[field] = MESSAGES.hydrateAmbiguous(
      `"${typed}"`,
      typed,
      [library.findForm(typed), ...others].map((f) => `${f.name}, ${f.molarMass.toFixed(2)} g/mol`),
    ).replace(/^"[^"]*": /, '');
    return true;
  };
  const ofSystem = (field: 'form' | 'acidForm' | 'baseForm', typed: string): string => {
    try {
      const form = library.findForm(typed);
      askHydrate(field, typed);
      if (system && !formContains(form, system)) errors[field] = `"${form.name}" does not contain ${system.name}; its forms are ${system.forms.map((f) => f.name).join(', ')}.`;
      return form.name;
    } catch (error) {
      errors[field] = fieldMessage(error);
      return typed;
    }
  };
  const weighsOne = request.route !== 'two-forms';
  const form = weighsOne ? ofSystem('form', request.form) : '';
  const acidForm = weighsOne ? '' : ofSystem('acidForm', request.acidForm);
  const baseForm = weighsOne ? '' : ofSystem('baseForm', request.baseForm);
  let titrant = request.titrant;
  if (weighsOne) {
    try {
      const found = library.findForm(request.titrant);
      titrantFromForm(found, library);
      titrant = found.name;
    } catch (error) {
      errors.titrant = fieldMessage(error);
    }
  }
  const salts = request.salts.map((salt) => {
    try {
      const found = library.findForm(salt.form).name;
      askHydrate('salts', salt.form);
      return { ...salt, form: found };
    } catch (error) {
      errors.salts = fieldMessage(error);
      return salt;
    }
  });
  let saltTarget = request.saltTarget;
  if (saltTarget) {
    try {
      const found = library.findForm(saltTarget.form).name;
      askHydrate('saltTargetForm', saltTarget.form);
      saltTarget = { ...saltTarget, form: found };
    } catch (error) {
      errors.saltTargetForm = fieldMessage(error);
    }
  }
  return { errors, request: { ...request, buffer: system?.name ?? request.buffer, form, acidForm, baseForm, titrant, salts, ...(saltTarget ? { saltTarget } : {}) } };
}

/**
 * The library a request's names are checked against: the built-in one, or with the user's
 * substances read from the workbook. A range typed without a sheet is taken on the sheet
 * that was active (formulas on the new recipe sheet would otherwise point at that sheet's
 * own cells), and comes back sheet-qualified for the formulas.
 */
async function libraryOfRequest(
  port: WorkbookPort,
  request: TableRequest,
): Promise<{ ok: true; library: SubstanceLibrary; userSubstances: string } | { ok: false; errors: FieldErrors }> {
  if (request.userSubstances === '') return { ok: true, library: defaultLibrary(), userSubstances: '' };
  const typed = parseRangeText(request.userSubstances);
  if (!typed) return { ok: false, errors: { userSubstances: "Give a range such as 'My substances'!A2:J20, or leave it blank." } };
  const sheets = await port.sheetNames();
  const wanted = typed.sheet ?? (await port.readSelection()).sheet;
  const sheet = sheets.find((n) => n.toLowerCase() === wanted.toLowerCase());
  if (sheet === undefined) return { ok: false, errors: { userSubstances: `There is no sheet named "${wanted}" in this workbook.` } };
  try {
    const values = await port.readValues(sheet, typed.range);
    return { ok: true, library: libraryFor(values), userSubstances: qualifiedAddress(sheet, typed.range) };
  } catch (error) {
    return { ok: false, errors: { userSubstances: error instanceof Error ? error.message : String(error) } };
  }
}

function stamp(now: Date): string {
  return now.toISOString().replace('T', ' ').slice(0, 16) + ' UTC';
}

/** Yields to the page between slices of work, so it can paint and take a click (a macrotask, not a microtask). */
export const yieldToPage = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));

/** What a build is doing, for the progress bar. */
export type BuildPhase = 'planning' | 'writing';

export interface BuildOptions {
  readonly version: string;
  readonly now?: Date;
  readonly onProgress?: (done: number, total: number, phase: BuildPhase) => void;
  /** What to do with rows the planner cannot make: list them and write nothing (default), or leave them out. */
  readonly unmakeable?: 'ask' | 'drop';
  /** Asked between slices; true stops the build (a sheet already started is left as written so far). */
  readonly cancelled?: () => boolean;
  /** How to let the page breathe between slices (default: a zero-delay timer). */
  readonly yieldToPage?: () => Promise<void>;
}

/**
 * Checks the form and plans every row; on success writes a new recipe sheet and its protocol
 * sheet, saves the settings in the document and activates the table. Rows the planner cannot
 * make are listed (with its error code and message) and nothing is written, unless the
 * caller asks to drop them.
 */
export async function buildRecipeTable(port: WorkbookPort, form: FormInput, options: BuildOptions): Promise<BuildResult> {
  const checked = checkForm(form);
  if (!checked.ok) return checked;
  const resolved = await libraryOfRequest(port, checked.request);
  if (!resolved.ok) return resolved;
  const named = checkNames({ ...checked.request, userSubstances: resolved.userSubstances }, resolved.library);
  if (Object.keys(named.errors).length > 0) return { ok: false, errors: named.errors };
  const request = named.request;
  const pause = options.yieldToPage ?? yieldToPage;
  const cancelled = options.cancelled ?? (() => false);
  const all = tableRows(request);
  const failed = await planRows(request, all, resolved.library, { onProgress: (d, t) => options.onProgress?.(d, t, 'planning'), yieldToPage: pause, cancelled });
  if (failed === 'cancelled') return { ok: false, cancelled: true, errors: {} };
  if (failed.length === all.length) return { ok: false, errors: {}, unmakeable: failed, allRows: all.length };
  if (failed.length > 0 && (options.unmakeable ?? 'ask') === 'ask') return { ok: false, errors: {}, unmakeable: failed, allRows: all.length };
  const dropped = new Set(failed.map((f) => f.index - 1));
  const rows = all.filter((_, i) => !dropped.has(i));
  const now = options.now ?? new Date();
  const plan = planRecipeSheet(request, {
    builtWith: `Proton Ledger ${options.version}`,
    builtOn: stamp(now),
    pKaStep: nearestStep(request.buffer, request.targetPhs[0]),
    rows,
  });
  const sheet = await port.uniqueSheetName(plan.baseName);
  await port.addSheet(sheet);
  for (const block of plan.head) await port.writeTable(sheet, block);
  const total = plan.rows.length;
  options.onProgress?.(0, total, 'writing');
  for (let i = 0; i < total; i += ROWS_PER_BATCH) {
    if (i > 0) {
      await pause();
      if (cancelled()) return { ok: false, cancelled: true, errors: {}, sheet };
    }
    const batch = plan.rows.slice(i, i + ROWS_PER_BATCH);
    await port.writeTable(sheet, { row: batch[0].row, col: 0, cells: batch.map((b) => b.cells[0]) });
    options.onProgress?.(Math.min(total, i + ROWS_PER_BATCH), total, 'writing');
  }
  for (const [i, block] of plan.tail.entries()) {
    if (i % TAIL_BLOCKS_PER_SLICE === 0) await pause();
    await port.writeTable(sheet, block);
  }
  await port.setColumnWidths(sheet, plan.columnWidths);
  for (const chart of plan.charts) await port.addChart(sheet, chart);
  const protocol = await port.uniqueSheetName(`Protocol ${sheet}`);
  await port.addSheet(protocol);
  for (const block of protocolBlocks(sheet, total, 1, request.userSubstances)) await port.writeTable(protocol, block);
  await port.setColumnWidths(protocol, PROTOCOL_WIDTHS);
  await port.writeTable(sheet, {
    row: PROTOCOL_LINK.row,
    col: PROTOCOL_LINK.labelCol,
    cells: [
      [
        { value: 'Protocol sheet', style: 'label' },
        { value: protocol, style: 'note' },
      ],
    ],
  });
  await port.saveSettings(settingsOf(checked.request)); // as typed, for the next form
  await port.activateSheet(sheet);
  return { ok: true, sheet, protocolSheet: protocol, rows: total, dropped: failed };
}

/**
 * Shows the protocol of a table row: writes the row number into the protocol sheet of the
 * table that holds the selection (its formulas do the rest) and activates that sheet.
 *
 * @param rowNumber - 1-based, as the user counts table rows
 */
export async function showProtocol(port: WorkbookPort, rowNumber: number, tableSheet?: string): Promise<{ sheet: string }> {
  const source = tableSheet ?? (await port.readSelection()).sheet;
  const [link] = await port.readValues(source, { row: PROTOCOL_LINK.row, col: PROTOCOL_LINK.labelCol, rowCount: 1, colCount: 2 });
  const protocol = link?.[1];
  const sheets = await port.sheetNames();
  if (typeof protocol !== 'string' || !sheets.includes(protocol))
    throw new Error(`"${source}" is not a recipe table with a protocol sheet: select a cell in a recipe table first.`);
  const [count] = await port.readValues(protocol, { row: PROTOCOL_ROW_CELL.row, col: PROTOCOL_ROW_CELL.col + 1, rowCount: 1, colCount: 1 });
  const rows = Number(/\d+/.exec(String(count?.[0] ?? ''))?.[0] ?? NaN);
  if (!Number.isInteger(rowNumber) || rowNumber < 1 || (Number.isFinite(rows) && rowNumber > rows)) throw new Error(`Give a table row from 1 to ${rows}.`);
  await port.writeTable(protocol, { row: PROTOCOL_ROW_CELL.row, col: PROTOCOL_ROW_CELL.col, cells: [[{ value: rowNumber, style: 'input', numberFormat: '0' }]] });
  await port.activateSheet(protocol);
  return { sheet: protocol };
}

/** What the provenance block of a values copy says. */
export interface Provenance {
  readonly version: string;
  readonly sourceSheet: string;
  readonly activityModel: string;
  readonly benchTemperatureC: string;
  readonly useTemperaturesC: string;
  readonly constantSources: string;
  readonly copiedOn: string;
}

/** Source note for a buffer's constants (from the library's records). */
export function constantSourcesOf(buffer: string): string {
  try {
    const steps = findSystem(buffer).steps;
    const described = steps.map((s) => `${s.entry} (${s.source}${s.checkedAgainst === 'memory' ? ', from memory, unchecked' : ''})`);
    return `${buffer}: ${described.join('; ')}`;
  } catch {
    return `${buffer}: your own substance range`;
  }
}

/** The provenance block's rows. */
export function provenanceBlock(p: Provenance): CellWrite[][] {
  const row = (name: string, value: string): CellWrite[] => [
    { value: name, style: 'provenance' },
    { value, style: 'provenance' },
  ];
  return [
    [{ value: `Values copy of "${p.sourceSheet}": numbers, not formulas`, style: 'title' }],
    row('Add-in', `Proton Ledger ${p.version}`),
    row('Activity model', p.activityModel),
    row('Bench temperature (°C)', p.benchTemperatureC),
    row('Temperatures of use (°C)', p.useTemperaturesC),
    row('Constants', p.constantSources),
    row('Copied on', p.copiedOn),
    [{ value: 'These numbers no longer follow any input. Verify the final pH with a calibrated meter at the working temperature.', style: 'note' }],
  ];
}

const PROVENANCE_ROWS = 9;

/** Opening words of the notes a table or protocol sheet carries about its live formulas. */
const LIVE_NOTES = ['Shaded cells are inputs. Every other number is a live', 'Type another row number to see its protocol', 'Curves for the first table row'];

function cellText(v: CellValue | undefined): string {
  return v === null || v === undefined ? '' : String(v);
}

/**
 * Copies a recipe sheet's values (not formulas) to a new sheet under a provenance block.
 * The source is the sheet of the current selection, unless `sourceSheet` is given.
 */
export async function valuesCopy(port: WorkbookPort, options: { version: string; now?: Date; sourceSheet?: string }): Promise<{ sheet: string; source: string }> {
  const source = options.sourceSheet ?? (await port.readSelection()).sheet;
  const used = await port.usedRange(source);
  if (!used) throw new Error(`"${source}" is empty: select a cell in a recipe table first.`);
  const values = await port.readValues(source, used);
  const at = (label: (typeof SETTING_ROWS)[number]) => cellText(values[settingRow(label)]?.[SETTING_VALUE_COL]);
  const isRecipe = cellText(values[LAYOUT.tableHeaderRow]?.[0]) === LAYOUT.columns[0];
  const temps = isRecipe
    ? [
        ...new Set(
          values
            .slice(LAYOUT.firstDataRow)
            .map((r) => r[1])
            .filter((v) => typeof v === 'number'),
        ),
      ].join('; ')
    : '(not a recipe table)';
  const provenance: Provenance = {
    version: options.version,
    sourceSheet: source,
    activityModel: isRecipe ? at('Activity model') : '(not a recipe table)',
    benchTemperatureC: isRecipe ? at('Bench temp. (°C)') : '(not a recipe table)',
    useTemperaturesC: temps,
    constantSources: isRecipe ? constantSourcesOf(at('Buffer system')) : '(not a recipe table)',
    copiedOn: stamp(options.now ?? new Date()),
  };
  const names = await port.sheetNames();
  const sheet = uniqueName(`${source} values`, names);
  await port.addSheet(sheet);
  await port.writeTable(sheet, { row: 0, col: 0, cells: provenanceBlock(provenance) });
  const copy: CellBlock = {
    row: PROVENANCE_ROWS,
    col: 0,
    cells: values.map((line, r) =>
      line.map((v): CellWrite | null => {
        if (v === null || v === '') return null;
        // The table's and protocol's notes about live formulas are not true of a copy.
        if (typeof v === 'string' && LIVE_NOTES.some((note) => v.startsWith(note)))
          return { value: 'Values only: nothing on this sheet follows an input any more.', style: 'note' };
        const header = isRecipe && r === LAYOUT.tableHeaderRow;
        return { value: v, ...(header ? { style: 'header' as const } : {}), ...(typeof v === 'number' ? { numberFormat: '0.000' } : {}) };
      }),
    ),
  };
  for (let i = 0; i < copy.cells.length; i += ROWS_PER_BATCH) {
    await port.writeTable(sheet, { row: copy.row + i, col: 0, cells: copy.cells.slice(i, i + ROWS_PER_BATCH) });
  }
  // The labels' column wide, the table's result columns narrow, its warnings column wide.
  await port.setColumnWidths(
    sheet,
    Array.from({ length: COL.warnings + 1 }, (_, i) => (i === 0 ? 24 : i === COL.warnings ? 44 : 11)),
  );
  await port.activateSheet(sheet);
  return { sheet, source };
}

/** Settings merged over defaults, for the form. */
export function mergedSettings(saved: Partial<PaneSettings>): Partial<PaneSettings> {
  const out: Partial<Record<keyof PaneSettings, unknown>> = {};
  if (saved.activityModel && ['pitzer', 'davies', 'ideal', 'bates-guggenheim'].includes(saved.activityModel)) out.activityModel = saved.activityModel;
  if (typeof saved.benchTemperatureC === 'number') out.benchTemperatureC = saved.benchTemperatureC;
  if (typeof saved.titrant === 'string' && saved.titrant) out.titrant = saved.titrant;
  if (typeof saved.titrantStockM === 'number') out.titrantStockM = saved.titrantStockM;
  if (typeof saved.partVolumeFraction === 'number') out.partVolumeFraction = saved.partVolumeFraction;
  return out as Partial<PaneSettings>;
}
