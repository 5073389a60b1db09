/**
 * One declaration of every input a user can give: name, label, unit, accepted units, range,
 * default and description. The planner's checks, the worksheet functions' coercion, the
 * pane's form, the command line's schema and help, the RECIPE options range and the help
 * page's option table are all derived from this table (docs/input.md).
 *
 * A field's `name` is its path in the command line's JSON (`titrant.concentrationM`); the
 * same name (or the label, case and spacing ignored) is what an options range row holds.
 */
import { ACTIVITY_MODELS } from '../activity';
import { ChemError, MESSAGES } from '../errors';
import { MAX_TARGET_PH, MIN_TARGET_PH } from '../titration';
import { MAX_FORM_CONCENTRATION_M } from '../library/lookup';
import { CONDUCTIVITY_MAX_C, CONDUCTIVITY_MIN_C } from '../conductivity';
import { closestNames } from '../library/names';
import { BASE_UNIT, Dimension, readQuantity, readQuantityList, splitList, unitsOf } from './quantity';

interface FieldBase {
  /** Path in the command line's JSON, and the name in an options range. */
  readonly name: string;
  /** Plain words for the pane and the options range (either this or `name` is accepted). */
  readonly label: string;
  readonly description: string;
  /** An example of our own, as a user would type it. */
  readonly example: string;
  /** Where the field can be given: the recipe planner, a worksheet argument only, or a batch's actuals and checks (as-made check, bench correction). */
  readonly scope: 'recipe' | 'argument' | 'batch';
}

/** A number in a unit, with its range. */
export interface NumberField extends FieldBase {
  readonly kind: 'number';
  readonly dimension: Dimension;
  /** The field's own unit (numbers without a unit are in it). */
  readonly unit: string;
  readonly min: number;
  readonly max: number;
  /** True when `min` itself is not allowed (a volume above 0). */
  readonly minExclusive?: boolean;
  /** A blank is an error (otherwise a blank takes `default`, or is left unset). */
  readonly required?: boolean;
  /** Used when the field is blank. */
  readonly default?: number;
  /** Words for a default that depends on other fields ("the temperature of use"). */
  readonly defaultText?: string;
}

/** A name (substance, form, range). */
export interface TextField extends FieldBase {
  readonly kind: 'text';
  readonly required?: boolean;
  readonly defaultText?: string;
}

/** One of a few words. */
export interface ChoiceField extends FieldBase {
  readonly kind: 'choice';
  readonly choices: readonly string[];
  readonly default: string;
}

/** A list of salts with their concentrations ("NaCl 150 mM; KCl 2.7 mM"). */
export interface SaltListField extends FieldBase {
  readonly kind: 'salts';
}

/** Purity: a percentage, or a fraction up to 1 ("99.5", "99.5%", 0.995). */
export interface PurityField extends FieldBase {
  readonly kind: 'purity';
  readonly min: number;
  readonly max: number;
}

export type Field = NumberField | TextField | ChoiceField | SaltListField | PurityField;

/** Largest volume, mL: a 1000 L tank (a guard against unit slips). */
export const MAX_VOLUME_ML = 1e6;
/** Largest concentration of a buffer or salt in a recipe, mM (5 M: beyond any buffer recipe, within the solver's range). */
export const MAX_RECIPE_CONCENTRATION_MM = 5000;
/** Strongest titrant stock, mol/L: concentrated HCl is about 12 M and 50 % NaOH about 19 M (common practice). */
export const MAX_TITRANT_M = 20;
/** Weakest titrant stock, mol/L: below 1 mM a titrant only dilutes the buffer. */
export const MIN_TITRANT_M = 0.001;
/** Largest stock fold. */
export const MAX_STOCK_FOLD = 100;

const TEMPERATURE = { kind: 'number', dimension: 'temperature', unit: '°C', min: 0, max: 100 } as const;

