/**
 * The Pitzer equations: activity coefficients of every ion and the osmotic coefficient of
 * a mixed electrolyte solution, on the molal scale.
 *
 * Method (K. S. Pitzer, Activity Coefficients in Electrolyte Solutions, 2nd ed. 1991,
 * ch. 3, eqs. for mixtures; the same form as Harvie, Møller & Weare 1984, eqs. 1–8):
 *   ln γ_M = z_M² F + Σ_a m_a (2B_Ma + Z C_Ma) + Σ_c m_c (2Φ_Mc + Σ_a m_a ψ_Mca)
 *            + Σ_{a<a'} m_a m_a' ψ_aa'M + |z_M| Σ_c Σ_a m_c m_a C_ca     (anions alike),
 *   F = −A_φ [√I/(1 + b√I) + (2/b) ln(1 + b√I)] + Σ_c Σ_a m_c m_a B'_ca + Σ m m' Φ'
 *   φ − 1 = (2/Σm)[−A_φ I^{3/2}/(1 + b√I) + Σ_c Σ_a m_c m_a (B^φ_ca + Z C_ca)
 *            + Σ_{c<c'} m_c m_c' (Φ^φ_cc' + Σ_a m_a ψ_cc'a) + Σ_{a<a'} (anions alike)],
 * with B = β⁰ + β¹ g(α₁√I) + β² g(α₂√I), g(x) = 2[1 − (1 + x)e^{−x}]/x², b = 1.2,
 * A_φ = A·ln10/3 (A the log10 Debye–Hückel slope), and Φ = θ + Eθ(I), the
 * unsymmetrical-mixing term from Pitzer's approximation of J(x) (K. S. Pitzer,
 * J. Solution Chem. 4 (1975) 249, eq. 47: J = x/(4 + 4.581 x^{−0.7237} e^{−0.0120 x^{0.528}})).
 * Neutral species have γ = 1 (ion–neutral λ terms are not modelled) but count in Σm.
 *
 * Parameters: ./parameters.ts. Ions with no parameters get the fallback there.
 */
import { PITZER_BINARY, PITZER_ION_CHARGE, PITZER_PSI, PITZER_THETA, PITZER_SLOPE_RANGE_C, PitzerIon, fallbackBeta1 } from './parameters';

/** Pitzer's b, kg^½ mol^−½ (Pitzer 1991, ch. 3: the same for all salts). */
const PITZER_B = 1.2;
/** α₁ for all but 2:2 salts, kg^½ mol^−½ (Pitzer 1991, ch. 3). */
const ALPHA1_DEFAULT = 2;
/** α₂ for 2:2 salts, kg^½ mol^−½ (Pitzer & Mayorga 1974; HMW84). */
const ALPHA2 = 12;
/** Reference temperature of the tables, °C. */
const TABLE_TEMPERATURE_C = 25;

/** One solute species as the model sees it. */
export interface PitzerSpecies {
  readonly charge: number;
  /** Its ion in the parameter tables, if any. */
  readonly ion?: PitzerIon;
}

/** Like-charged pairs as parallel arrays (faster to walk than objects): species i and j, θ, |z_i|, |z_j|, and whether the pair has an Eθ term (charges differ). */
interface LikePairs {
  readonly i: readonly number[];
  readonly j: readonly number[];
  readonly theta: readonly number[];
  readonly zi: readonly number[];
  readonly zj: readonly number[];
  readonly unsymmetric: readonly boolean[];
}
/** Triplets (two like-charged ions and one of the other sign) as parallel arrays, with their ψ. */
interface Triplets {
  readonly i: readonly number[];
  readonly j: readonly number[];
  readonly k: readonly number[];
  readonly psi: readonly number[];
}

