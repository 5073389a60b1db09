/**
 * The worksheet function catalog. Each function is a thin adapter: arguments are coerced
 * (coerce.ts), names resolved through the substance library, the core called, and the
 * result shaped for a cell. The JSDoc blocks below are the single source of the function
 * metadata (`npm run metadata` → metadata.json); Excel and the formula engine both
 * register from that file. Functions throw on bad input; the hosts turn what they throw
 * into spreadsheet errors (errors.ts). Nothing here touches Office or a formula engine.
 *
 * In Excel every name carries the add-in's namespace (PROTON, set in manifest.xml):
 * `=PROTON.PH(A2:B4)`.
 */
/* eslint-disable @typescript-eslint/no-explicit-any -- `any` is how custom-functions metadata spells a cell of any type */
import { apparentPKa, capacity, solutionWarnings, idealOsmolarity, debyeHuckelA, pKaAt, solvePh, speciate, titrantForPh, afterDilution, atTemperature } from '../chem';
import { titrantFromForm } from '../chem/library';
import { isBlank, isBlankRange, toActivityModel, toChoice, toNumber, toPurity, toRange, toTemperature, toText } from './coerce';
import { DEFAULT_PART_VOLUME_FRACTION, DEFAULT_STOCK_TOLERANCE_PERCENT, RecipeInput, RecipePlan, planRecipe } from '../chem/planner';
import { volumeText } from '../chem/planner/protocol';
import { compositionFrom, MAX_AMOUNT_MM } from './composition';
import { SheetError, invalid } from './errors';
import { memoised } from './memo';
import { SHEET_MESSAGES } from './messages';
import { libraryFor, userRowCount } from './userRange';

/** Rows of the SPECIES table, header included: fixed so every host knows the spill size before computing (HyperFormula sizes arrays at parse time). 29 species covers H⁺, OH⁻, the strong ions and several polyprotic systems. */
export const SPECIES_TABLE_ROWS = 30;
/** Columns of the SPECIES table. */
export const SPECIES_TABLE_HEADER = ['species', 'mM', 'activity (mM)', 'charge'] as const;
/** Largest volume accepted, mL (a 1000 L tank; a guard against unit slips). */
const MAX_VOLUME_ML = 1e6;
/** Largest dilution factor accepted (the core's limit). */
const MAX_DILUTION = 1e6;
/** Largest ionic strength accepted for an apparent pKa, mM (the core's concentration limit). */
const MAX_IONIC_STRENGTH_MM = 20000;

function setup(temperatureC: any, activityModel: any, userSubstances: any, temperatureRequired = false) {
  return {
    library: libraryFor(userSubstances),
    temperatureC: toTemperature('temperatureC', temperatureC, temperatureRequired),
    model: toActivityModel('activityModel', activityModel),
  };
}

function solution(composition: any, temperatureC: any, activityModel: any, userSubstances: any) {
  const s = setup(temperatureC, activityModel, userSubstances);
  return compositionFrom(s.library, composition, s.temperatureC, s.model);
}

/**
 * Predicted pH of a solution given as a range of names and amounts.
 * @customfunction PH PH
 * @helpurl https://localhost:3000/help/functions.html#ph
 * @param composition Two columns: substance or form name (e.g. "tris base", "Na2HPO4·7H2O", "NaCl"), then amount in mM. Blank rows are ignored.
 * @param [temperatureC] Temperature in °C (blank: 25).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim".
 * @param [userSubstances] Range of your own substances (see the help page for its columns).
 * @returns pH, as a calibrated meter would read it at that temperature.
 */
export function ph(composition: any[][], temperatureC?: any, activityModel?: any, userSubstances?: any[][]): number {
  return memoised('PH', [composition, temperatureC, activityModel, userSubstances], () => solvePh(solution(composition, temperatureC, activityModel, userSubstances)));
}

/**
 * Volume of titrant stock, in mL, that brings a weighed form to a target pH.
 * @customfunction TITRANT.ML TITRANT.ML
 * @helpurl https://localhost:3000/help/functions.html#titrant-ml
 * @param form Form weighed out (e.g. "HEPES free acid", "tris base").
 * @param concentrationMm Its concentration in the final solution, mM.
 * @param finalVolumeMl Final volume of the solution, mL.
 * @param targetPh pH to reach (0 to 14).
 * @param titrant Titrant form (e.g. "NaOH", "HCl", "KOH", or a weak base or acid such as "tris base").
 * @param titrantConcentrationM Concentration of the titrant stock, mol/L.
 * @param [temperatureC] Temperature at which the pH is adjusted, °C (blank: 25).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim".
 * @param [salts] Two columns: other forms in the final solution and their mM (e.g. "NaCl", 150); they shift the pH, so the titrant too.
 * @param [userSubstances] Range of your own substances.
 * @returns Titrant stock to add, mL.
 */
