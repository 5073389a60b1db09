/**
 * A weak titrant that is itself a form of the buffer (acetic acid into sodium acetate) adds
 * to the buffer's total. The plan either states the total it makes (option titrantInBuffer
 * "state", the default: a warning with code titrantAddsBuffer) or weighs less of the form so
 * the stated total holds ("hold").
 */
import { planRecipe } from '../../../src/chem/planner';
import type { RecipeInput } from '../../../src/chem/planner';

/** Our own scenario: 100 mM acetate, pH 4.6 at 25 °C, 500 mL, sodium acetate trihydrate brought down with glacial acetic acid diluted to 1 M. */
const INPUT: RecipeInput = {
  buffer: 'acetate',
  targetPh: 4.6,
  concentrationMm: 100,
  volumeMl: 500,
  form: 'sodium acetate trihydrate',
  titrant: { form: 'acetic acid', concentrationM: 1 },
};
/** The held total matches the stated one to the secant's own tolerance (1e-9 relative), well inside this. */
const HELD = 1e-6;
/** The target is met by construction: the solver's pH tolerance. */
const PH_TOLERANCE = 1e-6;

const acetateMm = (input: RecipeInput) =>
  planRecipe(input)
    .composition.systems.filter((x) => /acet/i.test(x.name))
    .reduce((sum, x) => sum + x.totalM * 1000, 0);

describe('titrant of the buffer system itself', () => {
  it('"state" (default): weighs the stated amount and warns with the total the titrant makes', () => {
    const plan = planRecipe(INPUT);
    const w = plan.warnings.find((x) => x.code === 'titrantAddsBuffer');
    expect(w?.field).toBe('titrantInBuffer');
    const total = acetateMm(INPUT);
    expect(total).toBeGreaterThan(150);
    expect(w!.message).toContain(`${Number(total.toPrecision(4))} mM acetate in all, not the 100 mM stated`);
    expect(plan.components.find((c) => c.role === 'buffer')!.concentrationMm).toBeCloseTo(100, 9);
  });

  it('"hold": weighs less of the form so the finished buffer holds the stated total, at the target pH, with no warning', () => {
    const held = { ...INPUT, titrantInBuffer: 'hold' };
    const plan = planRecipe(held);
    expect(Math.abs(acetateMm(held) - 100) / 100).toBeLessThan(HELD);
    expect(Math.abs(plan.predictions.pHAtUse - 4.6)).toBeLessThan(PH_TOLERANCE);
    expect(plan.components.find((c) => c.role === 'buffer')!.concentrationMm).toBeLessThan(70);
    expect(plan.warnings.some((x) => x.code === 'titrantAddsBuffer')).toBe(false);
  });

  it('a strong titrant adds nothing to the buffer: no warning, the same plan either way', () => {
    const strong = { ...INPUT, titrant: { form: 'HCl', concentrationM: 1 } };
    const plan = planRecipe(strong);
    expect(plan.warnings.some((x) => x.code === 'titrantAddsBuffer')).toBe(false);
    expect(planRecipe({ ...strong, titrantInBuffer: 'hold' }).titration!.volumeMl).toBe(plan.titration!.volumeMl);
  });
});
