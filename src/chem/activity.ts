/**
 * Activity-coefficient models. Davies, Bates–Guggenheim and ideal have the form
 * log10 γ_z = −A z² F(I), so one number F(I) per ionic strength serves every charge.
 * The Pitzer model (./pitzer) gives each ion its own γ from the whole composition; where
 * only an ionic strength is known (no composition), it falls back to the Bates–Guggenheim
 * form, its own limit in dilute solution to within 0.002 in log γ at I = 0.05.
 * Neutral species (and zwitterions of net charge 0) have γ = 1.
 */
import { ChemError, MESSAGES } from './errors';

/** The activity models a user can choose. */
export type ActivityModel = 'pitzer' | 'davies' | 'ideal' | 'bates-guggenheim';

/** Every model name, in the order offered to users; the first is the default. */
export const ACTIVITY_MODELS: readonly ActivityModel[] = ['pitzer', 'davies', 'ideal', 'bates-guggenheim'];

/** The model used when none is named. */
export const DEFAULT_ACTIVITY_MODEL: ActivityModel = ACTIVITY_MODELS[0];

/** How each model is named in sentences (the published methods keep their authors' names). */
export const ACTIVITY_MODEL_NAMES: Readonly<Record<ActivityModel, string>> = { pitzer: 'Pitzer', davies: 'Davies', ideal: 'ideal', 'bates-guggenheim': 'Bates–Guggenheim' };

/** Ionic strength (mol/L) above which Davies and Bates–Guggenheim are extrapolations; a warning is raised past it. Davies 1962, Ion Association, ch. 3: fit for I ≲ 0.1–0.5 M. */
export const ACTIVITY_MODEL_LIMIT_M = 0.5;

/** Molal ionic strength above which the Pitzer model is past the range of most of its parameters (PM73 fits reach 6 mol/kg for NaCl, 2–4 mol/kg for most salts); a warning is raised past it. */
export const PITZER_LIMIT_MOLAL = 4;

/**
 * The ionic-strength factor F(I) of a model, so that log10 γ_z = −A z² F(I).
 *
 * - davies: F = √I/(1+√I) − 0.3 I (C. W. Davies, Ion Association, Butterworths 1962).
 * - bates-guggenheim: F = √I/(1 + 1.5 √I), the extended Debye–Hückel form used to assign
 *   the primary pH standards (Buck et al., Pure Appl. Chem. 74 (2002) 2169, sec. 5).
 * - ideal: F = 0 (γ = 1).
 * - pitzer: where only an ionic strength is known, the Bates–Guggenheim F (see the module note).
 *
 * @param model - activity model
 * @param ionicStrengthM - ionic strength in mol/L (≥ 0)
 * @returns F(I), dimensionless
 */
export function ionicStrengthFactor(model: ActivityModel, ionicStrengthM: number): number {
  if (model === 'ideal') return 0;
  const s = Math.sqrt(ionicStrengthM);
  if (model === 'davies') return s / (1 + s) - 0.3 * ionicStrengthM;
  return s / (1 + 1.5 * s);
}

/**
 * dF/dI of a model's ionic-strength factor (see ionicStrengthFactor), per mol/L: what the
 * combined pH/ionic-strength Newton step needs. Infinite at I = 0 (√I); callers keep I > 0.
 *
 * @param model - activity model
 * @param ionicStrengthM - ionic strength in mol/L (> 0)
 */
export function ionicStrengthFactorSlope(model: ActivityModel, ionicStrengthM: number): number {
  if (model === 'ideal') return 0;
  const s = Math.sqrt(ionicStrengthM);
  if (model === 'davies') return 1 / (2 * s * (1 + s) * (1 + s)) - 0.3;
  const d = 1 + 1.5 * s;
  return 1 / (2 * s * d * d);
}

/**
 * x to an integer power n (either sign) by repeated squaring: the γ of an ion of charge z
 * in the one-number models is γ₁^(z²), so every charge's γ, and every mixed constant's
 * factor γ₁^(2z−1), follows from one exponential. Agrees with Math.exp(n·ln x) to a few
 * units in the last place for the |n| ≤ 64 that occur.
 */
export function integerPower(x: number, n: number): number {
  let k = n < 0 ? -n : n;
  let base = x;
  let result = 1;
  while (k > 0) {
    if (k & 1) result *= base;
    k >>= 1;
    if (k > 0) base *= base;
  }
  return n < 0 ? 1 / result : result;
}

/**
 * log10 of the activity coefficient of an ion of charge z.
 *
 * @param model - activity model
 * @param charge - ionic charge z
 * @param ionicStrengthM - ionic strength in mol/L
 * @param a - Debye–Hückel A at the temperature (see `debyeHuckelA`)
 */
export function log10Gamma(model: ActivityModel, charge: number, ionicStrengthM: number, a: number): number {
  return -a * charge * charge * ionicStrengthFactor(model, ionicStrengthM);
}

/** Returns the model named, or throws a typed error listing the allowed names. */
export function parseActivityModel(field: string, value: unknown): ActivityModel {
  if (value === undefined) return DEFAULT_ACTIVITY_MODEL;
  if (value === 'pitzer' || value === 'davies' || value === 'ideal' || value === 'bates-guggenheim') return value;
  const name = typeof value === 'string' ? value.trim().toLowerCase() : '';
  const found = ACTIVITY_MODELS.find((m) => m === name);
  if (!found) {
    const allowed = ACTIVITY_MODELS.join(', ');
    throw new ChemError('invalid-input', 'unknownModel', MESSAGES.unknownModel(field, String(value), allowed), field, allowed);
  }
  return found;
}

/**
 * Apparent (mixed) pKa′ of one step at an ionic strength, for use with pH = −log a(H⁺):
 * pK′ = pKa + log γ(A) − log γ(HA), with A one charge below HA (docs/science.md, Conventions).
 *
 * @param model - activity model
 * @param pKa - thermodynamic pKa at the temperature
 * @param chargeOfAcid - charge of the acid form HA of this step
 * @param ionicStrengthM - ionic strength, mol/L
 * @param a - Debye–Hückel A at the temperature
 * @returns pKa′
 * @example apparentPKa('davies', 7.198, -1, 0.1, 0.5108) // ≈ 6.877 (phosphate step 2 falls with I)
 */
export function apparentPKa(model: ActivityModel, pKa: number, chargeOfAcid: number, ionicStrengthM: number, a: number): number {
  return pKa + log10Gamma(model, chargeOfAcid - 1, ionicStrengthM, a) - log10Gamma(model, chargeOfAcid, ionicStrengthM, a);
}
