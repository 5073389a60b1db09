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
 * A salt target is met by bisection on the salt concentration (ionic strength and ideal
 * osmolarity rise with salt), re-solving the titrant at each step.
 */
import { ActivityModel, parseActivityModel } from '../activity';
import { capacityOfPrepared, scaleComposition } from '../capacity';
import { BUFFERING_HALF_WIDTH, metalComplexWarning } from '../checks';
import { AcidBaseSystem, Composition, prepare, systemAt, withConditions } from '../composition';
import { ChemError, MESSAGES, requireNumber } from '../errors';
import { SOURCES } from '../library/sources';
import { LibraryForm, SubstanceRecord } from '../library/types';
import { SubstanceLibrary, defaultLibrary } from '../library/lookup';
import { titrantFromForm } from '../library/titrant';
import { nameKey } from '../library/names';
import { idealOsmolarity } from '../osmolarity';
import { report, speciate, solvePh, solvePrepared } from '../speciation';
import { findStrongIon } from '../strongIons';
import { MAX_TARGET_PH, MIN_TARGET_PH, Titrant, titrantForPh, withTitrant } from '../titration';
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
/** Below this mass a weighing is poor on an analytical balance, g (common practice: about 10 mg at 0.1 mg readability). */
export const SMALLEST_GOOD_WEIGHING_G = 0.01;
/** Largest dilution fold for a stock. */
export const MAX_STOCK_FOLD = 100;
/** Largest salt concentration the salt-target search tries, mol/L (beyond any buffer recipe). */
const MAX_SALT_TARGET_M = 5;
/** Bisection steps for a salt target: 60 halvings of 5 M reach 4e-18 M. */
const SALT_TARGET_STEPS = 60;
/** Step for dpH/dT by central difference, °C. */
const DPH_DT_STEP_C = 0.5;

const ROUTES: readonly RecipeRoute[] = ['titrate', 'two-forms', 'stock'];

/** The numbers a route fixes: the finished buffer and how it was put together. */
interface RouteResult {
  readonly composition: Composition;
  /** Forms weighed with their concentrations in the solution made, mol/L. */
  readonly weighed: readonly { readonly role: RecipeComponent['role']; readonly form: LibraryForm; readonly concentrationM: number }[];
  readonly titrant?: {
    readonly form: LibraryForm;
    readonly titrant: Titrant;
    readonly concentrationM: number;
    readonly stock: { concentrationM: number; tolerancePercent: number };
    /** The solution before any titrant. */
    readonly before: Composition;
  };
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
  const fold = s.route === 'stock' ? requireNumber('stock.fold', input.stock?.fold, 1, MAX_STOCK_FOLD, `1 to ${MAX_STOCK_FOLD}`) : 1;
  const stockVolumeL = s.route === 'stock' ? requireNumber('stock.volumeMl', input.stock?.volumeMl ?? input.volumeMl, 0.001, 1e6, '0.001 to 1,000,000 mL') / 1000 : s.volumeL;

  // What is physically made on the bench: the finished buffer, or the stock (fold × it).
  const made = fold === 1 ? base : scaleRoute(base, fold);
  const madeVolumeL = stockVolumeL;
  const finished = base.composition;

  const atMeter = withConditions(scaleComposition(made.composition, 1 / s.partFraction), s.benchT);
  // A stock's own activity warnings (past the model's range, ions without Pitzer parameters) bear on the meter reading.
  const stockWarnings = fold === 1 ? [] : speciate(atMeter).warnings.filter((w) => /Pitzer|activity model/.test(w)).map((w) => `Stock (${fold}×) at the meter: ${w}`);
  const meterPh = solvePh(atMeter);
  const titration = made.titrant ? titrationPlan(s, made, madeVolumeL) : undefined;

  const prepared = prepare(finished);
  const state = solvePrepared(prepared, s.targetPh);
  const result = report(prepared, state, finished);
  const cap = capacityOfPrepared(prepared, state.pH);
  const warnings = [...result.warnings, ...stockWarnings];
  const predictions = {
    useTemperatureC: s.useT,
    pHAtUse: result.pH,
    pHAtBench: solvePh(withConditions(finished, s.benchT)),
    ionicStrengthM: result.ionicStrengthM,
    idealOsmolarityMosm: idealOsmolarity(result) * 1000,
    osmolalityMosmKg: result.osmolalityMosmKg,
    baseMmPerTenthPh: cap.baseMmPerTenthPh,
    acidMmPerTenthPh: cap.acidMmPerTenthPh,
    betaMPerPh: cap.betaMPerPh,
    pHPerDegreeC: dpHdT(finished, s.useT),
    pHAfterTenfoldDilution: solvePh(scaleComposition(finished, 0.1)),
  };