/** The model reduced to numbers for one list of species at one temperature. */
export interface PitzerSystem {
  readonly charges: readonly number[];
  readonly cations: readonly number[];
  readonly anions: readonly number[];
  /** Per cation–anion pair (cation-major): β⁰, β¹, β², C, α₁. */
  readonly b0: readonly number[];
  readonly b1: readonly number[];
  readonly b2: readonly number[];
  readonly c: readonly number[];
  readonly alpha1: readonly number[];
  readonly likePairs: LikePairs;
  readonly triplets: Triplets;
  readonly aPhi: number;
  /** Species that are charged but have no tabulated ion (they take the fallback). */
  readonly unparameterised: readonly boolean[];
  /** True when some pair with a tabulated value has no temperature slope and the temperature is not 25 °C. */
  readonly temperatureExtrapolated: boolean;
  /** KCl's β⁰, β¹ and C at the temperature (for the MacInnes pH convention). */
  readonly kcl: { readonly b0: number; readonly b1: number; readonly c: number };
}

const BINARY_BY_KEY = new Map<string, (typeof PITZER_BINARY)[number]>();
for (const b of PITZER_BINARY) BINARY_BY_KEY.set(`${b.cation}|${b.anion}`, b);
const THETA_BY_KEY = new Map<string, number>();
for (const t of PITZER_THETA) {
  THETA_BY_KEY.set(`${t.a}|${t.b}`, t.theta);
  THETA_BY_KEY.set(`${t.b}|${t.a}`, t.theta);
}
const PSI_BY_KEY = new Map<string, number>();
for (const p of PITZER_PSI) {
  PSI_BY_KEY.set(`${p.a}|${p.b}|${p.other}`, p.psi);
  PSI_BY_KEY.set(`${p.b}|${p.a}|${p.other}`, p.psi);
}

/**
 * Builds the model for a list of species at a temperature.
 *
 * @param species - every solute species (neutral ones included; they only count in Σm)
 * @param temperatureC - temperature, °C
 * @param debyeHuckelA - the log10 Debye–Hückel slope A at that temperature
 */
export function pitzerSystem(species: readonly PitzerSpecies[], temperatureC: number, debyeHuckelA: number): PitzerSystem {
  const charges = species.map((s) => s.charge);
  const cations: number[] = [];
  const anions: number[] = [];
  species.forEach((s, i) => {
    if (s.charge > 0) cations.push(i);
    else if (s.charge < 0) anions.push(i);
  });
  // Slopes move parameters over their range only; beyond it they stay at the range's end (continuous in T), flagged.
  const inRange = temperatureC >= PITZER_SLOPE_RANGE_C.min && temperatureC <= PITZER_SLOPE_RANGE_C.max;
  const dT = Math.min(Math.max(temperatureC, PITZER_SLOPE_RANGE_C.min), PITZER_SLOPE_RANGE_C.max) - TABLE_TEMPERATURE_C;
  let temperatureExtrapolated = !inRange;
  const b0: number[] = [];
  const b1: number[] = [];
  const b2: number[] = [];
  const c: number[] = [];
  const alpha1: number[] = [];
  for (const ci of cations) {
    for (const ai of anions) {
      const zc = charges[ci];
      const za = charges[ai];
      const cat = species[ci].ion;
      const an = species[ai].ion;
      const p = cat && an ? BINARY_BY_KEY.get(`${cat}|${an}`) : undefined;
      if (p) {
        const slope = p.slope;
        if (slope) {
          b0.push(p.beta0 + slope.beta0 * dT);
          b1.push(p.beta1 + slope.beta1 * dT);
          c.push((p.cphi + (slope.cphi ?? 0) * dT) / 2 / Math.sqrt(Math.abs(zc * za)));
        } else {
          if (temperatureC !== TABLE_TEMPERATURE_C) temperatureExtrapolated = true;
          b0.push(p.beta0);
          b1.push(p.beta1);
          c.push(p.cphi / 2 / Math.sqrt(Math.abs(zc * za)));
        }
        b2.push(p.beta2 ?? 0);
        alpha1.push(p.alpha1 ?? ALPHA1_DEFAULT);
      } else {
        b0.push(0);
        b1.push(fallbackBeta1(zc, za));
        b2.push(0);
        c.push(0);
        alpha1.push(ALPHA1_DEFAULT);
      }
    }
  }
  const likePairs = { i: [] as number[], j: [] as number[], theta: [] as number[], zi: [] as number[], zj: [] as number[], unsymmetric: [] as boolean[] };
  const addLike = (list: readonly number[]) => {
    for (let x = 0; x < list.length; x++) {
      for (let y = x + 1; y < list.length; y++) {
        const i = list[x];
        const j = list[y];
        const si = species[i].ion;
        const sj = species[j].ion;
        const theta = si && sj ? (THETA_BY_KEY.get(`${si}|${sj}`) ?? 0) : 0;
        const zi = Math.abs(charges[i]);
        const zj = Math.abs(charges[j]);
        if (theta !== 0 || zi !== zj) {
          likePairs.i.push(i);
          likePairs.j.push(j);
          likePairs.theta.push(theta);
          likePairs.zi.push(zi);
          likePairs.zj.push(zj);
          likePairs.unsymmetric.push(zi !== zj);
        }
      }
    }
  };
  addLike(cations);
  addLike(anions);
  const triplets = { i: [] as number[], j: [] as number[], k: [] as number[], psi: [] as number[] };
  const addTriplets = (like: readonly number[], other: readonly number[]) => {
    for (let x = 0; x < like.length; x++) {
      for (let y = x + 1; y < like.length; y++) {
        const si = species[like[x]].ion;
        const sj = species[like[y]].ion;
        if (!si || !sj) continue;
        for (const k of other) {
          const sk = species[k].ion;
          const psi = sk ? PSI_BY_KEY.get(`${si}|${sj}|${sk}`) : undefined;
          if (psi) {
            triplets.i.push(like[x]);
            triplets.j.push(like[y]);
            triplets.k.push(k);
            triplets.psi.push(psi);
          }
        }
      }
    }
  };
  addTriplets(cations, anions);
  addTriplets(anions, cations);
  const kclParameters = BINARY_BY_KEY.get('K+|Cl-')!;
  const kclSlope = kclParameters.slope!;
  const kcl = { b0: kclParameters.beta0 + kclSlope.beta0 * dT, b1: kclParameters.beta1 + kclSlope.beta1 * dT, c: (kclParameters.cphi + (kclSlope.cphi ?? 0) * dT) / 2 };
  return {
    kcl,
    charges,
    cations,
    anions,
    b0,
    b1,
    b2,
    c,
    alpha1,
    likePairs,
    triplets,
    aPhi: (debyeHuckelA * Math.LN10) / 3,
    unparameterised: species.map((s) => s.charge !== 0 && s.ion === undefined),
    temperatureExtrapolated,
  };
}

