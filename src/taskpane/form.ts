/**
 * The pane's form, as plain data: what the user typed, checked field by field. No DOM here
 * (src/taskpane/pane.ts renders the form); the checks give a message per field, and nothing
 * is written to the workbook while any field has one.
 */
import { parseRangeText } from '../workbook/port';
import type { PaneSettings } from '../workbook/port';

/** Field names, as the DOM's ids use them (`field-<name>`). */
export type FieldName =
  | 'buffer'
  | 'form'
  | 'purityPercent'
  | 'titrant'
  | 'titrantStockM'
  | 'phMode'
  | 'phStart'
  | 'phStop'
  | 'phStep'
  | 'phList'
  | 'useTemperaturesC'
  | 'concentrationsMm'
  | 'saltForm'
  | 'saltMm'
  | 'volumeMl'
  | 'benchTemperatureC'
  | 'activityModel'
  | 'partVolumeFraction'
  | 'userSubstances';

/** The form as typed: every field a string (select boxes give their value). */
export type FormInput = Readonly<Record<FieldName, string>>;

/** A checked request for a recipe table. Units are in the names. */
export interface TableRequest {
  readonly buffer: string;
  readonly form: string;
  /** Purity (assay) of the form weighed, % (100 when the field is blank). */
  readonly purityPercent: number;
  readonly titrant: string;
  readonly titrantStockM: number;
  readonly targetPhs: readonly number[];
  readonly useTemperaturesC: readonly number[];
  readonly concentrationsMm: readonly number[];
  /** Optional salt (e.g. sodium chloride) at a fixed concentration; blank form means none. */
  readonly saltForm: string;
  readonly saltMm: number;
  readonly volumeMl: number;
  readonly benchTemperatureC: number;
  readonly activityModel: PaneSettings['activityModel'];
  readonly partVolumeFraction: number;
  /** A workbook range holding the user's own substances (e.g. `'My substances'!A2:J20`), or ''. */
  readonly userSubstances: string;
}

export type FieldErrors = Partial<Record<FieldName, string>>;

export type Checked = { readonly ok: true; readonly request: TableRequest } | { readonly ok: false; readonly errors: FieldErrors };

/** Most rows one table may have (every target pH × temperature × concentration). */
export const MAX_TABLE_ROWS = 2000;
/** Most pH values a start/stop/step series may produce before the row limit is checked. */
const MAX_SERIES = 2000;
export const ACTIVITY_MODELS: readonly PaneSettings['activityModel'][] = ['pitzer', 'davies', 'ideal', 'bates-guggenheim'];

/** Limits for the numbers the pane accepts; the worksheet functions check the chemistry. */
export const LIMITS = {
  ph: [0, 14],
  temperatureC: [0, 100],
  concentrationMm: [0.001, 5000],
  saltMm: [0, 5000],
  volumeMl: [0.001, 1e6],
  titrantStockM: [0.001, 20],
  partVolumeFraction: [0.1, 1],
  purityPercent: [1, 100],
} as const;

/** Reads one number; accepts a decimal comma ("7,4") as many lab notebooks write it. */
export function readNumber(text: string): number | null {
  const t = text.trim().replace(/\s+/g, '');
  if (t === '') return null;
  const normal = /^[-+]?\d+,\d+$/.test(t) ? t.replace(',', '.') : t;
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(normal)) return null;
  const n = Number(normal);
  return Number.isFinite(n) ? n : null;
}

/**
 * Reads one number that may carry the field's own unit ("150 mM", "25 °C", "500 mL"): the
 * unit is dropped when it is the field's; any other unit makes it unreadable, so the field
 * says what to write instead of guessing a conversion.
 */
export function readNumberIn(text: string, unit: string): number | null {
  const u = unit.trim();
  let t = text.trim();
  if (u !== '') {
    const spellings = u === '°C' ? ['°C', '° C', 'C'] : [u];
    const found = spellings.find((sp) => t.toLowerCase().endsWith(sp.toLowerCase()) && (sp !== 'C' || /\d\s*C$/i.test(t)));
    if (found) t = t.slice(0, t.length - found.length);
  }
  return readNumber(t);
}