export function titrantMl(form: any, concentrationMm: any, finalVolumeMl: any, targetPh: any, titrant: any, titrantConcentrationM: any, temperatureC?: any, activityModel?: any, salts?: any[][], userSubstances?: any[][]): number {
  return memoised('TITRANT.ML', [form, concentrationMm, finalVolumeMl, targetPh, titrant, titrantConcentrationM, temperatureC, activityModel, salts, userSubstances], () => {
    const s = setup(temperatureC, activityModel, userSubstances);
    const formName = toText('form', form);
    const mM = toNumber('concentrationMm', concentrationMm, { min: 0, max: MAX_AMOUNT_MM, allowed: `0 to ${MAX_AMOUNT_MM} mM` });
    const volumeMl = toNumber('finalVolumeMl', finalVolumeMl, { min: Number.MIN_VALUE, max: MAX_VOLUME_ML, allowed: `above 0 up to ${MAX_VOLUME_ML} mL` });
    const target = toNumber('targetPh', targetPh, { min: 0, max: 14, allowed: '0 to 14' });
    const stockM = toNumber('titrantConcentrationM', titrantConcentrationM, { min: Number.MIN_VALUE, max: 20, allowed: 'above 0 up to 20 mol/L' });
    // Without other components the composition is the form alone: built directly, it skips the range cache.
    const composition = isBlankRange(salts)
      ? s.library.compositionFromForms([{ form: formName, concentrationM: mM / 1000 }], { temperatureC: s.temperatureC, activityModel: s.model })
      : compositionFrom(s.library, [[formName, mM], ...toRange(salts)], s.temperatureC, s.model);
    const t = titrantFromForm(s.library.findForm(toText('titrant', titrant)), s.library);
    const ml = (titrantForPh(composition, t, target).concentrationM * volumeMl) / stockM;
    if (ml > volumeMl) throw new SheetError('na', SHEET_MESSAGES.titrantExceedsVolume(ml, volumeMl));
    return ml;
  });
}

/**
 * Buffer capacity of a solution at its own pH.
 * @customfunction CAPACITY CAPACITY
 * @helpurl https://localhost:3000/help/functions.html#capacity
 * @param composition Two columns: substance or form name, then amount in mM.
 * @param [measure] "base" (blank): mM of strong base that raises the pH by 0.1; "acid": mM of strong acid that lowers it by 0.1; "beta": mol/L per pH unit.
 * @param [temperatureC] Temperature in °C (blank: 25).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim".
 * @param [userSubstances] Range of your own substances.
 * @returns Capacity in the measure chosen.
 */
export function capacityOf(composition: any[][], measure?: any, temperatureC?: any, activityModel?: any, userSubstances?: any[][]): number {
  return memoised('CAPACITY', [composition, measure, temperatureC, activityModel, userSubstances], () => {
    const which = toChoice<'base' | 'acid' | 'beta'>('measure', measure, { base: ['mmbase', 'basemm', 'mm', 'mm/0.1ph'], acid: ['mmacid', 'acidmm'], beta: ['β', 'm/ph', 'mperph', 'mol/l/ph'] }, 'base');
    const result = capacity(solution(composition, temperatureC, activityModel, userSubstances));
    if (which === 'acid') return result.acidMmPerTenthPh;
    if (which === 'beta') return result.betaMPerPh;
    return result.baseMmPerTenthPh;
  });
}

/**
 * pH of a solution after dilution with pure water.
 * @customfunction PH.DILUTED PH.DILUTED
 * @helpurl https://localhost:3000/help/functions.html#ph-diluted
 * @param composition Two columns: substance or form name, then amount in mM (before dilution).
 * @param dilutionFactor Final volume over starting volume (10 for one part plus nine of water); 1 or more.
 * @param [temperatureC] Temperature in °C (blank: 25).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim".
 * @param [userSubstances] Range of your own substances.
 * @returns pH after dilution.
 */
