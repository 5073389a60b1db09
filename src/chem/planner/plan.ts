/**
 * The recipe planner: from a target (buffer, concentration, pH at the temperature of use,
 * volume, salt) to what to weigh, what to pour, what the meter must read at the bench
 * temperature and part volume, and what to expect of the finished buffer.
 *
 * Method: the finished buffer is fixed by the target at the temperature of use; the
 * titrant (or the split between two forms) follows directly from the charge balance at
 * the target pH (titration.ts). The meter reading is the pH of the same solution at the
 * bench temperature with every concentration raised by 1/(part-volume fraction), because
 * at adjustment everything weighed and titrated sits in that smaller volume. A stock is
 * the finished buffer times its fold, so its dilution lands on target by construction.
 * A salt target is met by bisection on the salt concentration (ionic strength, ideal
 * osmolarity and conductivity rise with salt), re-solving the titrant at each step.
 */
import { ActivityModel } from '../activity';
import { MAX_TITRANT_M, readChoiceField, readNumberField, readPurityField, readSaltsField, readTextField, requireNumberField } from '../input';
import { capacityOfPrepared, scaleComposition } from '../capacity';
import { BUFFERING_HALF_WIDTH, metalComplexWarning, weakBufferingWarning } from '../checks';
import { ChemWarning, uniqueWarnings, warning } from '../warnings';
import { AcidBaseSystem, Composition, prepare, systemAt, withConditions } from '../composition';
import { ChemError, MESSAGES } from '../errors';
import { SOURCES } from '../library/sources';
import { LibraryForm, SubstanceRecord } from '../library/types';
import { SubstanceLibrary, defaultLibrary } from '../library/lookup';
import { titrantFromForm } from '../library/titrant';
import { nameKey } from '../library/names';
import { CONDUCTIVITY_MAX_C, CONDUCTIVITY_MIN_C, conductivityAt, conductivityOf } from '../conductivity';
import { idealOsmolarity } from '../osmolarity';
import { report, speciate, solvePh, solvePrepared } from '../speciation';
import { findStrongIon } from '../strongIons';
import { Titrant, titrantForPh, withTitrant } from '../titration';
import { temperatureWarnings } from '../temperatureChecks';
import { pKaAt } from '../vantHoff';
import { RecipeComponent, RecipeInput, RecipePlan, RecipeRoute, TitrationPlan } from './types';
import { cautionsFor, protocolSteps, volumeText } from './protocol';

/** pKa uncertainty used where the library gives none: published tables scatter by about ±0.01–0.02 (common practice, e.g. tris 8.06–8.08). */
export const DEFAULT_PKA_UNCERTAINTY = 0.02;
/** Stock tolerance used where the user gives none, %: common practice for a volumetric standard solution. */
export const DEFAULT_STOCK_TOLERANCE_PERCENT = 1;
/** Part of the final volume in which the pH is adjusted, by default (common practice: 70–90 %). */
export const DEFAULT_PART_VOLUME_FRACTION = 0.8;
/** The first titrant portion is this share of the low end of the band, so it cannot overshoot. */
export const FIRST_PORTION_SHARE = 0.9;
/** Warn when the target is further than this from every pKa (the core's rule, re-exported for the planner's users). */
export { BUFFERING_HALF_WIDTH };
/** Below this total titrant volume (mL) the pH cannot be approached in portions: about two drops (one drop ≈ 0.05 mL, common practice). */
export const SMALLEST_TITRANT_ML = 0.1;
/** A target this close to the unadjusted solution's pH needs no titrant: half the 0.01 resolution of a bench pH meter (common practice). */
export const NO_TITRANT_PH = 0.005;
/** Largest dilution of a titrant stock the planner advises (1 M to 1 mM); a smaller amount means the target is practically reached already. */
export const MAX_STOCK_DILUTION_ADVICE = 1000;
/** A titrant should take at most this share of the final volume (common practice: a tenth keeps the dilution and the volume error small). */
export const COMFORTABLE_TITRANT_SHARE = 0.1;
/** Below this mass a weighing is poor on an analytical balance, g (common practice: about 10 mg at 0.1 mg readability). */
export const SMALLEST_GOOD_WEIGHING_G = 0.01;
/** Largest dilution fold for a stock (declared with the other input limits). */
export { MAX_STOCK_FOLD } from '../input';
/** Largest salt concentration the salt-target search tries, mol/L (beyond any buffer recipe). */
const MAX_SALT_TARGET_M = 5;
/** Bisection steps for a salt target: 60 halvings of 5 M reach 4e-18 M. */
const SALT_TARGET_STEPS = 60;
/** Step for dpH/dT by central difference, °C. */
const DPH_DT_STEP_C = 0.5;

/** How each salt-target goal is named in messages, with its unit. */
const SALT_TARGET_WHAT: Readonly<Record<SaltGoal, (readAtC: number) => string>> = {
  ionicStrength: () => 'ionic strength (mol/L)',
  osmolarity: () => 'ideal osmolarity (mOsm/L)',
  osmolality: () => 'osmolality (mOsm/kg)',
  conductivity: (readAtC) => `conductivity (mS/cm at ${readAtC} °C)`,
};

/** What a salt target reaches. */
type SaltGoal = 'ionicStrength' | 'osmolarity' | 'osmolality' | 'conductivity';

/** Warnings about the activity model's range: a stock's own bear on its meter reading. */
const ACTIVITY_RANGE_CODES: ReadonlySet<string> = new Set(['beyondActivityModel', 'beyondPitzerRange', 'pitzerFallback', 'pitzerTemperature']);

