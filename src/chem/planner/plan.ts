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
 * A salt target is met by a bracketed search on the salt concentration (ionic strength, ideal
 * osmolarity and conductivity rise with salt), re-solving the titrant at each step.
 */
import { capacityOfPrepared, scaleComposition } from '../capacity';
import { metalComplexWarning, weakBufferingWarning } from '../checks';
import { ChemWarning, uniqueWarnings, warning } from '../warnings';
import { Composition, prepare, withConditions } from '../composition';
import { MESSAGES } from '../errors';
import { SOURCES } from '../library/sources';
import { LibraryForm } from '../library/types';
import { SubstanceLibrary, defaultLibrary } from '../library/lookup';
import { nameKey } from '../library/names';
import { conductivityOf } from '../conductivity';
import { idealOsmolarity } from '../osmolarity';
import { PitzerStart, SpeciationResult, report, solvePrepared } from '../speciation';
import { temperatureWarnings } from '../temperatureChecks';
import { pKaAt } from '../vantHoff';
import { RecipeComponent, RecipeInput, RecipePlan, TitrationPlan } from './types';
import { cautionsFor, protocolSteps } from './protocol';
import { DPH_DT_STEP_C, ACTIVITY_RANGE_CODES } from './constants';
import { RouteResult, Settled, settle } from './settle';
import { titrantTotalWarning, scaleRoute } from './routes';
import { solveWithSaltTarget } from './saltTarget';
import { titrationPlan, checkTitrantFits } from './band';
import { hydrateWarnings, planWarnings } from './planWarnings';

// The planner's public pieces, from the modules that hold them.
export * from './constants';
export { bufferSystemOf } from './settle';
export { formContains } from './routes';
export { checkTitrantFits } from './band';
export { hydrateWarning, hydrateWarnings } from './planWarnings';

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

  // The finished buffer first: its γ start every neighbouring solve below (the same species at another temperature
  // or dilution). Its own solve starts cold: from the amount solve's γ (the same fixed point) the γ change of the first
  // round sits at the two solves' noise floor (2e-10–4e-10), where the contraction cannot be read, and the stopping
  // rule then takes three to five rounds instead of two.
  const prepared = prepare(finished);
  const state = solvePrepared(prepared, s.targetPh);
  const result = report(prepared, state, finished);
  const near = state.pitzer;

  // Each composition below is solved once: a speciation made for one figure gives the others their pH.
  const atMeter = withConditions(scaleComposition(made.composition, 1 / s.partFraction), s.benchT);
  const meterSpeciation = fold === 1 ? undefined : speciateFrom(atMeter, s.targetPh, near);
  // A stock's own activity warnings (past the model's range, ions without Pitzer parameters) bear on the meter reading.
  const stockWarnings = meterSpeciation
    ? meterSpeciation.warnings.filter((w) => ACTIVITY_RANGE_CODES.has(w.code)).map((w) => warning(w.code, MESSAGES.stockAtMeter(fold, w.message), w.field))
    : [];
  const meterPh = meterSpeciation ? meterSpeciation.pH : phFrom(atMeter, s.targetPh, near);
  // The stock as made, at the temperature of use: its pH and conductivity (the stock route only).
  // Adjusted in the full volume at the temperature of use, the meter reads the stock itself.
  const meterReadsStock = s.partFraction === 1 && s.benchT === s.useT;
  const stockSpeciation = s.route !== 'stock' ? undefined : meterReadsStock && meterSpeciation ? meterSpeciation : speciateFrom(made.composition, s.targetPh, near);
  const titration = made.titrant ? titrationPlan(s, made, madeVolumeL, stockSpeciation?.pH) : undefined;
  if (titration) checkTitrantFits(titration.volumeMl, madeVolumeL * 1000, s.partFraction, titration.stockM);

  const cap = capacityOfPrepared(prepared, state.pH);
  // One criterion for weak buffering everywhere: the apparent pKa′ of the finished buffer at its own ionic strength and temperature (checks.ts).
  const weak = weakBufferingWarning(result);
  const warnings: ChemWarning[] = [...result.warnings, ...(weak ? [weak] : []), ...stockWarnings];
  const conductivity = conductivityOf(result);
  warnings.push(...conductivity.warnings);
  const predictions = {
    useTemperatureC: s.useT,
    pHAtUse: result.pH,
    // With nothing scaled (no stock, adjusted in the full volume) the meter reads the finished buffer at the bench temperature;
    // at the bench temperature of use it is the finished buffer itself, solved above.
    pHAtBench: fold === 1 && s.partFraction === 1 ? meterPh : s.benchT === s.useT ? result.pH : phFrom(withConditions(finished, s.benchT), meterPh, near),
    ionicStrengthM: result.ionicStrengthM,
    idealOsmolarityMosm: idealOsmolarity(result) * 1000,
    osmolalityMosmKg: result.osmolalityMosmKg,
    baseMmPerTenthPh: cap.baseMmPerTenthPh,
    acidMmPerTenthPh: cap.acidMmPerTenthPh,
    betaMPerPh: cap.betaMPerPh,
    pHPerDegreeC: dpHdT(finished, s.useT, result.pH, near),
    pHAfterTenfoldDilution: phFrom(scaleComposition(finished, 0.1), result.pH, near),
    conductivityMsPerCm: conductivity.conductivityMsPerCm,
    conductivity25MsPerCm: s.useT === 25 ? conductivity.conductivityMsPerCm : conductivityOf(speciateFrom(withConditions(finished, 25), result.pH, near)).conductivityMsPerCm,
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
          stockConductivity25MsPerCm:
            s.useT === 25 ? stockKappa.conductivityMsPerCm : conductivityOf(speciateFrom(withConditions(made.composition, 25), stockSpeciation.pH, near)).conductivityMsPerCm,
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
  // Built field by field in the order the plan has always had (no spreads: a conditional spread costs a few
  // tenths of a microsecond, and one that adds a field about a microsecond); absent parts stay absent.
  const plan: Partial<Building> = {
    route: s.route,
    buffer: s.system.name,
    targetPh: s.targetPh,
    concentrationMm: s.concentrationM * 1000,
    volumeMl: s.volumeL * 1000,
    activityModel: s.model,
    components,
  };
  if (titration) plan.titration = titration;
  plan.meter = meter;
  if (stock) plan.stock = stock;
  plan.predictions = predictions;
  plan.steps = [];
  plan.warnings = uniqueWarnings(warnings);
  plan.cautions = cautionsFor(made.weighed.map((w) => w.form).concat(made.titrant ? [made.titrant.form] : []));
  plan.constants = constants;
  plan.composition = finished;
  if (base.unadjustedPh !== undefined) plan.unadjustedPh = base.unadjustedPh;
  const done = plan as Building;
  done.steps = protocolSteps(done);
  return done;
}