export function phDiluted(composition: any[][], dilutionFactor: any, temperatureC?: any, activityModel?: any, userSubstances?: any[][]): number {
  return memoised('PH.DILUTED', [composition, dilutionFactor, temperatureC, activityModel, userSubstances], () => {
    const factor = toNumber('dilutionFactor', dilutionFactor, { min: 1, max: MAX_DILUTION, allowed: `1 to ${MAX_DILUTION}` });
    return afterDilution(solution(composition, temperatureC, activityModel, userSubstances), factor).pH;
  });
}

/**
 * pH of the same solution at another temperature (amounts unchanged), e.g. a buffer made up at room temperature and used in the cold room.
 * @customfunction PH.AT.TEMPERATURE PH.AT.TEMPERATURE
 * @helpurl https://localhost:3000/help/functions.html#ph-at-temperature
 * @param composition Two columns: substance or form name, then amount in mM.
 * @param temperatureC Temperature of use, °C (0 to 100).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim".
 * @param [userSubstances] Range of your own substances.
 * @returns pH at that temperature.
 */
export function phAtTemperature(composition: any[][], temperatureC: any, activityModel?: any, userSubstances?: any[][]): number {
  return memoised('PH.AT.TEMPERATURE', [composition, temperatureC, activityModel, userSubstances], () => {
    const s = setup(temperatureC, activityModel, userSubstances, true);
    return atTemperature(compositionFrom(s.library, composition, 25, s.model), s.temperatureC).pH;
  });
}

/**
 * Apparent pKa′ of one step of a substance at a temperature and ionic strength.
 * @customfunction PKA PKA
 * @helpurl https://localhost:3000/help/functions.html#pka
 * @param substance Substance or form name (e.g. "phosphate", "HEPES", "tris HCl").
 * @param [step] Which proton-loss step, 1 for the first (blank: 1).
 * @param [temperatureC] Temperature in °C (blank: 25).
 * @param [ionicStrengthMm] Ionic strength in mM (blank: 0, the thermodynamic pKa).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim".
 * @param [userSubstances] Range of your own substances.
 * @returns pKa′, to be used with pH = −log a(H+).
 */
export function pka(substance: any, step?: any, temperatureC?: any, ionicStrengthMm?: any, activityModel?: any, userSubstances?: any[][]): number {
  return memoised('PKA', [substance, step, temperatureC, ionicStrengthMm, activityModel, userSubstances], () => {
    const s = setup(temperatureC, activityModel, userSubstances);
    const record = s.library.findSystem(toText('substance', substance));
    if (record.steps.length === 0) throw invalid(SHEET_MESSAGES.noSuchStep('step', record.name, 1, 0));
    const k = toNumber('step', step, { default: 1, min: 1, max: record.steps.length, integer: true, allowed: `whole numbers 1 to ${record.steps.length}` });
    const ionicStrengthM = toNumber('ionicStrengthMm', ionicStrengthMm, { default: 0, min: 0, max: MAX_IONIC_STRENGTH_MM, allowed: `0 to ${MAX_IONIC_STRENGTH_MM} mM` }) / 1000;
    const st = record.steps[k - 1];
    const pKa = pKaAt(st.pKa, st.deltaHkJ ?? 0, st.deltaCpJ ?? 0, s.temperatureC);
    return apparentPKa(s.model, pKa, record.chargeOfMostProtonated - (k - 1), ionicStrengthM, debyeHuckelA(s.temperatureC));
  });
}

/**
 * Grams of a form to weigh for a concentration and volume.
 * @customfunction GRAMS GRAMS
 * @helpurl https://localhost:3000/help/functions.html#grams
 * @param form Form to weigh, as on the bottle (e.g. "Na2HPO4·7H2O", "tris hydrochloride").
 * @param concentrationMm Concentration in the final solution, mM.
 * @param volumeMl Final volume, mL.
 * @param [purity] Assay of the reagent: a fraction (0.995), a percentage (99.5) or text ("99.5%"); blank: pure.
 * @param [userSubstances] Range of your own substances.
 * @returns Mass to weigh, g.
 */
export function grams(form: any, concentrationMm: any, volumeMl: any, purity?: any, userSubstances?: any[][]): number {
  return memoised('GRAMS', [form, concentrationMm, volumeMl, purity, userSubstances], () => {
    const found = libraryFor(userSubstances).findForm(toText('form', form));
    const mM = toNumber('concentrationMm', concentrationMm, { min: 0, max: MAX_AMOUNT_MM, allowed: `0 to ${MAX_AMOUNT_MM} mM` });
    const ml = toNumber('volumeMl', volumeMl, { min: 0, max: MAX_VOLUME_ML, allowed: `0 to ${MAX_VOLUME_ML} mL` });
    return ((mM / 1000) * (ml / 1000) * found.molarMass) / toPurity(purity);
  });
}

