/**
 * Mixing from stock solutions: target final concentrations (and optionally a pH at the
 * temperature of use) → millilitres of each stock and of water, the pH the mixture really
 * lands on at use and at the bench, its ionic strength, conductivity and ideal osmolarity,
 * and — when a pH target is missed by more than the tolerance — the titrant that corrects it.
 *
 * Method: C₁V₁ = C₂V₂ for each target (V_stock = c_target / c_stock × V); the mixture's
 * composition is the volume-weighted sum of the stocks' compositions (each stock's
 * composition follows from its form, or from the titrant amount that brought it to its
 * label pH); the solver then finds the pH with activities at each temperature. Neutral
 * additives add volume and dissolved particles only (docs/stocks.md).
 *
 * Pure: no I/O. Errors are ChemError with a code and field; a target that cannot fit in the
 * final volume is an infeasible-target error, never a warning.
 */
import { ACTIVITY_MODEL_LIMIT_M, ACTIVITY_MODEL_NAMES, parseActivityModel } from '../activity';
import { solutionWarnings } from '../checks';
import { Composition, systemAt, withConditions } from '../composition';
import { conductivityOf } from '../conductivity';
import { ChemError, MESSAGES } from '../errors';
import { isBlankValue, readNumberField, readTextField, requireNumberField } from '../input';
import { NeutralAdditive, findAdditive } from '../library/additives';
import { SubstanceLibrary, defaultLibrary } from '../library/lookup';
import { titrantFromForm } from '../library/titrant';
import { idealOsmolarity } from '../osmolarity';
import { SpeciationResult, speciate } from '../speciation';
import { HYDROCHLORIC_ACID, SODIUM_HYDROXIDE, Titrant, titrantForPh, withTitrant } from '../titration';
import { ChemWarning, uniqueWarnings, warning } from '../warnings';
import { Amount, Stock, StockInput, additiveMolarFromPercent, mergeSystems, percentBasis, resolveShelf } from './stocks';

/** A mixture differing from a titrated stock's label by more than this (pH) is explained in a warning (common practice: a tenth is what a bench notices). */
export const LABEL_DIFFERENCE_PH = 0.1;
/** Volumes are printed to this many significant figures (a round trip through the solver then holds within 0.05 %). */
export const VOLUME_SIGNIFICANT_FIGURES = 4;

/** One component wanted in the final mixture. */
export interface MixTarget {
  /** A stock's name, or what it holds (`tris`, `NaCl`, `EDTA`, `glycerol`). */
  readonly component: string;
  /** Final concentration, mM (or text with a unit: "150 mM", "0.5 M"). */
  readonly concentrationMm?: Amount;
  /** Final amount of a neutral additive, % (v/v for liquids, w/v for solids). */
  readonly percent?: Amount;
}

/** Everything the mix planner needs. */
export interface MixInput {
  /** The stock shelf. */
  readonly stocks: readonly StockInput[];
  readonly targets: readonly MixTarget[];
  /** Final volume, mL. */
  readonly volumeMl: Amount;
  /** pH wanted at the temperature of use (optional). */
  readonly targetPh?: Amount;
  /** How far the predicted pH may miss the target before a correction is planned (default 0.05). */
  readonly phTolerance?: Amount;
  /** Temperature of use, °C (default 25). */
  readonly useTemperatureC?: Amount;
  /** Temperature of the bench where the pH is checked, °C (default 25). */
  readonly benchTemperatureC?: Amount;
  /** Titrant for a correction (default 1 M NaOH or HCl, whichever moves the pH the right way). */
  readonly titrant?: { readonly form?: string; readonly concentrationM?: Amount };
  /** Smallest volume pipetted accurately, µL (default 2). */
  readonly smallestVolumeUl?: Amount;
  /** Activity model (default `davies`). */
  readonly activityModel?: string;
}

/** One line of the mix: a stock, a neat additive, the correcting titrant, or water. */
export interface MixComponent {
  readonly role: 'stock' | 'additive' | 'titrant' | 'water';
  readonly name: string;
  /** Volume to measure, mL (liquids). */
  readonly millilitres?: number;
  /** Mass to weigh, g (solid additives). */
  readonly grams?: number;
  /** What it gives in the final mixture: mM of its component, or % of an additive. */
  readonly finalText?: string;
  /** The component a target named (stocks and additives). */
  readonly component?: string;
}

