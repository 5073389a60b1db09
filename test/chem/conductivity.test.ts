import { conductivityAt, conductivityOf, speciate, waterDensity, waterViscosity } from '../../src/chem';
import type { Composition } from '../../src/chem';
import { relaxationFactor } from '../../src/chem/conductivity';
import { PHOSPHATE, expectClose } from './fixtures';
import { CRC_TABLE_TEMPERATURE_C, K2HPO4, KH2PO4, NA2HPO4, NACL, TableRow, molarityOf, tableRow } from './crcConductivityTable';

/** Warnings are compared by code (and field), never by message text. */
const codes = (ws: readonly { code: string }[]) => ws.map((w) => w.code);

/** KCl primary standard at 25 °C, 0.01 mol/kg, a QC meter's usual calibration point: 1 % covers the λ° tables and the density conversion. */
const KCL_001_TOLERANCE = 0.01;
/** 0.1 mol/kg: the ion-by-ion Onsager correction is further from its limiting law here. */
const KCL_01_TOLERANCE = 0.02;
/** 1 mol/kg: beyond where any Onsager-type correction is exact; 5 % is what an ion-size term buys. */
const KCL_1_TOLERANCE = 0.05;
/** 0.01 mol/kg at 15, 20, 30 °C: adds the temperature shapes of K⁺ and Cl⁻. */
const KCL_TEMPERATURE_TOLERANCE = 0.015;
/** NaCl molar conductivities up to 0.1 mol/L: the same model with Na⁺ for K⁺. */
const NACL_TOLERANCE = 0.03;
/** NaCl 0.09–0.35 mol/L at 20 °C against the CRC mass-percent table: values of three figures, the density conversion, and the ion-size term's extrapolation beyond 0.1 M. */
const NACL_CRC_TOLERANCE = 0.03;
/** Phosphate salts 0.03–0.15 mol/L: λ° of H₂PO₄⁻ and HPO₄²⁻ are uncertain by several percent, the model forms no ion pairs, and the table gives two or three figures. */
const PHOSPHATE_CRC_TOLERANCE = 0.05;
/** Water viscosity against the IAPWS values: the Kestin fit is good to about 0.1 % over 0–60 °C. */
const VISCOSITY_TOLERANCE = 0.002;

/** Molar mass of KCl, g/mol (IUPAC atomic weights, common practice). */
const KCL_MOLAR_MASS = 74.551;
/**
 * Apparent molar volume of KCl in water, cm³/mol: about 27 below 0.1 mol/kg and 29 at
 * 1 mol/kg (memory of Millero's compilations); it only moves the molality-to-molarity
 * conversion by ~0.05 % per cm³/mol at 1 mol/kg.
 */
const kclApparentVolume = (molality: number) => (molality < 0.5 ? 27.2 : 28.9);

/** mol/L of KCl in a solution of the given molality at t °C, from the water density and KCl's apparent molar volume. */
function kclMolarity(molality: number, temperatureC: number): number {
  const rhoWater = waterDensity(temperatureC);
  const rho = (1000 + molality * KCL_MOLAR_MASS) / (1000 / rhoWater + molality * kclApparentVolume(molality));
  return (molality * rho) / (1 + (molality * KCL_MOLAR_MASS) / 1000);
}

function salt(cation: string, anion: string, c: number, temperatureC: number): Composition {
  return { systems: [], strongIons: { [cation]: c, [anion]: c }, temperatureC };
}

function expectRelative(input: string, result: number, expected: number, tolerance: number): void {
  expectClose(input, result, expected, expected * tolerance);
}