  const components = componentsOf(s, made, madeVolumeL, titration);
  const stock =
    s.route === 'stock'
      ? {
          fold,
          stockVolumeMl: madeVolumeL * 1000,
          stockPhAtUse: solvePh(made.composition),
          stockPerBatchMl: (s.volumeL * 1000) / fold,
          waterPerBatchMl: s.volumeL * 1000 * (1 - 1 / fold),
        }
      : undefined;

  warnings.push(...planWarnings(s, made, components, madeVolumeL, titration));
  const metals = metalComplexWarning(finished);
  if (metals) warnings.push(metals);
  const constants = s.system.steps.map((step) => ({
    pKa25: step.pKa,
    pKaAtUse: pKaAt(step.pKa, step.deltaHkJ ?? 0, step.deltaCpJ ?? 0, s.useT),
    source: `${SOURCES[step.source]}${step.entry ? `, entry ${step.entry}` : ''}${step.verified ? '' : ' (written from memory, not yet checked against the source)'}`,
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
    warnings: dedupe(warnings),
    cautions: cautionsFor(made.weighed.map((w) => w.form).concat(made.titrant ? [made.titrant.form] : [])),
    constants,
    composition: finished,
  };
  return { ...plan, steps: protocolSteps(plan) };
}

function dedupe(xs: readonly string[]): string[] {
  return [...new Set(xs)];
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
    system = library.findSystem(name as string);
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

/** Validates the input and fills defaults. */
function settle(input: RecipeInput, library: SubstanceLibrary): Settled {
  if (input === null || typeof input !== 'object') {
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('recipe', 'a recipe input object'), 'recipe', 'an object');
  }
  const system = bufferSystemOf(library, input.buffer);
  const route = input.route ?? 'titrate';
  if (!ROUTES.includes(route)) {
    throw new ChemError('invalid-input', 'outOfRange', MESSAGES.outOfRange('route', route, ROUTES.join(', ')), 'route', ROUTES.join(', '));
  }
  const useT = requireNumber('useTemperatureC', input.useTemperatureC ?? 25, 0, 100, '0 to 100 °C');
  const salts = (input.salts ?? []).map((salt, i) => ({
    form: library.findForm(salt?.form),
    concentrationM: requireNumber(`salts[${i}].concentrationMm`, salt?.concentrationMm, 0, 5000, '0 to 5000 mM') / 1000,
  }));
  return {
    input,
    library,
    system,
    route,
    targetPh: requireNumber('targetPh', input.targetPh, MIN_TARGET_PH, MAX_TARGET_PH, `${MIN_TARGET_PH} to ${MAX_TARGET_PH}`),
    useT,
    benchT: requireNumber('benchTemperatureC', input.benchTemperatureC ?? useT, 0, 100, '0 to 100 °C'),
    concentrationM: requireNumber('concentrationMm', input.concentrationMm, 0.001, 5000, '0.001 to 5000 mM') / 1000,
    volumeL: requireNumber('volumeMl', input.volumeMl, 0.001, 1e6, '0.001 to 1,000,000 mL') / 1000,
    partFraction: requireNumber('partVolumeFraction', input.partVolumeFraction ?? DEFAULT_PART_VOLUME_FRACTION, 0.1, 1, '0.1 to 1'),
    model: parseActivityModel('activityModel', input.activityModel),
    salts,
  };
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
  if (s.input.form !== undefined) return requireFormOf('form', s.input.form, s);
  const plain = s.system.forms.find((f) => Object.keys(f.counterIons).length === 0 && f.adds.length === 1);
  return requireFormOf('form', plain?.name, s);
}

/** The starting composition: the weighed forms and salts at the temperature of use. */
function baseComposition(s: Settled, items: readonly { form: LibraryForm; concentrationM: number }[], saltTargetM: number): Composition {
  const all = [...items, ...s.salts];
  if (saltTargetM > 0 && s.input.saltTarget) all.push({ form: s.library.findForm(s.input.saltTarget.form), concentrationM: saltTargetM });
  return s.library.compositionFromForms(
    all.map((i) => ({ form: i.form, concentrationM: i.concentrationM })),
    { temperatureC: s.useT, activityModel: s.model },
  );
}

function saltComponents(s: Settled, saltTargetM: number): RouteResult['weighed'] {
  const salts: { role: RecipeComponent['role']; form: LibraryForm; concentrationM: number }[] = s.salts.map((x) => ({ role: 'salt', ...x }));
  if (saltTargetM > 0 && s.input.saltTarget) salts.push({ role: 'salt', form: s.library.findForm(s.input.saltTarget.form), concentrationM: saltTargetM });
  return salts;
}

/** Route 1 (and the stock route's finished buffer): one form plus titrant. */
function titrateRoute(s: Settled, saltTargetM: number): RouteResult {
  const form = weighedForm(s);
  const formM = s.concentrationM / systemMolesIn(form, s.system);
  const start = baseComposition(s, [{ form, concentrationM: formM }], saltTargetM);
  const chosen = chooseTitrant(s, start);
  const composition = withTitrant(start, chosen.titrant, chosen.concentrationM);
  return {
    composition,
    weighed: [{ role: 'buffer', form, concentrationM: formM }, ...saltComponents(s, saltTargetM)],
    titrant: { ...chosen, before: start },
  };
}

/** The titrant named, or 1 M NaOH / 1 M HCl, whichever reaches the target. */
function chooseTitrant(s: Settled, start: Composition): Omit<NonNullable<RouteResult['titrant']>, 'before'> {
  const given = s.input.titrant;
  const candidates = given ? [given] : [{ form: 'sodium hydroxide', concentrationM: 1 }, { form: 'hydrochloric acid', concentrationM: 1 }];
  let firstError: unknown;
  for (const stock of candidates) {
    const form = s.library.findForm(stock.form);
    const concentrationM = requireNumber('titrant.concentrationM', stock.concentrationM, 1e-6, 30, '0.000001 to 30 mol/L');
    const tolerancePercent = requireNumber('titrant.tolerancePercent', stock.tolerancePercent ?? DEFAULT_STOCK_TOLERANCE_PERCENT, 0, 50, '0 to 50 %');
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
  const acid = requireFormOf('acidForm', s.input.acidForm, s);
  const base = requireFormOf('baseForm', s.input.baseForm, s);
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

/** Solves the route, adding the salt-target salt by bisection when one is asked for. */
function solveWithSaltTarget(s: Settled): RouteResult {
  const target = s.input.saltTarget;
  if (!target) return routeResult(s, 0);
  s.library.findForm(target.form);
  const byIonicStrength = target.ionicStrengthM !== undefined;
  const byOsmolality = target.osmolalityMosmKg !== undefined;
  const given = [byIonicStrength, target.idealOsmolarityMosm !== undefined, byOsmolality].filter(Boolean).length;
  if (given !== 1) {
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('saltTarget', 'one of ionicStrengthM, idealOsmolarityMosm or osmolalityMosmKg'), 'saltTarget', 'ionicStrengthM, idealOsmolarityMosm or osmolalityMosmKg');
  }
  const goal = byIonicStrength
    ? requireNumber('saltTarget.ionicStrengthM', target.ionicStrengthM, 0, 5, '0 to 5 mol/L')
    : byOsmolality
      ? requireNumber('saltTarget.osmolalityMosmKg', target.osmolalityMosmKg, 0, 10000, '0 to 10,000 mOsm/kg') / 1000
      : requireNumber('saltTarget.idealOsmolarityMosm', target.idealOsmolarityMosm, 0, 10000, '0 to 10,000 mOsm/L') / 1000;
  const measure = (r: RouteResult) => {
    const sp = speciate(r.composition);
    return byIonicStrength ? sp.ionicStrengthM : byOsmolality ? sp.osmolalityMosmKg / 1000 : idealOsmolarity(sp);
  };
  const none = routeResult(s, 0);
  const reached = measure(none);
  if (reached > goal) {
    const what = byIonicStrength ? 'ionic strength (mol/L)' : byOsmolality ? 'osmolality (mOsm/kg)' : 'ideal osmolarity (mOsm/L)';
    const shown = byIonicStrength ? Number(reached.toPrecision(4)) : Number((reached * 1000).toPrecision(4));
    throw new ChemError('infeasible-target', 'saltTargetUnreachable', MESSAGES.saltTargetUnreachable(what, byIonicStrength ? goal : goal * 1000, shown), 'saltTarget', `a target above ${shown}`);
  }
  let lo = 0;
  let hi = MAX_SALT_TARGET_M;
  for (let i = 0; i < SALT_TARGET_STEPS && hi - lo > 1e-12 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (measure(routeResult(s, mid)) < goal) lo = mid;
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
  };
}

/** The titrant volume and its band from the pKa uncertainty and the stock tolerance. */
function titrationPlan(s: Settled, made: RouteResult, volumeL: number): TitrationPlan {
  const t = made.titrant!;
  const volumeMl = ((t.concentrationM * volumeL) / t.stock.concentrationM) * 1000;
  const u =
    s.input.pKaUncertainty !== undefined
      ? requireNumber('pKaUncertainty', s.input.pKaUncertainty, 0, 1, '0 to 1 pH unit')
      : Math.max(...s.system.steps.map((step) => step.pKaUncertainty ?? DEFAULT_PKA_UNCERTAINTY));
  // The amount needed with every pKa of the buffer moved by ±u, to the pH the made solution has.
  const before = t.before;
  const madePh = s.route === 'stock' ? solvePh(made.composition) : s.targetPh;
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
    direction: t.titrant.system ? (madePh > solvePh(before) ? 'raises' : 'lowers') : chargeOf(t.titrant) > 0 ? 'raises' : 'lowers',
    volumeMl,
    lowMl,
    highMl,
    firstPortionMl: FIRST_PORTION_SHARE * lowMl,
    pKaUncertainty: u,
    tolerancePercent: t.stock.tolerancePercent,
  };
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
  const table = s.input.purityPercent ?? {};
  for (const [name, value] of Object.entries(table)) {
    if (nameKey(name) === nameKey(form.name) || form.aliases.some((a) => nameKey(a) === nameKey(name))) {
      return requireNumber(`purityPercent.${name}`, value, 1, 100, '1 to 100 %');
    }
  }
  const ownForm = role === 'buffer' || role === 'acid form' || role === 'base form';
  if (ownForm && s.input.formPurityPercent !== undefined) return requireNumber('formPurityPercent', s.input.formPurityPercent, 1, 100, '1 to 100 %');
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
    };
  });
  if (titration && made.titrant) {
    out.push({ role: 'titrant', name: `${titration.stockM} M ${made.titrant.form.name}`, formula: made.titrant.form.formula, concentrationMm: made.titrant.concentrationM * 1000, millilitres: titration.volumeMl });
  }
  // Solids take up volume too, so water is given as "to volume", never as a subtraction.
  out.push({ role: 'water', name: 'water, to final volume', millilitres: volumeL * 1000 });
  return out;
}