/** Every field, in the order help and forms show them. */
export const FIELDS: readonly Field[] = [
  {
    kind: 'text',
    scope: 'recipe',
    name: 'buffer',
    label: 'Buffer system',
    required: true,
    description: 'The acid–base system that buffers, by substance or form name.',
    example: 'HEPES',
  },
  {
    kind: 'number',
    scope: 'recipe',
    name: 'targetPh',
    required: true,
    label: 'Target pH',
    dimension: 'pH',
    unit: 'pH',
    min: MIN_TARGET_PH,
    max: MAX_TARGET_PH,
    description: 'pH wanted at the temperature of use.',
    example: '7.4',
  },
  {
    kind: 'number',
    scope: 'recipe',
    name: 'concentrationMm',
    required: true,
    label: 'Buffer (mM)',
    dimension: 'concentration',
    unit: 'mM',
    min: 0.001,
    max: MAX_RECIPE_CONCENTRATION_MM,
    description: 'Total concentration of the buffer system in the final solution.',
    example: '50 mM',
  },
  {
    kind: 'number',
    scope: 'recipe',
    name: 'volumeMl',
    required: true,
    label: 'Final volume (mL)',
    dimension: 'volume',
    unit: 'mL',
    min: 0.001,
    max: MAX_VOLUME_ML,
    description: 'Final volume (of the working buffer; for a stock, of diluted buffer).',
    example: '500 mL',
  },
  {
    ...TEMPERATURE,
    scope: 'recipe',
    name: 'useTemperatureC',
    label: 'Use at (°C)',
    default: 25,
    description: 'Temperature at which the buffer is used; the target pH holds there.',
    example: '4 °C',
  },
  {
    kind: 'choice',
    scope: 'recipe',
    name: 'route',
    label: 'Route',
    choices: ['titrate', 'two-forms', 'stock'],
    default: 'titrate',
    description: 'How it is made: titrate one form, weigh two forms, or make a concentrated stock.',
    example: 'titrate',
  },
  {
    kind: 'text',
    scope: 'recipe',
    name: 'form',
    label: 'Form weighed',
    defaultText: 'the plain form of the system',
    description: 'The form weighed (titrate and stock routes).',
    example: 'HEPES free acid',
  },
  {
    kind: 'purity',
    scope: 'recipe',
    name: 'formPurityPercent',
    label: 'Form purity (%)',
    min: 1,
    max: 100,
    description: 'Purity (assay) of the buffer form(s) weighed, from the label or certificate.',
    example: '99.5%',
  },
  {
    kind: 'text',
    scope: 'recipe',
    name: 'titrant.form',
    label: 'Titrant',
    defaultText: '1 M NaOH or 1 M HCl, whichever moves the pH the right way',
    description: 'Titrant form (strong, or a weak acid or base).',
    example: 'NaOH',
  },
  {
    kind: 'number',
    scope: 'recipe',
    name: 'titrant.concentrationM',
    label: 'Titrant stock (M)',
    dimension: 'concentration',
    unit: 'M',
    min: MIN_TITRANT_M,
    max: MAX_TITRANT_M,
    default: 1,
    description: 'Concentration of the titrant stock.',
    example: '5 M',
  },
  {
    kind: 'number',
    scope: 'recipe',
    name: 'titrant.tolerancePercent',
    label: 'Stock tolerance (%)',
    dimension: 'percent',
    unit: '%',
    min: 0,
    max: 50,
    default: 1,
    description: 'Relative tolerance of the titrant stock’s concentration.',
    example: '2 %',
  },
  {
    kind: 'text',
    scope: 'recipe',
    name: 'acidForm',
    label: 'Acid form',
    description: 'Two-forms route: the more acidic form weighed.',
    example: 'sodium phosphate monobasic monohydrate',
  },
  {
    kind: 'text',
    scope: 'recipe',
    name: 'baseForm',
    label: 'Base form',
    description: 'Two-forms route: the more basic form weighed.',
    example: 'sodium phosphate dibasic heptahydrate',
  },
  {
    kind: 'number',
    scope: 'recipe',
    name: 'stock.fold',
    required: true,
    label: 'Stock fold (×)',
    dimension: 'count',
    unit: '×',
    min: 1,
    max: MAX_STOCK_FOLD,
    description: 'Stock route: how many times concentrated the stock is.',
    example: '10',
  },
  {
    kind: 'number',
    scope: 'recipe',
    name: 'stock.volumeMl',
    label: 'Stock volume (mL)',
    dimension: 'volume',
    unit: 'mL',
    min: 0.001,
    max: MAX_VOLUME_ML,
    defaultText: 'the final volume',
    description: 'Stock route: how much stock to make.',
    example: '100 mL',
  },
  {
    kind: 'salts',
    scope: 'recipe',
    name: 'salts',
    label: 'Salts',
    description: 'Further salts at fixed concentrations in the final solution, separated by ";".',
    example: 'NaCl 150 mM; KCl 2.7 mM',
  },
  {
    kind: 'text',
    scope: 'recipe',
    name: 'saltTarget.form',
    label: 'Salt to a target',
    description: 'A salt added until the buffer reaches an ionic strength or an ideal osmolarity.',
    example: 'NaCl',
  },
  {
    kind: 'number',
    scope: 'recipe',
    name: 'saltTarget.ionicStrengthM',
    label: 'Target ionic strength (M)',
    dimension: 'concentration',
    unit: 'M',
    min: 0,
    max: 5,
    description: 'Ionic strength the salt target reaches (give this or the ideal osmolarity).',
    example: '150 mM',
  },
  {
    kind: 'number',
    scope: 'recipe',
    name: 'saltTarget.idealOsmolarityMosm',
    label: 'Target ideal osmolarity (mOsm/L)',
    dimension: 'osmolarity',
    unit: 'mOsm/L',
    min: 0,
    max: 10000,
    description: 'Ideal osmolarity the salt target reaches.',
    example: '300 mOsm/L',
  },
  {
    kind: 'number',
    scope: 'recipe',
    name: 'saltTarget.osmolalityMosmKg',
    label: 'Target osmolality (mOsm/kg)',
    dimension: 'osmolality',
    unit: 'mOsm/kg',
    min: 0,
    max: 10000,
    description: 'Osmolality (what a freezing-point osmometer reads) the salt target reaches.',
    example: '290 mOsm/kg',
  },
  {
    kind: 'number',
    scope: 'recipe',
    name: 'saltTarget.conductivityMsPerCm',
    label: 'Target conductivity (mS/cm)',
    dimension: 'conductivity',
    unit: 'mS/cm',
    min: 0,
    max: 1000,
    description: 'Conductivity the salt target reaches, read at the conductivity temperature.',
    example: '15 mS/cm',
  },
  {
    ...TEMPERATURE,
    scope: 'recipe',
    name: 'saltTarget.conductivityTemperatureC',
    label: 'Conductivity read at (°C)',
    min: CONDUCTIVITY_MIN_C,
    max: CONDUCTIVITY_MAX_C,
    defaultText: 'the temperature of use',
    description: 'Temperature at which the conductivity target is read.',
    example: '20 °C',
  },
  {
    ...TEMPERATURE,
    scope: 'recipe',
    name: 'benchTemperatureC',
    label: 'Bench temp. (°C)',
    defaultText: 'the temperature of use',
    description: 'Temperature at which the pH is adjusted on the bench.',
    example: '22 °C',
  },
  {
    kind: 'number',
    scope: 'recipe',
    name: 'partVolumeFraction',
    label: 'Adjust at (fraction)',
    dimension: 'fraction',
    unit: '',
    min: 0.1,
    max: 1,
    default: 0.8,
    description: 'Fraction of the final volume in which the pH is adjusted.',
    example: '0.8',
  },
  {
    kind: 'choice',
    scope: 'recipe',
    name: 'titrantInBuffer',
    label: 'Titrant of the buffer',
    choices: ['state', 'hold'],
    default: 'state',
    description:
      'When the titrant is itself a form of the buffer (acetic acid into sodium acetate): "state" weighs the stated amount and says the total the titrant makes; "hold" weighs less so the stated total holds.',
    example: 'hold',
  },
  {
    kind: 'choice',
    scope: 'recipe',
    name: 'activityModel',
    label: 'Activity model',
    choices: ACTIVITY_MODELS,
    default: ACTIVITY_MODELS[0],
    description: 'Activity model for the equilibrium solver.',
    example: 'davies',
  },
  {
    kind: 'number',
    scope: 'recipe',
    name: 'pKaUncertainty',
    label: 'pKa uncertainty (±)',
    dimension: 'fraction',
    unit: '',
    min: 0,
    max: 1,
    defaultText: 'the library’s, or 0.02',
    description: 'pKa uncertainty used for the titrant band.',
    example: '0.02',
  },
  // Worksheet arguments that are not recipe options.
  {
    ...TEMPERATURE,
    scope: 'argument',
    name: 'conductivityTemperatureC',
    label: 'Conductivity at (°C)',
    min: CONDUCTIVITY_MIN_C,
    max: CONDUCTIVITY_MAX_C,
    default: 25,
    description: 'Temperature of a conductivity reading (the model covers 0–60 °C).',
    example: '20 °C',
  },
  { ...TEMPERATURE, scope: 'argument', name: 'temperatureC', label: 'Temperature (°C)', default: 25, description: 'Temperature of the solution.', example: '37 °C' },
  {
    kind: 'number',
    scope: 'argument',
    name: 'finalVolumeMl',
    required: true,
    label: 'Final volume (mL)',
    dimension: 'volume',
    unit: 'mL',
    min: 0.001,
    max: MAX_VOLUME_ML,
    description: 'Final volume of the solution.',
    example: '250 mL',
  },
  {
    kind: 'number',
    scope: 'argument',
    name: 'titrantConcentrationM',
    required: true,
    label: 'Titrant stock (M)',
    dimension: 'concentration',
    unit: 'M',
    min: MIN_TITRANT_M,
    max: MAX_TITRANT_M,
    description: 'Concentration of the titrant stock.',
    example: '1 M',
  },
  {
    kind: 'number',
    scope: 'argument',
    name: 'amountMm',
    required: true,
    label: 'Amount (mM)',
    dimension: 'concentration',
    unit: 'mM',
    min: 0,
    max: MAX_FORM_CONCENTRATION_M * 1000,
    description: 'Concentration of a form in a composition (a solution described by its parts, stocks included).',
    example: '20 mM',
  },
  {
    kind: 'number',
    scope: 'argument',
    name: 'saltMm',
    required: true,
    label: 'Salt (mM)',
    dimension: 'concentration',
    unit: 'mM',
    min: 0,
    max: MAX_RECIPE_CONCENTRATION_MM,
    description: 'Concentration of a salt in a recipe’s final solution.',
    example: '150 mM',
  },
  {
    kind: 'number',
    scope: 'argument',
    name: 'ionicStrengthMm',
    label: 'Ionic strength (mM)',
    dimension: 'concentration',
    unit: 'mM',
    min: 0,
    max: MAX_FORM_CONCENTRATION_M * 1000,
    default: 0,
    description: 'Ionic strength at which an apparent pKa′ is given.',
    example: '150 mM',
  },
  {
    kind: 'number',
    scope: 'argument',
    name: 'dilutionFactor',
    required: true,
    label: 'Dilution (×)',
    dimension: 'count',
    unit: '×',
    min: 1,
    max: 1e6,
    description: 'Final volume over starting volume.',
    example: '10',
  },
  // Mixing from stock solutions (docs/stocks.md): the stock shelf, the targets and the mix.
  {
    kind: 'number',
    scope: 'argument',
    name: 'stock.concentrationM',
    required: true,
    label: 'Stock concentration (M)',
    dimension: 'concentration',
    unit: 'M',
    min: 0,
    max: MAX_FORM_CONCENTRATION_M,
    minExclusive: true,
    description: 'Concentration of a stock on the shelf: of its form, or of its buffer system for a stock made by titration (a neutral additive may instead be given in %).',
    example: '1 M',
  },
  {
    kind: 'number',
    scope: 'argument',
    name: 'stock.percent',
    required: true,
    label: 'Stock (%)',
    dimension: 'percent',
    unit: '%',
    min: 0,
    max: 100,
    minExclusive: true,
    description: 'Strength of a neutral-additive stock: % v/v for a liquid (glycerol, DMSO), % w/v for a solid (sucrose, urea).',
    example: '50 %',
  },
  {
    kind: 'number',
    scope: 'argument',
    name: 'stock.ph',
    label: 'Stock pH',
    dimension: 'pH',
    unit: 'pH',
    min: MIN_TARGET_PH,
    max: MAX_TARGET_PH,
    description: 'pH a stock made by titration was brought to (its label).',
    example: '8.0',
  },
  {
    ...TEMPERATURE,
    scope: 'argument',
    name: 'stock.phTemperatureC',
    label: 'Stock pH at (°C)',
    default: 25,
    description: 'Temperature at which the stock’s pH was set.',
    example: '25 °C',
  },
  {
    kind: 'number',
    scope: 'argument',
    name: 'target.concentrationMm',
    required: true,
    label: 'Final (mM)',
    dimension: 'concentration',
    unit: 'mM',
    min: 0,
    max: MAX_RECIPE_CONCENTRATION_MM,
    description: 'Final concentration of a component mixed from the stocks.',
    example: '150 mM',
  },
  {
    kind: 'number',
    scope: 'argument',
    name: 'target.percent',
    required: true,
    label: 'Final (%)',
    dimension: 'percent',
    unit: '%',
    min: 0,
    max: 100,
    description: 'Final amount of a neutral additive: % v/v for a liquid, % w/v for a solid.',
    example: '10 %',
  },
  {
    kind: 'number',
    scope: 'argument',
    name: 'mixTargetPh',
    label: 'Target pH (optional)',
    dimension: 'pH',
    unit: 'pH',
    min: MIN_TARGET_PH,
    max: MAX_TARGET_PH,
    description: 'pH wanted at the temperature of use; when given and missed by more than the tolerance, a correction is planned.',
    example: '7.5',
  },
  {
    kind: 'number',
    scope: 'argument',
    name: 'phTolerance',
    label: 'pH tolerance (±)',
    dimension: 'fraction',
    unit: '',
    min: 0.001,
    max: 1,
    default: 0.05,
    description: 'How far the mixture’s predicted pH may lie from the target before a correction is planned.',
    example: '0.05',
  },
  {
    kind: 'number',
    scope: 'argument',
    name: 'smallestVolumeUl',
    label: 'Smallest volume (µL)',
    dimension: 'volume',
    unit: 'µL',
    min: 0.1,
    max: 1000,
    default: 2,
    description: 'Smallest volume your pipettes measure accurately; a stock needed in less is flagged with the dilution that fixes it.',
    example: '2 µL',
  },
  { kind: 'purity', scope: 'argument', name: 'purity', label: 'Purity', min: 1, max: 100, description: 'Purity (assay) of the form weighed.', example: '99.5%' },
  // A batch as made: actual amounts, readings and the tolerances it is checked against (docs/batch.md).
  // Default tolerances are common practice for a buffer's release checks (pH ± 0.05, weighed amounts ± 2 %,
  // conductivity ± 5 %) and for a two-point calibrated bench meter (± 0.03 pH), not from a published source.
  {
    kind: 'number',
    scope: 'batch',
    name: 'actual.grams',
    required: true,
    label: 'Actual mass (g)',
    dimension: 'mass',
    unit: 'g',
    min: 0,
    max: 1e6,
    description: 'Mass of a form actually weighed, as the balance showed it.',
    example: '2.98 g',
  },
  {
    kind: 'purity',
    scope: 'batch',
    name: 'actual.purityPercent',
    label: 'Lot purity (%)',
    min: 1,
    max: 100,
    description: 'Purity (assay) of the lot actually weighed, from its certificate (default: the purity planned).',
    example: '99.2%',
  },
  {
    kind: 'number',
    scope: 'batch',
    name: 'actual.titrantMl',
    label: 'Titrant added (mL)',
    dimension: 'volume',
    unit: 'mL',
    min: 0,
    max: MAX_VOLUME_ML,
    default: 0,
    description: 'Titrant actually added, all portions together.',
    example: '3.45 mL',
  },
  {
    kind: 'number',
    scope: 'batch',
    name: 'actual.titrantConcentrationM',
    label: 'Titrant standardised (M)',
    dimension: 'concentration',
    unit: 'M',
    min: MIN_TITRANT_M,
    max: MAX_TITRANT_M,
    defaultText: 'the nominal stock of the plan',
    description: 'Concentration of the titrant stock as standardised (titrated against a primary standard).',
    example: '0.987 M',
  },
  {
    kind: 'number',
    scope: 'batch',
    name: 'actual.finalVolumeMl',
    label: 'Made up to (mL)',
    dimension: 'volume',
    unit: 'mL',
    min: 0.001,
    max: MAX_VOLUME_ML,
    defaultText: 'the planned volume',
    description: 'Volume the batch was made up to.',
    example: '500 mL',
  },
  {
    ...TEMPERATURE,
    scope: 'batch',
    name: 'actual.benchTemperatureC',
    label: 'Bench at (°C)',
    defaultText: 'the planned bench temperature',
    description: 'Temperature of the solution when the pH was adjusted.',
    example: '23.5 °C',
  },
  {
    kind: 'number',
    scope: 'batch',
    name: 'actual.meterPh',
    label: 'Meter read (pH)',
    dimension: 'pH',
    unit: 'pH',
    min: MIN_TARGET_PH,
    max: MAX_TARGET_PH,
    description: 'What the meter read at the end of the adjustment, at the bench temperature.',
    example: '7.62',
  },
  {
    kind: 'number',
    scope: 'batch',
    name: 'actual.finalPh',
    label: 'Final pH at use',
    dimension: 'pH',
    unit: 'pH',
    min: MIN_TARGET_PH,
    max: MAX_TARGET_PH,
    description: 'pH of the finished batch measured at the temperature of use.',
    example: '7.41',
  },
  {
    kind: 'number',
    scope: 'batch',
    name: 'actual.conductivity25MsPerCm',
    label: 'Conductivity at 25 °C (mS/cm)',
    dimension: 'conductivity',
    unit: 'mS/cm',
    min: 0,
    max: 1000,
    description: 'Conductivity of the finished batch at 25 °C (or temperature-compensated to 25 °C).',
    example: '15.2 mS/cm',
  },
  {
    kind: 'number',
    scope: 'batch',
    name: 'tolerance.ph',
    label: 'pH tolerance (±)',
    dimension: 'pH',
    unit: 'pH',
    min: 0.001,
    max: 2,
    default: 0.05,
    description: 'Accepted difference of the pH at use from the target.',
    example: '0.05',
  },
  {
    kind: 'number',
    scope: 'batch',
    name: 'tolerance.concentrationPercent',
    label: 'Amount tolerance (± %)',
    dimension: 'percent',
    unit: '%',
    min: 0.01,
    max: 50,
    default: 2,
    description: 'Accepted relative difference of each weighed component’s concentration from the plan.',
    example: '2 %',
  },
  {
    kind: 'number',
    scope: 'batch',
    name: 'tolerance.conductivityPercent',
    label: 'Conductivity tolerance (± %)',
    dimension: 'percent',
    unit: '%',
    min: 0.01,
    max: 100,
    default: 5,
    description: 'Accepted relative difference of the conductivity at 25 °C from the plan.',
    example: '5 %',
  },
  {
    kind: 'number',
    scope: 'batch',
    name: 'tolerance.meterPh',
    label: 'Meter tolerance (± pH)',
    dimension: 'pH',
    unit: 'pH',
    min: 0,
    max: 1,
    default: 0.03,
    description: 'How far a calibrated bench meter’s reading may stray (adds to the reading’s band).',
    example: '0.03',
  },
  {
    kind: 'number',
    scope: 'batch',
    name: 'reading.ph',
    required: true,
    label: 'Meter reads (pH)',
    dimension: 'pH',
    unit: 'pH',
    min: MIN_TARGET_PH,
    max: MAX_TARGET_PH,
    description: 'What the meter reads now, at the bench.',
    example: '7.21',
  },
  {
    ...TEMPERATURE,
    scope: 'batch',
    name: 'reading.temperatureC',
    label: 'Reading at (°C)',
    defaultText: 'the planned bench temperature',
    description: 'Temperature of the solution as the meter reads it now.',
    example: '22 °C',
  },
  {
    kind: 'number',
    scope: 'batch',
    name: 'reading.volumeMl',
    label: 'Volume now (mL)',
    dimension: 'volume',
    unit: 'mL',
    min: 0.001,
    max: MAX_VOLUME_ML,
    defaultText: 'the planned part volume',
    description: 'Volume of the solution as it is now (titrant included).',
    example: '400 mL',
  },
  {
    kind: 'text',
    scope: 'batch',
    name: 'counterTitrant.form',
    label: 'Counter-titrant',
    defaultText: 'HCl after a base, NaOH after an acid',
    description: 'What brings the pH back after an overshoot.',
    example: 'HCl',
  },
  {
    kind: 'number',
    scope: 'batch',
    name: 'counterTitrant.concentrationM',
    label: 'Counter-titrant stock (M)',
    dimension: 'concentration',
    unit: 'M',
    min: MIN_TITRANT_M,
    max: MAX_TITRANT_M,
    defaultText: 'the titrant stock’s strength',
    description: 'Concentration of the counter-titrant stock.',
    example: '0.1 M',
  },
];

