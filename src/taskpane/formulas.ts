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

/** A text literal for a formula: `"HEPES"`, with inner quotes doubled. */
export function text(value: string): string {
  return `"${value.replace(/"/g, '""')}"`;
}

/** A call with trailing blank arguments dropped: call('PH.OF', 'A1:B3', '', '') → `PROTON.PH.OF(A1:B3)`. */
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
  readonly volumeMl: string;
  readonly titrantMl: string;
  readonly partVolumeFraction: string;
}

export interface SettingCells {
  readonly buffer: string;
  readonly form: string;
  /** Purity of the form weighed, %. */
  readonly purityPercent: string;
  readonly titrant: string;
  readonly titrantStockM: string;
  readonly activityModel: string;
  readonly benchTemperatureC: string;
  readonly pKaUncertainty: string;
  readonly stockTolerancePercent: string;
  /** A range reference to the user's substances, or '' for none. */
  readonly userSubstances: string;
  /** The settings that are recipe options, as a two-column range (label, value). */
  readonly options: string;
  /** The salts block: two columns (name, mM); blank rows are no salt. */
  readonly salts: string;
}

/** Grams of a salt of the salts block for a volume, or blank beside a blank row. */
export const saltGrams = (name: string, mM: string, volumeMl: string, userSubstances: string) => `=IF(${name}="","",${call('GRAMS', name, mM, volumeMl, '', userSubstances)})`;

/**
 * The recipe row: one PROTON.RECIPE.ROW formula whose result spills across the row — grams
 * of the form(s), titrant mL and its band, the meter reading at the bench, pH at use,
 * capacity both ways, ionic strength, ideal osmolarity, salt to a target, stock per batch,
 * warnings — all from the recipe planner, with the sheet's salts and options.
 */
export const recipeRow = (s: SettingCells, r: RowCells) =>
  `=${call('RECIPE.ROW', s.buffer, r.targetPh, r.concentrationMm, r.volumeMl, r.useTemperatureC, s.salts, s.options, s.userSubstances)}`;

/** The whole recipe of a row, steps and warnings included, spilling one line per row (the row's live protocol). */
export const recipeProtocol = (s: SettingCells, r: RowCells) =>
  `=${call('RECIPE', s.buffer, r.targetPh, r.concentrationMm, r.volumeMl, r.useTemperatureC, s.salts, s.options, s.userSubstances)}`;

/** Titrant volume at a pH with the sheet's salts, mL. */
function titrantAt(s: SettingCells, r: RowCells, ph: string): string {
  return call('TITRANT.ML', s.form, r.concentrationMm, r.volumeMl, ph, s.titrant, s.titrantStockM, r.useTemperatureC, s.activityModel, s.salts, s.userSubstances);
}

/** Titrant amount in the final solution, mM, from its volume (mL × mol/L ÷ mL × 1000). */
export const titrantMm = (s: SettingCells, r: RowCells) => `=${r.titrantMl}*${s.titrantStockM}/${r.volumeMl}*1000`;
/** A composition row's name cell that turns blank when the name is blank (blank rows are ignored). */
export const nameOrBlank = (name: string) => `=IF(${name}="","",${name})`;
export const amountOrBlank = (name: string, mM: string) => `=IF(${name}="","",${mM})`;

/** Titrant volume at a pH, for the curve (the chart's row of the table gives form, amounts, salt and temperature). */
export const curveTitrantMl = (s: SettingCells, r: RowCells, ph: string) => `=IFERROR(${titrantAt(s, r, ph)},NA())`;
/** Capacity at a pH for the capacity curve: the composition of the chart's row at that pH's titrant amount. */
export const curveCapacity = (s: SettingCells, r: RowCells, composition: string) =>
  `=IFERROR(${call('CAPACITY', composition, text('base'), r.useTemperatureC, s.activityModel, s.userSubstances)},NA())`;
/** Apparent pKa′ of a step at the row's temperature (for the usable range, pKa′ ± the buffering half-width). */
export const pKaPrime = (buffer: string, step: number, r: RowCells, s: SettingCells, ionicStrength: string) =>
  `=${call('PKA', buffer, String(step), r.useTemperatureC, ionicStrength, s.activityModel, s.userSubstances)}`;
