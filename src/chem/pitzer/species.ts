/**
 * Which tabulated Pitzer ion each species of a composition is: strong ions by name, and the
 * protonation states of the library's acid–base systems by system name and structure.
 * Anything else (zwitterionic buffers, citrate, user substances) has no tabulated ion and
 * takes the fallback of ./parameters.ts.
 */
import type { AcidBaseChemistry } from '../composition';
import type { PitzerIon } from './parameters';

/** Strong ions of the solver (src/chem/strongIons.ts names) that the tables know. */
const STRONG: Readonly<Record<string, PitzerIon>> = {
  'Na+': 'Na+',
  'K+': 'K+',
  'Li+': 'Li+',
  'Cs+': 'Cs+',
  'Mg2+': 'Mg2+',
  'Ca2+': 'Ca2+',
  'Cl-': 'Cl-',
  'Br-': 'Br-',
  'I-': 'I-',
  'NO3-': 'NO3-',
  'ClO4-': 'ClO4-',
};

/** Per library system: charge of its most protonated form, then the ion of each protonation state (undefined = neutral). */
const SYSTEMS: Readonly<Record<string, { readonly z0: number; readonly ions: readonly (PitzerIon | undefined)[] }>> = {
  phosphate: { z0: 0, ions: [undefined, 'H2PO4-', 'HPO4-2', 'PO4-3'] },
  carbonate: { z0: 0, ions: [undefined, 'HCO3-', 'CO3-2'] },
  sulfate: { z0: 0, ions: [undefined, 'HSO4-', 'SO4-2'] },
  acetate: { z0: 0, ions: [undefined, 'acetate-'] },
  tris: { z0: 1, ions: ['trisH+', undefined] },
  ammonia: { z0: 1, ions: ['NH4+', undefined] },
};

/** The tabulated ion of a strong ion (canonical name), if any. */
export function pitzerIonOfStrongIon(name: string): PitzerIon | undefined {
  return STRONG[name];
}

/**
 * The tabulated ion of each protonation state of a system (most protonated first), or
 * undefined for states the tables do not hold. A system is recognised by its name and
 * only if its structure (charge of the most protonated form, number of steps) matches.
 */
export function pitzerIonsOfSystem(chem: AcidBaseChemistry): readonly (PitzerIon | undefined)[] {
  const known = SYSTEMS[chem.name.trim().toLowerCase()];
  if (known && known.z0 === chem.chargeOfMostProtonated && known.ions.length === chem.steps.length + 1) return known.ions;
  return new Array<PitzerIon | undefined>(chem.steps.length + 1).fill(undefined);
}