const BY_NAME = new Map<string, Field>(FIELDS.map((f) => [f.name, f]));

/** The declaration of a field by name; throws for a name not declared (a programming slip). */
export function field(name: string): Field {
  const f = BY_NAME.get(name);
  if (!f) throw new Error(`No input field is declared as ${name}`);
  return f;
}

/** A number field by name. */
export function numberField(name: string): NumberField {
  const f = field(name);
  if (f.kind !== 'number') throw new Error(`${name} is not a number field`);
  return f;
}

function trimZeros(n: number): string {
  return n >= 1e5 ? n.toLocaleString('en-US') : String(n);
}

/** What a field allows, in words with units: `0.001 to 5000 mM`. */
export function allowedOf(f: Field): string {
  switch (f.kind) {
    case 'number': {
      const unit = f.unit === '' || f.unit === '×' ? '' : f.unit === '%' ? ' %' : ` ${f.unit}`;
      if (f.dimension === 'pH') return `pH ${f.min} to ${f.max}`;
      return f.minExclusive ? `above ${trimZeros(f.min)} up to ${trimZeros(f.max)}${unit}` : `${trimZeros(f.min)} to ${trimZeros(f.max)}${unit}`;
    }
    case 'choice':
      return f.choices.join(', ');
    case 'purity':
      return `${f.min} to ${f.max} % (or a fraction up to 1, e.g. 0.995)`;
    case 'salts':
      return `"form amount" items separated by ";" (e.g. ${f.example}), each 0 to ${MAX_RECIPE_CONCENTRATION_MM} mM`;
    default:
      return 'a name';
  }
}

