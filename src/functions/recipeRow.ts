/**
 * The figures of one recipe-table row, in one place: RECIPE.ROW spills them across a sheet
 * row, and the command line's batch mode writes them as a CSV or workbook row.
 */
import type { RecipePlan } from '../chem/planner';

/** Columns of RECIPE.ROW, in order; a recipe table's header row. */
export const RECIPE_ROW_HEADER = [
  'form (g)',
  'base form (g)',
  'titrant (mL)',
  'titrant low (mL)',
  'titrant high (mL)',
  'meter reads (pH)',
  'pH at use',
  'base per 0.1 pH (mM)',
  'acid per 0.1 pH (mM)',
  'ionic strength (mM)',
  'ideal osmolarity (mOsm/L)',
  'osmolality (mOsm/kg)',
  'conductivity at use temp. (mS/cm)',
  'conductivity at 25 °C (mS/cm)',
  'salt to target (g)',
  'stock per batch (mL)',
  'warnings',
] as const;

/**
 * A plan's row: grams of the buffer's form (the acid form on the two-forms route, with the
 * base form's grams beside it; blank on the other routes), titrant mL and its band, the meter
 * reading (of the stock itself on the stock route), pH at use, capacity both ways, ionic
 * strength (mM), ideal osmolarity, osmolality as an osmometer reads it, the predicted
 * conductivity at the temperature of use and at 25 °C (of the finished buffer: the working
 * dilution on the stock route), grams of a salt added to a target (blank without one),
 * stock per batch of working buffer (blank off the stock route) and the warnings as text.
 *
 * @param plan - a plan from planRecipe
 * @returns one value per RECIPE_ROW_HEADER column
 */
export function recipeRowValues(plan: RecipePlan): (number | string)[] {
  const weighed = plan.components.find((c) => c.role === 'buffer' || c.role === 'acid form');
  const base = plan.components.find((c) => c.role === 'base form');
  const t = plan.titration;
  const p = plan.predictions;
  return [
    weighed?.grams ?? 0,
    base?.grams ?? '',
    t?.volumeMl ?? 0,
    t?.lowMl ?? 0,
    t?.highMl ?? 0,
    plan.meter.pH,
    p.pHAtUse,
    p.baseMmPerTenthPh,
    p.acidMmPerTenthPh,
    p.ionicStrengthM * 1000,
    p.idealOsmolarityMosm,
    p.osmolalityMosmKg,
    p.conductivityMsPerCm,
    p.conductivity25MsPerCm,
    plan.components.find((c) => c.toTarget)?.grams ?? '',
    plan.stock?.stockPerBatchMl ?? '',
    plan.warnings.map((w) => w.message).join(' '),
  ];
}
