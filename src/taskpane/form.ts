/**
 * The pane's form, as plain data: what the user typed, checked field by field. No DOM here
 * (src/taskpane/pane.ts renders the form); the checks give a message per field, and nothing
 * is written to the workbook while any field has one.
 */
import { ACTIVITY_MODELS, ChemError } from '../chem';
import { readChoiceField, readNumberListField, readPurityField, readQuantity, requireNumberField } from '../chem/input';
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

/** A failed check: a message per field, and the code of each error the input reader raised (as the functions and the command line raise them). */
export type Checked = { readonly ok: true; readonly request: TableRequest } | { readonly ok: false; readonly errors: FieldErrors; readonly codes: Partial<Record<FieldName, string>> };

/** Most rows one table may have (every target pH × temperature × concentration). */
export const MAX_TABLE_ROWS = 2000;
/** Most pH values a start/stop/step series may produce before the row limit is checked. */
const MAX_SERIES = 2000;

/** pH values from start to stop (inclusive) by step, rounded to the step's decimals. */
export function phSeries(start: number, stop: number, step: number): number[] {
  const decimals = Math.min(6, Math.max(0, (String(step).split('.')[1] ?? '').length));
  const count = Math.floor((stop - start) / step + 1e-9) + 1;
  const out: number[] = [];
  for (let i = 0; i < Math.min(count, MAX_SERIES + 1); i++) out.push(Number((start + i * step).toFixed(decimals)));
  return out;
}


/**
 * Checks the form. Each message names the field's meaning and what is allowed.
 *
 * @example checkForm({ ...defaults, phList: '7.2; 7.4' }).ok // true
 */
export function checkForm(input: FormInput): Checked {
  const errors: FieldErrors = {};
  const codes: Partial<Record<FieldName, string>> = {};
  // The message of a failed read comes from the core's catalogue, naming the field as the pane labels it.
  const fail = (field: FieldName, error: unknown) => {
    if (!(error instanceof ChemError)) throw error;
    errors[field] = error.message;
    codes[field] = error.code;
  };
  const need = (field: FieldName, what: string): string => {
    const v = input[field].trim();
    if (v === '') errors[field] = `Give ${what}.`;
    return v;
  };
  // Every number is read and checked by its declared field (src/chem/input), as the worksheet
  // functions and the command line read it; messages name the field by its label here.
  const number = (field: FieldName, declared: string, what: string, label: string = field): number => {
    if (input[field].trim() === '') {
      errors[field] = `Give ${what}.`;
      return NaN;
    }
    try {
      return requireNumberField(declared, input[field], label);
    } catch (e) {
      fail(field, e);
      return NaN;
    }
  };
  const list = (field: FieldName, declared: string, what: string, label: string): number[] => {
    try {
      const values = readNumberListField(declared, input[field], label);
      if (values.length === 0) errors[field] = `Give at least one ${what}.`;
      return unique(values);
    } catch (e) {
      fail(field, e);
      return [];
    }
  };

  const buffer = need('buffer', 'a buffer system');
  const form = need('form', 'the form you weigh');
  let purityPercent = 100;
  try {
    purityPercent = readPurityField('formPurityPercent', input.purityPercent, 'Form purity (%)') ?? 100;
  } catch (e) {
    fail('purityPercent', e);
  }
  const titrant = need('titrant', 'a titrant');
  const titrantStockM = number('titrantStockM', 'titrant.concentrationM', 'the titrant stock concentration', 'Titrant stock (M)');

  let targetPhs: number[] = [];
  if (input.phMode === 'list') {
    targetPhs = list('phList', 'targetPh', 'target pH', 'target pH');
  } else {
    const start = number('phStart', 'targetPh', 'the first pH', 'first pH');
    const stop = number('phStop', 'targetPh', 'the last pH', 'last pH');
    let step: number | null = null;
    try {
      step = readQuantity('pH step', input.phStep, 'pH');
    } catch {
      step = null;
    }
    if (input.phStep.trim() === '') errors.phStep = 'Give a pH step, e.g. 0.1.';
    else if (step === null || step <= 0) errors.phStep = 'The pH step must be a number above 0.';
    else if (step > 14) errors.phStep = 'The pH step must be at most 14.';
    if (!errors.phStart && !errors.phStop && stop < start) errors.phStop = 'The last pH must not be below the first.';
    if (!errors.phStart && !errors.phStop && !errors.phStep && step !== null) {
      if ((stop - start) / step + 1 > MAX_TABLE_ROWS) errors.phStep = `That makes more than ${MAX_TABLE_ROWS} pH values; take a larger step.`;
      else targetPhs = phSeries(start, stop, step);
    }
  }

  const useTemperaturesC = list('useTemperaturesC', 'useTemperatureC', 'temperature of use', 'temperature of use');
  const concentrationsMm = list('concentrationsMm', 'concentrationMm', 'buffer concentration', 'buffer concentration');
  const saltForm = input.saltForm.trim();
  let saltMm = 0;
  if (saltForm !== '' || input.saltMm.trim() !== '') {
    saltMm = number('saltMm', 'saltMm', 'the salt concentration', 'salt concentration');
    if (saltForm === '' && saltMm > 0) errors.saltForm = 'Name the salt, or clear its concentration.';
  }
  const volumeMl = number('volumeMl', 'volumeMl', 'the final volume', 'final volume');
  const benchTemperatureC = number('benchTemperatureC', 'benchTemperatureC', 'the bench temperature', 'bench temperature');
  const partVolumeFraction = number('partVolumeFraction', 'partVolumeFraction', 'the part volume for adjusting', 'part volume for adjusting');
  let activityModel = ACTIVITY_MODELS[0];
  try {
    activityModel = readChoiceField('activityModel', input.activityModel, 'activity model') as PaneSettings['activityModel'];
  } catch (e) {
    fail('activityModel', e);
  }
  const userSubstances = input.userSubstances.trim();
  if (userSubstances !== '' && parseRangeText(userSubstances) === null) {
    errors.userSubstances = "Give a range such as 'My substances'!A2:J20 (quote a sheet name with spaces), or leave it blank.";
  }

  const rows = targetPhs.length * useTemperaturesC.length * concentrationsMm.length;
  if (Object.keys(errors).length === 0 && rows > MAX_TABLE_ROWS) {
    errors[input.phMode === 'list' ? 'phList' : 'phStep'] = `That makes ${rows} rows (pH × temperatures × concentrations); at most ${MAX_TABLE_ROWS}.`;
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors, codes };
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