/** The units a number field accepts, with its own first. */
export function unitsAccepted(f: NumberField): readonly string[] {
  const all = unitsOf(f.dimension);
  return f.unit && all.includes(f.unit) ? [f.unit, ...all.filter((u) => u !== f.unit)] : all;
}

/** True for an omitted value, an empty cell or blank text. */
export function isBlankValue(value: unknown): boolean {
  return value === undefined || value === null || (typeof value === 'string' && value.trim() === '');
}

/** An out-of-range error that shows the value as the user wrote it (text with its unit stays as typed). */
function rangeError(f: NumberField | PurityField, asWritten: string, value: number, typed?: unknown): ChemError {
  const allowed = allowedOf(f);
  // Text with a unit or a decimal comma is quoted as typed ("9 M"); a plain number is shown as the number.
  const shown = typeof typed === 'string' && !/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(typed.trim()) ? typed.trim() : value;
  return new ChemError('invalid-input', 'outOfRange', MESSAGES.outOfRange(asWritten, shown, allowed), asWritten, allowed);
}

/**
 * A number field's value, read and checked: a number in the field's unit, or text with a
 * unit of its dimension. Blank takes the declared default.
 *
 * @param name - the declared field
 * @param value - what the user gave
 * @param asWritten - the field's name as the user wrote it (default: the declared name)
 * @returns the number in the field's unit, or undefined when blank and the field has no fixed default
 * @throws ChemError invalid-input naming `asWritten`, with the allowed range
 */
