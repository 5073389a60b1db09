/**
 * What a user asks of the recipe planner, and what it answers.
 */
import type { ActivityModel } from '../activity';
import type { Composition } from '../composition';
import type { ChemWarning } from '../warnings';

/**
 * A number given by a user: a number in the field's own unit (the unit in its name), or text
 * with a unit of the same kind ("50 mM", "0,5 L", "4 °C"), read by the one input reader
 * (src/chem/input; docs/input.md).
 */
export type Amount = number | string;

/** How the buffer is made. */
export type RecipeRoute =
  /** One form weighed, titrated to the meter reading with a stock of titrant. */
  | 'titrate'
  /** Two forms of the same system weighed in the right proportion; no titration. */
  | 'two-forms'
  /** A concentrated stock made by titration, diluted to the working buffer. */
  | 'stock';

/** The titrant stock on the shelf. */
export interface TitrantStock {
  /** Form name, e.g. `NaOH`, `HCl`, `acetic acid`. */
  readonly form: string;
  /** Concentration of the stock, mol/L. */
  readonly concentrationM: Amount;
  /** Relative tolerance of the stock's concentration, % (default 1: common practice for volumetric stocks). */
  readonly tolerancePercent?: Amount;
}

/** A salt (or any further form) at a fixed concentration in the final buffer. */
export interface SaltAmount {
  readonly form: string;
  readonly concentrationMm: Amount;
}

/** Add a salt until the final buffer reaches an ionic strength or an ideal osmolarity. */
export interface SaltTarget {
  readonly form: string;
  /** Target ionic strength, mol/L. Give this or `idealOsmolarityMosm`. */
  readonly ionicStrengthM?: Amount;
  /** Target ideal osmolarity, mOsm/L. */
  readonly idealOsmolarityMosm?: Amount;
  /** Target osmolality (what an osmometer reads), mOsm/kg. */
  readonly osmolalityMosmKg?: Amount;
  /** Target conductivity, mS/cm (instead of the others), read at `conductivityTemperatureC`. */
  readonly conductivityMsPerCm?: Amount;
  /** Temperature at which the conductivity target is read, °C, 0–60 (default: the temperature of use). */
  readonly conductivityTemperatureC?: Amount;
}

/** Everything the planner needs. Units are in the names. */
export interface RecipeInput {
  /** The buffer system, by substance or form name (`HEPES`, `phosphate`, `tris`). */
  readonly buffer: string;
  /** Target pH at the temperature of use. */
  readonly targetPh: Amount;
  /** Temperature at which the buffer will be used, °C (default 25). */
  readonly useTemperatureC?: Amount;
  /** Total concentration of the buffer system in the final buffer, mM. */
  readonly concentrationMm: Amount;
  /** Final volume, mL (of the working buffer; for the stock route, of diluted buffer). */
  readonly volumeMl: Amount;
  /** How it is made (default `titrate`). */
  readonly route?: RecipeRoute | string;
  /** Route titrate/stock: the form weighed (default: the first form of the system without counter-ions). */
  readonly form?: string;
  /** Route titrate/stock: the titrant stock (default: 1 M NaOH or 1 M HCl, whichever moves the pH the right way). */
  readonly titrant?: TitrantStock;
  /** Route two-forms: the more acidic form weighed. */
  readonly acidForm?: string;
  /** Route two-forms: the more basic form weighed. */
  readonly baseForm?: string;
  /** Route stock: how many times concentrated the stock is, and how much of it to make (mL; default: as much as `volumeMl`). */
  readonly stock?: { readonly fold: Amount; readonly volumeMl?: Amount };
  /** Further salts at fixed concentrations: a list, or text such as "NaCl 150 mM; KCl 2.7 mM". */
  readonly salts?: readonly SaltAmount[] | string;
  /** A salt added to reach an ionic strength or ideal osmolarity. */
  readonly saltTarget?: SaltTarget;
  /** Temperature at which the pH is adjusted on the bench, °C (default: the temperature of use). */
  readonly benchTemperatureC?: Amount;
  /** Fraction of the final volume at which the pH is adjusted (default 0.8). */
  readonly partVolumeFraction?: Amount;
  /** Purity of solids, % by form name (default 100). */
  readonly purityPercent?: Readonly<Record<string, Amount>>;
  /** Purity of the buffer's own form(s) weighed, whichever the route picks, % (default 100); a name in purityPercent wins. */
  readonly formPurityPercent?: Amount;
  /** A titrant that is a form of the buffer itself: state the total it makes (`state`, default) or weigh less so the stated total holds (`hold`). */
  readonly titrantInBuffer?: 'state' | 'hold' | string;
  /** Activity model (default `davies`). */
  readonly activityModel?: ActivityModel | string;
  /** pKa uncertainty for the titrant band, pH units (default: the library's, or 0.02 where it gives none). */
  readonly pKaUncertainty?: Amount;
}

