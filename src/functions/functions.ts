/**
 * The worksheet function catalog. Each function is a thin adapter: arguments are coerced
 * (coerce.ts), names resolved through the substance library, the core called, and the
 * result shaped for a cell. The JSDoc blocks below are the single source of the function
 * metadata (`npm run metadata` → metadata.json); Excel and the formula engine both
 * register from that file. Functions throw on bad input; the hosts turn what they throw
 * into spreadsheet errors (errors.ts). Nothing here touches Office or a formula engine.
 *
 * In Excel every name carries the add-in's namespace (PROTON, set in manifest.xml):
 * `=PROTON.PH.OF(A2:B4)`.
 */

import {
  ChemError,
  MESSAGES,
  warning,
  apparentPKa,
  capacity,
  conductivityAt,
  solutionWarnings,
  idealOsmolarity,
  debyeHuckelA,
  pKaAt,
  solvePh,
  speciate,
  afterDilution,
  atTemperature,
} from '../chem';
import { titrantFromForm } from '../chem/library';
import { isBlank, isBlankRange, toActivityModel, toChoice, toField, toNumber, toPurity, toRange, toTemperature, toText } from './coerce';
import { recipeOptions } from './recipeOptions';
import { RECIPE_ROW_HEADER, recipeRowValues } from './recipeRow';
import { RecipeInput, RecipePlan, hydrateWarning, planRecipe } from '../chem/planner';
// From their modules rather than the planner's index: a re-exported name costs a getter per call in the CommonJS build (a grid cell calls them).
import { checkTitrantFits } from '../chem/planner/band';
import { DEFAULT_PART_VOLUME_FRACTION } from '../chem/planner/constants';
import { titrantForPh } from '../chem/titration';
import { volumeText } from '../chem/planner/protocol';
import { checkRowLimit, compositionFrom, formAlone } from './composition';
import { invalid } from './errors';
import { memoised } from './memo';
import { SHEET_MESSAGES } from './messages';
import { libraryFor, userRowCount } from './userRange';
import { MixInput, mixByVolumes, planMix, printedVolume, resolveShelf } from '../chem/mixing';
import { VOLUMES_ARGUMENT, onShelf, shelfFrom, targetsFrom, volumesFrom } from './stockRange';
import { BenchState, asMade, benchCorrection } from '../chem/batch';
import { AS_MADE_HEADER, AS_MADE_ROWS, TITRANT_NEXT_HEADER, asMadeTable, incompleteTable, readActualsRange, titrantNextRow, waitingRow } from './batch';

/** Most rows of the SPECIES table, header included. Excel spills only the rows a solution has; the formula engine, which sizes arrays before computing, pads to this (formulaEngine.ts). 29 species covers H⁺, OH⁻, the strong ions and several polyprotic systems. */
export const SPECIES_TABLE_ROWS = 30;
/** Columns of the SPECIES table. */
export const SPECIES_TABLE_HEADER = ['species', 'mM', 'activity (mM)', 'charge'] as const;

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
 * @customfunction PH.OF PH.OF
 * @helpurl https://localhost:3000/help/functions.html#ph-of
 * @param composition Two columns: substance or form name (e.g. "tris base", "Na2HPO4·7H2O", "NaCl"), then amount in mM. Blank rows are ignored.
 * @param [temperatureC] Temperature in °C (blank: 25).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim".
 * @param [userSubstances] Range of your own substances (see the help page for its columns).
 * @returns pH, as a calibrated meter would read it at that temperature.
 */