/** Reads a list such as "6.8; 7.0; 7.2", "6.8 7.0 7.2" or "6.8, 7.0, 7.2". Null if any item is not a number. */
export function readList(text: string, unit = ''): number[] | null {
  const t = text.trim();
  if (t === '') return [];
  const parts = /;/.test(t) ? t.split(';') : /\s/.test(t.replace(/,\s+/g, ',')) ? t.split(/\s+/) : t.split(/,(?!\d)|,\s*|\s+/);
  const out: number[] = [];
  for (const p of parts.map((s) => s.trim()).filter((s) => s !== '')) {
    const n = readNumberIn(p, unit);
    if (n === null) return null;
    out.push(n);
  }
  return out;
}

/** pH values from start to stop (inclusive) by step, rounded to the step's decimals. */
export function phSeries(start: number, stop: number, step: number): number[] {
  const decimals = Math.min(6, Math.max(0, (String(step).split('.')[1] ?? '').length));
  const count = Math.floor((stop - start) / step + 1e-9) + 1;
  const out: number[] = [];
  for (let i = 0; i < Math.min(count, MAX_SERIES + 1); i++) out.push(Number((start + i * step).toFixed(decimals)));
  return out;
}

const range = (lo: number, hi: number) => `from ${lo} to ${hi}`;

function inRange(value: number, [lo, hi]: readonly [number, number]): boolean {
  return value >= lo && value <= hi;
}

/**
 * Checks the form. Each message names the field's meaning and what is allowed.
 *
 * @example checkForm({ ...defaults, phList: '7.2; 7.4' }).ok // true
 */