/**
 * Ionic strength of a solution, in mM, after its acid–base equilibria settle.
 * @customfunction IONIC.STRENGTH.MM IONIC.STRENGTH.MM
 * @helpurl https://localhost:3000/help/functions.html#ionic-strength-mm
 * @param composition Two columns: substance or form name, then amount in mM.
 * @param [temperatureC] Temperature in °C (blank: 25).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim".
 * @param [userSubstances] Range of your own substances.
 * @returns Ionic strength, mM.
 */
export function ionicStrengthMm(composition: any[][], temperatureC?: any, activityModel?: any, userSubstances?: any[][]): number {
  return memoised('IONIC.STRENGTH.MM', [composition, temperatureC, activityModel, userSubstances], () => speciate(solution(composition, temperatureC, activityModel, userSubstances)).ionicStrengthM * 1000);
}

/**
 * Ideal osmolarity, in mOsm/L: the sum of every dissolved particle with no osmotic coefficient (an osmometer reads lower).
 * @customfunction OSMOLARITY.IDEAL OSMOLARITY.IDEAL
 * @helpurl https://localhost:3000/help/functions.html#osmolarity-ideal
 * @param composition Two columns: substance or form name, then amount in mM.
 * @param [temperatureC] Temperature in °C (blank: 25).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim".
 * @param [userSubstances] Range of your own substances.
 * @returns Ideal osmolarity, mOsm/L.
 */
export function osmolarityIdeal(composition: any[][], temperatureC?: any, activityModel?: any, userSubstances?: any[][]): number {
  return memoised('OSMOLARITY.IDEAL', [composition, temperatureC, activityModel, userSubstances], () => idealOsmolarity(speciate(solution(composition, temperatureC, activityModel, userSubstances))) * 1000);
}

/**
 * Osmolality, in mOsm/kg: what a freezing-point osmometer reads, φ·Σm with the osmotic coefficient φ from the Pitzer equations.
 * @customfunction OSMOLALITY OSMOLALITY
 * @helpurl https://localhost:3000/help/functions.html#osmolality
 * @param composition Two columns: substance or form name, then amount in mM.
 * @param [temperatureC] Temperature in °C (blank: 25).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim" (sets the pH and so the species; φ is always Pitzer's).
 * @param [userSubstances] Range of your own substances.
 * @returns Osmolality, mOsm/kg.
 */
export function osmolality(composition: any[][], temperatureC?: any, activityModel?: any, userSubstances?: any[][]): number {
  return memoised('OSMOLALITY', [composition, temperatureC, activityModel, userSubstances], () => speciate(solution(composition, temperatureC, activityModel, userSubstances)).osmolalityMosmKg);
}

/**
 * Warnings about a solution's prediction, as one cell of text: "none", or how many and each in turn. Put it beside a PH cell: single-value results cannot carry their warnings.
 * @customfunction WARNINGS WARNINGS
 * @helpurl https://localhost:3000/help/functions.html#warnings
 * @param composition Two columns: substance or form name, then amount in mM.
 * @param [temperatureC] Temperature in °C (blank: 25).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim".
 * @param [userSubstances] Range of your own substances.
 * @returns "none", or the number of warnings followed by each.
 */
export function warnings(composition: any[][], temperatureC?: any, activityModel?: any, userSubstances?: any[][]): string {
  return memoised('WARNINGS', [composition, temperatureC, activityModel, userSubstances], () => {
    const s = setup(temperatureC, activityModel, userSubstances);
    const solved = compositionFrom(s.library, composition, s.temperatureC, s.model);
    const found = solutionWarnings(solved, speciate(solved));
    const fromMemory = solved.systems.filter((sys) => sys.totalM > 0 && s.library.findSystem(sys.name).steps.some((st) => !st.verified && st.source !== 'userDefined')).map((sys) => sys.name);
    if (fromMemory.length > 0) found.push(SHEET_MESSAGES.constantsFromMemory(fromMemory));
    if (found.length === 0) return 'none';
    return `${found.length} warning${found.length === 1 ? '' : 's'}: ${found.map((w, i) => `(${i + 1}) ${w}`).join(' ')}`;
  });
}

