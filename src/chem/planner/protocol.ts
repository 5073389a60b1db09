/**
 * The bench protocol and the cautions of a recipe, in plain words, and a printable text
 * of the whole plan. Numbers are rounded here, for reading; the plan keeps full precision.
 */
import type { LibraryForm } from '../library/types';
import type { RecipeComponent, RecipePlan } from './types';

/** Said with every recipe: a planning aid, not a licence. */
export const GENERAL_CAUTION =
  'Planning aid only: verify the final pH with a calibrated meter at the temperature of use, and follow your safety data sheets, local rules and licensed practice.';

/** Plain caution lines for each hazard flag. */
const FLAG_WORDS: Readonly<Record<string, string>> = {
  corrosive: 'corrosive: wear eye protection and gloves; add it slowly, with stirring',
  toxic: 'toxic: handle with gloves, avoid dust, dispose of as your lab requires',
  arsenic: 'contains arsenic: toxic, collect waste separately',
  controlled: 'controlled substance: check your local rules before use',
  irritant: 'irritant: avoid contact with skin and eyes',
  oxidiser: 'oxidiser: keep away from organic material',
};

/**
 * Caution lines for the forms a recipe uses, most serious first, then the general caution.
 *
 * @param forms - every form weighed or poured
 * @returns one line per hazardous form, then GENERAL_CAUTION
 */
export function cautionsFor(forms: readonly LibraryForm[]): string[] {
  const lines: string[] = [];
  const seen = new Set<string>();
  for (const form of forms) {
    if (form.allCautions.length === 0 || seen.has(form.name)) continue;
    seen.add(form.name);
    let line = CAUTION_LINES.get(form);
    if (line === undefined) {
      const words = form.allCautions.map((f) => FLAG_WORDS[f] ?? f).join('; ');
      line = `${form.name}: ${words}.${form.cautionText ? ` ${form.cautionText}` : ''}`;
      CAUTION_LINES.set(form, line);
    }
    lines.push(line);
  }
  lines.push(GENERAL_CAUTION);
  return lines;
}

/** Each form's caution line, written once (it depends on the form alone). */
const CAUTION_LINES = new WeakMap<LibraryForm, string>();

/** Rounds for reading: 4 significant figures for masses, mL to 0.1 (0.01 below 10 mL). */
export function formatGrams(g: number): string {
  if (g >= 100) return g.toFixed(1);
  if (g >= 10) return g.toFixed(2);
  if (g >= 1) return g.toFixed(3);
  return g.toPrecision(3);
}

export function formatMl(ml: number): string {
  if (ml >= 100) return ml.toFixed(0);
  if (ml >= 10) return ml.toFixed(1);
  return ml.toFixed(2);
}

/**
 * A volume with its unit, as a pipette, cylinder or tank is read: below 1 mL in µL to three
 * significant figures (`10.8 µL`, `250 µL`), from 10 L in litres (`200 L`, `12.5 L`),
 * otherwise as formatMl in mL.
 *
 * @example volumeText(0.0108) // '10.8 µL'
 */
export function volumeText(ml: number): string {
  if (ml > 0 && ml < 1) {
    const ul = ml * 1000;
    return `${ul >= 100 ? ul.toFixed(0) : ul.toPrecision(3)} µL`;
  }
  if (ml >= 10_000) {
    const l = ml / 1000;
    return `${l >= 100 ? l.toFixed(0) : l.toPrecision(3)} L`;
  }
  return `${formatMl(ml)} mL`;
}

/** Largest volume usually made up in a volumetric flask, mL (common practice: flasks stop at 2–5 L). */
const LARGEST_FLASK_ML = 2000;

/** An expected range of volumes, in one unit: `5.98–6.35 mL`, `10.5–11.2 µL`. */
function volumeRange(lowMl: number, highMl: number): string {
  const high = volumeText(highMl);
  const unit = high.endsWith('µL') ? ' µL' : ' mL';
  const low = volumeText(lowMl);
  return low.endsWith(unit) ? `${low.slice(0, -unit.length)}–${high}` : `${low}–${high}`;
}

/** pH to two decimals: what a bench meter shows. */
export function formatPh(pH: number): string {
  return pH.toFixed(2);
}

function weighLine(c: RecipeComponent): string {
  const purity = c.purityPercent !== undefined && c.purityPercent < 100 ? `, ${c.purityPercent} % pure` : '';
  return `${formatGrams(c.grams!)} g of ${c.name} (${c.formula}, ${c.molarMass!.toFixed(2)} g/mol${purity})`;
}

/**
 * The bench steps of a plan, in order.
 *
 * @param plan - a plan (its steps field is ignored)
 * @returns numbered-in-order plain sentences
 */