/** g(x) = 2[1 − (1 + x)e^{−x}]/x² (Pitzer 1991), given e = e^{−x}, with its series near 0. */
function gFromExp(x: number, e: number): number {
  if (x < 1e-4) return 1 - (2 * x) / 3;
  return (2 * (1 - (1 + x) * e)) / (x * x);
}

/** g′(x) = −2[1 − (1 + x + x²/2)e^{−x}]/x² (Pitzer 1991), given e = e^{−x}, with its series near 0. */
function gPrimeFromExp(x: number, e: number): number {
  if (x < 1e-4) return -x / 3;
  return (-2 * (1 - (1 + x + (x * x) / 2) * e)) / (x * x);
}

const J_C1 = 4.581;
const J_C2 = 0.7237;
const J_C3 = 0.012;
const J_C4 = 0.528;

/** Pitzer's J(x) = x/(4 + C1 x^{−C2} e^{−C3 x^{C4}}) and x·J′(x) (J. Solution Chem. 4 (1975) 249, eq. 47), x > 0. */
function jExact(x: number, out: { j: number; xjp: number }): void {
  const lnX = Math.log(x);
  const xc4 = Math.exp(J_C4 * lnX);
  const p = J_C1 * Math.exp(-J_C2 * lnX - J_C3 * xc4);
  const d = 4 + p;
  // x·dD/dx = p·(−C2 − C3·C4·x^{C4}), so x·J′ = x/D − x·(x·dD/dx)/D².
  const xdp = p * (-J_C2 - J_C3 * J_C4 * xc4);
  out.j = x / d;
  out.xjp = x / d - (x * xdp) / (d * d);
}

/**
 * J tabulated on a uniform grid in u = √x (0 to J_TABLE_U_MAX) with its slope dJ/du = 2·xJ′/u,
 * and read by cubic Hermite interpolation: one square root and a few products in place of a
 * logarithm and two exponentials. The interpolation error is below 1e-11 in J and 2e-10 in x·J′ (step 0.004); x·J′
 * is taken from the derivative of the same interpolant, so γ and φ stay exactly consistent.
 */