/**
 * Every species of a solution: name, concentration (mM), activity (mM) and charge. Spills a fixed 30 rows × 4 columns, header first, padded with blanks.
 * @customfunction SPECIES SPECIES
 * @helpurl https://localhost:3000/help/functions.html#species
 * @param composition Two columns: substance or form name, then amount in mM.
 * @param [temperatureC] Temperature in °C (blank: 25).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim".
 * @param [userSubstances] Range of your own substances.
 * @returns Table of species.
 */
export function species(composition: any[][], temperatureC?: any, activityModel?: any, userSubstances?: any[][]): any[][] {
  return memoised('SPECIES', [composition, temperatureC, activityModel, userSubstances], () => {
    const result = speciate(solution(composition, temperatureC, activityModel, userSubstances));
    if (result.species.length > SPECIES_TABLE_ROWS - 1) throw invalid(SHEET_MESSAGES.tooManySpecies(result.species.length, SPECIES_TABLE_ROWS - 1));
    const rows: (string | number)[][] = [[...SPECIES_TABLE_HEADER]];
    for (const sp of result.species) rows.push([sp.name, sp.concentrationM * 1000, sp.activity * 1000, sp.charge]);
    while (rows.length < SPECIES_TABLE_ROWS) rows.push(['', '', '', '']);
    return rows;
  });
}

/**
 * Names of every substance in the library (and your own), one per row, for drop-down lists. Spills the library's count plus one row per row of userSubstances, padded with blanks.
 * @customfunction SUBSTANCES SUBSTANCES
 * @helpurl https://localhost:3000/help/functions.html#substances
 * @param [userSubstances] Range of your own substances, listed after the library's.
 * @returns One column of names.
 */
export function substances(userSubstances?: any[][]): string[][] {
  return memoised('SUBSTANCES', [userSubstances], () => padColumn(libraryFor(userSubstances).list().map((r) => r.name), listLength('substances', userSubstances)));
}

/**
 * Names of every form on the shelf (salts, hydrates, free acids and bases), one per row, for drop-down lists of composition names. Spills the library's count plus one row per row of userSubstances, padded with blanks.
 * @customfunction FORMS FORMS
 * @helpurl https://localhost:3000/help/functions.html#forms
 * @param [userSubstances] Range of your own substances, whose forms are listed after the library's.
 * @returns One column of form names.
 */
export function forms(userSubstances?: any[][]): string[][] {
  return memoised('FORMS', [userSubstances], () => padColumn(formNames(libraryFor(userSubstances)), listLength('forms', userSubstances)));
}

function formNames(library: ReturnType<typeof libraryFor>): string[] {
  return library.records().flatMap((r) => r.forms.map((f) => f.name));
}

/**
 * Rows a SUBSTANCES or FORMS list spills: the built-in library's count plus one per row of
 * the user range, so the size follows from the arguments' shape alone.
 *
 * @param list - which list
 * @param userSubstances - the user range argument (only its row count matters)
 */
export function listLength(list: 'substances' | 'forms', userSubstances: unknown): number {
  const library = libraryFor(undefined);
  return (list === 'substances' ? library.list().length : formNames(library).length) + userRowCount(userSubstances);
}

function padColumn(names: readonly string[], rows: number): string[][] {
  const out = names.slice(0, rows).map((n) => [n]);
  while (out.length < rows) out.push(['']);
  return out;
}

/** Columns of RECIPE.ROW, in order; a recipe table's header row. */
export const RECIPE_ROW_HEADER = [
  'form (g)',
  'titrant (mL)',
  'titrant low (mL)',
  'titrant high (mL)',
  'meter reads (pH)',
  'pH at use',
  'base per 0.1 pH (mM)',
  'acid per 0.1 pH (mM)',
  'ionic strength (mM)',
  'ideal osmolarity (mOsm/L)',
  'warnings',
] as const;

/** Rows of the RECIPE sheet: fixed, so every host knows the spill size before computing. */
export const RECIPE_TABLE_ROWS = 48;
/** Columns of the RECIPE sheet. */
export const RECIPE_TABLE_HEADER = ['section', 'item', 'value', 'unit'] as const;

/**
 * The plan a RECIPE or RECIPE.ROW call asks for, from its arguments in the order both
 * declare them (one list, so the two functions cannot drift apart).
 */
