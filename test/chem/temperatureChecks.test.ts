/**
 * Temperature warnings: a step used outside the temperatures its data cover, and a step
 * without ΔH° used away from 25 ± 2 °C (its pKa held at the 25 °C value).
 */
import { NO_ENTHALPY_TOLERANCE_C, temperatureWarnings } from '../../src/chem/temperatureChecks';
import { chemistryOf, findSystem } from '../../src/chem/library/lookup';

const at = (name: string, temperatureC: number, totalM = 0.05) => temperatureWarnings([{ ...chemistryOf(findSystem(name)), totalM }], temperatureC);

describe('temperatureWarnings', () => {
  it("says nothing for tris at 4, 25 and 37 °C (inside Bates & Hetzer's 0–50 °C)", () => {
    for (const t of [4, 25, 37]) expect(at('tris', t)).toEqual([]);
  });

  it('warns outsideDataRange for tris at 60 °C, naming the 0–50 °C range and step 1', () => {
    const [w, ...rest] = at('tris', 60);
    expect(rest).toEqual([]);
    expect(w).toMatchObject({ code: 'outsideDataRange', system: 'tris', steps: [1], temperatureC: 60, rangeC: [0, 50] });
    expect(w.message).toMatch(/^Temperature 60 °C lies outside 0–50 °C, the temperatures the data for tris \(step 1\) cover/);
  });

  it(`warns noEnthalpy for malate (no ΔH° for either step) beyond 25 ± ${NO_ENTHALPY_TOLERANCE_C} °C, and not within it`, () => {
    expect(at('malate', 4)).toEqual([expect.objectContaining({ code: 'noEnthalpy', system: 'malate', steps: [1, 2], temperatureC: 4 })]);
    expect(at('malate', 37)[0].message).toMatch(/^malate has no ΔH° for steps 1, 2: its pKa is held at the 25 °C value, so at temperature 37 °C/);
    for (const t of [23, 25, 27]) expect(at('malate', t)).toEqual([]);
    expect(at('malate', 27.5)).toHaveLength(1);
  });

  it('warns for the histidine step that still has no ΔH° (carboxyl, step 1) at 4 °C, not for steps 2 and 3', () => {
    expect(at('histidine', 4)).toEqual([expect.objectContaining({ code: 'noEnthalpy', steps: [1] })]);
  });

  it("leaves out steps more than 3 units from the pH when it is given: histidine's carboxyl step in a pH 6 buffer at 4 °C", () => {
    expect(temperatureWarnings([chemistryOf(findSystem('histidine'))], 4, 'Temperature', 6)).toEqual([]);
    expect(temperatureWarnings([chemistryOf(findSystem('histidine'))], 4, 'Temperature', 4.7)).toEqual([expect.objectContaining({ code: 'noEnthalpy', steps: [1] })]);
  });

  it('leaves out the strong H2SO4 step (pKa below 0) and systems with no amount', () => {
    expect(at('sulfate', 4)).toEqual([]);
    expect(at('malate', 4, 0)).toEqual([]);
  });

  it('names the temperature as the caller says (bench or use)', () => {
    const [w] = temperatureWarnings([chemistryOf(findSystem('lactate'))], 20, 'The bench temperature');
    expect(w.message).toMatch(/at the bench temperature 20 °C \(beyond 25 ± 2 °C\)/);
  });

  it('a user step without a range warns only for a missing ΔH°', () => {
    const user = { name: 'my acid', chargeOfMostProtonated: 0, steps: [{ pKa: 5 }, { pKa: 7, deltaHkJ: 10 }] };
    expect(temperatureWarnings([user], 90)).toEqual([expect.objectContaining({ code: 'noEnthalpy', steps: [1] })]);
  });
});
