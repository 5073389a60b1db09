/**
 * Prints the accuracy tables of docs/activity.md: mean activity coefficients and osmotic
 * coefficients against the published values, with the Davies model (the default before
 * the Pitzer model) beside the Pitzer model, and the stock dilution figures.
 *
 * Run `npx tsx scripts/activityTables.ts` and paste the output into docs/activity.md.
 */
import { debyeHuckelA, speciate } from '../src/chem';
import { ionicStrengthFactor } from '../src/chem/activity';
import { compositionFromForms } from '../src/chem/library/lookup';
import { PITZER_ION_CHARGE } from '../src/chem/pitzer/parameters';
import { saltCoefficients } from '../src/chem/pitzer/model';
import { SODIUM_CHLORIDE, TABLES } from '../test/chem/pitzer/referenceTables';

const A = debyeHuckelA(25);
const pct = (got: number, ref: number) => `${((100 * (got - ref)) / ref).toFixed(1)} %`;

/** Davies γ± of a salt at a molality (ionic strength from the molality, as the tool did). */
function daviesMean(zc: number, za: number, molality: number): number {
  const nuC = Math.abs(za);
  const nuA = Math.abs(zc);
  const ionicStrength = 0.5 * (nuC * molality * zc * zc + nuA * molality * za * za);
  return Math.pow(10, -A * Math.abs(zc * za) * ionicStrengthFactor('davies', ionicStrength));
}

/** Osmotic coefficient of a 1:1 salt consistent with the Davies γ± (Gibbs–Duhem, integrated in closed form). */
function daviesOsmotic(molality: number): number {
  const s = Math.sqrt(molality);
  const alpha = A * Math.LN10;
  return 1 - (alpha / molality) * (s - 2 * Math.log(1 + s) - 1 / (1 + s) + 1 - 0.15 * molality * molality);
}

for (const t of TABLES) {
  const zc = PITZER_ION_CHARGE[t.cation];
  const za = PITZER_ION_CHARGE[t.anion];
  console.log(`\n**${t.salt}, γ± at 25 °C** (reference: Robinson & Stokes 1959, App. 8.10)\n`);
  console.log('| m (mol/kg) | reference | Davies (before) | error | Pitzer (now) | error |');
  console.log('| ---: | ---: | ---: | ---: | ---: | ---: |');
  for (const [m, ref] of t.meanActivity) {
    const d = daviesMean(zc, za, m);
    const p = saltCoefficients(t.cation, t.anion, m, 25, A).meanActivity;
    console.log(`| ${m} | ${ref.toFixed(3)} | ${d.toFixed(3)} | ${pct(d, ref)} | ${p.toFixed(3)} | ${pct(p, ref)} |`);
  }
}

console.log('\n**NaCl, osmotic coefficient φ at 25 °C** (reference: Robinson & Stokes 1959, App. 8.10)\n');
console.log('| m (mol/kg) | reference | ideal, φ = 1 (before) | error | Davies-consistent φ | error | Pitzer (now) | error |');
console.log('| ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |');
for (const [m, ref] of SODIUM_CHLORIDE.osmotic!) {
  const d = daviesOsmotic(m);
  const p = saltCoefficients('Na+', 'Cl-', m, 25, A).osmotic;
  console.log(`| ${m} | ${ref.toFixed(4)} | 1 | ${pct(1, ref)} | ${d.toFixed(4)} | ${pct(d, ref)} | ${p.toFixed(4)} | ${pct(p, ref)} |`);
}

const saline = (fold: number, activityModel: 'pitzer' | 'davies' | 'bates-guggenheim') =>
  compositionFromForms(
    [
      { form: 'NaCl', concentrationM: 0.137 * fold },
      { form: 'KCl', concentrationM: 0.0027 * fold },
      { form: 'Na2HPO4', concentrationM: 0.01 * fold },
      { form: 'KH2PO4', concentrationM: 0.0018 * fold },
    ],
    { temperatureC: 25, activityModel },
  );
const tris = (scale: number, activityModel: 'pitzer' | 'davies' | 'bates-guggenheim') =>
  compositionFromForms(
    [
      { form: 'tris base', concentrationM: 0.4 * scale },
      { form: 'tris hydrochloride', concentrationM: 0.6 * scale },
    ],
    { temperatureC: 25, activityModel },
  );

console.log('\n**Stocks and their dilutions, 25 °C**\n');
console.log('| solution | model | pH stock | pH diluted | stock − diluted | I stock (mol/kg) | osmolality stock / diluted (mOsm/kg) |');
console.log('| --- | --- | ---: | ---: | ---: | ---: | ---: |');
for (const model of ['davies', 'bates-guggenheim', 'pitzer'] as const) {
  const a = speciate(saline(10, model));
  const b = speciate(saline(1, model));
  console.log(
    `| saline phosphate 10× → 1× | ${model} | ${a.pH.toFixed(3)} | ${b.pH.toFixed(3)} | ${(a.pH - b.pH).toFixed(3)} | ${a.ionicStrengthMolal.toFixed(2)} | ${a.osmolalityMosmKg.toFixed(0)} / ${b.osmolalityMosmKg.toFixed(0)} |`,
  );
}
for (const model of ['davies', 'bates-guggenheim', 'pitzer'] as const) {
  const a = speciate(tris(1, model));
  const b = speciate(tris(0.1, model));
  console.log(
    `| tris 1 M → 0.1 M (0.4 base + 0.6 HCl salt) | ${model} | ${a.pH.toFixed(3)} | ${b.pH.toFixed(3)} | ${(a.pH - b.pH).toFixed(3)} | ${a.ionicStrengthMolal.toFixed(2)} | ${a.osmolalityMosmKg.toFixed(0)} / ${b.osmolalityMosmKg.toFixed(0)} |`,
  );
}