describe('KCl conductivity standards (Wu, Koch & Pratt, J. Res. NIST 96 (1991) 191; Wu et al., J. Res. NIST 99 (1994) 241; as tabulated in the CRC Handbook, "Standard KCl solutions for calibrating conductivity cells")', () => {
  it.each([
    [0.01, 1.40823, KCL_001_TOLERANCE],
    [0.1, 12.8246, KCL_01_TOLERANCE],
    [1.0, 108.62, KCL_1_TOLERANCE],
  ])('%p mol/kg at 25 °C reads %p mS/cm within the named tolerance', (molality, expected, tolerance) => {
    const k = conductivityAt(salt('K+', 'Cl-', kclMolarity(molality, 25), 25)).conductivityMsPerCm;
    expectRelative(`κ(KCl ${molality} mol/kg, 25 °C)`, k, expected, tolerance);
  });

  it.each([
    [15, 1.14145],
    [20, 1.27303],
    [30, 1.54663],
  ])('0.01 mol/kg at %p °C reads %p mS/cm within 1.5 %', (t, expected) => {
    const k = conductivityAt(salt('K+', 'Cl-', kclMolarity(0.01, t), t)).conductivityMsPerCm;
    expectRelative(`κ(KCl 0.01 mol/kg, ${t} °C)`, k, expected, KCL_TEMPERATURE_TOLERANCE);
  });
});

describe('NaCl molar conductivity at 25 °C (Vanýsek, CRC Handbook, "Equivalent conductivity of electrolytes in aqueous solution" (memory; five of the six values checked against a second copy, agreeing within 0.1))', () => {
  it.each([
    [0.001, 123.68],
    [0.005, 120.59],
    [0.01, 118.45],
    [0.02, 115.7],
    [0.05, 111.01],
    [0.1, 106.69],
  ])('%p mol/L: Λ = %p S cm²/mol within 3 %', (c, expected) => {
    const k = conductivityAt(salt('Na+', 'Cl-', c, 25)).conductivityMsPerCm;
    expectRelative(`Λ(NaCl ${c} M)`, k / c, expected, NACL_TOLERANCE);
  });
});

/** The solution of a table row at 20 °C: the salt's ions, or its phosphate with its cations. */
function tableSolution(r: TableRow): Composition {
  const c = molarityOf(r);
  const cations = { [r.salt.cation]: r.salt.cationsPerFormula * c };
  if (r.salt.anion === 'Cl-') return { systems: [], strongIons: { ...cations, 'Cl-': c }, temperatureC: CRC_TABLE_TEMPERATURE_C };
  return { systems: [{ ...PHOSPHATE, totalM: c }], strongIons: cations, temperatureC: CRC_TABLE_TEMPERATURE_C };
}

describe('NaCl above 0.1 mol/L at 20 °C (CRC Handbook, "Electrical conductivity of aqueous solutions", copy in ugognw/pchemdb; densities from CRC "Concentrative properties of aqueous solutions", copy in amosonabike/CRC-Solution-Properties-)', () => {
  it.each([0.5, 1, 2])('%p % NaCl reads the published κ within 3 %', (massPercent) => {
    const r = tableRow(NACL, massPercent);
    const k = conductivityAt(tableSolution(r)).conductivityMsPerCm;
    expectRelative(`κ(NaCl ${massPercent} %, ${molarityOf(r).toFixed(4)} M, 20 °C)`, k, r.conductivityMsPerCm, NACL_CRC_TOLERANCE);
  });
});

describe('phosphate salts at 20 °C (CRC Handbook, "Electrical conductivity of aqueous solutions", copy in ugognw/pchemdb; densities from CRC "Concentrative properties of aqueous solutions", copy in amosonabike/CRC-Solution-Properties-)', () => {
  it.each([
    ['KH2PO4', 0.5, KH2PO4],
    ['KH2PO4', 1, KH2PO4],
    ['KH2PO4', 2, KH2PO4],
    ['K2HPO4', 0.5, K2HPO4],
    ['K2HPO4', 1, K2HPO4],
    ['K2HPO4', 2, K2HPO4],
    ['Na2HPO4', 1, NA2HPO4],
    ['Na2HPO4', 2, NA2HPO4],
  ] as const)('%s %p % reads the published κ within 5 %', (formula, massPercent, salt) => {
    const r = tableRow(salt, massPercent);
    const k = conductivityAt(tableSolution(r)).conductivityMsPerCm;
    expectRelative(`κ(${formula} ${massPercent} %, ${molarityOf(r).toFixed(4)} M, 20 °C)`, k, r.conductivityMsPerCm, PHOSPHATE_CRC_TOLERANCE);
  });
});