/** A plan while it is put together. */
type Building = { -readonly [K in keyof RecipePlan]: RecipePlan[K] };

/** dpH/dT of a composition at a temperature, by central difference (one-sided at 0 and 100 °C); each solve starts from the pH (and the Pitzer γ) at t. */
function dpHdT(c: Composition, t: number, pHAtT: number, near: PitzerStart | undefined): number {
  const lo = Math.max(0, t - DPH_DT_STEP_C);
  const hi = Math.min(100, t + DPH_DT_STEP_C);
  return (phFrom(withConditions(c, hi), pHAtT, near) - phFrom(withConditions(c, lo), pHAtT, near)) / (hi - lo);
}

/**
 * pH of a composition, the solve's first Newton step taken from a pH already known nearby (the same
 * solution at another temperature or dilution), and with the Pitzer model its γ iteration from that
 * solution's γ (`near`, used when the species match): a few charge-balance evaluations and γ rounds fewer;
 * the bracket, tolerances, stopping rule and residual checks are the solver's own, unchanged.
 */
function phFrom(c: Composition, nearPh: number, near: PitzerStart | undefined): number {
  return solvePrepared(prepare(c), nearPh, near).pH;
}

/** The full speciation of a composition (as speciate), its solve started from a pH and γ known nearby (see phFrom). */
function speciateFrom(c: Composition, nearPh: number, near: PitzerStart | undefined): SpeciationResult {
  const p = prepare(c);
  return report(p, solvePrepared(p, nearPh, near), c);
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
    const grams = (w.concentrationM * volumeL * w.form.molarMass) / (purity / 100);
    // Two literal shapes rather than a conditional spread (a spread costs more than the rest of this loop).
    const { role, form } = w;
    const concentrationMm = w.concentrationM * 1000;
    return w.toTarget
      ? { role, name: form.name, formula: form.formula, molarMass: form.molarMass, concentrationMm, grams, purityPercent: purity, toTarget: true as const }
      : { role, name: form.name, formula: form.formula, molarMass: form.molarMass, concentrationMm, grams, purityPercent: purity };
  });
  if (titration && made.titrant) {
    out.push({
      role: 'titrant',
      name: `${titration.stockM} M ${made.titrant.form.name}`,
      formula: made.titrant.form.formula,
      concentrationMm: made.titrant.concentrationM * 1000,
      millilitres: titration.volumeMl,
    });
  }
  // Solids take up volume too, so water is given as "to volume", never as a subtraction.
  out.push({ role: 'water', name: 'water, to final volume', millilitres: volumeL * 1000 });
  return out;
}