/** The numbers a route fixes: the finished buffer and how it was put together. */
interface RouteResult {
  readonly composition: Composition;
  /** Forms weighed with their concentrations in the solution made, mol/L. */
  readonly weighed: readonly { readonly role: RecipeComponent['role']; readonly form: LibraryForm; readonly concentrationM: number; readonly toTarget?: true }[];
  readonly titrant?: {
    readonly form: LibraryForm;
    readonly titrant: Titrant;
    readonly concentrationM: number;
    readonly stock: { concentrationM: number; tolerancePercent: number };
    /** The solution before any titrant. */
    readonly before: Composition;
  };
  /** pH of the weighed forms and salts before any titrant (titrate route). */
  readonly unadjustedPh?: number;
}

/** Validated, defaulted input. */
interface Settled {
  readonly input: RecipeInput;
  readonly library: SubstanceLibrary;
  readonly system: SubstanceRecord;
  readonly route: RecipeRoute;
  readonly targetPh: number;
  readonly useT: number;
  readonly benchT: number;
  readonly concentrationM: number;
  readonly volumeL: number;
  readonly partFraction: number;
  readonly model: ActivityModel;
  readonly salts: readonly { form: LibraryForm; concentrationM: number }[];
  /** The titrant stock given; without a form, NaOH or HCl (whichever is needed) at that concentration. */
  readonly titrant?: { readonly form?: string; readonly concentrationM: number; readonly tolerancePercent: number };
  readonly stock?: { readonly fold: number; readonly volumeMl?: number };
  /** The salt added to a target: its form, what it reaches (mol/L of ionic strength, mOsm/L, or mS/cm read at readAtC °C). */
  readonly saltTarget?: { readonly form: LibraryForm; readonly kind: SaltGoal; readonly goal: number; readonly readAtC: number };
  readonly pKaUncertainty?: number;
  /** A titrant of the buffer system itself: state the total it makes, or hold the stated total. */
  readonly titrantInBuffer: 'state' | 'hold';
  readonly formPurityPercent?: number;
  readonly purityPercent: readonly { readonly key: string; readonly percent: number }[];
}

/**
 * Plans a buffer recipe.
 *
 * @param input - the target and what is on the shelf (units in the field names)
 * @param library - substance library (default: the built-in one; pass createLibrary(user) for user substances)
 * @returns amounts, the bench protocol, the meter reading, predictions, warnings and cautions
 * @throws ChemError invalid-input (naming the field) or infeasible-target
 * @example planRecipe({ buffer: 'HEPES', targetPh: 7.4, concentrationMm: 25, volumeMl: 500, form: 'HEPES free acid', titrant: { form: 'NaOH', concentrationM: 1 } }).titration?.volumeMl
 */
