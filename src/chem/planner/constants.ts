/** The planner's defaults and thresholds, each with its reason (common practice where no source is named). */
import { BUFFERING_HALF_WIDTH } from '../checks';

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
export const MAX_SALT_TARGET_M = 5;

/** Most steps of the salt-target search: the bracket halves at least every third step, so 180 steps reach what 60 halvings of 5 M do (4e-18 M); it stops at 1e-12 of the salt, in about ten. */
export const SALT_TARGET_STEPS = 180;

/** Step for dpH/dT by central difference, °C. */
export const DPH_DT_STEP_C = 0.5;

/** How each salt-target goal is named in messages, with its unit. */
export const SALT_TARGET_WHAT: Readonly<Record<SaltGoal, (readAtC: number) => string>> = {
  ionicStrength: () => 'ionic strength (mol/L)',
  osmolarity: () => 'ideal osmolarity (mOsm/L)',
  osmolality: () => 'osmolality (mOsm/kg)',
  conductivity: (readAtC) => `conductivity (mS/cm at ${readAtC} °C)`,
};

/** What a salt target reaches. */
export type SaltGoal = 'ionicStrength' | 'osmolarity' | 'osmolality' | 'conductivity';

/** Warnings about the activity model's range: a stock's own bear on its meter reading. */
export const ACTIVITY_RANGE_CODES: ReadonlySet<string> = new Set(['beyondActivityModel', 'beyondPitzerRange', 'pitzerFallback', 'pitzerTemperature']);

/** Most secant steps, and the relative tolerance, when the stated total is held against a titrant of the buffer (a few steps reach 1e-9). */
export const HOLD_TOTAL_STEPS = 30;

export const HOLD_TOTAL_TOLERANCE = 1e-9;