export function readNumberField(name: string, value: unknown, asWritten: string = name): number | undefined {
  const f = numberField(name);
  if (isBlankValue(value)) {
    if (!f.required) return f.default;
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(asWritten, `a number, ${allowedOf(f)}`), asWritten, allowedOf(f));
  }
  const n = readQuantity(asWritten, value, f.dimension, f.unit || BASE_UNIT[f.dimension]);
  if (n < f.min || n > f.max || (f.minExclusive && n === f.min)) throw rangeError(f, asWritten, n, value);
  return n;
}

/** Like readNumberField, for a field that must end with a number (blank takes the default, which must exist). */
export function requireNumberField(name: string, value: unknown, asWritten: string = name): number {
  const n = readNumberField(name, value, asWritten);
  if (n === undefined) {
    const f = numberField(name);
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(asWritten, `a number, ${allowedOf(f)}`), asWritten, allowedOf(f));
  }
  return n;
}

/**
 * A list of values for one number field ("4; 25", "4 °C; 25 °C", "7,2; 7,4"), each read and
 * checked as the field; blank is an empty list.
 */
export function readNumberListField(name: string, value: unknown, asWritten: string = name): number[] {
  const f = numberField(name);
  return readQuantityList(asWritten, value, f.dimension, f.unit || BASE_UNIT[f.dimension]).map((n) => {
    if (n < f.min || n > f.max || (f.minExclusive && n === f.min)) throw rangeError(f, asWritten, n);
    return n;
  });
}