const J_TABLE_STEP = 0.004;
const J_TABLE_U_MAX = 12;
const J_TABLE_SIZE = Math.ceil(J_TABLE_U_MAX / J_TABLE_STEP) + 1;
const J_TABLE_VALUE = new Float64Array(J_TABLE_SIZE);
const J_TABLE_SLOPE = new Float64Array(J_TABLE_SIZE);
{
  const out = { j: 0, xjp: 0 };
  for (let q = 1; q < J_TABLE_SIZE; q++) {
    const u = q * J_TABLE_STEP;
    jExact(u * u, out);
    J_TABLE_VALUE[q] = out.j;
    J_TABLE_SLOPE[q] = (2 * out.xjp) / u;
  }
}

/** J(x) and x·J′(x) at x = k·x₁₁ for the multipliers k that occur, filled once per evaluation. */
/** Largest multiplier k = z_i·z_j: charges reach ±6 (the composition's limit), so 36; typed arrays do not grow. */
const J_MULTIPLIERS = 64;
const jValue = new Float64Array(J_MULTIPLIERS);
const jxPrime = new Float64Array(J_MULTIPLIERS);
const jStamp = new Float64Array(J_MULTIPLIERS).fill(-1);
const jOut = { j: 0, xjp: 0 };

function jAt(multiplier: number, x11: number, stamp: number): void {
  if (jStamp[multiplier] === stamp) return;
  const x = multiplier * x11;
  const u = Math.sqrt(x);
  const t = u / J_TABLE_STEP;
  const q = Math.floor(t);
  if (q + 1 >= J_TABLE_SIZE) {
    jExact(x, jOut);
    jValue[multiplier] = jOut.j;
    jxPrime[multiplier] = jOut.xjp;
  } else {
    const f = t - q;
    const h = J_TABLE_STEP;
    const y0 = J_TABLE_VALUE[q];
    const y1 = J_TABLE_VALUE[q + 1];
    const m0 = J_TABLE_SLOPE[q] * h;
    const m1 = J_TABLE_SLOPE[q + 1] * h;
    const f2 = f * f;
    const f3 = f2 * f;
    jValue[multiplier] = (2 * f3 - 3 * f2 + 1) * y0 + (f3 - 2 * f2 + f) * m0 + (-2 * f3 + 3 * f2) * y1 + (f3 - f2) * m1;
    // dJ/du of the interpolant, then x·J′(x) = (u/2)·dJ/du.
    const dJdu = ((6 * f2 - 6 * f) * y0 + (3 * f2 - 4 * f + 1) * m0 + (-6 * f2 + 6 * f) * y1 + (3 * f2 - 2 * f) * m1) / h;
    jxPrime[multiplier] = 0.5 * u * dJdu;
  }
  jStamp[multiplier] = stamp;
}

/**
 * Eθ and Eθ′ for charges zi ≠ zj at ionic strength I (Pitzer 1975, eqs. 25–26), with
 * x_ij = 6 zi zj A_φ √I. Writes into `out` (eth, ethp).
 */
function eTheta(zi: number, zj: number, x11: number, ionicStrength: number, stamp: number, out: { eth: number; ethp: number }): void {
  const ij = zi * zj;
  const ii = zi * zi;
  const jj = zj * zj;
  jAt(ij, x11, stamp);
  jAt(ii, x11, stamp);
  jAt(jj, x11, stamp);
  const eth = (ij / (4 * ionicStrength)) * (jValue[ij] - 0.5 * jValue[ii] - 0.5 * jValue[jj]);
  out.eth = eth;
  out.ethp = -eth / ionicStrength + (ij / (8 * ionicStrength * ionicStrength)) * (jxPrime[ij] - 0.5 * jxPrime[ii] - 0.5 * jxPrime[jj]);
}

const eOut = { eth: 0, ethp: 0 };
/** Eθ and Eθ′ per charge pair (index zi·8 + zj), filled once per evaluation: they depend only on the charges and I. */
const eThetaCache = new Float64Array(128);
const eThetaPrimeCache = new Float64Array(128);
const eThetaStamp = new Float64Array(128).fill(-1);
let evaluationStamp = 0;