export function planRecipe(input: RecipeInput, library: SubstanceLibrary = defaultLibrary()): RecipePlan {
  const s = settle(input, library);
  const base = solveWithSaltTarget(s);
  const fold = s.stock?.fold ?? 1;
  const stockVolumeL = s.stock ? (s.stock.volumeMl ?? s.volumeL * 1000) / 1000 : s.volumeL;

  // What is physically made on the bench: the finished buffer, or the stock (fold × it).
  const made = fold === 1 ? base : scaleRoute(base, fold);
  const madeVolumeL = stockVolumeL;
  const finished = base.composition;

  // Each composition below is solved once: a speciation made for one figure gives the others their pH.
  const atMeter = withConditions(scaleComposition(made.composition, 1 / s.partFraction), s.benchT);
  const meterSpeciation = fold === 1 ? undefined : speciate(atMeter);
  // A stock's own activity warnings (past the model's range, ions without Pitzer parameters) bear on the meter reading.
  const stockWarnings = meterSpeciation ? meterSpeciation.warnings.filter((w) => ACTIVITY_RANGE_CODES.has(w.code)).map((w) => warning(w.code, MESSAGES.stockAtMeter(fold, w.message), w.field)) : [];
  const meterPh = meterSpeciation ? meterSpeciation.pH : solvePh(atMeter);
  // The stock as made, at the temperature of use: its pH and conductivity (the stock route only).
  // Adjusted in the full volume at the temperature of use, the meter reads the stock itself.
  const meterReadsStock = s.partFraction === 1 && s.benchT === s.useT;
  const stockSpeciation = s.route !== 'stock' ? undefined : meterReadsStock && meterSpeciation ? meterSpeciation : speciate(made.composition);
  const titration = made.titrant ? titrationPlan(s, made, madeVolumeL, stockSpeciation?.pH) : undefined;
  if (titration) checkTitrantFits(titration.volumeMl, madeVolumeL * 1000, s.partFraction, titration.stockM);

  const prepared = prepare(finished);
  const state = solvePrepared(prepared, s.targetPh);
  const result = report(prepared, state, finished);
  const cap = capacityOfPrepared(prepared, state.pH);
  // One criterion for weak buffering everywhere: the apparent pKa′ of the finished buffer at its own ionic strength and temperature (checks.ts).
  const weak = weakBufferingWarning(result);
  const warnings: ChemWarning[] = [...result.warnings, ...(weak ? [weak] : []), ...stockWarnings];
  const conductivity = conductivityOf(result);
  warnings.push(...conductivity.warnings);
  const predictions = {
    useTemperatureC: s.useT,
    pHAtUse: result.pH,
    // With nothing scaled (no stock, adjusted in the full volume) the meter reads the finished buffer at the bench temperature.
    pHAtBench: fold === 1 && s.partFraction === 1 ? meterPh : solvePh(withConditions(finished, s.benchT)),
    ionicStrengthM: result.ionicStrengthM,
    idealOsmolarityMosm: idealOsmolarity(result) * 1000,
    osmolalityMosmKg: result.osmolalityMosmKg,
    baseMmPerTenthPh: cap.baseMmPerTenthPh,
    acidMmPerTenthPh: cap.acidMmPerTenthPh,
    betaMPerPh: cap.betaMPerPh,
    pHPerDegreeC: dpHdT(finished, s.useT),
    pHAfterTenfoldDilution: solvePh(scaleComposition(finished, 0.1)),
    conductivityMsPerCm: conductivity.conductivityMsPerCm,
    conductivity25MsPerCm: s.useT === 25 ? conductivity.conductivityMsPerCm : conductivityAt(finished, 25).conductivityMsPerCm,
  };

  const components = componentsOf(s, made, madeVolumeL, titration);
  const stockKappa = stockSpeciation ? conductivityOf(stockSpeciation) : undefined;
  const stock =
    stockKappa && stockSpeciation
      ? {
          fold,
          stockVolumeMl: madeVolumeL * 1000,
          stockPhAtUse: stockSpeciation.pH,
          stockPerBatchMl: (s.volumeL * 1000) / fold,
          waterPerBatchMl: s.volumeL * 1000 * (1 - 1 / fold),
          stockConductivityMsPerCm: stockKappa.conductivityMsPerCm,
          stockConductivity25MsPerCm: s.useT === 25 ? stockKappa.conductivityMsPerCm : conductivityAt(made.composition, 25).conductivityMsPerCm,
        }
      : undefined;

  if (stockKappa) warnings.push(...stockKappa.warnings.map((w) => warning(w.code, MESSAGES.ofTheStock(w.message), w.field)));
  warnings.push(...planWarnings(s, made, components, madeVolumeL, titration));
  warnings.push(...hydrateWarnings(input, s.library));
  const sharedTotal = titrantTotalWarning(s, base);
  if (sharedTotal) warnings.push(sharedTotal);
  const metals = metalComplexWarning(finished);
  if (metals) warnings.push(metals);
  // The temperature of use and the bench temperature, each against the constants' data (the same messages when equal are merged by dedupe).
  warnings.push(...temperatureWarnings(finished.systems, s.useT, 'The temperature of use', s.targetPh));
  if (s.benchT !== s.useT) warnings.push(...temperatureWarnings(finished.systems, s.benchT, 'The bench temperature', meterPh));
  const constants = s.system.steps.map((step) => ({
    pKa25: step.pKa,
    pKaAtUse: pKaAt(step.pKa, step.deltaHkJ ?? 0, step.deltaCpJ ?? 0, s.useT),
    source: `${SOURCES[step.source]}${step.entry ? `, entry ${step.entry}` : ''}${step.checkedAgainst === 'memory' ? ' (written from memory, not yet checked against a copy of the source)' : ''}`,
  }));
  const meter = { pH: meterPh, benchTemperatureC: s.benchT, partVolumeMl: madeVolumeL * 1000 * s.partFraction, partVolumeFraction: s.partFraction };
  const plan: RecipePlan = {
    route: s.route,
    buffer: s.system.name,
    targetPh: s.targetPh,
    concentrationMm: s.concentrationM * 1000,
    volumeMl: s.volumeL * 1000,
    activityModel: s.model,
    components,
    ...(titration ? { titration } : {}),
    meter,
    ...(stock ? { stock } : {}),
    predictions,
    steps: [],
    warnings: uniqueWarnings(warnings),
    cautions: cautionsFor(made.weighed.map((w) => w.form).concat(made.titrant ? [made.titrant.form] : [])),
    constants,
    composition: finished,
    ...(base.unadjustedPh === undefined ? {} : { unadjustedPh: base.unadjustedPh }),
  };
  return { ...plan, steps: protocolSteps(plan) };
}


/**
 * The acid–base system a recipe buffers with, by the name given. Throws ChemError: the
 * library's unknownSubstance (with the nearest names), or outOfRange (code `outOfRange`)
 * when the name is a strong electrolyte such as NaCl or HCl.
 *
 * @param library - the substance library (the user's substances included)
 * @param name - the buffer as typed
 */
export function bufferSystemOf(library: SubstanceLibrary, name: unknown): SubstanceRecord {
  let system: SubstanceRecord;
  try {
    system = library.findSystem(name as string, 'buffer');
  } catch (e) {
    // A strong electrolyte named as the buffer (NaCl, HCl, or a form of one such as CaCl2·2H2O,
    // which adds no acid–base system) gets a message that says so.
    const key = typeof name === 'string' ? nameKey(name) : '';
    const strong = library.records().some((r) => r.kind === 'strong' && [r.name, ...r.aliases].some((n) => nameKey(n) === key)) || addsNoSystem(library, name);
    if (!strong) throw e;
    throw new ChemError('invalid-input', 'outOfRange', MESSAGES.outOfRange('buffer', name, 'an acid–base buffer system (this is a strong electrolyte: add it as a salt)'), 'buffer', 'an acid–base buffer system');
  }
  if (system.kind !== 'acid-base') {
    throw new ChemError('invalid-input', 'outOfRange', MESSAGES.outOfRange('buffer', name, 'an acid–base buffer system'), 'buffer', 'an acid–base buffer system');
  }
  return system;
}

/** True when the name is a form on the shelf that adds no acid–base system (a salt such as CaCl2·2H2O). */
function addsNoSystem(library: SubstanceLibrary, name: unknown): boolean {
  try {
    return library.findForm(name as string).adds.length === 0;
  } catch {
    return false;
  }
}

