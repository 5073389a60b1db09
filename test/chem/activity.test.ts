import { ionicStrengthFactor, log10Gamma } from '../../src/chem';
import { integerPower, parseActivityModel } from '../../src/chem/activity';
import { ChemError } from '../../src/chem';
import { expectClose } from './fixtures';

describe('activity models', () => {
  it('Davies at I = 0.1 M, A = 0.5100: log γ(1) = −0.5100·(0.3162/1.3162 − 0.03) (Davies 1962 form, evaluated by hand)', () => {
    const s = Math.sqrt(0.1);
    expectClose('davies', log10Gamma('davies', 1, 0.1, 0.51), -0.51 * (s / (1 + s) - 0.03), 1e-15);
  });
  it('Bates–Guggenheim at I = 0.1 M: log γ(1) = −A·√I/(1 + 1.5√I) (Buck et al. 2002)', () => {
    const s = Math.sqrt(0.1);
    expectClose('bg', log10Gamma('bates-guggenheim', 1, 0.1, 0.51), (-0.51 * s) / (1 + 1.5 * s), 1e-15);
  });
  it('scales with z²: a 2− ion has four times the log γ of a 1− ion', () => {
    expectClose('z2', log10Gamma('davies', -2, 0.05, 0.51), 4 * log10Gamma('davies', 1, 0.05, 0.51), 1e-15);
  });
  it('ideal gives γ = 1 and neutral species always have γ = 1', () => {
    expect(ionicStrengthFactor('ideal', 0.3)).toBe(0);
    expect(log10Gamma('davies', 0, 0.3, 0.51)).toBeCloseTo(0, 15);
  });
  it('integer powers of γ₁ by multiplication agree with exp(n·ln γ₁) for every power a mixed constant uses (|n| ≤ 13)', () => {
    /** A few units in the last place per multiplication: far below anything that moves a pH. */
    const POWER_TOLERANCE = 1e-14;
    for (const g of [0.2, 0.61, 0.93, 1, 1.3]) {
      for (let n = -13; n <= 13; n++) expect(Math.abs(integerPower(g, n) / Math.exp(n * Math.log(g)) - 1)).toBeLessThan(POWER_TOLERANCE);
    }
  });
  it('parses names case-insensitively, defaults to pitzer, and refuses unknown models naming the allowed ones', () => {
    expect(parseActivityModel('m', undefined)).toBe('pitzer');
    expect(parseActivityModel('m', ' Ideal ')).toBe('ideal');
    expect(parseActivityModel('m', 'Pitzer')).toBe('pitzer');
    expect(() => parseActivityModel('activityModel', 'sit')).toThrow(ChemError);
    expect(() => parseActivityModel('activityModel', 'sit')).toThrow(/pitzer, davies, ideal, bates-guggenheim/);
  });
});
