/**
 * Ideal osmolarity: the sum of the concentrations of every dissolved particle, ions and
 * neutral molecules alike, with no osmotic coefficient applied (so labelled "ideal"). Real
 * solutions read lower on an osmometer (e.g. NaCl near 0.93 of ideal at 150 mM, common
 * practice).
 */
import type { SpeciationResult } from './speciation';

/**
 * Ideal osmolarity of a solved composition, osmol/L.
 *
 * @param result - a speciation result
 * @returns Σ c over all species, osmol/L (H⁺ and OH⁻ included; water excluded)
 * @example idealOsmolarity(speciate(150 mM NaCl)) // ≈ 0.300
 */
export function idealOsmolarity(result: SpeciationResult): number {
  let sum = 0;
  for (const s of result.species) sum += s.concentrationM;
  return sum;
}