/** Validates the input and fills defaults: every field read by its one declaration (src/chem/input). */
function settle(input: RecipeInput, library: SubstanceLibrary): Settled {
  if (input === null || typeof input !== 'object') {
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('recipe', 'a recipe input object'), 'recipe', 'an object');
  }
  const system = bufferSystemOf(library, readTextField('buffer', input.buffer));
  const route = readChoiceField('route', input.route) as RecipeRoute;
  const useT = requireNumberField('useTemperatureC', input.useTemperatureC);
  const salts = readSaltsField(input.salts).map((salt, i) => ({
    form: library.findForm(salt.form, typeof input.salts === 'string' ? 'salts' : `salts[${i}].form`),
    concentrationM: salt.concentrationMm / 1000,
  }));
  const titrant = input.titrant === undefined ? undefined : settleTitrant(input.titrant);
  const stock = route === 'stock' ? { fold: requireNumberField('stock.fold', input.stock?.fold), volumeMl: readNumberField('stock.volumeMl', input.stock?.volumeMl) } : undefined;
  return {
    input,
    library,
    system,
    route,
    targetPh: requireNumberField('targetPh', input.targetPh),
    useT,
    benchT: readNumberField('benchTemperatureC', input.benchTemperatureC) ?? useT,
    concentrationM: requireNumberField('concentrationMm', input.concentrationMm) / 1000,
    volumeL: requireNumberField('volumeMl', input.volumeMl) / 1000,
    partFraction: requireNumberField('partVolumeFraction', input.partVolumeFraction),
    model: readChoiceField('activityModel', input.activityModel) as ActivityModel,
    salts,
    ...(titrant ? { titrant } : {}),
    ...(stock ? { stock } : {}),
    saltTarget: settleSaltTarget(input.saltTarget, library, useT),
    pKaUncertainty: readNumberField('pKaUncertainty', input.pKaUncertainty),
    titrantInBuffer: readChoiceField('titrantInBuffer', input.titrantInBuffer) as Settled['titrantInBuffer'],
    formPurityPercent: readPurityField('formPurityPercent', input.formPurityPercent),
    purityPercent: Object.entries(input.purityPercent ?? {}).map(([name, value]) => ({ key: nameKey(name), percent: readPurityField('formPurityPercent', value, `purityPercent.${name}`) ?? 100 })),
  };
}

function settleTitrant(t: NonNullable<RecipeInput['titrant']>): NonNullable<Settled['titrant']> {
  const form = readTextField('titrant.form', t?.form);
  return {
    ...(form === undefined ? {} : { form }),
    concentrationM: requireNumberField('titrant.concentrationM', t?.concentrationM),
    tolerancePercent: requireNumberField('titrant.tolerancePercent', t?.tolerancePercent),
  };
}

function settleSaltTarget(t: RecipeInput['saltTarget'], library: SubstanceLibrary, useT: number): Settled['saltTarget'] {
  if (t === undefined) return undefined;
  const name = readTextField('saltTarget.form', t?.form);
  if (name === undefined) throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('saltTarget.form', 'a salt form'), 'saltTarget.form', 'a name');
  const form = library.findForm(name, 'saltTarget.form');
  const goals = [
    { kind: 'ionicStrength' as const, goal: readNumberField('saltTarget.ionicStrengthM', t.ionicStrengthM) },
    { kind: 'osmolarity' as const, goal: readNumberField('saltTarget.idealOsmolarityMosm', t.idealOsmolarityMosm) },
    { kind: 'osmolality' as const, goal: readNumberField('saltTarget.osmolalityMosmKg', t.osmolalityMosmKg) },
    { kind: 'conductivity' as const, goal: readNumberField('saltTarget.conductivityMsPerCm', t.conductivityMsPerCm) },
  ].filter((g): g is { kind: SaltGoal; goal: number } => g.goal !== undefined);
  if (goals.length !== 1) {
    const allowed = 'one of ionicStrengthM, idealOsmolarityMosm, osmolalityMosmKg, conductivityMsPerCm';
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('saltTarget', `one goal only: ${allowed}`), 'saltTarget', allowed);
  }
  const readAtC = readNumberField('saltTarget.conductivityTemperatureC', t.conductivityTemperatureC) ?? Math.min(Math.max(useT, CONDUCTIVITY_MIN_C), CONDUCTIVITY_MAX_C);
  return { form, ...goals[0], readAtC };
}

/** Moles of the buffer system one mole of a form adds (0 if none). */
function systemMolesIn(form: LibraryForm, system: SubstanceRecord): number {
  const key = nameKey(system.name);
  return form.adds.filter((a) => nameKey(a.system) === key).reduce((sum, a) => sum + a.moles, 0);
}

/** True when weighing the form adds the buffer system (tris base and tris HCl both hold tris). */
export function formContains(form: LibraryForm, system: SubstanceRecord): boolean {
  return systemMolesIn(form, system) > 0;
}

function requireFormOf(field: string, name: string | undefined, s: Settled): LibraryForm {
  if (name === undefined || name === '') {
    throw new ChemError('invalid-input', 'formsOfSystem', MESSAGES.formsOfSystem(field, s.system.name, s.system.forms.map((f) => f.name)), field, s.system.forms.map((f) => f.name).join(', '));
  }
  const form = s.library.findForm(name);
  if (!formContains(form, s.system)) {
    throw new ChemError('invalid-input', 'formNotOfSystem', MESSAGES.formNotOfSystem(field, form.name, s.system.name), field, s.system.forms.map((f) => f.name).join(', '));
  }
  return form;
}

