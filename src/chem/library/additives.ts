/**
 * Neutral additives: uncharged solutes a working buffer often carries (glycerol, sucrose,
 * trehalose, urea, DMSO). They take no part in the acid–base equilibrium as modelled here:
 * they take up volume, add dissolved particles (osmolarity), and are listed in a recipe.
 * Their effect on pKa values and activities (a co-solvent changes both) is not modelled,
 * and every recipe that holds one says so.
 *
 * Conventions: `densityGPerMl` is that of the neat liquid at 20–25 °C (liquids only), used
 * to turn % v/v into grams; `specificVolumeMlPerG` is the volume one gram takes up in
 * dilute aqueous solution (its partial specific volume), used for the water a recipe adds.
 */
import type { Provenance } from './types';

/** A neutral additive as the library knows it. */
export interface NeutralAdditive {
  readonly name: string;
  readonly aliases: readonly string[];
  readonly formula: string;
  /** Molar mass of the form sold, g/mol. */
  readonly molarMass: number;
  /** `liquid` additives are usually measured by volume (% v/v), `solid` ones weighed (% w/v). */
  readonly state: 'liquid' | 'solid';
  /** Density of the neat liquid, g/mL (liquids only). */
  readonly densityGPerMl?: number;
  /** Partial specific volume in water, mL/g. */
  readonly specificVolumeMlPerG: number;
  /** Where the density and specific volume come from. */
  readonly checkedAgainst: Provenance;
  readonly cautionNote?: string;
  readonly note?: string;
}

/** Every neutral additive the library knows. Molar masses follow from the formula (IUPAC atomic weights); physical constants are from memory. */
export const NEUTRAL_ADDITIVES: readonly NeutralAdditive[] = [
  {
    name: 'glycerol',
    aliases: ['glycerin', 'glycerine', 'propane-1,2,3-triol', 'C3H8O3'],
    formula: 'C3H8O3',
    molarMass: 92.09,
    state: 'liquid',
    /** Density 1.261 g/mL at 20 °C (memory of the CRC Handbook's table of organic compounds); partial specific volume 0.77 mL/g in water (memory). */
    densityGPerMl: 1.261,
    specificVolumeMlPerG: 0.77,
    checkedAgainst: 'memory',
    note: 'Viscous: weigh it (1.261 g per mL) or pipette slowly with a positive-displacement pipette.',
  },
  {
    name: 'sucrose',
    aliases: ['saccharose', 'C12H22O11'],
    formula: 'C12H22O11',
    molarMass: 342.3,
    state: 'solid',
    /** Partial specific volume 0.63 mL/g (memory, a value common in sedimentation work). */
    specificVolumeMlPerG: 0.63,
    checkedAgainst: 'memory',
  },
  {
    name: 'trehalose dihydrate',
    aliases: ['trehalose', 'D-(+)-trehalose dihydrate', 'C12H22O11·2H2O'],
    formula: 'C12H22O11·2H2O',
    molarMass: 378.33,
    state: 'solid',
    /** Partial specific volume about 0.62 mL/g of anhydrous sugar (memory), taken per gram of the dihydrate weighed. */
    specificVolumeMlPerG: 0.62,
    checkedAgainst: 'memory',
  },
  {
    name: 'urea',
    aliases: ['carbamide', 'CH4N2O'],
    formula: 'CH4N2O',
    molarMass: 60.06,
    state: 'solid',
    /** Partial molar volume about 44 mL/mol in water (memory): 0.74 mL/g. */
    specificVolumeMlPerG: 0.74,
    checkedAgainst: 'memory',
    cautionNote: 'Urea solutions slowly form cyanate, which modifies proteins: make them fresh, do not heat them above about 30 °C.',
    note: 'Dissolving urea cools the solution strongly: let it return to room temperature before making up to volume.',
  },
  {
    name: 'DMSO',
    aliases: ['dimethyl sulfoxide', 'dimethylsulfoxide', 'C2H6OS'],
    formula: 'C2H6OS',
    molarMass: 78.13,
    state: 'liquid',
    /** Density 1.100 g/mL at 20 °C (memory of the CRC Handbook); partial specific volume about 0.90 mL/g (memory). */
    densityGPerMl: 1.1,
    specificVolumeMlPerG: 0.9,
    checkedAgainst: 'memory',
    cautionNote: 'DMSO passes through skin and carries dissolved substances with it: wear gloves suited to it (butyl or thick nitrile).',
  },
];

function key(name: string): string {
  return name.trim().toLowerCase().replace(/\s+/g, ' ');
}

/**
 * A library additive by name or alias (case ignored), or undefined.
 *
 * @example findAdditive('Glycerin')?.densityGPerMl // 1.261
 */
export function findAdditive(name: string, extra: readonly NeutralAdditive[] = []): NeutralAdditive | undefined {
  const k = key(name);
  return [...extra, ...NEUTRAL_ADDITIVES].find((a) => key(a.name) === k || a.aliases.some((x) => key(x) === k));
}