/**
 * A text field's value: trimmed text (a number is taken as its text: a substance could be
 * named "3"); undefined when blank and optional.
 */
export function readTextField(name: string, value: unknown, asWritten: string = name): string | undefined {
  const f = field(name);
  if (isBlankValue(value)) {
    if (f.kind === 'text' && f.required) throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(asWritten, 'a name'), asWritten, 'a name');
    return undefined;
  }
  if (typeof value === 'number') return String(value);
  if (typeof value !== 'string') throw new ChemError('invalid-input', 'notText', MESSAGES.notText(asWritten, value), asWritten, 'a name');
  return value.trim();
}

/** Normalises a choice as typed: case, spaces, underscores and dashes do not matter. */
function choiceKey(text: string): string {
  return text
    .trim()
    .toLowerCase()
    .replace(/[\s_–—-]+/g, '-');
}

/** A choice field's value (its canonical word); blank takes the default. */
export function readChoiceField(name: string, value: unknown, asWritten: string = name): string {
  const f = field(name);
  if (f.kind !== 'choice') throw new Error(`${name} is not a choice field`);
  if (isBlankValue(value)) return f.default;
  if (typeof value !== 'string') throw new ChemError('invalid-input', 'unknownChoice', MESSAGES.unknownChoice(asWritten, value, f.choices), asWritten, f.choices.join(', '));
  const key = choiceKey(value);
  const found = f.choices.find((c) => choiceKey(c) === key);
  if (!found) throw new ChemError('invalid-input', 'unknownChoice', MESSAGES.unknownChoice(asWritten, value, f.choices), asWritten, f.choices.join(', '));
  return found;
}