export function protocolSteps(plan: RecipePlan): string[] {
  const weighed = plan.components.filter((c) => c.grams !== undefined);
  const t = plan.titration;
  const m = plan.meter;
  const finalMl = plan.stock ? plan.stock.stockVolumeMl : plan.volumeMl;
  const steps: string[] = [];
  steps.push(`Weigh ${weighed.map(weighLine).join('; and ')}.`);
  const dissolveMl = Math.max(0, m.partVolumeMl - (t?.volumeMl ?? 0));
  steps.push(
    `Dissolve in about ${volumeText(dissolveMl)} of water, leaving room for the pH adjustment in about ${volumeText(m.partVolumeMl)} (${Math.round(m.partVolumeFraction * 100)} % of the ${volumeText(finalMl)}).`,
  );
  steps.push(`Bring the solution to ${m.benchTemperatureC} °C and calibrate the pH meter at that temperature.`);
  if (t) {
    steps.push(
      `Add about ${volumeText(t.firstPortionMl)} of ${t.stockM} M ${t.titrant} (a safe first portion; expect ${volumeRange(t.lowMl, t.highMl)} in all, about ${volumeText(t.volumeMl)}), mix, then add more in small portions until the meter reads ${formatPh(m.pH)} at ${m.benchTemperatureC} °C.`,
    );
  } else {
    steps.push(
      `Mix until dissolved; the meter should read ${formatPh(m.pH)} at ${m.benchTemperatureC} °C. If it is off by more than 0.05, adjust with small portions of the acid or base form, or of dilute strong acid or base.`,
    );
  }
  const vessel = finalMl <= LARGEST_FLASK_ML ? `a ${volumeText(finalMl)} volumetric flask or graduated vessel` : 'a graduated vessel or tank';
  steps.push(`Transfer to ${vessel}, rinse in, and bring to ${volumeText(finalMl)} with water at ${m.benchTemperatureC} °C.`);
  if (plan.stock) {
    steps.push(`Mix well. The stock reads about pH ${formatPh(plan.stock.stockPhAtUse)} at ${plan.predictions.useTemperatureC} °C; that is expected, not an error.`);
    steps.push(
      `For ${volumeText(plan.volumeMl)} of working buffer, mix ${volumeText(plan.stock.stockPerBatchMl)} of stock with ${volumeText(plan.stock.waterPerBatchMl)} of water.`,
    );
  } else {
    steps.push('Mix well.');
  }
  steps.push(
    `Check: at ${plan.predictions.useTemperatureC} °C the buffer should read pH ${formatPh(plan.predictions.pHAtUse)}; verify with a calibrated meter at that temperature.`,
  );
  return steps;
}

/** A conductivity for print, mS/cm to three significant figures (µS/cm below 1 mS/cm). */
function conductivityText(msPerCm: number): string {
  return msPerCm < 1 ? `${(msPerCm * 1000).toPrecision(3)} µS/cm` : `${msPerCm.toPrecision(3)} mS/cm`;
}

/**
 * The whole plan as printable text: components, steps, predictions, warnings, cautions.
 *
 * @param plan - a plan from planRecipe
 * @returns text for a terminal or a printed sheet
 */
export function formatRecipe(plan: RecipePlan): string {
  const p = plan.predictions;
  const lines: string[] = [];
  lines.push(`${plan.buffer} buffer, ${plan.concentrationMm} mM, pH ${plan.targetPh} at ${p.useTemperatureC} °C, ${volumeText(plan.volumeMl)} (${plan.route})`);
  if (plan.stock)
    lines.push(`Made as ${volumeText(plan.stock.stockVolumeMl)} of ${plan.stock.fold}× stock (${(plan.concentrationMm * plan.stock.fold).toPrecision(4)} mM), diluted for use`);
  lines.push('');
  lines.push('Amounts');
  for (const c of plan.components) {
    const amount = c.grams !== undefined ? `${formatGrams(c.grams)} g` : c.role === 'water' ? `to ${volumeText(c.millilitres ?? 0)}` : volumeText(c.millilitres ?? 0);
    lines.push(`  ${c.role.padEnd(9)} ${amount.padStart(10)}  ${c.name}${c.concentrationMm !== undefined ? ` (${c.concentrationMm.toPrecision(4)} mM)` : ''}`);
  }
  lines.push('');
  lines.push('Steps');
  plan.steps.forEach((s, i) => lines.push(`  ${i + 1}. ${s}`));
  lines.push('');
  lines.push('Predicted');
  lines.push(`  meter while adjusting   pH ${formatPh(plan.meter.pH)} at ${plan.meter.benchTemperatureC} °C in ${volumeText(plan.meter.partVolumeMl)}`);
  const atBench = plan.meter.benchTemperatureC === p.useTemperatureC ? '' : `; ${formatPh(p.pHAtBench)} at ${plan.meter.benchTemperatureC} °C (finished buffer at the bench)`;
  lines.push(`  pH at use               ${formatPh(p.pHAtUse)} at ${p.useTemperatureC} °C${atBench}`);
  lines.push(`  ionic strength          ${(p.ionicStrengthM * 1000).toFixed(1)} mM`);
  lines.push(`  ideal osmolarity        ${p.idealOsmolarityMosm.toFixed(0)} mOsm/L`);
  lines.push(`  osmolality              ${p.osmolalityMosmKg.toFixed(0)} mOsm/kg (Pitzer osmotic coefficient)`);
  const at25 = p.useTemperatureC === 25 ? '' : `; ${conductivityText(p.conductivity25MsPerCm)} at 25 °C`;
  lines.push(`  conductivity            ${conductivityText(p.conductivityMsPerCm)} at ${p.useTemperatureC} °C${at25}`);
  if (plan.stock)
    lines.push(
      `  stock conductivity      ${conductivityText(plan.stock.stockConductivityMsPerCm)} at ${p.useTemperatureC} °C; ${conductivityText(plan.stock.stockConductivity25MsPerCm)} at 25 °C`,
    );
  lines.push(`  capacity                ${p.baseMmPerTenthPh.toFixed(2)} mM base or ${p.acidMmPerTenthPh.toFixed(2)} mM acid per 0.1 pH`);
  lines.push(`  temperature             ${p.pHPerDegreeC.toFixed(4)} pH per °C`);
  lines.push(`  tenfold dilution        pH ${formatPh(p.pHAfterTenfoldDilution)}`);
  if (plan.warnings.length) {
    lines.push('');
    lines.push('Warnings');
    for (const w of plan.warnings) lines.push(`  ! ${w.message}`);
  }
  lines.push('');
  lines.push('Cautions');
  for (const c of plan.cautions) lines.push(`  - ${c}`);
  return lines.join('\n');
}
