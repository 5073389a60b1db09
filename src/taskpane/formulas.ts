/**
 * Every worksheet formula the pane writes is spelled here, and only here. Function names
 * come from the generated catalog metadata (src/functions/metadata.json) with the add-in's
 * namespace (manifest.xml), so a renamed function fails loudly at build and test time
 * instead of writing #NAME? into a user's sheet.
 */
import metadata from '../functions/metadata.json';

/** The custom-functions namespace, as set in manifest.xml. */
export const NAMESPACE = 'PROTON';

const KNOWN = new Set((metadata as { functions: { name: string }[] }).functions.map((f) => f.name));

/** The function's name as typed in a cell, e.g. `PROTON.TITRANT.ML`. Throws if the catalog lacks it. */
export function fn(name: string): string {
  if (!KNOWN.has(name)) throw new Error(`The worksheet function catalog has no ${name} (src/functions/metadata.json).`);
  return `${NAMESPACE}.${name}`;
}

/** Whether the catalog has a function (for features that wait on one, such as a recipe function). */
export function hasFunction(name: string): boolean {
  return KNOWN.has(name);
}

/** A text literal for a formula: `"HEPES"`, with inner quotes doubled. */
export function text(value: string): string {
  return `"${value.replace(/"/g, '""')}"`;
}

/** A call with trailing blank arguments dropped: call('PH', 'A1:B3', '', '') → `PROTON.PH(A1:B3)`. */
export function call(name: string, ...args: string[]): string {
  const kept = [...args];
  while (kept.length > 0 && kept[kept.length - 1] === '') kept.pop();
  return `${fn(name)}(${kept.join(',')})`;
}

/** Cells (A1 references) of one table row and the sheet's settings block. */
export interface RowCells {
  readonly targetPh: string;
  readonly useTemperatureC: string;
  readonly concentrationMm: string;
  readonly saltMm: string;
  readonly volumeMl: string;
  readonly titrantMl: string;
  readonly partVolumeFraction: string;
}

export interface SettingCells {
  readonly form: string;
  readonly titrant: string;
  readonly titrantStockM: string;
  readonly salt: string;
  readonly activityModel: string;
  readonly benchTemperatureC: string;
  readonly pKaUncertainty: string;
  readonly stockTolerancePercent: string;
  /** A range reference to the user's substances, or '' for none. */
  readonly userSubstances: string;
}

/** Grams of the weighed form. */
export const formGrams = (s: SettingCells, r: RowCells) => `=${call('GRAMS', s.form, r.concentrationMm, r.volumeMl, '', s.userSubstances)}`;

/** Grams of the salt, or blank when the sheet names no salt. */
export const saltGrams = (s: SettingCells, r: RowCells) => `=IF(${s.salt}="","",${call('GRAMS', s.salt, r.saltMm, r.volumeMl, '', s.userSubstances)})`;

function titrantAt(s: SettingCells, r: RowCells, ph: string): string {
  return call('TITRANT.ML', s.form, r.concentrationMm, r.volumeMl, ph, s.titrant, s.titrantStockM, r.useTemperatureC, s.activityModel, s.userSubstances);
}

/** Titrant stock to add, mL, for the target pH at the temperature of use. */
export const titrantMl = (s: SettingCells, r: RowCells) => `=${titrantAt(s, r, r.targetPh)}`;

/**
 * Low and high ends of the titrant band: the volume at target ± the pKa uncertainty (a pKa
 * off by u moves the volume as a target off by u would), widened by the stock's tolerance.
 */
export const titrantLowMl = (s: SettingCells, r: RowCells) =>
  `=MIN(${titrantAt(s, r, `${r.targetPh}-${s.pKaUncertainty}`)},${titrantAt(s, r, `${r.targetPh}+${s.pKaUncertainty}`)})*(1-${s.stockTolerancePercent}/100)`;
export const titrantHighMl = (s: SettingCells, r: RowCells) =>
  `=MAX(${titrantAt(s, r, `${r.targetPh}-${s.pKaUncertainty}`)},${titrantAt(s, r, `${r.targetPh}+${s.pKaUncertainty}`)})*(1+${s.stockTolerancePercent}/100)`;