/** How a titrated stock's label pH turns into the mixture's pH. */
export interface LabelShift {
  readonly stock: string;
  readonly labelPh: number;
  readonly labelTemperatureC: number;
  /** That stock diluted alone to its final concentration, at the label temperature. */
  readonly dilutedAlonePh: number;
  /** The whole mixture (before any correction) at the label temperature. */
  readonly mixedAtLabelTemperaturePh: number;
  /** The whole mixture (before any correction) at the temperature of use. */
  readonly mixedAtUsePh: number;
}

/** The pH correction planned when a target pH is missed. */
export interface MixCorrection {
  /** The titrant form (`sodium hydroxide`, `hydrochloric acid`, or the one given). */
  readonly titrant: string;
  readonly stockM: number;
  readonly direction: 'raises' | 'lowers';
  readonly millilitres: number;
  /** pH of the stocks alone, before the correction, at the temperature of use. */
  readonly uncorrectedPh: number;
}

/** What the mix planner answers. */
export interface MixPlan {
  readonly volumeMl: number;
  readonly useTemperatureC: number;
  readonly benchTemperatureC: number;
  readonly components: readonly MixComponent[];
  /** Final concentration of each component, mol/L (additives included). */
  readonly finalM: Readonly<Record<string, number>>;
  readonly predictions: {
    readonly pHAtUse: number;
    readonly pHAtBench: number;
    readonly ionicStrengthM: number;
    readonly conductivityMsPerCm: number;
    /** Ideal osmolarity (every dissolved particle, additives included), mOsm/L. */
    readonly idealOsmolarityMosm: number;
    /** Osmolality, mOsm/kg, when the activity model gives one (see `osmolalityOf`). */
    readonly osmolalityMosmKg?: number;
  };
  readonly targetPh?: number;
  readonly correction?: MixCorrection;
  readonly labelShifts: readonly LabelShift[];
  /** The mixture's acid–base systems and strong ions at the temperature of use (additives left out). */
  readonly composition: Composition;
  readonly warnings: readonly ChemWarning[];
  readonly cautions: readonly string[];
}

/**
 * Osmolality of the mixture, mOsm/kg, when the speciation result carries one (the
 * concentrated-solution activity model adds `osmolalityMosmKg`, φ·Σm, and `waterKgPerL`);
 * undefined until then (the ideal osmolarity stands in). Neutral additives are not in the
 * solver's result: they are added as ideal solutes (φ = 1) per kg of water.
 *
 * @param result - the solved mixture
 * @param additivesM - neutral additives, mol/L in all
 */
export function osmolalityOf(result: SpeciationResult, additivesM = 0): number | undefined {
  const r = result as unknown as { osmolalityMosmKg?: unknown; waterKgPerL?: unknown };
  if (typeof r.osmolalityMosmKg !== 'number' || !Number.isFinite(r.osmolalityMosmKg)) return undefined;
  const waterKgPerL = typeof r.waterKgPerL === 'number' && r.waterKgPerL > 0 ? r.waterKgPerL : 1;
  return r.osmolalityMosmKg + (additivesM / waterKgPerL) * 1000;
}

/** A volume as printed: VOLUME_SIGNIFICANT_FIGURES significant figures. */
export function printedVolume(millilitres: number): number {
  return millilitres === 0 ? 0 : Number(millilitres.toPrecision(VOLUME_SIGNIFICANT_FIGURES));
}

/** Text for a volume: mL, or µL below 1 mL. */
export function volumeWords(millilitres: number): string {
  return millilitres < 1 ? `${printedVolume(millilitres * 1000)} µL` : `${printedVolume(millilitres)} mL`;
}

/** A stock volume within a mixture. */
export interface StockVolume {
  readonly stock: string;
  readonly millilitres: number;
}

/** What a mixture made by volumes holds. */
export interface Mixture {
  /** Acid–base systems and strong ions, mol/L of the final volume. */
  readonly composition: Composition;
  /** Each stock's component, mol/L of the final volume (summed where two stocks hold the same one). */
  readonly componentM: Readonly<Record<string, number>>;
  /** Neutral additives, mol/L. */
  readonly additivesM: Readonly<Record<string, number>>;
}