/** Result of one evaluation. */
export interface PitzerEvaluation {
  /** Molal ionic strength, mol/kg. */
  ionicStrength: number;
  /** Osmotic coefficient φ (NaN when Σm = 0). */
  osmoticCoefficient: number;
  /** ln γ± of pure KCl at a molality equal to this ionic strength (the MacInnes convention's γ(Cl⁻)). */
  lnGammaKcl: number;
}

/**
 * ln γ of every species for the molalities given; also the molal ionic strength and φ.
 *
 * @param s - the prepared model
 * @param m - molality of each species, mol/kg (same order as the species list)
 * @param lnGamma - written: ln γ of each species (0 for neutral ones)
 * @param result - written: ionic strength and osmotic coefficient
 */
export function pitzerEvaluate(s: PitzerSystem, m: readonly number[], lnGamma: number[], result: PitzerEvaluation): void {
  const z = s.charges;
  const n = z.length;
  let i2 = 0;
  let bigZ = 0;
  let sumM = 0;
  for (let q = 0; q < n; q++) {
    const mq = m[q];
    const zq = z[q];
    i2 += mq * zq * zq;
    bigZ += mq * Math.abs(zq);
    sumM += mq;
    lnGamma[q] = 0;
  }
  const ionicStrength = 0.5 * i2;
  result.ionicStrength = ionicStrength;
  evaluationStamp++;
  if (ionicStrength <= 0) {
    result.osmoticCoefficient = sumM > 0 ? 1 : NaN;
    result.lnGammaKcl = 0;
    return;
  }
  const sqrtI = Math.sqrt(ionicStrength);
  const bs = 1 + PITZER_B * sqrtI;
  let bigF = -s.aPhi * (sqrtI / bs + (2 / PITZER_B) * Math.log(bs));
  let phiSum = (-s.aPhi * ionicStrength * sqrtI) / bs;
  let cSum = 0;

  // g and g′ for the α values in use (2, 1.4 and 12 at most): computed once per evaluation.
  const x2 = ALPHA1_DEFAULT * sqrtI;
  const e2 = Math.exp(-x2);
  const g2 = gFromExp(x2, e2);
  const gp2 = gPrimeFromExp(x2, e2);
  {
    // KCl at molality I: ln γ± = f^γ + I²B′ + 2I·B + 3I²C (the 1:1 case of the equations above).
    const k = s.kcl;
    result.lnGammaKcl = bigF + ionicStrength * k.b1 * gp2 + 2 * ionicStrength * (k.b0 + k.b1 * g2) + 3 * ionicStrength * ionicStrength * k.c;
  }
  let g14 = 0;
  let gp14 = 0;
  let e14 = 0;
  let g12 = 0;
  let gp12 = 0;
  let e12 = 0;
  let have14 = false;

  const cations = s.cations;
  const anions = s.anions;
  const nA = anions.length;
  for (let x = 0; x < cations.length; x++) {
    const ci = cations[x];
    const mc = m[ci];
    for (let y = 0; y < nA; y++) {
      const ai = anions[y];
      const ma = m[ai];
      const p = x * nA + y;
      const beta1 = s.b1[p];
      const beta2 = s.b2[p];
      let gA: number;
      let gpA: number;
      let eA: number;
      if (s.alpha1[p] === ALPHA1_DEFAULT) {
        gA = g2;
        gpA = gp2;
        eA = e2;
      } else {
        if (!have14) {
          const x14 = 1.4 * sqrtI;
          e14 = Math.exp(-x14);
          g14 = gFromExp(x14, e14);
          gp14 = gPrimeFromExp(x14, e14);
          const x12 = ALPHA2 * sqrtI;
          e12 = Math.exp(-x12);
          g12 = gFromExp(x12, e12);
          gp12 = gPrimeFromExp(x12, e12);
          have14 = true;
        }
        gA = g14;
        gpA = gp14;
        eA = e14;
      }
      let bb = s.b0[p] + beta1 * gA;
      let bp = beta1 * gpA;
      let bphi = s.b0[p] + beta1 * eA;
      if (beta2 !== 0) {
        bb += beta2 * g12;
        bp += beta2 * gp12;
        bphi += beta2 * e12;
      }
      bp /= ionicStrength;
      const cc = s.c[p];
      const t = 2 * bb + bigZ * cc;
      lnGamma[ci] += ma * t;
      lnGamma[ai] += mc * t;
      const mm = mc * ma;
      bigF += mm * bp;
      cSum += mm * cc;
      phiSum += mm * (bphi + bigZ * cc);
    }
  }
  const lp = s.likePairs;
  const lpI = lp.i;
  const lpJ = lp.j;
  let x11Ready = false;
  let x11 = 0;
  for (let q = 0; q < lpI.length; q++) {
    const i = lpI[q];
    const j = lpJ[q];
    const mi = m[i];
    const mj = m[j];
    let phi = lp.theta[q];
    let phiPrime = 0;
    if (lp.unsymmetric[q]) {
      const zi = lp.zi[q];
      const zj = lp.zj[q];
      const key = zi * 8 + zj;
      if (eThetaStamp[key] !== evaluationStamp) {
        if (!x11Ready) {
          x11 = 6 * s.aPhi * sqrtI;
          x11Ready = true;
        }
        eTheta(zi, zj, x11, ionicStrength, evaluationStamp, eOut);
        eThetaCache[key] = eOut.eth;
        eThetaPrimeCache[key] = eOut.ethp;
        eThetaStamp[key] = evaluationStamp;
      }
      phi += eThetaCache[key];
      phiPrime = eThetaPrimeCache[key];
    }
    lnGamma[i] += 2 * mj * phi;
    lnGamma[j] += 2 * mi * phi;
    const mm = mi * mj;
    bigF += mm * phiPrime;
    phiSum += mm * (phi + ionicStrength * phiPrime);
  }
  const tr = s.triplets;
  const trI = tr.i;
  for (let q = 0; q < trI.length; q++) {
    const i = trI[q];
    const j = tr.j[q];
    const k = tr.k[q];
    const psi = tr.psi[q];
    const mi = m[i];
    const mj = m[j];
    const mk = m[k];
    lnGamma[i] += mj * mk * psi;
    lnGamma[j] += mi * mk * psi;
    lnGamma[k] += mi * mj * psi;
    phiSum += mi * mj * mk * psi;
  }
  for (let q = 0; q < n; q++) {
    const zq = z[q];
    if (zq !== 0) lnGamma[q] += zq * zq * bigF + Math.abs(zq) * cSum;
  }
  result.osmoticCoefficient = sumM > 0 ? 1 + (2 / sumM) * phiSum : NaN;
}