/** The form weighed on the titrate and stock routes: the one named, or the system's first form without counter-ions. */
function weighedForm(s: Settled): LibraryForm {
  const named = readTextField('form', s.input.form);
  if (named !== undefined) return requireFormOf('form', named, s);
  const plain = s.system.forms.find((f) => Object.keys(f.counterIons).length === 0 && f.adds.length === 1);
  return requireFormOf('form', plain?.name, s);
}

/** The starting composition: the weighed forms and salts at the temperature of use. */
function baseComposition(s: Settled, items: readonly { form: LibraryForm; concentrationM: number }[], saltTargetM: number): Composition {
  const all = [...items, ...s.salts];
  if (saltTargetM > 0 && s.saltTarget) all.push({ form: s.saltTarget.form, concentrationM: saltTargetM });
  return s.library.compositionFromForms(
    all.map((i) => ({ form: i.form, concentrationM: i.concentrationM })),
    { temperatureC: s.useT, activityModel: s.model },
  );
}

function saltComponents(s: Settled, saltTargetM: number): RouteResult['weighed'] {
  const salts: RouteResult['weighed'][number][] = s.salts.map((x) => ({ role: 'salt', ...x }));
  if (saltTargetM > 0 && s.saltTarget) salts.push({ role: 'salt', form: s.saltTarget.form, concentrationM: saltTargetM, toTarget: true });
  return salts;
}

/** Route 1 (and the stock route's finished buffer): one form plus titrant. */
function titrateRoute(s: Settled, saltTargetM: number): RouteResult {
  const form = weighedForm(s);
  const perMole = systemMolesIn(form, s.system);
  const attempt = (formM: number): RouteResult => {
    const start = baseComposition(s, [{ form, concentrationM: formM }], saltTargetM);
    const weighed = [{ role: 'buffer' as const, form, concentrationM: formM }, ...saltComponents(s, saltTargetM)];
    const startPh = solvePh(start);
    if (Math.abs(startPh - s.targetPh) <= NO_TITRANT_PH) return { composition: start, weighed, unadjustedPh: startPh };
    const chosen = chooseTitrant(s, start);
    const composition = withTitrant(start, chosen.titrant, chosen.concentrationM);
    return { composition, weighed, titrant: { ...chosen, before: start }, unadjustedPh: startPh };
  };
  const stated = attempt(s.concentrationM / perMole);
  const shared = stated.titrant ? systemMolesIn(stated.titrant.form, s.system) : 0;
  if (shared === 0 || s.titrantInBuffer === 'state') return stated;
  // Hold the stated total: weigh x of the form so that x·perMole + titrant(x)·shared = C. The
  // titrant needed is close to proportional to x at a fixed target, so a secant on x converges
  // in a few steps.
  const total = (r: RouteResult) => r.weighed[0].concentrationM * perMole + (r.titrant?.concentrationM ?? 0) * shared;
  let [x0, r0] = [s.concentrationM / perMole, stated];
  let x1 = (x0 * s.concentrationM) / total(r0);
  let r1 = attempt(x1);
  for (let i = 0; i < HOLD_TOTAL_STEPS && Math.abs(total(r1) - s.concentrationM) > HOLD_TOTAL_TOLERANCE * s.concentrationM; i++) {
    const slope = (total(r1) - total(r0)) / (x1 - x0);
    const x2 = x1 - (total(r1) - s.concentrationM) / slope;
    [x0, r0] = [x1, r1];
    x1 = x2 > 0 && Number.isFinite(x2) ? x2 : x1 / 2;
    r1 = attempt(x1);
  }
  return r1;
}

/** Most secant steps, and the relative tolerance, when the stated total is held against a titrant of the buffer (a few steps reach 1e-9). */
const HOLD_TOTAL_STEPS = 30;
const HOLD_TOTAL_TOLERANCE = 1e-9;

/**
 * When the titrant is a form of the buffer and the weighed amount was not reduced for it:
 * the total it makes, as a warning (code titrantAddsBuffer).
 */
function titrantTotalWarning(s: Settled, base: RouteResult): ChemWarning | undefined {
  if (!base.titrant || s.titrantInBuffer === 'hold' || s.route === 'two-forms') return undefined;
  const shared = systemMolesIn(base.titrant.form, s.system);
  if (shared === 0) return undefined;
  const totalMm = base.weighed.filter((w) => w.role === 'buffer').reduce((sum, w) => sum + w.concentrationM * systemMolesIn(w.form, s.system), 0) * 1000 + base.titrant.concentrationM * shared * 1000;
  return warning('titrantAddsBuffer', MESSAGES.titrantAddsBuffer(base.titrant.form.name, s.system.name, s.concentrationM * 1000, totalMm), 'titrantInBuffer');
}

/** The titrant named, or 1 M NaOH / 1 M HCl, whichever reaches the target. */
function chooseTitrant(s: Settled, start: Composition): Omit<NonNullable<RouteResult['titrant']>, 'before'> {
  const stockM = s.titrant?.concentrationM ?? 1;
  const tolerance = s.titrant?.tolerancePercent ?? DEFAULT_STOCK_TOLERANCE_PERCENT;
  const candidates = s.titrant?.form
    ? [{ form: s.titrant.form, concentrationM: stockM, tolerancePercent: tolerance }]
    : [
        { form: 'sodium hydroxide', concentrationM: stockM, tolerancePercent: tolerance },
        { form: 'hydrochloric acid', concentrationM: stockM, tolerancePercent: tolerance },
      ];
  let firstError: unknown;
  for (const { concentrationM, tolerancePercent, ...stock } of candidates) {
    const form = s.library.findForm(stock.form, 'titrant.form');
    const titrant = titrantFromForm(form, s.library, 'titrant.form');
    try {
      const amount = titrantForPh(start, titrant, s.targetPh);
      return { form, titrant, concentrationM: amount.concentrationM, stock: { concentrationM, tolerancePercent } };
    } catch (e) {
      firstError ??= e;
    }
  }
  throw firstError;
}