describe("Onsager's relaxation factor for unsymmetrical salts (Robinson & Stokes 1959, eq. 7.36)", () => {
  it('is 1 for a 1:1 salt whatever the two ions', () => {
    expectClose('r(1:1)', relaxationFactor(1, 50.1, { charge: 1, lambdaPerEquivalent: 76.3 }), 1, 1e-12);
  });

  it('is the same for both ions of a 2:1 salt: 1.85 for Na₂HPO₄ by hand from eq. 7.36, where z² scaling gave 4 for HPO₄²⁻ and 1 for Na⁺', () => {
    // Na⁺ 50.1 and ½HPO₄²⁻ 57 S cm²/mol per equivalent: q = (2/3)·107.1/157.2 = 0.4542, r = 2q/(1 + √q)/0.2929 = 1.853.
    const na = relaxationFactor(1, 50.1, { charge: 2, lambdaPerEquivalent: 57 });
    const hpo4 = relaxationFactor(2, 57, { charge: 1, lambdaPerEquivalent: 50.1 });
    expectClose('r(Na⁺) = r(HPO₄²⁻)', na, hpo4, 1e-12);
    expectClose('r(Na₂HPO₄)', na, 1.853, 0.001);
  });
});

describe('water viscosity (Kestin et al. 1978) against IAPWS 2008 values (common practice)', () => {
  it.each([
    [0, 1.7914],
    [25, 0.89],
    [60, 0.4665],
  ])('at %p °C is %p mPa·s within 0.2 %', (t, expected) => {
    expectRelative(`η(${t})`, waterViscosity(t), expected, VISCOSITY_TOLERANCE);
  });
});

describe('conductivity of buffers', () => {
  const phosphateBuffer = (t: number): Composition => ({
    systems: [{ ...PHOSPHATE, totalM: 0.05 }],
    strongIons: { 'Na+': 0.075, 'Cl-': 0.15, 'K+': 0.15 },
    temperatureC: t,
  });

  it('counts only charged species: a zwitterion at its neutral form carries no current', () => {
    const r = conductivityOf(speciate({ systems: [{ name: 'zwitter', chargeOfMostProtonated: 1, steps: [{ pKa: 2 }, { pKa: 12 }], totalM: 0.1 }], temperatureC: 25 }));
    // At pH ≈ 7 almost all of it is the neutral form; only H⁺/OH⁻ and traces conduct.
    expect(r.conductivityMsPerCm).toBeLessThan(0.01);
  });

  it('rises with temperature by about 2 % per °C near 25 °C (CRC: λ rises 2–3 % per degree)', () => {
    const k20 = conductivityAt(phosphateBuffer(20)).conductivityMsPerCm;
    const k25 = conductivityAt(phosphateBuffer(25)).conductivityMsPerCm;
    const perDegree = (k25 / k20 - 1) / 5;
    expect(perDegree).toBeGreaterThan(0.015);
    expect(perDegree).toBeLessThan(0.03);
  });

  it('is the sum of the ions it lists', () => {
    const r = conductivityAt(phosphateBuffer(25));
    const sum = r.ions.reduce((s, i) => s + i.contributionMsPerCm, 0);
    expectClose('Σ contributions', sum, r.conductivityMsPerCm, 1e-12);
  });

  it('lists an ion with no published λ° as an estimate, with its share, and warns when it matters', () => {
    const r = conductivityAt({ systems: [{ name: 'our own acid', chargeOfMostProtonated: 0, steps: [{ pKa: 5 }], totalM: 0.05 }], strongIons: { 'Na+': 0.05 }, temperatureC: 25 });
    expect(r.estimates.map((e) => e.species)).toEqual(['our own acid 1−']);
    expect(r.estimates[0].shareOfConductivity).toBeGreaterThan(0.2);
    expect(r.warnings).toContainEqual(expect.objectContaining({ code: 'conductivityEstimated', message: expect.stringMatching(/our own acid 1−/) }));
  });

  it('gives no estimate entry for a phosphate-buffered saline (every ion tabulated)', () => {
    expect(conductivityAt(phosphateBuffer(25)).estimates).toEqual([]);
  });

  it('warns outside 0–60 °C', () => {
    expect(codes(conductivityAt(phosphateBuffer(80)).warnings)).toContain('conductivityTemperature');
  });
});