/**
 * The composition of stocks mixed by volume and made up to a final volume with water.
 *
 * @param shelf - the resolved stocks
 * @param volumes - millilitres of each stock by name
 * @param finalVolumeMl - the final volume, mL
 * @param temperatureC - temperature of the mixture, °C
 * @param activityModel - activity model for the solver
 */
export function mixByVolumes(shelf: readonly Stock[], volumes: readonly StockVolume[], finalVolumeMl: number, temperatureC = 25, activityModel?: string): Mixture {
  const model = parseActivityModel('activityModel', activityModel);
  const systems = [];
  const strongIons: Record<string, number> = {};
  const componentM: Record<string, number> = {};
  const additivesM: Record<string, number> = {};
  for (const v of volumes) {
    const stock = shelf.find((s) => s.name.toLowerCase() === v.stock.toLowerCase());
    if (!stock)
      throw new ChemError(
        'invalid-input',
        'noStockFor',
        MESSAGES.noStockFor(
          'volumes',
          v.stock,
          shelf.map((s) => s.name),
        ),
        'volumes',
        shelf.map((s) => s.name).join(', '),
      );
    const f = v.millilitres / finalVolumeMl;
    for (const s of stock.composition.systems) systems.push(systemAt(s, s.totalM * f));
    for (const [ion, c] of Object.entries(stock.composition.strongIons ?? {})) strongIons[ion] = (strongIons[ion] ?? 0) + c * f;
    componentM[stock.component] = (componentM[stock.component] ?? 0) + stock.componentM * f;
    for (const [a, c] of Object.entries(stock.additivesM)) additivesM[a] = (additivesM[a] ?? 0) + c * f;
  }
  return { composition: { systems: mergeSystems(systems), strongIons, temperatureC, activityModel: model }, componentM, additivesM };
}

/**
 * The stock a target names: by stock name, then by what the stock holds (the library
 * resolves aliases and form names). Two stocks holding the same component make the name
 * ambiguous: the target must then name the stock.
 */
function stockFor(target: string, at: string, shelf: readonly Stock[], library: SubstanceLibrary): Stock | undefined {
  const k = target.trim().toLowerCase();
  const byName = shelf.find((s) => s.name.toLowerCase() === k);
  if (byName) return byName;
  let component: string | undefined;
  const additive = findAdditive(target);
  if (shelf.some((s) => s.component.toLowerCase() === k)) component = shelf.find((s) => s.component.toLowerCase() === k)?.component;
  else if (additive) component = additive.name;
  else {
    try {
      component = library.findSystem(target, 'target').name;
    } catch {
      try {
        const form = library.findForm(target, 'target');
        component = form.adds[0]?.system ?? form.substance;
      } catch {
        return undefined;
      }
    }
  }
  const holding = shelf.filter((s) => s.component === component);
  if (holding.length > 1) {
    const names = holding.map((s) => s.name);
    throw new ChemError('invalid-input', 'ambiguousStock', MESSAGES.ambiguousStock(at, target, names), at, names.join(', '));
  }
  return holding[0];
}

/** Smallest power of ten that brings a volume up to the pipetting limit. */
function dilutionFold(microlitres: number, smallestUl: number): number {
  return Math.pow(10, Math.ceil(Math.log10(smallestUl / microlitres) - 1e-12));
}

/** A target resolved: the stock (or neat additive) and the final concentration, mol/L. */
interface ResolvedTarget {
  readonly at: string;
  readonly stock?: Stock;
  readonly additive?: NeutralAdditive;
  readonly finalM: number;
  readonly finalText: string;
}