function recipePlan(args: readonly any[], twoFormsAllowed: boolean): RecipePlan {
  const [buffer, targetPh, concentrationMm, volumeMl, form, titrant, titrantConcentrationM, useTemperatureC, benchTemperatureC, partVolumeFraction, salts, pKaUncertainty, titrantTolerancePercent, purity, activityModel, userSubstances] = args;
  return planRecipe(
    recipeInput(buffer, targetPh, concentrationMm, volumeMl, form, titrant, titrantConcentrationM, useTemperatureC, benchTemperatureC, partVolumeFraction, salts, pKaUncertainty, titrantTolerancePercent, purity, activityModel, twoFormsAllowed),
    libraryFor(userSubstances),
  );
}

/** The planner input a RECIPE or RECIPE.ROW call describes. */
function recipeInput(
  buffer: any, targetPh: any, concentrationMm: any, volumeMl: any, form: any, titrant: any, titrantConcentrationM: any,
  useTemperatureC: any, benchTemperatureC: any, partVolumeFraction: any, salts: any, pKaUncertainty: any, titrantTolerancePercent: any,
  purity: any, activityModel: any, twoFormsAllowed: boolean,
): RecipeInput {
  const useT = toTemperature('useTemperatureC', useTemperatureC);
  const formText = isBlank(form) ? undefined : toText('form', form);
  const pair = formText?.split(/\s+\+\s+/);
  const twoForms = pair !== undefined && pair.length === 2;
  if (twoForms && !twoFormsAllowed) throw invalid(SHEET_MESSAGES.oneFormOnly('form', formText!));
  const saltRows = isBlankRange(salts) ? [] : toRange(salts).filter((row) => !row.every(isBlank));
  const tolerance = toNumber('titrantTolerancePercent', titrantTolerancePercent, { default: DEFAULT_STOCK_TOLERANCE_PERCENT, min: 0, max: 50, allowed: '0 to 50 %' });
  return {
    buffer: toText('buffer', buffer),
    targetPh: toNumber('targetPh', targetPh, { min: 0, max: 14, allowed: '0 to 14' }),
    concentrationMm: toNumber('concentrationMm', concentrationMm, { min: 0.001, max: MAX_AMOUNT_MM, allowed: `0.001 to ${MAX_AMOUNT_MM} mM` }),
    volumeMl: toNumber('volumeMl', volumeMl, { min: 0.001, max: MAX_VOLUME_ML, allowed: `0.001 to ${MAX_VOLUME_ML} mL` }),
    useTemperatureC: useT,
    benchTemperatureC: isBlank(benchTemperatureC) ? useT : toTemperature('benchTemperatureC', benchTemperatureC),
    partVolumeFraction: toNumber('partVolumeFraction', partVolumeFraction, { default: DEFAULT_PART_VOLUME_FRACTION, min: 0.1, max: 1, allowed: '0.1 to 1' }),
    activityModel: toActivityModel('activityModel', activityModel),
    ...(isBlank(purity) ? {} : { formPurityPercent: toPurity(purity) * 100 }),
    ...(isBlank(pKaUncertainty) ? {} : { pKaUncertainty: toNumber('pKaUncertainty', pKaUncertainty, { min: 0, max: 1, allowed: '0 to 1 pH unit' }) }),
    salts: saltRows.map((row, i) => ({
      form: toText(`salts row ${i + 1}`, row[0]),
      concentrationMm: toNumber(`salts row ${i + 1} (mM)`, row[1], { min: 0, max: MAX_AMOUNT_MM, allowed: `0 to ${MAX_AMOUNT_MM} mM` }),
    })),
    ...(twoForms
      ? { route: 'two-forms' as const, acidForm: pair![0], baseForm: pair![1] }
      : {
          ...(formText === undefined ? {} : { form: formText }),
          ...(isBlank(titrant)
            ? {}
            : { titrant: { form: toText('titrant', titrant), concentrationM: toNumber('titrantConcentrationM', titrantConcentrationM, { default: 1, min: 1e-6, max: 30, allowed: 'above 0 up to 30 mol/L' }), tolerancePercent: tolerance } }),
        }),
  };
}

