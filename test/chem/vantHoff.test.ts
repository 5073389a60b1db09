import { pKaAt } from '../../src/chem';
import { TRIS, PHOSPHATE } from './fixtures';
import { expectClose } from './fixtures';

describe("pKa(T) by integrated van 't Hoff with ΔCp° (Goldberg et al. 2002, eq. 5)", () => {
  it('returns the 25 °C value at 25 °C', () => {
    expectClose('tris 25', pKaAt(8.072, 47.45, -59, 25), 8.072, 1e-12);
  });
  it("with ΔCp = 0 matches the plain van 't Hoff form ΔpKa = ΔH/(R ln10)(1/T − 1/θ), evaluated by hand", () => {
    const t = 310.15;
    const expected = 8.072 + ((47450 / 8.314462618) * (1 / t - 1 / 298.15)) / Math.LN10;
    expectClose('tris 37 ΔCp=0', pKaAt(8.072, 47.45, 0, 37), expected, 1e-12);
  });
  it('tris moves about −0.028 pH per °C near 25 °C (common practice)', () => {
    const slope = (pKaAt(8.072, 47.45, -59, 30) - pKaAt(8.072, 47.45, -59, 20)) / 10;
    expectClose('tris dpKa/dT', slope, -0.028, 0.003);
  });
  it('tris pKa is about 7.7 at 37 °C and about 8.6 at 4 °C, within 0.1 (common practice)', () => {
    const [step] = TRIS.steps;
    expectClose('tris 37', pKaAt(step.pKa, step.deltaHkJ!, step.deltaCpJ!, 37), 7.72, 0.1);
    expectClose('tris 4', pKaAt(step.pKa, step.deltaHkJ!, step.deltaCpJ!, 4), 8.62, 0.1);
  });
  it('phosphate step 2 moves far less with temperature than tris (common practice)', () => {
    const p = PHOSPHATE.steps[1];
    const t = TRIS.steps[0];
    const dPhos = Math.abs(pKaAt(p.pKa, p.deltaHkJ!, p.deltaCpJ!, 4) - p.pKa);
    const dTris = Math.abs(pKaAt(t.pKa, t.deltaHkJ!, t.deltaCpJ!, 4) - t.pKa);
    expect(dPhos * 5).toBeLessThan(dTris);
  });
});
