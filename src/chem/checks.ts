/**
 * Plain-words checks on a solved solution, beyond the solver's own warnings (temperature
 * outside the fitted range, ionic strength beyond the activity model): does anything in it
 * buffer at the pH it settles to, and does it hold something the model leaves out.
 *
 * Pure: no library, no host. Hosts add what only they know (constants from memory, the
 * user's own substances).
 */
import type { Composition } from './composition';
import type { SpeciationResult } from './speciation';
import { MESSAGES } from './errors';
import { temperatureWarnings } from './temperatureChecks';
import { ChemWarning, warning } from './warnings';

/** A step buffers usefully within pKa ± 1 (common practice). */
export const BUFFERING_HALF_WIDTH = 1;

/** Divalent metal ions that bind multiply charged buffer anions (phosphate, citrate, carbonate, EDTA …). */
const DIVALENT_METALS = ['Mg2+', 'Ca2+'] as const;

/**
 * A warning when no acid–base step of the solution lies within ±1 of the pH it settles to:
 * there it buffers weakly, and small loads move the pH far. Undefined when something buffers
 * or the solution holds no acid–base system.
 *
 * @param result - the solved solution; its apparent pKa′ (at its own ionic strength and temperature) are compared
 */
export function weakBufferingWarning(result: SpeciationResult): ChemWarning | undefined {
  const present = result.systems.filter((s) => s.totalM > 0);
  if (present.length === 0) return undefined;
  const near = present.some((s) => s.apparentPKa.some((pk) => Math.abs(pk - result.pH) <= BUFFERING_HALF_WIDTH));
  if (near) return undefined;
  const listed = present.map((s) => `${s.name} ${s.apparentPKa.map((pk) => pk.toFixed(2)).join(', ')}`).join('; ');
  return warning('weakBuffering', MESSAGES.weakBuffering(result.pH, BUFFERING_HALF_WIDTH, listed));
}

/**
 * A warning when Mg²⁺ or Ca²⁺ share the solution with an acid–base system whose anion can
 * carry a charge of 2− or more: metal–buffer complexes are not modelled, so the pH and the
 * free amounts are estimates. Undefined otherwise.
 *
 * @param composition - the solution as given (strong ions in mol/L)
 */
export function metalComplexWarning(composition: Composition): ChemWarning | undefined {
  const metals = DIVALENT_METALS.filter((m) => (composition.strongIons?.[m] ?? 0) > 0);
  if (metals.length === 0) return undefined;
  const binders = composition.systems.filter((s) => s.totalM > 0 && s.chargeOfMostProtonated - s.steps.length <= -2).map((s) => s.name);
  if (binders.length === 0) return undefined;
  const calcium = metals.includes('Ca2+') ? ' Calcium salts of these anions may also precipitate, above all on warming or at high pH.' : '';
  return warning('metalComplexes', MESSAGES.metalComplexes(metals.join(' and '), binders.join(', '), calcium));
}

/** Systems that bind Mg²⁺ and Ca²⁺ about 1:1 and almost completely near neutral pH (library names). */
export const CHELATORS = ['EDTA', 'EGTA'] as const;

/**
 * A warning when a chelator (EDTA, EGTA) shares the solution with Mg²⁺ or Ca²⁺: beyond the
 * general metal-complex caveat, it binds them about 1:1 and almost completely above pH ~6,
 * so the free metal is roughly what exceeds the chelator, and binding releases protons that
 * the solver does not see. Undefined otherwise.
 *
 * @param composition - the solution as given (mol/L)
 */
export function chelatorWarning(composition: Composition): ChemWarning | undefined {
  const metalM = DIVALENT_METALS.reduce((sum, m) => sum + (composition.strongIons?.[m] ?? 0), 0);
  if (metalM <= 0) return undefined;
  const present = composition.systems.filter((s) => s.totalM > 0 && (CHELATORS as readonly string[]).includes(s.name));
  if (present.length === 0) return undefined;
  const chelatorM = present.reduce((sum, s) => sum + s.totalM, 0);
  const metals = DIVALENT_METALS.filter((m) => (composition.strongIons?.[m] ?? 0) > 0).join(' and ');
  const freeMm = Math.max(0, metalM - chelatorM) * 1000;
  return warning('chelatorBindsMetals', MESSAGES.chelatorBindsMetals(present.map((s) => s.name).join(' and '), metals, chelatorM * 1000, metalM * 1000, freeMm));
}

/**
 * Every warning about a solved solution: the solver's own, then weak buffering, then metal
 * complexes (and chelators), then its temperature against each step's data (temperatureChecks.ts).
 *
 * @param composition - the solution as given
 * @param result - its speciation
 */
export function solutionWarnings(composition: Composition, result: SpeciationResult): ChemWarning[] {
  const warnings = [...result.warnings];
  const weak = weakBufferingWarning(result);
  if (weak) warnings.push(weak);
  const metals = metalComplexWarning(composition);
  if (metals) warnings.push(metals);
  const chelated = chelatorWarning(composition);
  if (chelated) warnings.push(chelated);
  warnings.push(...temperatureWarnings(composition.systems, composition.temperatureC ?? 25, 'Temperature', result.pH));
  return warnings;
}