/**
 * One row of a recipe table: grams of the form, titrant mL with its band, what the meter must read at the bench, pH at use, capacity, ionic strength, ideal osmolarity and warnings. Spills 1 row × 11 columns.
 * @customfunction RECIPE.ROW RECIPE.ROW
 * @helpurl https://localhost:3000/help/functions.html#recipe-row
 * @param buffer Buffer system (e.g. "HEPES", "tris", "phosphate").
 * @param targetPh pH wanted at the temperature of use.
 * @param concentrationMm Buffer concentration in the final solution, mM.
 * @param volumeMl Final volume, mL.
 * @param [form] Form weighed (e.g. "HEPES free acid", "tris base"; blank: the plain form).
 * @param [titrant] Titrant form (e.g. "NaOH", "HCl"; blank: 1 M NaOH or HCl, whichever is needed).
 * @param [titrantConcentrationM] Titrant stock, mol/L (blank: 1).
 * @param [useTemperatureC] Temperature of use, °C (blank: 25).
 * @param [benchTemperatureC] Temperature at which the pH is adjusted, °C (blank: the temperature of use).
 * @param [partVolumeFraction] Fraction of the final volume in which the pH is adjusted (blank: 0.8).
 * @param [salts] Two columns: salt form and mM (e.g. "NaCl", 150).
 * @param [pKaUncertainty] pKa uncertainty for the titrant band, pH units (blank: the library's, or 0.02).
 * @param [titrantTolerancePercent] Tolerance of the titrant stock's concentration, % (blank: 1).
 * @param [purity] Purity (assay) of the form weighed, from its label or certificate: 0.995, 99.5 or "99.5%" (blank: pure).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim".
 * @param [userSubstances] Range of your own substances.
 * @returns One row of recipe figures.
 */
export function recipeRow(
  buffer: any, targetPh: any, concentrationMm: any, volumeMl: any, form?: any, titrant?: any, titrantConcentrationM?: any,
  useTemperatureC?: any, benchTemperatureC?: any, partVolumeFraction?: any, salts?: any[][], pKaUncertainty?: any, titrantTolerancePercent?: any,
  purity?: any, activityModel?: any, userSubstances?: any[][],
): any[][] {
  const args = [buffer, targetPh, concentrationMm, volumeMl, form, titrant, titrantConcentrationM, useTemperatureC, benchTemperatureC, partVolumeFraction, salts, pKaUncertainty, titrantTolerancePercent, purity, activityModel, userSubstances];
  return memoised('RECIPE.ROW', args, () => {
    const plan = recipePlan(args, false);
    const weighed = plan.components.find((c) => c.role === 'buffer');
    const t = plan.titration;
    const p = plan.predictions;
    return [[weighed?.grams ?? 0, t?.volumeMl ?? 0, t?.lowMl ?? 0, t?.highMl ?? 0, plan.meter.pH, p.pHAtUse, p.baseMmPerTenthPh, p.acidMmPerTenthPh, p.ionicStrengthM * 1000, p.idealOsmolarityMosm, plan.warnings.join(' ')]];
  });
}

/**
 * The whole recipe as a sheet: amounts, the meter reading, the titrant band, predictions, the bench steps, warnings and cautions. Spills a fixed 48 rows × 4 columns (section, item, value, unit), padded with blanks. Give "acid form + base form" as the form to weigh two forms instead of titrating.
 * @customfunction RECIPE RECIPE
 * @helpurl https://localhost:3000/help/functions.html#recipe
 * @param buffer Buffer system (e.g. "HEPES", "tris", "phosphate").
 * @param targetPh pH wanted at the temperature of use.
 * @param concentrationMm Buffer concentration in the final solution, mM.
 * @param volumeMl Final volume, mL.
 * @param [form] Form weighed (e.g. "tris base"), or two forms as "NaH2PO4·H2O + Na2HPO4·7H2O" (blank: the plain form).
 * @param [titrant] Titrant form (e.g. "NaOH", "HCl"; blank: 1 M NaOH or HCl, whichever is needed).
 * @param [titrantConcentrationM] Titrant stock, mol/L (blank: 1).
 * @param [useTemperatureC] Temperature of use, °C (blank: 25).
 * @param [benchTemperatureC] Temperature at which the pH is adjusted, °C (blank: the temperature of use).
 * @param [partVolumeFraction] Fraction of the final volume in which the pH is adjusted (blank: 0.8).
 * @param [salts] Two columns: salt form and mM (e.g. "NaCl", 150).
 * @param [pKaUncertainty] pKa uncertainty for the titrant band, pH units (blank: the library's, or 0.02).
 * @param [titrantTolerancePercent] Tolerance of the titrant stock's concentration, % (blank: 1).
 * @param [purity] Purity (assay) of the form weighed, of each for two forms: 0.995, 99.5 or "99.5%" (blank: pure).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim".
 * @param [userSubstances] Range of your own substances.
 * @returns The recipe, one line per row.
 */