export function ph(composition: any[][], temperatureC?: any, activityModel?: any, userSubstances?: any[][]): number {
  return memoised('PH.OF', [composition, temperatureC, activityModel, userSubstances], () => solvePh(solution(composition, temperatureC, activityModel, userSubstances)));
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
export function titrantMl(
  form: any,
  concentrationMm: any,
  finalVolumeMl: any,
  targetPh: any,
  titrant: any,
  titrantConcentrationM: any,
  temperatureC?: any,
  activityModel?: any,
  salts?: any[][],
  userSubstances?: any[][],
): number {
  return memoised('TITRANT.ML', [form, concentrationMm, finalVolumeMl, targetPh, titrant, titrantConcentrationM, temperatureC, activityModel, salts, userSubstances], () => {
    const s = setup(temperatureC, activityModel, userSubstances);
    const formName = toText('form', form);
    const mM = toField('concentrationMm', concentrationMm);
    const volumeMl = toField('finalVolumeMl', finalVolumeMl);
    const target = toField('targetPh', targetPh);
    const stockM = toField('titrantConcentrationM', titrantConcentrationM);
    // Without other components the composition is the form alone: kept by its four values, it skips the range cache.
    checkRowLimit('salts', salts);
    const composition = isBlankRange(salts)
      ? formAlone(s.library, formName, mM / 1000, s.temperatureC, s.model)
      : compositionFrom(s.library, [[formName, mM], ...toRange(salts)], s.temperatureC, s.model);
    const t = titrantFromForm(s.library.findForm(toText('titrant', titrant)), s.library);
    const ml = (titrantForPh(composition, t, target).concentrationM * volumeMl) / stockM;
    // The same rule as a recipe's: the titrant must fit in the part volume the pH is adjusted in.
    checkTitrantFits(ml, volumeMl, DEFAULT_PART_VOLUME_FRACTION, stockM);
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
    const which = toChoice<'base' | 'acid' | 'beta'>(
      'measure',
      measure,
      { base: ['mmbase', 'basemm', 'mm', 'mm/0.1ph'], acid: ['mmacid', 'acidmm'], beta: ['β', 'm/ph', 'mperph', 'mol/l/ph'] },
      'base',
    );
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
    const factor = toField('dilutionFactor', dilutionFactor);
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
    if (record.steps.length === 0) throw invalid('noSuchStep', 'step', SHEET_MESSAGES.noSuchStep('step', record.name, 1, 0));
    const k = toNumber('step', step, { default: 1, min: 1, max: record.steps.length, integer: true, allowed: `whole numbers 1 to ${record.steps.length}` });
    const ionicStrengthM = toField('ionicStrengthMm', ionicStrengthMm) / 1000;
    const st = record.steps[k - 1];
    const pKa = pKaAt(st.pKa, st.deltaHkJ ?? 0, st.deltaCpJ ?? 0, s.temperatureC);
    return apparentPKa(s.model, pKa, record.chargeOfMostProtonated - (k - 1), ionicStrengthM, debyeHuckelA(s.temperatureC));
  });
}

/**
 * Grams of a form to weigh for a concentration and volume.
 * @customfunction GRAMS GRAMS
 * @helpurl https://localhost:3000/help/functions.html#grams
 * @param form Form to weigh, as on the bottle (e.g. "Na2HPO4·7H2O", "tris hydrochloride"); a name that leaves the hydrate open ("sodium phosphate dibasic") is the library's form under it, which WARNINGS names.
 * @param concentrationMm Concentration in the final solution, mM.
 * @param volumeMl Final volume, mL.
 * @param [purity] Assay of the reagent: a fraction (0.995), a percentage (99.5) or text ("99.5%"); blank: pure.
 * @param [userSubstances] Range of your own substances.
 * @returns Mass to weigh, g.
 */
export function grams(form: any, concentrationMm: any, volumeMl: any, purity?: any, userSubstances?: any[][]): number {
  return memoised('GRAMS', [form, concentrationMm, volumeMl, purity, userSubstances], () => {
    const found = libraryFor(userSubstances).findForm(toText('form', form));
    const mM = toField('amountMm', concentrationMm, 'concentrationMm');
    const ml = toField('volumeMl', volumeMl);
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
  return memoised(
    'IONIC.STRENGTH.MM',
    [composition, temperatureC, activityModel, userSubstances],
    () => speciate(solution(composition, temperatureC, activityModel, userSubstances)).ionicStrengthM * 1000,
  );
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
  return memoised(
    'OSMOLARITY.IDEAL',
    [composition, temperatureC, activityModel, userSubstances],
    () => idealOsmolarity(speciate(solution(composition, temperatureC, activityModel, userSubstances))) * 1000,
  );
}

/**
 * Conductivity of a solution, in mS/cm at the temperature given: what an uncompensated conductivity meter reads there (a meter compensating to 25 °C reads the value at 25). Ions with no published limiting conductivity get a stated default (see the help page).
 * @customfunction CONDUCTIVITY CONDUCTIVITY
 * @helpurl https://localhost:3000/help/functions.html#conductivity
 * @param composition Two columns: substance or form name, then amount in mM.
 * @param [temperatureC] Temperature of the reading in °C, 0 to 60 (blank: 25).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim" (for the speciation; the conductivity model is the same).
 * @param [userSubstances] Range of your own substances.
 * @returns Conductivity, mS/cm.
 */
export function conductivity(composition: any[][], temperatureC?: any, activityModel?: any, userSubstances?: any[][]): number {
  return memoised('CONDUCTIVITY', [composition, temperatureC, activityModel, userSubstances], () => {
    // The conductivity model covers 0–60 °C, a narrower range than the pH functions.
    const t = toField('conductivityTemperatureC', temperatureC, 'temperatureC');
    return conductivityAt(solution(composition, t, activityModel, userSubstances)).conductivityMsPerCm;
  });
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
  return memoised(
    'OSMOLALITY',
    [composition, temperatureC, activityModel, userSubstances],
    () => speciate(solution(composition, temperatureC, activityModel, userSubstances)).osmolalityMosmKg,
  );
}

/**
 * Warnings about a solution's prediction, as one cell of text: "none", or how many and each in turn. Put it beside a PH.OF cell: single-value results cannot carry their warnings.
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
    const fromMemory = solved.systems.filter((sys) => sys.totalM > 0 && s.library.findSystem(sys.name).steps.some((st) => st.checkedAgainst === 'memory')).map((sys) => sys.name);
    if (fromMemory.length > 0) found.push(warning('constantsFromMemory', MESSAGES.constantsFromMemory(fromMemory)));
    // A name that leaves the hydrate open is weighed (GRAMS) and counted as the library's form under it: say which.
    for (const row of toRange(composition)) {
      const name = row[0];
      if (typeof name !== 'string') continue;
      const w = hydrateWarning(s.library, name);
      if (w) found.push(w);
    }
    if (found.length === 0) return 'none';
    return `${found.length} warning${found.length === 1 ? '' : 's'}: ${found.map((w, i) => `(${i + 1}) ${w.message}`).join(' ')}`;
  });
}

/**
 * Every species of a solution: name, concentration (mM), activity (mM) and charge. Spills a header and one row per species (at most 29), 4 columns.
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
    if (result.species.length > SPECIES_TABLE_ROWS - 1)
      throw invalid('tooManySpecies', 'composition', SHEET_MESSAGES.tooManySpecies(result.species.length, SPECIES_TABLE_ROWS - 1));
    const rows: (string | number)[][] = [[...SPECIES_TABLE_HEADER]];
    for (const sp of result.species) rows.push([sp.name, sp.concentrationM * 1000, sp.activity * 1000, sp.charge]);
    return rows;
  });
}

/**
 * Names of every substance in the library (and your own), one per row, for drop-down lists. Spills one row per substance.
 * @customfunction SUBSTANCES SUBSTANCES
 * @helpurl https://localhost:3000/help/functions.html#substances
 * @param [userSubstances] Range of your own substances, listed after the library's.
 * @returns One column of names.
 */
export function substances(userSubstances?: any[][]): string[][] {
  return memoised('SUBSTANCES', [userSubstances], () =>
    column(
      libraryFor(userSubstances)
        .list()
        .map((r) => r.name),
    ),
  );
}

/**
 * Names of every form on the shelf (salts, hydrates, free acids and bases), one per row, for drop-down lists of composition names. Spills one row per form.
 * @customfunction FORMS FORMS
 * @helpurl https://localhost:3000/help/functions.html#forms
 * @param [userSubstances] Range of your own substances, whose forms are listed after the library's.
 * @returns One column of form names.
 */
export function forms(userSubstances?: any[][]): string[][] {
  return memoised('FORMS', [userSubstances], () => column(formNames(libraryFor(userSubstances))));
}

function formNames(library: ReturnType<typeof libraryFor>): string[] {
  return library.records().flatMap((r) => r.forms.map((f) => f.name));
}

/**
 * Most rows a SUBSTANCES or FORMS list can spill: the built-in library's count plus one per
 * row of the user range, so the size follows from the arguments' shape alone (what the
 * formula engine pads to).
 *
 * @param list - which list
 * @param userSubstances - the user range argument (only its row count matters)
 */
export function listLength(list: 'substances' | 'forms', userSubstances: unknown): number {
  const library = libraryFor(undefined);
  return (list === 'substances' ? library.list().length : formNames(library).length) + userRowCount(userSubstances);
}

function column(names: readonly string[]): string[][] {
  return names.map((n) => [n]);
}

export { RECIPE_ROW_HEADER } from './recipeRow';

/** Most rows of the RECIPE sheet, header included: Excel spills only the rows a recipe has; the formula engine pads to this. */
export const RECIPE_TABLE_ROWS = 48;
/** Columns of the RECIPE sheet. */
export const RECIPE_TABLE_HEADER = ['section', 'item', 'value', 'unit'] as const;

/**
 * The plan a RECIPE or RECIPE.ROW call asks for, from its arguments in the order both
 * declare them (one list, so the two functions cannot drift apart).
 */
function recipePlan(args: readonly any[]): RecipePlan {
  const [buffer, targetPh, concentrationMm, volumeMl, useTemperatureC, salts, options, userSubstances] = args;
  return planRecipe(recipeInput(buffer, targetPh, concentrationMm, volumeMl, useTemperatureC, salts, options), libraryFor(userSubstances));
}

/**
 * The planner input a RECIPE or RECIPE.ROW call describes: four required arguments, the
 * temperature of use and a salts range (the two things a recipe table varies by row), and
 * an options range for everything else. Every value is read by its field's one declaration
 * (src/chem/input), here and in the planner alike.
 */
function recipeInput(buffer: any, targetPh: any, concentrationMm: any, volumeMl: any, useTemperatureC: any, salts: any, options: any): RecipeInput {
  const { input: chosen, written } = recipeOptions(options);
  if (!isBlank(useTemperatureC) && written.has('useTemperatureC'))
    throw new ChemError('invalid-input', 'givenTwice', MESSAGES.givenTwice('useTemperatureC'), 'useTemperatureC', 'the argument or the option, once');
  checkRowLimit('salts', salts);
  const saltRows = isBlankRange(salts) ? [] : toRange(salts).filter((row) => !row.every(isBlank));
  if (saltRows.length > 0 && written.has('salts')) throw new ChemError('invalid-input', 'givenTwice', MESSAGES.givenTwice('salts'), 'salts', 'the argument or the option, once');
  const input: RecipeInput = {
    ...chosen,
    buffer: toText('buffer', buffer),
    targetPh: toField('targetPh', targetPh),
    concentrationMm: toField('concentrationMm', concentrationMm),
    volumeMl: toField('volumeMl', volumeMl),
    ...(isBlank(useTemperatureC) ? {} : { useTemperatureC: toField('useTemperatureC', useTemperatureC) }),
    ...(saltRows.length === 0
      ? {}
      : {
          salts: saltRows.map((row, i) => {
            if (row.length < 2) throw invalid('tooFewColumns', 'salts', SHEET_MESSAGES.tooFewColumns('salts', row.length, 'two: a salt form and its mM'), 'two columns');
            return { form: toText(`salts row ${i + 1}`, row[0]), concentrationMm: toField('saltMm', row[1], `salts row ${i + 1} (mM)`) };
          }),
        }),
  };
  // "acid form + base form" as the form weighed is the two-forms route.
  const pair = typeof input.form === 'string' ? input.form.split(/\s+\+\s+/) : undefined;
  if (pair && pair.length === 2 && (input.route === undefined || input.route === 'two-forms')) {
    const { form: _form, ...rest } = input;
    return { ...rest, route: 'two-forms', acidForm: pair[0], baseForm: pair[1] };
  }
  return input;
}

/**
 * One row of a recipe table on any route: grams of the form (of the acid and the base form, weighing two), titrant mL with its band, what the meter must read at the bench (of the stock itself, making a stock), pH at use, capacity, ionic strength, ideal osmolarity, osmolality (mOsm/kg), conductivity (mS/cm) at the temperature of use and at 25 °C, grams of a salt added to a target, stock per batch and warnings. Spills 1 row × 17 columns.
 * @customfunction RECIPE.ROW RECIPE.ROW
 * @helpurl https://localhost:3000/help/functions.html#recipe-row
 * @param buffer Buffer system (e.g. "HEPES", "tris", "phosphate").
 * @param targetPh pH wanted at the temperature of use.
 * @param concentrationMm Buffer concentration in the final solution, mM.
 * @param volumeMl Final volume, mL.
 * @param [useTemperatureC] Temperature of use, °C (blank: 25).
 * @param [salts] Two columns: salt form and mM (e.g. "NaCl", 150).
 * @param [options] Two columns: option name and value (e.g. "titrant", "NaOH"; "titrant.concentrationM", 5); the names are listed on the help page.
 * @param [userSubstances] Range of your own substances.
 * @returns One row of recipe figures.
 */
export function recipeRow(
  buffer: any,
  targetPh: any,
  concentrationMm: any,
  volumeMl: any,
  useTemperatureC?: any,
  salts?: any[][],
  options?: any[][],
  userSubstances?: any[][],
): any[][] {
  const args = [buffer, targetPh, concentrationMm, volumeMl, useTemperatureC, salts, options, userSubstances];
  return memoised('RECIPE.ROW', args, () => {
    return [recipeRowValues(recipePlan(args))];
  });
}

/**
 * The whole recipe as a sheet: amounts, the meter reading, the titrant band, predictions, the bench steps, warnings and cautions. Spills one row per line (at most 48) × 4 columns (section, item, value, unit). Give "acid form + base form" as the form option to weigh two forms instead of titrating.
 * @customfunction RECIPE RECIPE
 * @helpurl https://localhost:3000/help/functions.html#recipe
 * @param buffer Buffer system (e.g. "HEPES", "tris", "phosphate").
 * @param targetPh pH wanted at the temperature of use.
 * @param concentrationMm Buffer concentration in the final solution, mM.
 * @param volumeMl Final volume, mL.
 * @param [useTemperatureC] Temperature of use, °C (blank: 25).
 * @param [salts] Two columns: salt form and mM (e.g. "NaCl", 150).
 * @param [options] Two columns: option name and value (e.g. "form", "HEPES free acid"; "benchTemperatureC", 22); the names are listed on the help page.
 * @param [userSubstances] Range of your own substances.
 * @returns The recipe, one line per row.
 */
export function recipe(
  buffer: any,
  targetPh: any,
  concentrationMm: any,
  volumeMl: any,
  useTemperatureC?: any,
  salts?: any[][],
  options?: any[][],
  userSubstances?: any[][],
): any[][] {
  const args = [buffer, targetPh, concentrationMm, volumeMl, useTemperatureC, salts, options, userSubstances];
  return memoised('RECIPE', args, () => {
    const plan = recipePlan(args);
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
    rows.push(['predicted', `conductivity at ${p.useTemperatureC} °C`, p.conductivityMsPerCm, 'mS/cm']);
    if (p.useTemperatureC !== 25) rows.push(['predicted', 'conductivity at 25 °C', p.conductivity25MsPerCm, 'mS/cm']);
    rows.push(['predicted', 'strong base per +0.1 pH', p.baseMmPerTenthPh, 'mM']);
    rows.push(['predicted', 'strong acid per −0.1 pH', p.acidMmPerTenthPh, 'mM']);
    rows.push(['predicted', 'change with temperature', p.pHPerDegreeC, 'pH per °C']);
    rows.push(['predicted', 'after tenfold dilution', p.pHAfterTenfoldDilution, 'pH']);
    plan.steps.forEach((step, i) => rows.push(['step', String(i + 1), step, '']));
    for (const w of plan.warnings) rows.push(['warning', '', w.message, '']);
    for (const c of plan.cautions) rows.push(['caution', '', c, '']);
    if (rows.length > RECIPE_TABLE_ROWS) throw invalid('recipeTooLong', undefined, SHEET_MESSAGES.recipeTooLong(rows.length, RECIPE_TABLE_ROWS));
    return rows;
  });
}

/** Columns of the MIX.VOLUMES table. */
export const MIX_TABLE_HEADER = ['item', 'amount', 'unit', 'gives'] as const;
/** Option names MIX.VOLUMES takes in its options range, and the mix field each sets. */
const MIX_OPTIONS: Readonly<Record<string, string>> = {
  phtolerance: 'phTolerance',
  benchtemperaturec: 'benchTemperatureC',
  smallestvolumeul: 'smallestVolumeUl',
  titrant: 'titrant.form',
  'titrant.form': 'titrant.form',
  'titrant.concentrationm': 'titrant.concentrationM',
  activitymodel: 'activityModel',
};

/** The options range of MIX.VOLUMES as mix fields (values passed on for the core's reader). */
function mixOptions(options: unknown): Partial<MixInput> {
  const out: Record<string, unknown> = {};
  const titrant: Record<string, unknown> = {};
  for (const row of toRange(options)) {
    if (row.every(isBlank)) continue;
    const written = toText('options', row[0]);
    const name = MIX_OPTIONS[written.trim().toLowerCase().replace(/\s+/g, '')];
    if (!name) {
      const allowed = [...new Set(Object.values(MIX_OPTIONS))].join(', ');
      throw new ChemError('invalid-input', 'unknownField', MESSAGES.unknownField(written, [], allowed), written, allowed);
    }
    const value = row.length > 1 && !isBlank(row[1]) ? row[1] : undefined;
    if (name.startsWith('titrant.')) titrant[name.slice(8)] = value;
    else out[name] = value;
  }
  return Object.keys(titrant).length > 0 ? { ...out, titrant } : out;
}

/**
 * A working buffer mixed from your stock solutions: mL of each stock (g of a solid additive), the pH correction when a target pH is missed, water, and the predicted pH at use and at the bench. Spills (targets + 5) rows × 4 columns (item, amount, unit, gives).
 * @customfunction MIX.VOLUMES MIX.VOLUMES
 * @helpurl https://localhost:3000/help/functions.html#mix-volumes
 * @param stocks Your stock shelf: name, form (or additive), concentration ("1 M", "50 %"), and for stocks made by titration the titrant, pH and its temperature.
 * @param targets Two columns: component (a stock or what it holds) and final mM (or "10 %" for an additive).
 * @param volumeMl Final volume, mL.
 * @param [targetPh] pH wanted at the temperature of use (blank: no correction).
 * @param [useTemperatureC] Temperature of use, °C (blank: 25).
 * @param [options] Two columns: option name and value (phTolerance, benchTemperatureC, smallestVolumeUl, titrant, titrant.concentrationM, activityModel).
 * @param [userSubstances] Range of your own substances.
 * @returns The mix, one line per row.
 */
export function mixVolumes(stocks: any[][], targets: any[][], volumeMl: any, targetPh?: any, useTemperatureC?: any, options?: any[][], userSubstances?: any[][]): any[][] {
  const args = [stocks, targets, volumeMl, targetPh, useTemperatureC, options, userSubstances];
  return memoised('MIX.VOLUMES', args, () => {
    const shelf = shelfFrom(stocks);
    const input: MixInput = {
      ...mixOptions(options),
      stocks: shelf.stocks,
      targets: targetsFrom(targets),
      volumeMl,
      ...(isBlank(targetPh) ? {} : { targetPh }),
      ...(isBlank(useTemperatureC) ? {} : { useTemperatureC }),
    };
    const plan = onShelf(shelf.rows, () => planMix(input, libraryFor(userSubstances)));
    const rows: (number | string)[][] = [[...MIX_TABLE_HEADER]];
    for (const c of plan.components) {
      if (c.role === 'titrant' || c.role === 'water') continue;
      if (c.millilitres !== undefined) rows.push([c.name, printedVolume(c.millilitres), 'mL', c.finalText ?? '']);
      else rows.push([c.name, Number((c.grams ?? 0).toPrecision(4)), 'g', c.finalText ?? '']);
    }
    const correction = plan.components.find((c) => c.role === 'titrant');
    rows.push(
      correction ? [`pH correction: ${correction.name}`, printedVolume(correction.millilitres ?? 0), 'mL', `to pH ${plan.targetPh}`] : ['pH correction: none', 0, 'mL', ''],
    );
    const water = plan.components.find((c) => c.role === 'water');
    rows.push(['water, to final volume', printedVolume(water?.millilitres ?? 0), 'mL', '']);
    rows.push([`predicted pH at ${plan.useTemperatureC} °C`, plan.predictions.pHAtUse, 'pH', '']);
    rows.push([`predicted pH at ${plan.benchTemperatureC} °C (bench)`, plan.predictions.pHAtBench, 'pH', '']);
    return rows;
  });
}

/**
 * The as-made check of a batch: from the actual amounts (grams of each form with the lot's purity, titrant mL at its standardised strength, the volume made up to, the bench temperature, readings), what was made, against the plan, with pass/fail. Spills one row per check (at most 24) × 6 columns (check, planned, as made, deviation, tolerance, result); the last row is the batch's verdict.
 * @customfunction AS.MADE AS.MADE
 * @helpurl https://localhost:3000/help/functions.html#as-made
 * @param buffer Buffer system (e.g. "HEPES", "tris", "phosphate").
 * @param targetPh pH wanted at the temperature of use.
 * @param concentrationMm Buffer concentration in the final solution, mM.
 * @param volumeMl Final volume, mL.
 * @param actuals Two or three columns: a form's name, grams weighed and the lot's purity; or a field and its value (e.g. "actual.titrantMl", 5.6; "tolerance.ph", 0.05); the fields are listed on the help page.
 * @param [useTemperatureC] Temperature of use, °C (blank: 25).
 * @param [salts] Two columns: salt form and mM (e.g. "NaCl", 150).
 * @param [options] Two columns: option name and value, as for RECIPE.
 * @param [userSubstances] Range of your own substances.
 * @returns The checks, one per row, and the verdict.
 */
export function asMadeCheck(
  buffer: any,
  targetPh: any,
  concentrationMm: any,
  volumeMl: any,
  actuals: any[][],
  useTemperatureC?: any,
  salts?: any[][],
  options?: any[][],
  userSubstances?: any[][],
): any[][] {
  const args = [buffer, targetPh, concentrationMm, volumeMl, useTemperatureC, salts, options, userSubstances];
  return memoised('AS.MADE', [...args, actuals], () => {
    const plan = recipePlan(args);
    const read = readActualsRange(actuals);
    const incomplete = incompleteTable(plan, read);
    if (incomplete) return incomplete;
    return asMadeTable(asMade(plan, { ...read.actuals, weighed: read.weighed }, read.tolerances, libraryFor(userSubstances)));
  });
}

/**
 * Predicted pH of stocks mixed by volume and made up to a final volume with water.
 * @customfunction MIX.PH MIX.PH
 * @helpurl https://localhost:3000/help/functions.html#mix-ph
 * @param stocks Your stock shelf (as for MIX.VOLUMES).
 * @param volumes Two columns: stock name and mL.
 * @param finalVolumeMl Final volume, mL.
 * @param [temperatureC] Temperature, °C (blank: 25).
 * @param [activityModel] "pitzer" (blank), "davies", "ideal" or "bates-guggenheim".
 * @param [userSubstances] Range of your own substances.
 * @returns pH.
 */
export function mixPh(stocks: any[][], volumes: any[][], finalVolumeMl: any, temperatureC?: any, activityModel?: any, userSubstances?: any[][]): number {
  const args = [stocks, volumes, finalVolumeMl, temperatureC, activityModel, userSubstances];
  return memoised('MIX.PH', args, () => {
    const s = setup(temperatureC, activityModel, userSubstances);
    const read = shelfFrom(stocks);
    const shelf = onShelf(read.rows, () => resolveShelf(read.stocks, s.library, s.model));
    const list = volumesFrom(volumes);
    const finalMl = toField('finalVolumeMl', finalVolumeMl);
    const takenMl = list.reduce((sum, v) => sum + v.millilitres, 0);
    if (takenMl > finalMl)
      throw new ChemError(
        'infeasible-target',
        'stocksDoNotFit',
        MESSAGES.stocksDoNotFit(takenMl, finalMl, list.map((v) => `${v.stock} ${v.millilitres} mL`).join(', ')),
        VOLUMES_ARGUMENT,
        `at most ${finalMl} mL in all`,
      );
    return solvePh(mixByVolumes(shelf, list, finalMl, s.temperatureC, s.model).composition);
  });
}

/**
 * What to add next at the bench: from the recipe, the titrant added so far and what the meter reads now, how much more titrant (or which counter-titrant, and how much) reaches the end point, with a safe first portion; off the plan's band it says so, works from the reading and names the likely causes. Spills 1 row × 6 columns (add, next mL, first portion mL, end-point reading, reading expected now, note).
 * @customfunction TITRANT.NEXT TITRANT.NEXT
 * @helpurl https://localhost:3000/help/functions.html#titrant-next
 * @param buffer Buffer system (e.g. "HEPES", "tris", "phosphate").
 * @param targetPh pH wanted at the temperature of use.
 * @param concentrationMm Buffer concentration in the final solution, mM.
 * @param volumeMl Final volume, mL.
 * @param titrantAddedMl Titrant added so far, mL (all portions together; blank: waits for a reading).
 * @param readingPh What the meter reads now (blank: waits for a reading).
 * @param [useTemperatureC] Temperature of use, °C (blank: 25).
 * @param [salts] Two columns: salt form and mM (e.g. "NaCl", 150).
 * @param [options] Two columns: option name and value, as for RECIPE.
 * @param [actuals] Two or three columns, as for AS.MADE: forms weighed (blank: as planned), "reading.temperatureC", "reading.volumeMl", "actual.titrantConcentrationM", "counterTitrant.form".
 * @param [userSubstances] Range of your own substances.
 * @returns One row: what to add, how much, the first portion, and the readings.
 */
export function titrantNext(
  buffer: any,
  targetPh: any,
  concentrationMm: any,
  volumeMl: any,
  titrantAddedMl: any,
  readingPh: any,
  useTemperatureC?: any,
  salts?: any[][],
  options?: any[][],
  actuals?: any[][],
  userSubstances?: any[][],
): any[][] {
  const args = [buffer, targetPh, concentrationMm, volumeMl, useTemperatureC, salts, options, userSubstances];
  return memoised('TITRANT.NEXT', [...args, titrantAddedMl, readingPh, actuals], () => {
    const plan = recipePlan(args);
    const read = readActualsRange(actuals);
    // A record sheet asks before the bench has read the meter: a blank amount or reading waits, it is not an error.
    if (isBlank(titrantAddedMl) || isBlank(readingPh)) return [waitingRow(plan)];
    const state: BenchState = {
      ...read.bench,
      ...(read.actuals.titrantConcentrationM === undefined ? {} : { titrantConcentrationM: read.actuals.titrantConcentrationM }),
      ...(read.weighed.length > 0 ? { weighed: read.weighed } : {}),
      titrantMl: toField('actual.titrantMl', titrantAddedMl, 'titrantAddedMl'),
      readingPh: toField('reading.ph', readingPh, 'readingPh'),
    };
    return [titrantNextRow(benchCorrection(plan, state, libraryFor(userSubstances)))];
  });
}

/** Size of a spilled result: rows × columns. */
export interface SpillShape {
  readonly rows: number;
  readonly columns: number;
}

/**
 * The most a spilling function's result can hold, from the row counts of its arguments
 * alone (0 for an omitted argument). Excel sizes a spill when the result comes back, so the
 * functions return only the rows they have; HyperFormula sizes arrays before computing, so
 * its registration (formulaEngine.ts) pads every result to this shape. Undefined for
 * functions that return one value.
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
    case 'MIX.VOLUMES':
      return { rows: 1 + (argumentRows[1] ?? 0) + 4, columns: MIX_TABLE_HEADER.length };
    case 'AS.MADE':
      return { rows: AS_MADE_ROWS, columns: AS_MADE_HEADER.length };
    case 'TITRANT.NEXT':
      return { rows: 1, columns: TITRANT_NEXT_HEADER.length };
    case 'SUBSTANCES':
      return { rows: listLength('substances', new Array(argumentRows[0] ?? 0)), columns: 1 };
    case 'FORMS':
      return { rows: listLength('forms', new Array(argumentRows[0] ?? 0)), columns: 1 };
    default:
      return undefined;
  }
}