function planWarnings(s: Settled, made: RouteResult, components: readonly RecipeComponent[], volumeL: number, titration: TitrationPlan | undefined): string[] {
  const w: string[] = [];
  const near = s.system.steps.some((st) => Math.abs(pKaAt(st.pKa, st.deltaHkJ ?? 0, st.deltaCpJ ?? 0, s.useT) - s.targetPh) <= BUFFERING_HALF_WIDTH);
  if (!near) {
    const pkas = s.system.steps.map((st) => pKaAt(st.pKa, st.deltaHkJ ?? 0, st.deltaCpJ ?? 0, s.useT).toFixed(2)).join(', ');
    w.push(`pH ${s.targetPh} is more than ${BUFFERING_HALF_WIDTH} unit from every pKa of ${s.system.name} at ${s.useT} °C (${pkas}): it will buffer weakly there.`);
  }
  if (titration) {
    const totalMl = volumeL * 1000;
    if (titration.volumeMl > 0.5 * totalMl) {
      w.push(`The titrant (${titration.volumeMl.toFixed(1)} mL) is more than half the final volume (${totalMl.toFixed(0)} mL): use a more concentrated stock.`);
    }
    if (titration.volumeMl < SMALLEST_TITRANT_ML) {
      const fold = Math.pow(10, Math.ceil(Math.log10(SMALLEST_TITRANT_ML / titration.volumeMl)));
      w.push(`The whole titrant is only ${(titration.volumeMl * 1000).toPrecision(3)} µL: too little to add in portions that approach the target; dilute the stock ${fold}× (${(titration.stockM / fold).toPrecision(3)} M) to add about ${volumeText(titration.volumeMl * fold)}.`);
    }
    if (titration.highMl > totalMl * s.partFraction) {
      w.push(`The titrant may not fit: up to ${titration.highMl.toFixed(1)} mL is expected, more than the ${(totalMl * s.partFraction).toFixed(0)} mL part volume; use a more concentrated stock.`);
    }
  }
  made.weighed.forEach((item, i) => {
    // componentsOf lists the weighed forms first, in this order, with the grams printed (purity applied).
    const grams = components[i].grams ?? 0;
    if (grams > 0 && grams < SMALLEST_GOOD_WEIGHING_G) {
      w.push(`${(grams * 1000).toPrecision(3)} mg of ${item.form.name} is too little to weigh well on an analytical balance (about ${SMALLEST_GOOD_WEIGHING_G * 1000} mg at least): make a larger volume or a concentrated stock and take a part of it.`);
    }
    const sol = item.form.solubility;
    if (!sol) return;
    const gPerL = (item.concentrationM * item.form.molarMass) / s.partFraction;
    if (gPerL > sol.gramsPerLitre) {
      w.push(`${item.form.name} at ${gPerL.toFixed(0)} g/L in the part volume is above its solubility (about ${sol.gramsPerLitre} g/L at ${sol.temperatureC} °C).`);
    }
  });
  return w;
}