export function recipe(
  buffer: any, targetPh: any, concentrationMm: any, volumeMl: any, form?: any, titrant?: any, titrantConcentrationM?: any,
  useTemperatureC?: any, benchTemperatureC?: any, partVolumeFraction?: any, salts?: any[][], pKaUncertainty?: any, titrantTolerancePercent?: any,
  purity?: any, activityModel?: any, userSubstances?: any[][],
): any[][] {
  const args = [buffer, targetPh, concentrationMm, volumeMl, form, titrant, titrantConcentrationM, useTemperatureC, benchTemperatureC, partVolumeFraction, salts, pKaUncertainty, titrantTolerancePercent, purity, activityModel, userSubstances];
  return memoised('RECIPE', args, () => {
    const plan = recipePlan(args, true);
    const p = plan.predictions;
    const rows: (number | string)[][] = [[...RECIPE_TABLE_HEADER]];
    rows.push(['recipe', `${plan.buffer}, ${plan.concentrationMm} mM, pH ${plan.targetPh} at ${p.useTemperatureC} °C`, plan.volumeMl, 'mL']);
    for (const c of plan.components) {
      if (c.grams !== undefined) rows.push(['amount', `${c.role}: ${c.name}`, c.grams, 'g']);
      else rows.push(['amount', c.role === 'water' ? 'water, to final volume' : `${c.role}: ${c.name}`, c.millilitres ?? 0, 'mL']);
    }
    rows.push(['meter', `reads while adjusting, at ${plan.meter.benchTemperatureC} °C in ${volumeText(plan.meter.partVolumeMl)}`, plan.meter.pH, 'pH']);
    if (plan.titration) {
      rows.push(['titrant', 'expected, low end', plan.titration.lowMl, 'mL']);
      rows.push(['titrant', 'expected, high end', plan.titration.highMl, 'mL']);
      rows.push(['titrant', 'safe first portion', plan.titration.firstPortionMl, 'mL']);
    }
    rows.push(['predicted', `pH at ${p.useTemperatureC} °C`, p.pHAtUse, 'pH']);
    rows.push(['predicted', `pH at ${plan.meter.benchTemperatureC} °C`, p.pHAtBench, 'pH']);
    rows.push(['predicted', 'ionic strength', p.ionicStrengthM * 1000, 'mM']);
    rows.push(['predicted', 'ideal osmolarity', p.idealOsmolarityMosm, 'mOsm/L']);
    rows.push(['predicted', 'strong base per +0.1 pH', p.baseMmPerTenthPh, 'mM']);
    rows.push(['predicted', 'strong acid per −0.1 pH', p.acidMmPerTenthPh, 'mM']);
    rows.push(['predicted', 'change with temperature', p.pHPerDegreeC, 'pH per °C']);
    rows.push(['predicted', 'after tenfold dilution', p.pHAfterTenfoldDilution, 'pH']);
    plan.steps.forEach((step, i) => rows.push(['step', String(i + 1), step, '']));
    for (const w of plan.warnings) rows.push(['warning', '', w, '']);
    for (const c of plan.cautions) rows.push(['caution', '', c, '']);
    if (rows.length > RECIPE_TABLE_ROWS) throw invalid(SHEET_MESSAGES.recipeTooLong(rows.length, RECIPE_TABLE_ROWS));
    while (rows.length < RECIPE_TABLE_ROWS) rows.push(['', '', '', '']);
    return rows;
  });
}

/** Size of a spilled result: rows × columns. */
export interface SpillShape {
  readonly rows: number;
  readonly columns: number;
}

/**
 * The size a spilling function's result will have, from the row counts of its arguments
 * alone (0 for an omitted argument). Every host can size the spill before computing it;
 * HyperFormula must. Undefined for functions that return one value.
 *
 * @param id - function id
 * @param argumentRows - row count of each argument as passed (1 for a single value)
 */
export function spillShape(id: string, argumentRows: readonly number[]): SpillShape | undefined {
  switch (id) {
    case 'SPECIES':
      return { rows: SPECIES_TABLE_ROWS, columns: SPECIES_TABLE_HEADER.length };
    case 'RECIPE':
      return { rows: RECIPE_TABLE_ROWS, columns: RECIPE_TABLE_HEADER.length };
    case 'RECIPE.ROW':
      return { rows: 1, columns: RECIPE_ROW_HEADER.length };
    case 'SUBSTANCES':
      return { rows: listLength('substances', new Array(argumentRows[0] ?? 0)), columns: 1 };
    case 'FORMS':
      return { rows: listLength('forms', new Array(argumentRows[0] ?? 0)), columns: 1 };
    default:
      return undefined;
  }
}
