/**
 * The figures of one recipe-table row, in one place: RECIPE.ROW spills them across a sheet
 * row, and the command line's batch mode writes them as a CSV or workbook row.
 */
import type { RecipePlan } from '../chem/planner';

/** Columns of RECIPE.ROW, in order; a recipe table's header row. */
export const RECIPE_ROW_HEADER = [
  'form (g)',
  'titrant (mL)',
  'titrant low (mL)',
  'titrant high (mL)',
  'meter reads (pH)',
  'pH at use',
  'base per 0.1 pH (mM)',
  'acid per 0.1 pH (mM)',
  'ionic strength (mM)',
  'ideal osmolarity (mOsm/L)',
  'warnings',
] as const;

/**
 * A plan's row: grams of the buffer's form, titrant mL and its band, the meter reading, pH at
 * use, capacity both ways, ionic strength (mM), ideal osmolarity and the warnings as text.
 *
 * @param plan - a plan from planRecipe
 * @returns one value per RECIPE_ROW_HEADER column
 */
export function recipeRowValues(plan: RecipePlan): (number | string)[] {
  const weighed = plan.components.find((c) => c.role === 'buffer');
  const t = plan.titration;
  const p = plan.predictions;
  return [weighed?.grams ?? 0, t?.volumeMl ?? 0, t?.lowMl ?? 0, t?.highMl ?? 0, plan.meter.pH, p.pHAtUse, p.baseMmPerTenthPh, p.acidMmPerTenthPh, p.ionicStrengthM * 1000, p.idealOsmolarityMosm, plan.warnings.map((w) => w.message).join(' ')];
}
