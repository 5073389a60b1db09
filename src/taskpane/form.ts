/**
 * The pane's form, as plain data: what the user typed, checked field by field. No DOM here
 * (src/taskpane/pane.ts renders the form); the checks give a message per field, and nothing
 * is written to the workbook while any field has one.
 */
import { ACTIVITY_MODELS, ChemError } from '../chem';
import { FIELDS, readChoiceField, readNumberField, readNumberListField, readPurityField, readQuantity, readSaltsField, requireNumberField } from '../chem/input';
import type { SaltEntry } from '../chem/input';
import { parseRangeText } from '../workbook/port';
import type { PaneSettings } from '../workbook/port';

/** Field names, as the DOM's ids use them (`field-<name>`). */
export type FieldName =
  | 'buffer'
  | 'route'
  | 'form'
  | 'acidForm'
  | 'baseForm'
  | 'stockFold'
  | 'stockVolumeMl'
  | 'purityPercent'
  | 'titrant'
  | 'titrantStockM'
  | 'titrantInBuffer'
  | 'phMode'
  | 'phStart'
  | 'phStop'
  | 'phStep'
  | 'phList'
  | 'useTemperaturesC'
  | 'concentrationsMm'
  | 'salts'
  | 'saltTargetForm'
  | 'saltTargetGoal'
  | 'saltTargetValue'
  | 'volumeMl'
  | 'benchTemperatureC'
  | 'activityModel'
  | 'partVolumeFraction'
  | 'userSubstances';

/** The form as typed: every field a string (select boxes give their value). */
export type FormInput = Readonly<Record<FieldName, string>>;

/** How the table's buffers are made (the planner's routes, src/chem/planner). */
export type TableRoute = 'titrate' | 'two-forms' | 'stock';

/**
 * The salt-target goals, from the declared fields `saltTarget.<goal>` (a number with a unit;
 * the temperature of a conductivity reading is a setting of that goal, not a goal).
 */
export const SALT_TARGET_GOALS: readonly { readonly name: string; readonly label: string }[] = FIELDS.filter(
  (f) => f.kind === 'number' && f.name.startsWith('saltTarget.') && f.dimension !== 'temperature',
).map((f) => ({ name: f.name.slice('saltTarget.'.length), label: f.label }));

/** A salt added until the finished buffer reaches a goal: `goal` is a SALT_TARGET_GOALS name, `value` in that field's unit. */
export interface TableSaltTarget {
  readonly form: string;
  readonly goal: string;
  readonly value: number;
}

/** A checked request for a recipe table. Units are in the names. */
export interface TableRequest {
  readonly buffer: string;
  readonly route: TableRoute;
  /** Titrate and stock routes: the form weighed ('' on the two-forms route). */
  readonly form: string;
  /** Two-forms route: the acid and the base form weighed ('' on the other routes). */
  readonly acidForm: string;
  readonly baseForm: string;
  /** Stock route: how many times concentrated, and how much stock to make (mL; undefined: the final volume). */
  readonly stockFold?: number;
  readonly stockVolumeMl?: number;
  /** Purity (assay) of the form weighed, % (100 when the field is blank). */
  readonly purityPercent: number;
  readonly titrant: string;
  readonly titrantStockM: number;
  /** A titrant of the buffer system itself (acetic acid into sodium acetate): state the total it makes, or hold the stated total. */
  readonly titrantInBuffer: 'state' | 'hold';
  readonly targetPhs: readonly number[];
  readonly useTemperaturesC: readonly number[];
  readonly concentrationsMm: readonly number[];
  /** Salts at fixed concentrations in the final buffer (none: empty). */
  readonly salts: readonly SaltEntry[];
  /** A salt added to reach an ionic strength, osmolarity or conductivity (none: undefined). */
  readonly saltTarget?: TableSaltTarget;
  readonly volumeMl: number;
  readonly benchTemperatureC: number;
  readonly activityModel: PaneSettings['activityModel'];
  readonly partVolumeFraction: number;
  /** A workbook range holding the user's own substances (e.g. `'My substances'!A2:J20`), or ''. */
  readonly userSubstances: string;
}

export type FieldErrors = Partial<Record<FieldName, string>>;

/** A failed check: a message per field, and the code of each error the input reader raised (as the functions and the command line raise them). */
export type Checked =
  { readonly ok: true; readonly request: TableRequest } | { readonly ok: false; readonly errors: FieldErrors; readonly codes: Partial<Record<FieldName, string>> };

