/**
 * A batch as made and a reading at the bench: what a user records, and what the as-made
 * check and the bench correction answer. Units are in the names; every number is read by
 * the one input reader against its declaration (src/chem/input, scope `batch`).
 */
import type { Composition } from '../composition';
import type { Amount } from '../planner/types';
import type { ChemWarning } from '../warnings';

/** One form as actually weighed. */
export interface WeighedActual {
  /** The form on the bottle (a name the library knows). */
  readonly form: string;
  /** Grams weighed (field `actual.grams`). */
  readonly grams: Amount;
  /** Purity of the lot, % (field `actual.purityPercent`; default: the purity planned). */
  readonly purityPercent?: Amount;
  /** Lot number, for the record only. */
  readonly lot?: string;
}

/** What was actually done (fields `actual.*`). */
export interface BatchActuals {
  /** Every form weighed; a planned form left out is an error until its grams are given (0 if none went in). */
  readonly weighed: readonly WeighedActual[];
  readonly titrantMl?: Amount;
  /** The titrant stock as standardised, M (default: the nominal stock of the plan). */
  readonly titrantConcentrationM?: Amount;
  readonly finalVolumeMl?: Amount;
  readonly benchTemperatureC?: Amount;
  /** What the meter read at the end of the adjustment. */
  readonly meterPh?: Amount;
  /** pH of the finished batch measured at the temperature of use. */
  readonly finalPh?: Amount;
  readonly conductivity25MsPerCm?: Amount;
}

/** Acceptance limits (fields `tolerance.*`); blanks take the declared defaults. */
export interface BatchTolerances {
  readonly ph?: Amount;
  readonly concentrationPercent?: Amount;
  readonly conductivityPercent?: Amount;
  readonly meterPh?: Amount;
}

/** One weighed component: planned against actual. */
export interface ComponentCheck {
  readonly role: string;
  /** The form weighed (the planned one, or the one actually weighed in its place). */
  readonly name: string;
  readonly plannedName: string;
  readonly plannedMm: number;
  readonly actualMm: number;
  readonly deviationPercent: number;
  readonly tolerancePercent: number;
  readonly pass: boolean;
}

/** One quantity of the finished batch: plan, as made (or measured), deviation, pass/fail. */
export interface QuantityCheck {
  /** Stable key: `pHAtUse`, `measuredPhAtUse`, `meterReading`, `conductivity25`, `measuredConductivity25`. */
  readonly key: string;
  readonly label: string;
  readonly unit: string;
  readonly planned: number;
  readonly value: number;
  /** value − planned (pH units), or the relative difference in % for conductivity. */
  readonly deviation: number;
  readonly tolerance: number;
  readonly pass: boolean;
}

/** The as-made check's answer. */
export interface AsMadeResult {
  /** True when every check with a tolerance passes. */
  readonly pass: boolean;
  readonly components: readonly ComponentCheck[];
  readonly titrant?: {
    readonly name: string;
    readonly millilitres: number;
    readonly stockM: number;
    readonly plannedMm: number;
    readonly actualMm: number;
    readonly deviationPercent: number;
  };
  readonly predictions: {
    readonly pHAtUse: number;
    readonly pHAtBench: number;
    /** What the meter should have read at the end of the adjustment (part volume, bench temperature). */
    readonly meterPh: number;
    readonly ionicStrengthM: number;
    readonly idealOsmolarityMosm: number;
    /** Only when the plan predicts osmolality: the plan's, scaled by the ideal osmolarity made (the plan's osmotic coefficient kept). */
    readonly osmolalityMosmPerKg?: number;
    readonly conductivityMsPerCm: number;
    readonly conductivity25MsPerCm: number;
  };
  readonly checks: readonly QuantityCheck[];
  readonly warnings: readonly ChemWarning[];
  readonly benchTemperatureC: number;
  readonly madeVolumeMl: number;
  /** The finished buffer as made, at the temperature of use (mol/L). */
  readonly composition: Composition;
}

/** The bench as it is now (fields `reading.*`, `actual.*`, `counterTitrant.*`). */
export interface BenchState {
  /** Titrant added so far, mL. */
  readonly titrantMl: Amount;
  readonly titrantConcentrationM?: Amount;
  readonly readingPh: Amount;
  readonly temperatureC?: Amount;
  readonly volumeMl?: Amount;
  /** Forms as weighed (default: as planned). */
  readonly weighed?: readonly WeighedActual[];
  readonly counterTitrant?: { readonly form?: string; readonly concentrationM?: Amount };
  readonly meterTolerancePh?: Amount;
}

/** A likely cause of a reading off the plan, with the value that would explain it. */
export interface LikelyCause {
  readonly cause: 'stock concentration' | 'hydrate' | 'salt form' | 'temperature' | 'calibration';
  readonly warning: ChemWarning;
  /** The stock M, the other form's name, the °C or the pH offset that fits the reading. */
  readonly fits: number | string;
}

/** The correction's answer. */
export interface BenchCorrection {
  /** `add` more titrant, `counter`-titrate after an overshoot, or `on-target`. */
  readonly action: 'add' | 'counter' | 'on-target';
  /** What to add next (the titrant, or the counter-titrant), and its stock, M. */
  readonly add: string;
  readonly stockM: number;
  /** Volume that reaches the end point by the model and the reading, mL. */
  readonly nextMl: number;
  /** A safe first portion, mL: add it, stir, read again. */
  readonly firstPortionMl: number;
  /** What the meter should read at the end point, here and now (this volume, this temperature). */
  readonly endPointPh: number;
  /** What the meter was expected to read now, from what was added. */
  readonly expectedPh: number;
  readonly readingPh: number;
  /** Half-width of the band around the expected reading, pH. */
  readonly bandPh: number;
  readonly offPlan: boolean;
  /** Titrant the reading implies is in the solution, as mL of the stock (differs from what was added when off plan). */
  readonly effectiveTitrantMl: number;
  readonly causes: readonly LikelyCause[];
  readonly warnings: readonly ChemWarning[];
}