/** Titrant amount in the final solution, mM, from its volume (mL × mol/L ÷ mL × 1000). */
export const titrantMm = (s: SettingCells, r: RowCells) => `=${r.titrantMl}*${s.titrantStockM}/${r.volumeMl}*1000`;
/** An amount at part volume, mM: everything is in, only water is missing. */
export const atPartVolume = (mM: string, r: RowCells) => `=IF(${mM}="","",${mM}/${r.partVolumeFraction})`;
/** A composition row's name cell that turns blank when the name is blank (blank rows are ignored). */
export const nameOrBlank = (name: string) => `=IF(${name}="","",${name})`;
export const amountOrBlank = (name: string, mM: string) => `=IF(${name}="","",${mM})`;

/** pH the meter shows at the bench temperature, with the solution at part volume. */
export const meterReading = (s: SettingCells, partComposition: string) =>
  `=${call('PH.AT.TEMPERATURE', partComposition, s.benchTemperatureC, s.activityModel, s.userSubstances)}`;
/** pH of the finished buffer at the temperature of use (salt and titrant included): the check. */
export const phAtUse = (s: SettingCells, r: RowCells, composition: string) =>
  `=${call('PH.AT.TEMPERATURE', composition, r.useTemperatureC, s.activityModel, s.userSubstances)}`;
/** mM of strong base that raises the pH by 0.1. */
export const capacityMm = (s: SettingCells, r: RowCells, composition: string) =>
  `=${call('CAPACITY', composition, text('base'), r.useTemperatureC, s.activityModel, s.userSubstances)}`;
export const ionicStrengthMm = (s: SettingCells, r: RowCells, composition: string) =>
  `=${call('IONIC.STRENGTH.MM', composition, r.useTemperatureC, s.activityModel, s.userSubstances)}`;
export const idealOsmolarity = (s: SettingCells, r: RowCells, composition: string) =>
  `=${call('OSMOLARITY.IDEAL', composition, r.useTemperatureC, s.activityModel, s.userSubstances)}`;

/** pH at which the check may differ from the target before the row says so. */
export const CHECK_TOLERANCE_PH = 0.02;
/** Ionic strength above which the Davies model is stretched (SCIENCE.md), mM. */
export const ACTIVITY_LIMIT_MM = 500;
/** Temperatures above which the library's constants are extrapolated, °C (fitted range 0–60). */
export const FITTED_MAX_C = 60;

/** Plain-words warnings for a row, built from its own result cells. */
export function warnings(r: RowCells, cells: { check: string; ionicStrength: string }): string {
  const parts = [
    `IF(ISERROR(${r.titrantMl}),"No titrant volume: see its cell. ","")`,
    `IF(ISERROR(${r.titrantMl}),"",IF(${r.titrantMl}>0.25*${r.volumeMl},"Titrant over a quarter of the volume: use a stronger stock. ",""))`,
    `IF(ISERROR(${cells.check}),"",IF(ABS(${cells.check}-${r.targetPh})>${CHECK_TOLERANCE_PH},"Salt and titrant shift the pH to "&ROUND(${cells.check},2)&": finish on the meter. ",""))`,
    `IF(ISERROR(${cells.ionicStrength}),"",IF(${cells.ionicStrength}>${ACTIVITY_LIMIT_MM},"Ionic strength above 0.5 M: activity model stretched. ",""))`,
    `IF(${r.useTemperatureC}>${FITTED_MAX_C},"Above ${FITTED_MAX_C} °C: constants extrapolated. ","")`,
  ];
  return `=TRIM(${parts.join('&')})`;
}

/** Titrant volume at a pH, for the curve (the chart's row of the table gives form, amounts and temperature). */
export const curveTitrantMl = (s: SettingCells, r: RowCells, ph: string) => `=IFERROR(${titrantAt(s, r, ph)},NA())`;
/** Capacity at a pH for the capacity curve: the composition of the chart's row at that pH's titrant amount. */
export const curveCapacity = (s: SettingCells, r: RowCells, composition: string) => `=IFERROR(${call('CAPACITY', composition, text('base'), r.useTemperatureC, s.activityModel, s.userSubstances)},NA())`;
/** Apparent pKa′ of a step at the row's temperature (for the usable range, pKa′ ± 1). */
export const pKaPrime = (buffer: string, step: number, r: RowCells, s: SettingCells, ionicStrength: string) =>
  `=${call('PKA', buffer, String(step), r.useTemperatureC, ionicStrength, s.activityModel, s.userSubstances)}`;