function resolveTargets(input: MixInput, shelf: readonly Stock[], library: SubstanceLibrary): ResolvedTarget[] {
  const targets = input.targets;
  if (!Array.isArray(targets) || targets.length === 0) {
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('targets', 'at least one component and its final concentration'), 'targets', 'a list of targets');
  }
  const seen = new Set<string>();
  return targets.map((t, i) => {
    const at = `targets[${i}]`;
    const e = (t ?? {}) as Partial<MixTarget>;
    const name = readTextField('form', e.component, `${at}.component`);
    if (name === undefined)
      throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(`${at}.component`, 'a stock or component name'), `${at}.component`, 'a name');
    const stock = stockFor(name, `${at}.component`, shelf, library);
    const additive = stock?.additive ?? (stock ? undefined : findAdditive(name));
    if (!stock && !additive)
      throw new ChemError(
        'invalid-input',
        'noStockFor',
        MESSAGES.noStockFor(
          `${at}.component`,
          name,
          shelf.map((s) => s.name),
        ),
        `${at}.component`,
        shelf.map((s) => s.name).join(', '),
      );
    const key = stock ? `stock:${stock.name}` : `additive:${additive?.name}`;
    if (seen.has(key)) throw new ChemError('invalid-input', 'targetTwice', MESSAGES.targetTwice(`${at}.component`, name), `${at}.component`, 'each component once');
    seen.add(key);
    let finalM: number;
    let finalText: string;
    if (!isBlankValue(e.percent)) {
      if (!additive)
        throw new ChemError('invalid-input', 'percentForAdditivesOnly', MESSAGES.percentForAdditivesOnly(`${at}.percent`, name), `${at}.percent`, 'a concentration in mM');
      const pct = requireNumberField('target.percent', e.percent, `${at}.percent`);
      finalM = additiveMolarFromPercent(additive, pct);
      finalText = `${pct} ${percentBasis(additive)}`;
    } else {
      const mM = requireNumberField('target.concentrationMm', e.concentrationMm, `${at}.concentrationMm`);
      finalM = mM / 1000;
      finalText = `${mM} mM`;
    }
    return { at, ...(stock ? { stock } : {}), ...(additive ? { additive } : {}), finalM, finalText };
  });
}

/**
 * Plans a working buffer mixed from stock solutions.
 *
 * @param input - the shelf, the targets (component and final mM or %), the final volume,
 *   optionally a target pH with its tolerance, temperatures, the correcting titrant, the
 *   smallest pipetted volume and the activity model
 * @param library - the substance library (the user's own substances included)
 * @returns mL of each stock, neat additives, the correction and water; the predicted pH at
 *   use and at the bench, ionic strength, conductivity, ideal osmolarity; how the label pH
 *   of each titrated stock moves; warnings and cautions
 * @throws ChemError invalid-input naming the field; infeasible-target (`stocksDoNotFit`)
 *   when the stocks cannot fit in the final volume, or (`unreachablePh`) when the titrant
 *   cannot reach the target pH
 * @example planMix({ stocks: [{ name: 'NaCl 5 M', form: 'NaCl', concentration: '5 M' }], targets: [{ component: 'NaCl', concentrationMm: 150 }], volumeMl: 50 }).components[0].millilitres // 1.5
 */