/**
 * Purity as a percentage: "99.5%" or 99.5 is a percentage; a number above 0 up to 1 is a
 * fraction (0.995, as a cell formatted as a percentage holds it). Blank is undefined (pure).
 */
export function readPurityField(name: string, value: unknown, asWritten: string = name): number | undefined {
  const f = field(name);
  if (f.kind !== 'purity') throw new Error(`${name} is not a purity field`);
  if (isBlankValue(value)) return undefined;
  const isPercentText = typeof value === 'string' && value.trim().endsWith('%');
  const n = readQuantity(asWritten, value, 'percent', '%');
  const percent = !isPercentText && n > 0 && n <= 1 ? n * 100 : n;
  if (percent < f.min || percent > f.max) throw rangeError(f, asWritten, n, value);
  return percent;
}

/** One salt of a list: its form and concentration, mM. */
export interface SaltEntry {
  readonly form: string;
  readonly concentrationMm: number;
}

/**
 * Reads one salt item "NaCl 150 mM", "KCl 2,7 mM" or "MgCl2·6H2O 1" (mM when no unit): the
 * amount is the last word (or the last two, number then unit); the rest is the name.
 */
function readSaltItem(asWritten: string, item: string): SaltEntry {
  const words = item.trim().split(/\s+/);
  const allowed = allowedOf(field('salts'));
  const fail = () => new ChemError('invalid-input', 'notANumber', MESSAGES.badSaltItem(asWritten, item, allowed), asWritten, allowed);
  if (words.length < 2) throw fail();
  const last = words[words.length - 1];
  const lastIsNumber = /^[+-]?[\d.,]/.test(last);
  const amountWords = lastIsNumber ? 1 : 2;
  if (words.length <= amountWords) throw fail();
  const amount = words.slice(words.length - amountWords).join(' ');
  if (!/^[+-]?[\d.,]/.test(amount)) throw fail();
  const mM = requireNumberField('saltMm', amount, asWritten);
  return { form: words.slice(0, words.length - amountWords).join(' '), concentrationMm: mM };
}