/** Route 2: two forms of the same system in the proportion that gives the target. */
function twoFormsRoute(s: Settled, saltTargetM: number): RouteResult {
  const acid = requireFormOf('acidForm', readTextField('acidForm', s.input.acidForm), s);
  const base = requireFormOf('baseForm', readTextField('baseForm', s.input.baseForm), s);
  const mA = systemMolesIn(acid, s.system);
  const mB = systemMolesIn(base, s.system);
  // Start from all-acid-form; swapping one mole of base form in for mB/mA moles of acid
  // form changes only the counter-ions, so the split follows from the charge balance at
  // the target exactly as a titrant amount does.
  const allAcid = baseComposition(s, [{ form: acid, concentrationM: s.concentrationM / mA }], saltTargetM);
  const swap: Record<string, number> = {};
  for (const [ion, n] of Object.entries(base.counterIons)) swap[ion] = (swap[ion] ?? 0) + n;
  for (const [ion, n] of Object.entries(acid.counterIons)) swap[ion] = (swap[ion] ?? 0) - (n * mB) / mA;
  const maxBaseM = s.concentrationM / mB;
  let baseM: number;
  try {
    baseM = titrantForPh(allAcid, { name: base.name, strongIons: swap }, s.targetPh).concentrationM;
  } catch (e) {
    if (!(e instanceof ChemError) || e.kind !== 'infeasible-target') throw e;
    baseM = Infinity;
  }
  if (!(baseM <= maxBaseM * (1 + 1e-12))) {
    const allBase = baseComposition(s, [{ form: base, concentrationM: maxBaseM }], saltTargetM);
    const [lo, hi] = [solvePh(allAcid), solvePh(allBase)].sort((a, b) => a - b);
    throw new ChemError('infeasible-target', 'unreachableByMixing', MESSAGES.unreachableByMixing(s.targetPh, lo, hi), 'targetPh', `pH ${lo.toFixed(2)} to ${hi.toFixed(2)}`);
  }
  baseM = Math.min(baseM, maxBaseM);
  const acidM = Math.max(0, (s.concentrationM - baseM * mB) / mA);
  const weighed = [
    { role: 'acid form' as const, form: acid, concentrationM: acidM },
    { role: 'base form' as const, form: base, concentrationM: baseM },
  ];
  return {
    composition: baseComposition(s, weighed, saltTargetM),
    weighed: [...weighed, ...saltComponents(s, saltTargetM)],
  };
}

function routeResult(s: Settled, saltTargetM: number): RouteResult {
  return s.route === 'two-forms' ? twoFormsRoute(s, saltTargetM) : titrateRoute(s, saltTargetM);
}

/**
 * Solves the route, adding the salt-target salt by bisection when one is asked for. Ionic
 * strength, ideal osmolarity and conductivity all rise with every added mole of a salt that
 * dissociates, so one bisection serves all three goals. A goal the buffer already passes
 * without salt, or one that the largest salt amount tried cannot reach (a zwitterion such as
 * glycine adds no ionic strength), is infeasible, never a success.
 */
function solveWithSaltTarget(s: Settled): RouteResult {
  const target = s.saltTarget;
  if (!target) return routeResult(s, 0);
  const measure = (saltM: number): number => {
    const c = routeResult(s, saltM).composition;
    if (target.kind === 'conductivity') return conductivityAt(c, target.readAtC).conductivityMsPerCm;
    const sp = speciate(c);
    if (target.kind === 'osmolality') return sp.osmolalityMosmKg;
    return target.kind === 'ionicStrength' ? sp.ionicStrengthM : idealOsmolarity(sp) * 1000;
  };
  const what = SALT_TARGET_WHAT[target.kind](target.readAtC);
  const shown = (x: number) => Number(x.toPrecision(4));
  const reached = measure(0);
  if (reached > target.goal) {
    throw new ChemError('infeasible-target', 'saltTargetUnreachable', MESSAGES.saltTargetUnreachable(what, target.goal, shown(reached)), 'saltTarget', `a target above ${shown(reached)}`);
  }
  const most = measure(MAX_SALT_TARGET_M);
  if (most < target.goal) {
    throw new ChemError('infeasible-target', 'saltTargetBeyondSalt', MESSAGES.saltTargetBeyondSalt(what, target.goal, shown(most), target.form.name, MAX_SALT_TARGET_M), 'saltTarget', `a target up to ${shown(most)}`);
  }
  let lo = 0;
  let hi = MAX_SALT_TARGET_M;
  for (let i = 0; i < SALT_TARGET_STEPS && hi - lo > 1e-12 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (measure(mid) < target.goal) lo = mid;
    else hi = mid;
  }
  return routeResult(s, 0.5 * (lo + hi));
}

/** A route's result with every concentration multiplied by a fold (the stock). */
function scaleRoute(r: RouteResult, fold: number): RouteResult {
  return {
    composition: scaleComposition(r.composition, fold),
    weighed: r.weighed.map((w) => ({ ...w, concentrationM: w.concentrationM * fold })),
    ...(r.titrant ? { titrant: { ...r.titrant, concentrationM: r.titrant.concentrationM * fold, before: scaleComposition(r.titrant.before, fold) } } : {}),
    // The finished buffer's unadjusted pH, as the plan reports it (not the stock's).
    ...(r.unadjustedPh === undefined ? {} : { unadjustedPh: r.unadjustedPh }),
  };
}