export function planMix(input: MixInput, library: SubstanceLibrary = defaultLibrary()): MixPlan {
  const model = parseActivityModel('activityModel', input.activityModel);
  const volumeMl = requireNumberField('volumeMl', input.volumeMl);
  const useT = requireNumberField('useTemperatureC', input.useTemperatureC);
  const benchT = readNumberField('temperatureC', input.benchTemperatureC, 'benchTemperatureC') ?? 25;
  const targetPh = readNumberField('mixTargetPh', input.targetPh, 'targetPh');
  const tolerance = requireNumberField('phTolerance', input.phTolerance);
  const smallestUl = requireNumberField('smallestVolumeUl', input.smallestVolumeUl);
  const shelf = resolveShelf(input.stocks, library, model);
  const targets = resolveTargets(input, shelf, library);
  const volumeL = volumeMl / 1000;

  const components: MixComponent[] = [];
  const volumes: StockVolume[] = [];
  const neat: { additive: NeutralAdditive; grams: number; millilitres: number }[] = [];
  let takenMl = 0;
  const parts: string[] = [];
  for (const t of targets) {
    if (t.stock) {
      const ml = (t.finalM / t.stock.componentM) * volumeMl;
      volumes.push({ stock: t.stock.name, millilitres: ml });
      components.push({ role: 'stock', name: t.stock.name, millilitres: ml, finalText: t.finalText, component: t.stock.component });
      takenMl += ml;
      parts.push(`${t.stock.name} ${volumeWords(ml)}`);
    } else if (t.additive) {
      const grams = t.finalM * volumeL * t.additive.molarMass;
      const liquid = t.additive.state === 'liquid' && t.additive.densityGPerMl !== undefined;
      const ml = liquid ? grams / (t.additive.densityGPerMl as number) : grams * t.additive.specificVolumeMlPerG;
      neat.push({ additive: t.additive, grams, millilitres: ml });
      components.push(
        liquid
          ? { role: 'additive', name: t.additive.name, millilitres: ml, grams, finalText: t.finalText, component: t.additive.name }
          : { role: 'additive', name: t.additive.name, grams, finalText: t.finalText, component: t.additive.name },
      );
      takenMl += ml;
      parts.push(`${t.additive.name} ${volumeWords(ml)}`);
    }
  }
  if (takenMl > volumeMl)
    throw new ChemError('infeasible-target', 'stocksDoNotFit', MESSAGES.stocksDoNotFit(takenMl, volumeMl, parts.join(', ')), 'targets', `at most ${volumeMl} mL in all`);

  const mixture = mixByVolumes(shelf, volumes, volumeMl, useT, model);
  const additivesM: Record<string, number> = { ...mixture.additivesM };
  for (const n of neat) additivesM[n.additive.name] = (additivesM[n.additive.name] ?? 0) + n.grams / n.additive.molarMass / volumeL;
  const uncorrected = mixture.composition;
  const uncorrectedResult = speciate(uncorrected);

  // A correction when a target pH is missed by more than the tolerance.
  let finished = uncorrected;
  let correction: MixCorrection | undefined;
  const warnings: ChemWarning[] = [];
  if (targetPh !== undefined && Math.abs(uncorrectedResult.pH - targetPh) > tolerance) {
    const raises = uncorrectedResult.pH < targetPh;
    const stockM = readNumberField('titrant.concentrationM', input.titrant?.concentrationM, 'titrant.concentrationM') ?? 1;
    const formName = readTextField('titrant.form', input.titrant?.form, 'titrant.form');
    const titrant: Titrant = formName ? titrantFromForm(library.findForm(formName, 'titrant.form'), library, 'titrant.form') : raises ? SODIUM_HYDROXIDE : HYDROCHLORIC_ACID;
    const amount = titrantForPh(uncorrected, titrant, targetPh);
    const ml = (amount.concentrationM / stockM) * volumeMl;
    finished = withTitrant(uncorrected, titrant, amount.concentrationM);
    correction = { titrant: titrant.name, stockM, direction: raises ? 'raises' : 'lowers', millilitres: ml, uncorrectedPh: uncorrectedResult.pH };
    components.push({ role: 'titrant', name: `${stockM} M ${titrant.name}`, millilitres: ml });
    takenMl += ml;
    if (takenMl > volumeMl)
      throw new ChemError(
        'infeasible-target',
        'stocksDoNotFit',
        MESSAGES.stocksDoNotFit(takenMl, volumeMl, [...parts, `${titrant.name} ${volumeWords(ml)}`].join(', ')),
        'titrant.concentrationM',
        'a more concentrated titrant',
      );
    warnings.push(warning('correctionNeeded', MESSAGES.correctionNeeded(uncorrectedResult.pH, targetPh, tolerance, volumeWords(ml), `${stockM} M ${titrant.name}`), 'targetPh'));
  }
  components.push({ role: 'water', name: 'water', millilitres: volumeMl - takenMl });

  const result = finished === uncorrected ? uncorrectedResult : speciate(finished);
  const atBench = speciate(withConditions(finished, benchT));
  const conductivity = conductivityOf(result);

  // How each titrated stock's label pH becomes the mixture's.
  const labelShifts: LabelShift[] = [];
  for (const v of volumes) {
    const stock = shelf.find((s) => s.name === v.stock) as Stock;
    if (!stock.label) continue;
    const alone = mixByVolumes(shelf, [v], volumeMl, stock.label.temperatureC, model).composition;
    const shift: LabelShift = {
      stock: stock.name,
      labelPh: stock.label.ph,
      labelTemperatureC: stock.label.temperatureC,
      dilutedAlonePh: speciate(alone).pH,
      mixedAtLabelTemperaturePh: speciate(withConditions(uncorrected, stock.label.temperatureC)).pH,
      mixedAtUsePh: uncorrectedResult.pH,
    };
    labelShifts.push(shift);
  }
  // The label people trust is the main buffer's: the titrated stock giving the most of its system.
  const main = [...labelShifts].sort((a, b) => (mixture.componentM[componentOf(shelf, b.stock)] ?? 0) - (mixture.componentM[componentOf(shelf, a.stock)] ?? 0))[0];
  if (main && Math.abs(main.mixedAtUsePh - main.labelPh) > LABEL_DIFFERENCE_PH) {
    warnings.push(
      warning(
        'mixDiffersFromLabel',
        MESSAGES.mixDiffersFromLabel(main.stock, main.labelPh, main.labelTemperatureC, main.mixedAtUsePh, useT, main.dilutedAlonePh, main.mixedAtLabelTemperaturePh),
        main.stock,
      ),
    );
  }

  // Volumes too small to pipette, with the dilution that fixes each.
  for (const c of components) {
    if (c.role === 'water' || c.millilitres === undefined || c.millilitres <= 0) continue;
    const ul = c.millilitres * 1000;
    if (ul < smallestUl) {
      const fold = dilutionFold(ul, smallestUl);
      warnings.push(warning('belowPipetteVolume', MESSAGES.belowPipetteVolume(c.name, ul, smallestUl, fold, Number((ul * fold).toPrecision(3))), c.name));
    }
  }

  // A titrated stock's titrant content comes from the activity model at the stock's own ionic strength.
  for (const stock of shelf) {
    if (stock.titrant && model !== 'ideal' && stock.titrant.ionicStrengthM > ACTIVITY_MODEL_LIMIT_M && volumes.some((v) => v.stock === stock.name)) {
      warnings.push(
        warning(
          'stockBeyondActivityModel',
          MESSAGES.stockBeyondActivityModel(stock.name, stock.titrant.ionicStrengthM, ACTIVITY_MODEL_LIMIT_M, ACTIVITY_MODEL_NAMES[model]),
          stock.name,
        ),
      );
    }
  }

  const additiveNames = Object.keys(additivesM).filter((a) => additivesM[a] > 0);
  if (additiveNames.length > 0) warnings.push(warning('additiveEffectNotModelled', MESSAGES.additiveEffectNotModelled(additiveNames.join(', ')), 'targets'));
  warnings.push(...solutionWarnings(finished, result), ...conductivity.warnings);

  const finalM: Record<string, number> = { ...mixture.componentM, ...additivesM };
  const additiveSum = additiveNames.reduce((sum, a) => sum + additivesM[a], 0);
  const osmolality = osmolalityOf(result, additiveSum);
  const cautions = cautionLines(
    shelf.filter((s) => volumes.some((v) => v.stock === s.name)),
    neat.map((n) => n.additive),
    correction,
  );
  return {
    volumeMl,
    useTemperatureC: useT,
    benchTemperatureC: benchT,
    components,
    finalM,
    predictions: {
      pHAtUse: result.pH,
      pHAtBench: atBench.pH,
      ionicStrengthM: result.ionicStrengthM,
      conductivityMsPerCm: conductivity.conductivityMsPerCm,
      idealOsmolarityMosm: (idealOsmolarity(result) + additiveSum) * 1000,
      ...(osmolality === undefined ? {} : { osmolalityMosmKg: osmolality }),
    },
    ...(targetPh === undefined ? {} : { targetPh }),
    ...(correction ? { correction } : {}),
    labelShifts,
    composition: finished,
    warnings: uniqueWarnings(warnings),
    cautions,
  };
}

function componentOf(shelf: readonly Stock[], name: string): string {
  return (shelf.find((s) => s.name === name) as Stock).component;
}

/** Caution lines for what goes into the mixture: each stock's form and titrant, each additive, the correcting titrant. */
function cautionLines(stocks: readonly Stock[], additives: readonly NeutralAdditive[], correction?: MixCorrection): string[] {
  const lines: string[] = [];
  const seen = new Set<string>();
  const add = (line: string) => {
    if (!seen.has(line)) {
      seen.add(line);
      lines.push(line);
    }
  };
  for (const s of stocks) {
    if (s.form?.cautionText) add(`${s.form.name}: ${s.form.cautionText}`);
    const a = s.additive;
    if (a?.cautionNote) add(`${a.name}: ${a.cautionNote}`);
  }
  for (const a of additives) if (a.cautionNote) add(`${a.name}: ${a.cautionNote}`);
  if (correction) add(`${correction.stockM} M ${correction.titrant}: corrosive; wear eye protection and add it in small portions while stirring.`);
  add('Planning aid only: check the pH of the finished mixture with a calibrated meter at the temperature of use, and follow your safety data sheets and local rules.');
  return lines;
}