/**
 * A salt list: text ("NaCl 150 mM; KCl 2.7 mM") or already a list of `{form, concentrationMm}`
 * (the command line's JSON; each amount a number in mM or text with a unit).
 */
export function readSaltsField(value: unknown, asWritten = 'salts'): SaltEntry[] {
  if (isBlankValue(value)) return [];
  if (typeof value === 'string') return splitList(asWritten, value).map((item) => readSaltItem(asWritten, item));
  if (!Array.isArray(value)) throw new ChemError('invalid-input', 'notText', MESSAGES.notText(asWritten, value), asWritten, allowedOf(field('salts')));
  return value.map((entry: unknown, i) => {
    const at = `${asWritten}[${i}]`;
    const e = (entry ?? {}) as { form?: unknown; concentrationMm?: unknown };
    const form = readTextField('form', e.form, `${at}.form`);
    if (form === undefined) throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(`${at}.form`, 'a form name'), `${at}.form`, 'a name');
    const mM = requireNumberField('saltMm', e.concentrationMm, `${at}.concentrationMm`);
    return { form, concentrationMm: mM };
  });
}

function optionKey(text: string): string {
  return text
    .trim()
    .toLowerCase()
    .replace(/[\s_]+/g, '');
}

const RECIPE_OPTION_KEYS = new Map<string, Field>();
for (const f of FIELDS) {
  if (f.scope !== 'recipe') continue;
  RECIPE_OPTION_KEYS.set(optionKey(f.name), f);
  RECIPE_OPTION_KEYS.set(optionKey(f.label), f);
}

const OPTION_NAMES = new Map<string, string>([...RECIPE_OPTION_KEYS].map(([key, f]) => [key, f.name]));

/** The recipe field an option name (a field name or its label) stands for; "did you mean" when none. */
export function recipeFieldOf(written: string): Field {
  const f = RECIPE_OPTION_KEYS.get(optionKey(written));
  if (f) return f;
  const names = FIELDS.filter((x) => x.scope === 'recipe').map((x) => x.name);
  // Long text is no misspelt option name: no suggestion search (it is quadratic in length).
  const suggestions = written.length > 60 ? [] : closestNames(optionKey(written), OPTION_NAMES);
  throw new ChemError('invalid-input', 'unknownField', MESSAGES.unknownField(written, suggestions, names.join(', ')), written, names.join(', '));
}

/**
 * Sets a value at a field's path in a nested input object (`titrant.form` → `{titrant: {form}}`),
 * as the command line's JSON holds it; hosts that read fields as flat names (an options range,
 * a batch CSV header) build the planner's input with it.
 */
export function setFieldPath(target: Record<string, unknown>, path: string, value: unknown): void {
  const parts = path.split('.');
  let at = target;
  for (const part of parts.slice(0, -1)) {
    if (typeof at[part] !== 'object' || at[part] === null) at[part] = {};
    at = at[part] as Record<string, unknown>;
  }
  at[parts[parts.length - 1]] = value;
}

const BATCH_KEYS = new Map<string, Field>();
for (const f of FIELDS) {
  // Per-form fields (grams, purity) are a form's row, not a named row of their own.
  if (f.scope !== 'batch' || f.name === 'actual.grams' || f.name === 'actual.purityPercent') continue;
  BATCH_KEYS.set(optionKey(f.name), f);
  BATCH_KEYS.set(optionKey(f.label), f);
}

/** The batch field a row name (a field name or its label) stands for, or undefined (then the row names a form weighed). */
export function batchFieldOf(written: string): Field | undefined {
  return BATCH_KEYS.get(optionKey(written));
}