/** The titrant volume and its band from the pKa uncertainty and the stock tolerance. */
function titrationPlan(s: Settled, made: RouteResult, volumeL: number, stockPh: number | undefined): TitrationPlan {
  const t = made.titrant!;
  const volumeMl = ((t.concentrationM * volumeL) / t.stock.concentrationM) * 1000;
  const u =
    s.pKaUncertainty !== undefined
      ? s.pKaUncertainty
      : Math.max(...s.system.steps.map((step) => step.pKaUncertainty ?? DEFAULT_PKA_UNCERTAINTY));
  // The amount needed with every pKa of the buffer moved by ±u, to the pH the made solution has.
  const before = t.before;
  const madePh = s.route === 'stock' ? (stockPh ?? solvePh(made.composition)) : s.targetPh;
  const amounts = [-u, u].map((shift) => {
    const shifted = shiftSystem(before, s.system.name, shift);
    try {
      return titrantForPh(shifted, t.titrant, madePh).concentrationM;
    } catch {
      return 0;
    }
  });
  const tol = t.stock.tolerancePercent / 100;
  const toMl = (c: number, stockM: number) => ((c * volumeL) / stockM) * 1000;
  const lowMl = Math.min(volumeMl, toMl(Math.min(...amounts), t.stock.concentrationM * (1 + tol)));
  const highMl = Math.max(volumeMl, toMl(Math.max(...amounts), t.stock.concentrationM * (1 - tol)));
  return {
    titrant: t.form.name,
    stockM: t.stock.concentrationM,
    // The titrate route's unadjusted pH is the pH of `before`, already solved.
    direction: t.titrant.system ? (madePh > (s.route === 'titrate' && made.unadjustedPh !== undefined ? made.unadjustedPh : solvePh(before)) ? 'raises' : 'lowers') : chargeOf(t.titrant) > 0 ? 'raises' : 'lowers',
    volumeMl,
    lowMl,
    highMl,
    firstPortionMl: FIRST_PORTION_SHARE * lowMl,
    pKaUncertainty: u,
    tolerancePercent: t.stock.tolerancePercent,
  };
}

/** The next strength up in a 1–2–5 series, mol/L (the stocks a lab keeps or makes easily). */
function roundedStock(m: number): number {
  const decade = Math.pow(10, Math.floor(Math.log10(m)));
  for (const step of [1, 2, 5, 10]) if (step * decade >= m * (1 - 1e-12)) return step * decade;
  return 10 * decade;
}

/**
 * Refuses a titrant that does not fit: at adjustment everything sits in the part volume, so
 * the titrant cannot take more than the part volume leaves. One rule for every host (the
 * planner, RECIPE, RECIPE.ROW, TITRANT.ML). The message names a stock strong enough that the
 * titrant takes about a tenth of the final volume, or says none is strong enough.
 *
 * @param titrantMl - titrant volume needed, mL
 * @param finalVolumeMl - volume being made, mL
 * @param partVolumeFraction - share of the final volume in which the pH is adjusted
 * @param stockM - the titrant stock, mol/L
 * @throws ChemError infeasible-target `titrantTooLarge`, field `titrant.concentrationM`
 */
export function checkTitrantFits(titrantMl: number, finalVolumeMl: number, partVolumeFraction: number, stockM: number): void {
  const roomMl = finalVolumeMl * partVolumeFraction;
  if (!(titrantMl > roomMl)) return;
  const needed = (stockM * titrantMl) / (COMFORTABLE_TITRANT_SHARE * finalVolumeMl);
  const suggestion = needed <= MAX_TITRANT_M ? `a ${roundedStock(needed)} M stock` : `no stock is strong enough (it would take above ${MAX_TITRANT_M} M); weigh a form nearer the target pH instead`;
  throw new ChemError('infeasible-target', 'titrantTooLarge', MESSAGES.titrantTooLarge(titrantMl, roomMl, stockM, suggestion), 'titrant.concentrationM', suggestion);
}

/** Net charge a strong titrant adds per mole (positive: a base). */
function chargeOf(t: Titrant): number {
  let q = 0;
  for (const [ion, n] of Object.entries(t.strongIons ?? {})) q += findStrongIon('titrant', ion).charge * n;
  return q;
}

/** The composition with every pKa of one system moved by `shift`. */
function shiftSystem(c: Composition, name: string, shift: number): Composition {
  return {
    ...c,
    systems: c.systems.map((sys): AcidBaseSystem => (sys.name === name ? systemAt({ name: sys.name, chargeOfMostProtonated: sys.chargeOfMostProtonated, steps: sys.steps.map((st) => ({ pKa: st.pKa + shift, deltaHkJ: st.deltaHkJ, deltaCpJ: st.deltaCpJ })) }, sys.totalM) : sys)),
  };
}

/** dpH/dT of a composition at a temperature, by central difference (one-sided at 0 and 100 °C). */
function dpHdT(c: Composition, t: number): number {
  const lo = Math.max(0, t - DPH_DT_STEP_C);
  const hi = Math.min(100, t + DPH_DT_STEP_C);
  return (solvePh(withConditions(c, hi)) - solvePh(withConditions(c, lo))) / (hi - lo);
}