/** Most salts at fixed concentrations one table holds (the rows of its salts block). */
export const MAX_TABLE_SALTS = 6;
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
  let route: TableRoute = 'titrate';
  try {
    route = readChoiceField('route', input.route, 'route') as TableRoute;
  } catch (e) {
    fail('route', e);
  }
  const weighsOne = route !== 'two-forms';
  const form = weighsOne ? need('form', 'the form you weigh') : '';
  const acidForm = weighsOne ? '' : need('acidForm', 'the acid form you weigh');
  const baseForm = weighsOne ? '' : need('baseForm', 'the base form you weigh');
  let stockFold: number | undefined;
  let stockVolumeMl: number | undefined;
  if (route === 'stock') {
    stockFold = number('stockFold', 'stock.fold', 'how many times concentrated the stock is', 'stock fold');
    try {
      stockVolumeMl = readNumberField('stock.volumeMl', input.stockVolumeMl, 'stock volume');
    } catch (e) {
      fail('stockVolumeMl', e);
    }
  }
  let purityPercent = 100;
  try {
    purityPercent = readPurityField('formPurityPercent', input.purityPercent, 'Form purity (%)') ?? 100;
  } catch (e) {
    fail('purityPercent', e);
  }
  const titrant = weighsOne ? need('titrant', 'a titrant') : input.titrant.trim();
  let titrantInBuffer: TableRequest['titrantInBuffer'] = 'state';
  try {
    titrantInBuffer = readChoiceField('titrantInBuffer', input.titrantInBuffer, 'titrant of the buffer') as TableRequest['titrantInBuffer'];
  } catch (e) {
    fail('titrantInBuffer', e);
  }
  // Weighing two forms needs no titrant: its fields are then kept as typed for the next table, not checked.
  const titrantStockM = weighsOne ? number('titrantStockM', 'titrant.concentrationM', 'the titrant stock concentration', 'Titrant stock (M)') : 1;

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
  let salts: SaltEntry[] = [];
  try {
    salts = readSaltsField(input.salts, 'salts');
  } catch (e) {
    fail('salts', e);
  }
  if (salts.length > MAX_TABLE_SALTS) errors.salts = `At most ${MAX_TABLE_SALTS} salts in one table.`;
  let saltTarget: TableSaltTarget | undefined;
  const targetForm = input.saltTargetForm.trim();
  if (input.saltTargetGoal !== '' && input.saltTargetGoal !== 'none') {
    const goal = SALT_TARGET_GOALS.find((g) => g.name === input.saltTargetGoal);
    if (!goal) errors.saltTargetGoal = `Choose one of: ${SALT_TARGET_GOALS.map((g) => g.label).join(', ')}.`;
    if (targetForm === '') errors.saltTargetForm = 'Name the salt added to reach the target.';
    const value = goal ? number('saltTargetValue', `saltTarget.${goal.name}`, 'the target value', goal.label) : NaN;
    if (goal && targetForm !== '' && !errors.saltTargetValue) saltTarget = { form: targetForm, goal: goal.name, value };
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
      route,
      form,
      acidForm,
      baseForm,
      ...(stockFold === undefined ? {} : { stockFold }),
      ...(stockVolumeMl === undefined ? {} : { stockVolumeMl }),
      purityPercent,
      titrant,
      titrantStockM,
      titrantInBuffer,
      targetPhs,
      useTemperaturesC,
      concentrationsMm,
      salts,
      ...(saltTarget ? { saltTarget } : {}),
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
    route: 'titrate',
    form: 'HEPES',
    acidForm: '',
    baseForm: '',
    stockFold: '10',
    stockVolumeMl: '',
    purityPercent: '',
    titrant: settings.titrant ?? 'NaOH',
    titrantStockM: String(settings.titrantStockM ?? 1),
    titrantInBuffer: 'state',
    phMode: 'range',
    phStart: '7.0',
    phStop: '7.6',
    phStep: '0.2',
    phList: '7.2; 7.4',
    useTemperaturesC: '4; 25',
    concentrationsMm: '25',
    salts: 'sodium chloride 150 mM',
    saltTargetForm: '',
    saltTargetGoal: 'none',
    saltTargetValue: '',
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