/**
 * Mean activity coefficient and osmotic coefficient of one salt M_νM X_νX at a molality,
 * fully dissociated (the convention of the published tables).
 *
 * @param cation - the cation's tabulated name
 * @param anion - the anion's tabulated name
 * @param molality - molality of the salt, mol/kg
 * @param temperatureC - °C
 * @param debyeHuckelA - log10 Debye–Hückel slope at that temperature
 * @returns γ± and φ
 * @example saltCoefficients('Na+', 'Cl-', 1, 25, 0.5108).meanActivity // ≈ 0.657
 */
export function saltCoefficients(cation: PitzerIon, anion: PitzerIon, molality: number, temperatureC: number, debyeHuckelA: number): { meanActivity: number; osmotic: number } {
  const zc = PITZER_ION_CHARGE[cation];
  const za = PITZER_ION_CHARGE[anion];
  const nuC = Math.abs(za);
  const nuA = Math.abs(zc);
  const system = pitzerSystem(
    [
      { charge: zc, ion: cation },
      { charge: za, ion: anion },
    ],
    temperatureC,
    debyeHuckelA,
  );
  const lnGamma = [0, 0];
  const result: PitzerEvaluation = { ionicStrength: 0, osmoticCoefficient: 0, lnGammaKcl: 0 };
  pitzerEvaluate(system, [nuC * molality, nuA * molality], lnGamma, result);
  return { meanActivity: Math.exp((nuC * lnGamma[0] + nuA * lnGamma[1]) / (nuC + nuA)), osmotic: result.osmoticCoefficient };
}