function purityOf(s: Settled, form: LibraryForm, role: RecipeComponent['role']): number {
  const keys = [form.name, ...form.aliases].map(nameKey);
  const named = s.purityPercent.find((p) => keys.includes(p.key));
  if (named) return named.percent;
  const ownForm = role === 'buffer' || role === 'acid form' || role === 'base form';
  if (ownForm && s.formPurityPercent !== undefined) return s.formPurityPercent;
  return 100;
}

function componentsOf(s: Settled, made: RouteResult, volumeL: number, titration: TitrationPlan | undefined): RecipeComponent[] {
  const out: RecipeComponent[] = made.weighed.map((w) => {
    const purity = purityOf(s, w.form, w.role);
    return {
      role: w.role,
      name: w.form.name,
      formula: w.form.formula,
      molarMass: w.form.molarMass,
      concentrationMm: w.concentrationM * 1000,
      grams: (w.concentrationM * volumeL * w.form.molarMass) / (purity / 100),
      purityPercent: purity,
      ...(w.toTarget ? { toTarget: true as const } : {}),
    };
  });
  if (titration && made.titrant) {
    out.push({ role: 'titrant', name: `${titration.stockM} M ${made.titrant.form.name}`, formula: made.titrant.form.formula, concentrationMm: made.titrant.concentrationM * 1000, millilitres: titration.volumeMl });
  }
  // Solids take up volume too, so water is given as "to volume", never as a subtraction.
  out.push({ role: 'water', name: 'water, to final volume', millilitres: volumeL * 1000 });
  return out;
}

/**
 * A name that leaves the hydration state open (`sodium phosphate dibasic`) is weighed as the
 * form the library lists under it (docs/substances.md); the plan says which, with its molar
 * mass, and names the other forms, so a heptahydrate on the shelf is not weighed as anhydrous.
 */
export function hydrateWarnings(input: RecipeInput, library: SubstanceLibrary): ChemWarning[] {
  const typed: { name: string; field: string }[] = [];
  for (const field of ['form', 'acidForm', 'baseForm'] as const) {
    const name = input[field];
    if (typeof name === 'string' && name.trim() !== '') typed.push({ name, field });
  }
  if (input.salts !== undefined) readSaltsField(input.salts).forEach((salt, i) => typed.push({ name: salt.form, field: `salts[${i}].form` }));
  if (typeof input.saltTarget?.form === 'string') typed.push({ name: input.saltTarget.form, field: 'saltTarget.form' });
  const out: ChemWarning[] = [];
  for (const { name, field } of typed) {
    const others = library.hydrateAlternatives(name);
    if (others.length === 0) continue;
    const used = library.findForm(name, field);
    out.push(warning('hydrateAssumed', MESSAGES.hydrateAssumed(name, used.name, used.molarMass, others.map((f) => `${f.name} (${f.molarMass.toFixed(2)} g/mol)`)), field));
  }
  return out;
}

/** Warnings only a plan can give: the titrant's size, small weighings, solubility, no titrant needed. */
function planWarnings(s: Settled, made: RouteResult, components: readonly RecipeComponent[], volumeL: number, titration: TitrationPlan | undefined): ChemWarning[] {
  const w: ChemWarning[] = [];
  if (titration) {
    const totalMl = volumeL * 1000;
    if (titration.volumeMl > 0.5 * totalMl) w.push(warning('titrantOverHalf', MESSAGES.titrantOverHalf(titration.volumeMl, totalMl), 'titrant.concentrationM'));
    if (titration.volumeMl < SMALLEST_TITRANT_ML) {
      const fold = Math.pow(10, Math.ceil(Math.log10(SMALLEST_TITRANT_ML / titration.volumeMl)));
      if (fold <= MAX_STOCK_DILUTION_ADVICE) {
        w.push(warning('titrantTiny', MESSAGES.titrantTiny(titration.volumeMl * 1000, fold, titration.stockM / fold, volumeText(titration.volumeMl * fold)), 'titrant.concentrationM'));
      } else {
        const unadjusted = made.unadjustedPh ?? s.targetPh;
        w.push(warning('titrantTinyCheckMeter', MESSAGES.titrantTinyCheckMeter(titration.volumeMl * 1000, Math.abs(s.targetPh - unadjusted), MAX_STOCK_DILUTION_ADVICE, titration.stockM / MAX_STOCK_DILUTION_ADVICE), 'targetPh'));
      }
    }
    if (titration.highMl > totalMl * s.partFraction) w.push(warning('titrantMayNotFit', MESSAGES.titrantMayNotFit(titration.highMl, totalMl * s.partFraction), 'titrant.concentrationM'));
  }
  if (!titration && made.unadjustedPh !== undefined) w.push(warning('noTitrantNeeded', MESSAGES.noTitrantNeeded(made.unadjustedPh, s.useT, NO_TITRANT_PH), 'targetPh'));
  made.weighed.forEach((item, i) => {
    // componentsOf lists the weighed forms first, in this order, with the grams printed (purity applied).
    const grams = components[i].grams ?? 0;
    if (grams > 0 && grams < SMALLEST_GOOD_WEIGHING_G) w.push(warning('smallWeighing', MESSAGES.smallWeighing(grams * 1000, item.form.name, SMALLEST_GOOD_WEIGHING_G * 1000), 'volumeMl'));
    const sol = item.form.solubility;
    if (!sol) return;
    const gPerL = (item.concentrationM * item.form.molarMass) / s.partFraction;
    if (gPerL > sol.gramsPerLitre) w.push(warning('aboveSolubility', MESSAGES.aboveSolubility(item.form.name, gPerL, sol.gramsPerLitre, sol.temperatureC), 'concentrationMm'));
  });
  return w;
}