/** One thing to measure out. */
export interface RecipeComponent {
  readonly role: 'buffer' | 'acid form' | 'base form' | 'titrant' | 'salt' | 'stock' | 'water';
  readonly name: string;
  readonly formula?: string;
  /** Molar mass of the exact form weighed, g/mol. */
  readonly molarMass?: number;
  /** Concentration of the form in what is being made, mM. */
  readonly concentrationMm?: number;
  /** Mass to weigh, g (purity applied). */
  readonly grams?: number;
  /** Volume to measure, mL. */
  readonly millilitres?: number;
  readonly purityPercent?: number;
  /** A salt whose amount the planner found to reach the salt target. */
  readonly toTarget?: true;
}

/** The titration part of a recipe. */
export interface TitrationPlan {
  readonly titrant: string;
  readonly stockM: number;
  /** `raises` when the titrant is a base, `lowers` when an acid. */
  readonly direction: 'raises' | 'lowers';
  /** Expected volume, mL. */
  readonly volumeMl: number;
  /** Band from the pKa uncertainty and the stock tolerance, mL. */
  readonly lowMl: number;
  readonly highMl: number;
  /** A safe first portion: below the low end of the band, mL. */
  readonly firstPortionMl: number;
  /** pKa uncertainty used for the band. */
  readonly pKaUncertainty: number;
  readonly tolerancePercent: number;
}

/** What the meter should read while adjusting. */
export interface MeterReading {
  readonly pH: number;
  readonly benchTemperatureC: number;
  /** Volume at which it is read, mL, and that volume as a fraction of the final. */
  readonly partVolumeMl: number;
  readonly partVolumeFraction: number;
}

/** Predicted properties of the finished buffer. */
export interface RecipePredictions {
  readonly useTemperatureC: number;
  /** pH at the temperature of use (equals the target by construction; shown as the check). */
  readonly pHAtUse: number;
  /** pH of the finished buffer at the bench temperature (full volume). */
  readonly pHAtBench: number;
  readonly ionicStrengthM: number;
  /** Ideal osmolarity (every particle counted once, no osmotic coefficient), mOsm/L. */
  readonly idealOsmolarityMosm: number;
  /** Osmolality φ·Σm, mOsm/kg (φ from the Pitzer equations): what a freezing-point osmometer reads. */
  readonly osmolalityMosmKg: number;
  /** mM of strong base that raises the pH by 0.1, and of strong acid that lowers it by 0.1. */
  readonly baseMmPerTenthPh: number;
  readonly acidMmPerTenthPh: number;
  /** β, mol/L per pH. */
  readonly betaMPerPh: number;
  /** Change of pH with temperature at the temperature of use, pH per °C. */
  readonly pHPerDegreeC: number;
  /** pH after a tenfold dilution with water, at the temperature of use. */
  readonly pHAfterTenfoldDilution: number;
  /** Conductivity of the finished buffer at the temperature of use, mS/cm (uncompensated, as a meter reads it there). */
  readonly conductivityMsPerCm: number;
  /** Conductivity of the finished buffer at 25 °C, mS/cm. */
  readonly conductivity25MsPerCm: number;
}

/** The stock route's extra numbers. */
export interface StockPlan {
  readonly fold: number;
  /** Volume of stock the weighing and titration make, mL. */
  readonly stockVolumeMl: number;
  /** pH of the undiluted stock at the temperature of use. */
  readonly stockPhAtUse: number;
  /** Stock and water for one batch of working buffer, mL. */
  readonly stockPerBatchMl: number;
  readonly waterPerBatchMl: number;
  /** Conductivity of the undiluted stock at the temperature of use and at 25 °C, mS/cm (the working dilution's are in the predictions). */
  readonly stockConductivityMsPerCm: number;
  readonly stockConductivity25MsPerCm: number;
}

/** The planner's answer. */
export interface RecipePlan {
  readonly route: RecipeRoute;
  readonly buffer: string;
  readonly targetPh: number;
  readonly concentrationMm: number;
  readonly volumeMl: number;
  readonly activityModel: ActivityModel;
  /** Things to weigh or measure, in the order used. */
  readonly components: readonly RecipeComponent[];
  readonly titration?: TitrationPlan;
  readonly meter: MeterReading;
  readonly stock?: StockPlan;
  readonly predictions: RecipePredictions;
  /** The bench protocol, in order, in plain words. */
  readonly steps: readonly string[];
  readonly warnings: readonly ChemWarning[];
  readonly cautions: readonly string[];
  /** The pKa values (25 °C and at the temperature of use) and their sources. */
  readonly constants: readonly { readonly pKa25: number; readonly pKaAtUse: number; readonly source: string }[];
  /** pH of the finished buffer's weighed form(s) and salts before any titrant, at the temperature of use (titrate and stock routes). */
  readonly unadjustedPh?: number;
  /** The finished buffer as the solver sees it, at the temperature of use (mol/L). */
  readonly composition: Composition;
}