export function checkForm(input: FormInput): Checked {
  const errors: FieldErrors = {};
  const need = (field: FieldName, what: string): string => {
    const v = input[field].trim();
    if (v === '') errors[field] = `Give ${what}.`;
    return v;
  };
  const number = (field: FieldName, what: string, limits: readonly [number, number], unit: string): number => {
    const n = readNumberIn(input[field], unit);
    if (input[field].trim() === '') errors[field] = `Give ${what}.`;
    else if (n === null) errors[field] = `${capital(what)} must be a number${unit ? ` in${unit}` : ''}.`;
    else if (!inRange(n, limits)) errors[field] = `${capital(what)} must be ${range(limits[0], limits[1])}${unit}.`;
    return n ?? NaN;
  };
  const list = (field: FieldName, what: string, limits: readonly [number, number], unit: string): number[] => {
    const values = readList(input[field], unit);
    if (values === null) errors[field] = `Write the ${what} as numbers separated by semicolons, e.g. "4; 25".`;
    else if (values.length === 0) errors[field] = `Give at least one ${what.replace(/s$/, '')}.`;
    else {
      const bad = values.find((v) => !inRange(v, limits));
      if (bad !== undefined) errors[field] = `${bad} is not allowed: each value must be ${range(limits[0], limits[1])}${unit}.`;
    }
    return unique(values ?? []);
  };

  const buffer = need('buffer', 'a buffer system');
  const form = need('form', 'the form you weigh');
  const purityPercent = input.purityPercent.trim() === '' ? 100 : number('purityPercent', 'the purity of the form', LIMITS.purityPercent, ' %');
  const titrant = need('titrant', 'a titrant');
  const titrantStockM = number('titrantStockM', 'the titrant stock concentration', LIMITS.titrantStockM, ' M');

  let targetPhs: number[] = [];
  if (input.phMode === 'list') {
    targetPhs = list('phList', 'target pH values', LIMITS.ph, '');
  } else {
    const start = number('phStart', 'the first pH', LIMITS.ph, '');
    const stop = number('phStop', 'the last pH', LIMITS.ph, '');
    const step = readNumber(input.phStep);
    if (input.phStep.trim() === '') errors.phStep = 'Give a pH step, e.g. 0.1.';
    else if (step === null || step <= 0) errors.phStep = 'The pH step must be a number above 0.';
    else if (step > 14) errors.phStep = 'The pH step must be at most 14.';
    if (!errors.phStart && !errors.phStop && stop < start) errors.phStop = 'The last pH must not be below the first.';
    if (!errors.phStart && !errors.phStop && !errors.phStep && step !== null) {
      if ((stop - start) / step + 1 > MAX_TABLE_ROWS) errors.phStep = `That makes more than ${MAX_TABLE_ROWS} pH values; take a larger step.`;
      else targetPhs = phSeries(start, stop, step);
    }
  }

  const useTemperaturesC = list('useTemperaturesC', 'temperatures of use', LIMITS.temperatureC, ' °C');
  const concentrationsMm = list('concentrationsMm', 'buffer concentrations', LIMITS.concentrationMm, ' mM');
  const saltForm = input.saltForm.trim();
  let saltMm = 0;
  if (saltForm !== '' || input.saltMm.trim() !== '') {
    saltMm = number('saltMm', 'the salt concentration', LIMITS.saltMm, ' mM');
    if (saltForm === '' && saltMm > 0) errors.saltForm = 'Name the salt, or clear its concentration.';
  }
  const volumeMl = number('volumeMl', 'the final volume', LIMITS.volumeMl, ' mL');
  const benchTemperatureC = number('benchTemperatureC', 'the bench temperature', LIMITS.temperatureC, ' °C');
  const partVolumeFraction = number('partVolumeFraction', 'the part volume for adjusting', LIMITS.partVolumeFraction, '');
  const activityModel = input.activityModel as PaneSettings['activityModel'];
  if (!ACTIVITY_MODELS.includes(activityModel)) errors.activityModel = `Choose one of: ${ACTIVITY_MODELS.join(', ')}.`;
  const userSubstances = input.userSubstances.trim();
  if (userSubstances !== '' && parseRangeText(userSubstances) === null) {
    errors.userSubstances = "Give a range such as 'My substances'!A2:J20 (quote a sheet name with spaces), or leave it blank.";
  }

  const rows = targetPhs.length * useTemperaturesC.length * concentrationsMm.length;
  if (Object.keys(errors).length === 0 && rows > MAX_TABLE_ROWS) {
    errors[input.phMode === 'list' ? 'phList' : 'phStep'] = `That makes ${rows} rows (pH × temperatures × concentrations); at most ${MAX_TABLE_ROWS}.`;
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  return {
    ok: true,
    request: {
      buffer,
      form,
      purityPercent,
      titrant,
      titrantStockM,
      targetPhs,
      useTemperaturesC,
      concentrationsMm,
      saltForm,
      saltMm: saltForm === '' ? 0 : saltMm,
      volumeMl,
      benchTemperatureC,
      activityModel,
      partVolumeFraction,
      userSubstances,
    },
  };
}

function unique(values: readonly number[]): number[] {
  return values.filter((v, i) => values.indexOf(v) === i);
}

function capital(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

/** Defaults of a fresh form, with the document's settings laid over them. */
export function defaultInput(settings: Partial<PaneSettings> = {}): FormInput {
  return {
    buffer: 'HEPES',
    form: 'HEPES',
    purityPercent: '',
    titrant: settings.titrant ?? 'NaOH',
    titrantStockM: String(settings.titrantStockM ?? 1),
    phMode: 'range',
    phStart: '7.0',
    phStop: '7.6',
    phStep: '0.2',
    phList: '7.2; 7.4',
    useTemperaturesC: '4; 25',
    concentrationsMm: '25',
    saltForm: 'sodium chloride',
    saltMm: '150',
    volumeMl: '1000',
    benchTemperatureC: String(settings.benchTemperatureC ?? 22),
    activityModel: settings.activityModel ?? 'pitzer',
    partVolumeFraction: String(settings.partVolumeFraction ?? 0.8),
    userSubstances: '',
  };
}

/** The settings part of a checked request, to keep in the document. */
export function settingsOf(request: TableRequest): PaneSettings {
  return {
    activityModel: request.activityModel,
    benchTemperatureC: request.benchTemperatureC,
    titrant: request.titrant,
    titrantStockM: request.titrantStockM,
    partVolumeFraction: request.partVolumeFraction,
  };
}
