/**
 * Strong ions: fully dissociated at every pH the solver covers, so each contributes a
 * fixed charge to the charge balance and a fixed term to the ionic strength.
 * Ion pairing and metal–buffer complexes (e.g. Mg²⁺ with citrate or ATP) are not modelled.
 */
import { ChemError, MESSAGES } from './errors';

export interface StrongIon {
  /** Canonical name as written in compositions, e.g. `Na+`, `SO4-2` is not here (sulfate is weak). */
  readonly name: string;
  readonly charge: number;
  /** Other ways people write it (case-insensitive). */
  readonly aliases: readonly string[];
}

/** Every strong ion the solver accepts. Charges are facts of chemistry. */
export const STRONG_IONS: readonly StrongIon[] = [
  { name: 'Na+', charge: 1, aliases: ['na', 'sodium'] },
  { name: 'K+', charge: 1, aliases: ['k', 'potassium'] },
  { name: 'Li+', charge: 1, aliases: ['li', 'lithium'] },
  { name: 'Cs+', charge: 1, aliases: ['cs', 'caesium', 'cesium'] },
  { name: 'Mg2+', charge: 2, aliases: ['mg', 'mg++', 'magnesium'] },
  { name: 'Ca2+', charge: 2, aliases: ['ca', 'ca++', 'calcium'] },
  { name: 'Cl-', charge: -1, aliases: ['cl', 'chloride'] },
  { name: 'Br-', charge: -1, aliases: ['br', 'bromide'] },
  { name: 'I-', charge: -1, aliases: ['iodide'] },
  { name: 'NO3-', charge: -1, aliases: ['no3', 'nitrate'] },
  { name: 'ClO4-', charge: -1, aliases: ['clo4', 'perchlorate'] },
];

const BY_KEY = new Map<string, StrongIon>();
/** Names exactly as usually written (`Na+`), looked up before any normalising. */
const BY_NAME = new Map<string, StrongIon>();
for (const ion of STRONG_IONS) {
  BY_NAME.set(ion.name, ion);
  for (const key of [ion.name, ...ion.aliases]) BY_KEY.set(normaliseIonKey(key), ion);
}

function normaliseIonKey(name: string): string {
  return name.trim().toLowerCase().replace(/−/g, '-').replace(/\s+/g, '');
}

/** Looks up a strong ion by name or alias; throws a typed error listing the allowed names. */
export function findStrongIon(field: string, name: string): StrongIon {
  const ion = BY_NAME.get(name) ?? (typeof name === 'string' ? BY_KEY.get(normaliseIonKey(name)) : undefined);
  if (!ion) {
    const allowed = STRONG_IONS.map((i) => i.name).join(', ');
    throw new ChemError('invalid-input', 'unknownIon', MESSAGES.unknownIon(field, name, allowed), field, allowed);
  }
  return ion;
}
