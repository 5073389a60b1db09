import { run } from '../../src/cli/main';

function call(args: string[]): { code: number; out: any } {
  let text = '';
  const code = run(args, (t) => (text += t));
  return { code, out: text.startsWith('{') ? JSON.parse(text) : text };
}

describe('proton-ledger solve', () => {
  it('solves an inline composition given in mM and prints one JSON result', () => {
    const { code, out } = call(['solve', '--json', JSON.stringify({ systems: [{ name: 'MES', chargeOfMostProtonated: 0, pKa: [6.27], totalMm: 50 }], strongIonsMm: { 'Na+': 25 }, activityModel: 'ideal' })]);
    expect(code).toBe(0);
    // Half-neutralised with the ideal model: pH = pKa within 0.001 (Henderson–Hasselbalch at 50 mM).
    expect(Math.abs(out.pH - 6.27)).toBeLessThan(0.001);
    expect(out.species.map((s: { name: string }) => s.name)).toEqual(['H+', 'OH-', 'Na+', 'MES 0', 'MES 1−']);
  });

  it('runs the demo composition', () => {
    const { code, out } = call(['demo']);
    expect(code).toBe(0);
    expect(out.result.pH).toBeGreaterThan(7);
    expect(out.result.temperatureC).toBe(4);
  });

  it.each([
    ['invalid JSON', ['solve', '--json', '{nope'], /not valid JSON/],
    ['a missing field', ['solve', '--json', '{"systems":[{"name":"x","pKa":[6]}]}'], /systems\.0\.chargeOfMostProtonated: Required/],
    ['an unknown field', ['solve', '--json', '{"temperature":25}'], /Unrecognized key/],
    ['a chemistry error', ['solve', '--json', '{"systems":[],"temperatureC":150,"strongIonsMm":{"Na+":1}}'], /temperatureC is 150/],
    ['mismatched ΔH list', ['solve', '--json', '{"systems":[{"name":"x","chargeOfMostProtonated":0,"pKa":[4,6],"deltaHkJ":[1],"totalMm":10}]}'], /one value per pKa step/],
    ['an unknown command', ['brew'], /Unknown command "brew"/],
  ])('given %s, prints a JSON error and exits 2', (_label, args, message) => {
    const { code, out } = call(args as string[]);
    expect(code).toBe(2);
    expect(out.error.message).toMatch(message);
  });

  it('prints usage for help', () => {
    expect(call(['help']).out).toMatch(/Usage:/);
  });
});
