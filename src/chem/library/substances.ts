/**
 * The substance library: one typed table of acid–base systems and strong electrolytes,
 * each with the forms found on the shelf. Every constant names its source on its record;
 * `verified: false` marks values written from memory of the source and not yet checked
 * against a copy of it.
 *
 * Conventions: pKa at 25 °C and I = 0; ΔH° in kJ/mol; ΔCp° in J K⁻¹ mol⁻¹; steps in
 * order of proton loss from the most protonated form listed. A form's `adds` says which
 * system one mole adds and how many protons it has lost relative to that system's most
 * protonated form; with its counter-ions (and any strong-acid proton it releases) the
 * whole is neutral. Molar masses: listed = supplier label; computed from the formula.
 */
import { SourceId } from './sources';
import { CautionFlag, FormRecord, SourcedStep, SubstanceRecord, SystemPortion } from './types';

/** Goldberg et al. 2002 data mostly span about 0–60 °C; the range the constants are meant for. */
const GOLDBERG_RANGE_C: readonly [number, number] = [0, 60];
/** Values known at 25 °C only (no ΔH° recorded): treat other temperatures as an estimate. */
const ROOM_ONLY_RANGE_C: readonly [number, number] = [20, 30];

function step(source: SourceId, entry: string, verified: boolean, pKa: number, deltaHkJ?: number, deltaCpJ?: number, note?: string): SourcedStep {
  return {
    pKa,
    ...(deltaHkJ === undefined ? {} : { deltaHkJ }),
    ...(deltaCpJ === undefined ? {} : { deltaCpJ }),
    source,
    entry,
    verified,
    ...(note === undefined ? {} : { note }),
  };
}

/** Goldberg et al. 2002, checked against a found copy of its table. */
const gv = (entry: string, pKa: number, dH: number, dCp: number, note?: string) => step('goldberg2002', entry, true, pKa, dH, dCp, note);
/** Goldberg et al. 2002, written from memory (not checked). */
const gm = (entry: string, pKa: number, dH?: number, dCp?: number, note?: string) =>
  step('goldberg2002', entry, false, pKa, dH, dCp, note ?? '(memory) not checked against a copy of the source');

type Extra = Partial<Pick<FormRecord, 'protonsReleased' | 'cautions' | 'cautionNote' | 'note' | 'solubility'>>;

function form(
  name: string,
  aliases: readonly string[],
  formula: string,
  listedMolarMass: number,
  adds: readonly (readonly [string, number, number])[],
  counterIons: Readonly<Record<string, number>> = {},
  extra: Extra = {},
): FormRecord {
  const portions: SystemPortion[] = adds.map(([system, moles, protonsLost]) => ({ system, moles, protonsLost }));
  return { name, aliases, formula, listedMolarMass, listedMolarMassSource: 'supplierLabel', adds: portions, counterIons, ...extra };
}

function system(
  name: string,
  aliases: readonly string[],
  chargeOfMostProtonated: number,
  steps: readonly SourcedStep[],
  forms: readonly FormRecord[],
  more: { cautions?: readonly CautionFlag[]; cautionNote?: string; note?: string; temperatureRangeC?: readonly [number, number] } = {},
): SubstanceRecord {
  return {
    name,
    aliases,
    kind: 'acid-base',
    chargeOfMostProtonated,
    steps,
    temperatureRangeC: more.temperatureRangeC ?? GOLDBERG_RANGE_C,
    cautions: more.cautions ?? [],
    ...(more.cautionNote === undefined ? {} : { cautionNote: more.cautionNote }),
    ...(more.note === undefined ? {} : { note: more.note }),
    forms,
  };
}

function strong(name: string, aliases: readonly string[], forms: readonly FormRecord[], cautions: readonly CautionFlag[] = [], cautionNote?: string): SubstanceRecord {
  return { name, aliases, kind: 'strong', chargeOfMostProtonated: 0, steps: [], cautions, ...(cautionNote === undefined ? {} : { cautionNote }), forms };
}

const GOOD_NOTE = 'Zwitterionic Good buffer; only the buffering step is listed (the sulfonate/carboxylate step lies below pH 2 and is not needed for recipes).';
const GOOD_CAUTION = 'May irritate eyes and skin as a powder; see the safety data sheet.';
const DISULFONATE_NOTE =
  'Piperazine disulfonate: the buffering step is HL− ⇌ L2−, so the most protonated form listed carries −1; the free acid\'s extra sulfonic-acid proton is treated as a strong acid (released to water). The free acid dissolves poorly until base is added.';

/** Every substance the library knows. */
export const SUBSTANCES: readonly SubstanceRecord[] = [
  // ── Zwitterionic Good buffers, in order of pKa ───────────────────────────────────────
  system('MES', ['2-(N-morpholino)ethanesulfonic acid', '2-morpholinoethanesulfonic acid'], 0, [gv('MES', 6.27, 14.8, 5)], [
    form('MES free acid', ['MES', 'MES acid', 'MES anhydrous'], 'C6H13NO4S', 195.24, [['MES', 1, 0]]),
    form('MES monohydrate', ['MES hydrate', 'MES·H2O'], 'C6H13NO4S·H2O', 213.25, [['MES', 1, 0]]),
    form('MES sodium salt', ['MES sodium', 'sodium MES', 'MES Na'], 'C6H12NNaO4S', 217.22, [['MES', 1, 1]], { 'Na+': 1 }),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('Bis-Tris', ['bis(2-hydroxyethyl)amino-tris(hydroxymethyl)methane', 'bistris', 'bis tris methane'], 1, [gv('bis-tris', 6.484, 28.4, -7)], [
    form('Bis-Tris base', ['Bis-Tris', 'bistris base'], 'C8H19NO5', 209.24, [['Bis-Tris', 1, 1]]),
    form('Bis-Tris hydrochloride', ['Bis-Tris HCl', 'bistris hydrochloride'], 'C8H19NO5·HCl', 245.7, [['Bis-Tris', 1, 0]], { 'Cl-': 1 }),
  ], { cautionNote: GOOD_CAUTION }),
  system('ADA', ['N-(2-acetamido)iminodiacetic acid', 'acetamidoiminodiacetic acid'], 0, [
    step('goldberg2002', 'ADA, H2L± ⇌ HL− (reaction 2)', false, 2.48, undefined, undefined, 'Mean of the four literature values on the review\'s ADA page (scanned copy, p. 242), which the review\'s comment says it adopted; the printed selected value itself not seen. ΔH° not recorded.'),
    step('goldberg2002', 'ADA, HL− ⇌ L2− (reaction 3)', false, 6.844, 12.23, -144, '(memory) Matches the Roy et al. 1981 values quoted on the scanned p. 242 (pK 6.844, ΔH° 12.23 kJ/mol, ΔCp° 144 with its sign lost in the scan); the selected line itself not seen.'),
  ], [
    form('ADA free acid', ['ADA'], 'C6H10N2O5', 190.15, [['ADA', 1, 0]]),
    form('ADA monosodium salt', ['ADA sodium salt', 'ADA sodium'], 'C6H9N2NaO5', 212.14, [['ADA', 1, 1]], { 'Na+': 1 }),
  ], { cautionNote: GOOD_CAUTION, note: 'Binds divalent metal ions (Ca2+, Mg2+, Cu2+); complexes are not modelled.' }),
  system('PIPES', ['piperazine-N,N\'-bis(2-ethanesulfonic acid)', '1,4-piperazinediethanesulfonic acid'], -1, [gv('PIPES', 7.141, 11.2, -2)], [
    form('PIPES free acid', ['PIPES', 'PIPES acid'], 'C8H18N2O6S2', 302.37, [['PIPES', 1, 0]], {}, { protonsReleased: 1 }),
    form('PIPES monosodium salt', ['PIPES sodium salt', 'PIPES sodium'], 'C8H17N2NaO6S2', 324.35, [['PIPES', 1, 0]], { 'Na+': 1 }),
    form('PIPES disodium salt', ['PIPES disodium'], 'C8H16N2Na2O6S2', 346.33, [['PIPES', 1, 1]], { 'Na+': 2 }),
  ], { note: DISULFONATE_NOTE, cautionNote: GOOD_CAUTION }),
  system('ACES', ['N-(2-acetamido)-2-aminoethanesulfonic acid'], 0, [gv('ACES', 6.847, 30.43, -49)], [
    form('ACES free acid', ['ACES'], 'C4H10N2O4S', 182.2, [['ACES', 1, 0]]),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('MOPSO', ['3-morpholino-2-hydroxypropanesulfonic acid', '3-(N-morpholino)-2-hydroxypropanesulfonic acid'], 0, [gv('MOPSO', 6.9, 25.0, 38)], [
    form('MOPSO free acid', ['MOPSO'], 'C7H15NO5S', 225.26, [['MOPSO', 1, 0]]),
    form('MOPSO sodium salt', ['MOPSO sodium'], 'C7H14NNaO5S', 247.24, [['MOPSO', 1, 1]], { 'Na+': 1 }),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('BES', ['N,N-bis(2-hydroxyethyl)-2-aminoethanesulfonic acid'], 0, [gv('BES', 7.187, 24.25, -2)], [
    form('BES free acid', ['BES'], 'C6H15NO5S', 213.25, [['BES', 1, 0]]),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('MOPS', ['3-(N-morpholino)propanesulfonic acid', '3-morpholinopropanesulfonic acid', '4-morpholinepropanesulfonic acid'], 0, [gv('MOPS', 7.184, 21.1, -5)], [
    form('MOPS free acid', ['MOPS', 'MOPS acid'], 'C7H15NO4S', 209.26, [['MOPS', 1, 0]]),
    form('MOPS sodium salt', ['MOPS sodium', 'sodium MOPS'], 'C7H14NNaO4S', 231.25, [['MOPS', 1, 1]], { 'Na+': 1 }),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('TES', ['N-[tris(hydroxymethyl)methyl]-2-aminoethanesulfonic acid'], 0, [gv('TES', 7.55, 32.13, 0)], [
    form('TES free acid', ['TES'], 'C6H15NO6S', 229.25, [['TES', 1, 0]]),
    form('TES sodium salt', ['TES sodium'], 'C6H14NNaO6S', 251.23, [['TES', 1, 1]], { 'Na+': 1 }),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('HEPES', ['4-(2-hydroxyethyl)piperazine-1-ethanesulfonic acid', 'N-(2-hydroxyethyl)piperazine-N\'-(2-ethanesulfonic acid)'], 0, [gv('HEPES', 7.564, 20.4, 47)], [
    form('HEPES free acid', ['HEPES', 'HEPES acid'], 'C8H18N2O4S', 238.3, [['HEPES', 1, 0]]),
    form('HEPES sodium salt', ['HEPES sodium', 'sodium HEPES', 'HEPES Na'], 'C8H17N2NaO4S', 260.29, [['HEPES', 1, 1]], { 'Na+': 1 }),
    form('HEPES hemisodium salt', ['HEPES hemisodium'], 'C8H17.5N2Na0.5O4S', 249.29, [['HEPES', 1, 0.5]], { 'Na+': 0.5 }),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('DIPSO', ['3-[N,N-bis(2-hydroxyethyl)amino]-2-hydroxypropanesulfonic acid'], 0, [gm('DIPSO', 7.576, 30.18)], [
    form('DIPSO free acid', ['DIPSO'], 'C7H17NO6S', 243.28, [['DIPSO', 1, 0]]),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('TAPSO', ['3-[N-tris(hydroxymethyl)methylamino]-2-hydroxypropanesulfonic acid'], 0, [gv('TAPSO', 7.635, 39.09, -16)], [
    form('TAPSO free acid', ['TAPSO'], 'C7H17NO7S', 259.28, [['TAPSO', 1, 0]]),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('POPSO', ['piperazine-N,N\'-bis(2-hydroxypropanesulfonic acid)'], -1, [gm('POPSO', 7.78, 25.3)], [
    form('POPSO free acid', ['POPSO'], 'C10H22N2O8S2', 362.42, [['POPSO', 1, 0]], {}, { protonsReleased: 1 }),
  ], { note: DISULFONATE_NOTE, cautionNote: GOOD_CAUTION }),
  system('HEPPSO', ['N-(2-hydroxyethyl)piperazine-N\'-(2-hydroxypropanesulfonic acid)'], 0, [gv('HEPPSO', 8.042, 23.7, 47)], [
    form('HEPPSO free acid', ['HEPPSO'], 'C9H20N2O5S', 268.33, [['HEPPSO', 1, 0]]),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('EPPS', ['HEPPS', '4-(2-hydroxyethyl)piperazine-1-propanesulfonic acid', 'N-(2-hydroxyethyl)piperazine-N\'-(3-propanesulfonic acid)'], 0, [gm('HEPPS (EPPS)', 7.957, 21.5, 47)], [
    form('EPPS free acid', ['EPPS', 'HEPPS free acid'], 'C9H20N2O4S', 252.33, [['EPPS', 1, 0]]),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('tricine', ['N-[tris(hydroxymethyl)methyl]glycine'], 0, [gv('tricine', 8.135, 31.37, -53)], [
    form('tricine free acid', ['tricine'], 'C6H13NO5', 179.17, [['tricine', 1, 0]]),
  ], { note: 'Zwitterionic glycine derivative; only the amine step is listed (the carboxyl step lies near pH 2).', cautionNote: GOOD_CAUTION }),
  system('bicine', ['N,N-bis(2-hydroxyethyl)glycine'], 0, [gv('bicine', 8.334, 26.34, 0)], [
    form('bicine free acid', ['bicine'], 'C6H13NO4', 163.17, [['bicine', 1, 0]]),
  ], { note: 'Zwitterionic glycine derivative; only the amine step is listed (the carboxyl step lies near pH 2).', cautionNote: GOOD_CAUTION }),
  system('TAPS', ['N-[tris(hydroxymethyl)methyl]-3-aminopropanesulfonic acid'], 0, [gv('TAPS', 8.44, 40.4, 15)], [
    form('TAPS free acid', ['TAPS'], 'C7H17NO6S', 243.28, [['TAPS', 1, 0]]),
    form('TAPS sodium salt', ['TAPS sodium'], 'C7H16NNaO6S', 265.26, [['TAPS', 1, 1]], { 'Na+': 1 }),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('AMPSO', ['3-[(1,1-dimethyl-2-hydroxyethyl)amino]-2-hydroxypropanesulfonic acid'], 0, [gm('AMPSO', 9.138, 43.19)], [
    form('AMPSO free acid', ['AMPSO'], 'C7H17NO5S', 227.28, [['AMPSO', 1, 0]]),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('CHES', ['2-(N-cyclohexylamino)ethanesulfonic acid', '2-(cyclohexylamino)ethanesulfonic acid'], 0, [gv('CHES', 9.394, 39.55, 9)], [
    form('CHES free acid', ['CHES'], 'C8H17NO3S', 207.29, [['CHES', 1, 0]]),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('CAPSO', ['3-(cyclohexylamino)-2-hydroxy-1-propanesulfonic acid'], 0, [gm('CAPSO', 9.825, 46.67)], [
    form('CAPSO free acid', ['CAPSO'], 'C9H19NO4S', 237.32, [['CAPSO', 1, 0]]),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),
  system('CAPS', ['3-(cyclohexylamino)-1-propanesulfonic acid', 'N-cyclohexyl-3-aminopropanesulfonic acid'], 0, [gv('CAPS', 10.499, 48.1, 57)], [
    form('CAPS free acid', ['CAPS'], 'C9H19NO3S', 221.32, [['CAPS', 1, 0]]),
  ], { note: GOOD_NOTE, cautionNote: GOOD_CAUTION }),

  // ── Amines ──────────────────────────────────────────────────────────────────────────
  system('tris', ['tris(hydroxymethyl)aminomethane', 'trometamol', 'tromethamine', 'THAM', '2-amino-2-(hydroxymethyl)propane-1,3-diol', 'Trizma'], 1, [gv('tris', 8.072, 47.45, -59)], [
    form('tris base', ['tris', 'tris free base', 'Trizma base', 'tromethamine base'], 'C4H11NO3', 121.14, [['tris', 1, 1]], {}, {
      solubility: { gramsPerLitre: 550, temperatureC: 25, source: 'supplierLabel', verified: false },
    }),
    form('tris hydrochloride', ['tris HCl', 'tris-HCl', 'Trizma hydrochloride', 'tromethamine hydrochloride'], 'C4H11NO3·HCl', 157.6, [['tris', 1, 0]], { 'Cl-': 1 }),
  ], { cautionNote: 'Irritating to eyes as a powder. Its pH moves about −0.03 per °C: adjust at the working temperature.', cautions: ['irritant'] }),
  system('bis-tris propane', ['BTP', '1,3-bis[tris(hydroxymethyl)methylamino]propane', 'bis tris propane'], 2, [
    gm('bis-tris propane, H2L2+ ⇌ HL+', 6.65, 28.4),
    gm('bis-tris propane, HL+ ⇌ L', 9.1, 29.7),
  ], [
    form('bis-tris propane base', ['bis-tris propane', 'BTP base'], 'C11H26N2O6', 282.33, [['bis-tris propane', 1, 2]]),
  ], { cautionNote: GOOD_CAUTION }),
  system('triethanolamine', ['TEA', 'tris(2-hydroxyethyl)amine', '2,2\',2\'\'-nitrilotriethanol', 'TEOA'], 1, [gm('triethanolamine', 7.762, 33.6, 50)], [
    form('triethanolamine base', ['triethanolamine', 'TEA base'], 'C6H15NO3', 149.19, [['triethanolamine', 1, 1]]),
    form('triethanolamine hydrochloride', ['TEA HCl', 'triethanolamine HCl'], 'C6H15NO3·HCl', 185.65, [['triethanolamine', 1, 0]], { 'Cl-': 1 }),
  ], { cautions: ['irritant'], cautionNote: 'Viscous liquid; irritating to eyes and skin.' }),
  system('imidazole', ['1,3-diazole', 'glyoxaline'], 1, [gv('imidazole', 6.993, 36.64, -9)], [
    form('imidazole base', ['imidazole'], 'C3H4N2', 68.08, [['imidazole', 1, 1]]),
  ], { cautions: ['corrosive', 'toxic'], cautionNote: 'Causes burns and may harm fertility or the unborn child (reproductive toxicant); wear gloves and eye protection.' }),
  system('2-amino-2-methyl-1-propanol', ['AMP', 'aminomethylpropanol', '2-amino-2-methylpropan-1-ol'], 1, [gm('2-amino-2-methyl-1-propanol', 9.694, 54.05)], [
    form('2-amino-2-methyl-1-propanol base', ['AMP base', '2-amino-2-methyl-1-propanol'], 'C4H11NO', 89.14, [['2-amino-2-methyl-1-propanol', 1, 1]]),
  ], { cautions: ['irritant'], cautionNote: 'Liquid or low-melting solid; irritating to eyes and skin.' }),
  system('2-amino-2-methyl-1,3-propanediol', ['AMPD', 'ammediol'], 1, [gm('2-amino-2-methyl-1,3-propanediol', 8.801, 49.85)], [
    form('AMPD base', ['AMPD', '2-amino-2-methyl-1,3-propanediol'], 'C4H11NO2', 105.14, [['2-amino-2-methyl-1,3-propanediol', 1, 1]]),
  ], { cautions: ['irritant'], cautionNote: 'Irritating to eyes and skin.' }),
  system('ethanolamine', ['monoethanolamine', 'MEA', '2-aminoethanol', 'colamine'], 1, [gm('ethanolamine', 9.498, 50.52)], [
    form('ethanolamine base', ['ethanolamine', 'monoethanolamine'], 'C2H7NO', 61.08, [['ethanolamine', 1, 1]]),
  ], { cautions: ['corrosive'], cautionNote: 'Corrosive liquid: causes skin burns and eye damage.' }),
  system('diethanolamine', ['DEA', 'DEOA', '2,2\'-iminodiethanol'], 1, [gm('diethanolamine', 8.883, 42.08)], [
    form('diethanolamine base', ['diethanolamine'], 'C4H11NO2', 105.14, [['diethanolamine', 1, 1]]),
  ], { cautions: ['irritant', 'toxic'], cautionNote: 'Irritating to eyes and skin; harmful with repeated exposure.' }),
  system('piperazine', ['diethylenediamine', '1,4-diazacyclohexane'], 2, [
    gm('piperazine, H2L2+ ⇌ HL+', 5.333, 31.11),
    gm('piperazine, HL+ ⇌ L', 9.731, 42.89),
  ], [
    form('piperazine anhydrous', ['piperazine'], 'C4H10N2', 86.14, [['piperazine', 1, 2]]),
    form('piperazine hexahydrate', ['piperazine·6H2O'], 'C4H10N2·6H2O', 194.23, [['piperazine', 1, 2]]),
  ], { cautions: ['corrosive'], cautionNote: 'Causes burns and may cause skin or breathing sensitisation.' }),
  system('ammonia', ['ammonium', 'NH3', 'NH4+'], 1, [gv('ammonia (ammonium ion)', 9.245, 51.95, 8)], [
    form('ammonium chloride', ['NH4Cl', 'sal ammoniac'], 'NH4Cl', 53.49, [['ammonia', 1, 0]], { 'Cl-': 1 }, { cautions: ['irritant'], cautionNote: 'Harmful if swallowed; irritating to eyes.' }),
    form('ammonium sulfate', ['(NH4)2SO4', 'ammonium sulphate'], '(NH4)2SO4', 132.14, [['ammonia', 2, 0], ['sulfate', 1, 2]]),
    form('ammonium acetate', ['NH4OAc', 'CH3COONH4'], 'C2H7NO2', 77.08, [['ammonia', 1, 0], ['acetate', 1, 1]]),
    form('ammonium formate', ['HCOONH4'], 'CH5NO2', 63.06, [['ammonia', 1, 0], ['formate', 1, 1]]),
    form('ammonia (dissolved)', ['ammonia solution', 'ammonium hydroxide', 'aqueous ammonia', 'NH4OH'], 'NH3', 17.03, [['ammonia', 1, 1]], {}, {
      cautions: ['corrosive'],
      cautionNote: 'Concentrated solutions are corrosive and give off pungent ammonia gas; work in a fume hood. The amount is that of NH3: read the bottle\'s assay.',
    }),
  ]),

  // ── Amino acids and peptides ────────────────────────────────────────────────────────
  system('glycine', ['Gly', 'aminoacetic acid', 'aminoethanoic acid'], 1, [
    gm('glycine, H2L+ ⇌ HL±', 2.351, 4.0, -139),
    gv('glycine, HL± ⇌ L−', 9.78, 44.2, -57),
  ], [
    form('glycine', ['glycine free base', 'glycine zwitterion'], 'C2H5NO2', 75.07, [['glycine', 1, 1]]),
  ]),
  system('glycylglycine', ['Gly-Gly', 'glygly', 'diglycine'], 1, [
    gm('glycylglycine, H2L+ ⇌ HL±', 3.14, 0.11, -120),
    gv('glycylglycine, HL± ⇌ L−', 8.265, 43.4, -16),
  ], [
    form('glycylglycine free base', ['glycylglycine', 'Gly-Gly'], 'C4H8N2O3', 132.12, [['glycylglycine', 1, 1]]),
  ]),
  system('histidine', ['L-histidine', 'His'], 2, [
    step('crcDissociation', 'L-histidine, carboxyl', false, 1.8, undefined, undefined, '(memory) ΔH° not recorded: pKa treated as independent of temperature.'),
    step('crcDissociation', 'L-histidine, imidazolium', false, 6.04, undefined, undefined, '(memory) ΔH° not recorded: pKa treated as independent of temperature.'),
    step('crcDissociation', 'L-histidine, ammonium', false, 9.33, undefined, undefined, '(memory) ΔH° not recorded: pKa treated as independent of temperature.'),
  ], [
    form('L-histidine', ['histidine', 'histidine free base'], 'C6H9N3O2', 155.15, [['histidine', 1, 2]]),
    form('L-histidine monohydrochloride monohydrate', ['histidine HCl', 'histidine hydrochloride', 'histidine HCl H2O', 'L-histidine hydrochloride monohydrate'], 'C6H9N3O2·HCl·H2O', 209.63, [['histidine', 1, 1]], { 'Cl-': 1 }),
  ], { temperatureRangeC: ROOM_ONLY_RANGE_C }),

  // ── Inorganic acids ─────────────────────────────────────────────────────────────────
  system('phosphate', ['phosphoric acid', 'orthophosphate', 'H3PO4', 'Pi'], 0, [
    gv('phosphoric acid, H3PO4 ⇌ H2PO4−', 2.148, -8.0, -141),
    gv('phosphoric acid, H2PO4− ⇌ HPO42−', 7.198, 3.6, -230),
    gv('phosphoric acid, HPO42− ⇌ PO43−', 12.35, 16.0, -242),
  ], [
    form('phosphoric acid', ['orthophosphoric acid', 'H3PO4'], 'H3PO4', 98.0, [['phosphate', 1, 0]], {}, {
      cautions: ['corrosive'],
      cautionNote: 'Concentrated acid causes burns. The amount is that of H3PO4: read the assay (85 % is typical).',
    }),
    form('sodium phosphate monobasic anhydrous', ['sodium dihydrogen phosphate', 'monosodium phosphate', 'NaH2PO4', 'NaH2PO4 anhydrous', 'sodium phosphate monobasic', 'sodium dihydrogen phosphate anhydrous'], 'NaH2PO4', 119.98, [['phosphate', 1, 1]], { 'Na+': 1 }),
    form('sodium phosphate monobasic monohydrate', ['NaH2PO4·H2O', 'sodium dihydrogen phosphate monohydrate', 'monosodium phosphate monohydrate'], 'NaH2PO4·H2O', 137.99, [['phosphate', 1, 1]], { 'Na+': 1 }),
    form('sodium phosphate monobasic dihydrate', ['NaH2PO4·2H2O', 'sodium dihydrogen phosphate dihydrate', 'monosodium phosphate dihydrate'], 'NaH2PO4·2H2O', 156.01, [['phosphate', 1, 1]], { 'Na+': 1 }),
    form('sodium phosphate dibasic anhydrous', ['disodium hydrogen phosphate', 'disodium phosphate', 'Na2HPO4', 'Na2HPO4 anhydrous', 'sodium phosphate dibasic', 'disodium hydrogen phosphate anhydrous'], 'Na2HPO4', 141.96, [['phosphate', 1, 2]], { 'Na+': 2 }, {
      solubility: { gramsPerLitre: 77, temperatureC: 20, source: 'crcSolubility', verified: false },
    }),
    form('sodium phosphate dibasic dihydrate', ['Na2HPO4·2H2O', 'disodium hydrogen phosphate dihydrate', 'disodium phosphate dihydrate'], 'Na2HPO4·2H2O', 177.99, [['phosphate', 1, 2]], { 'Na+': 2 }),
    form('sodium phosphate dibasic heptahydrate', ['Na2HPO4·7H2O', 'disodium hydrogen phosphate heptahydrate', 'disodium phosphate heptahydrate'], 'Na2HPO4·7H2O', 268.07, [['phosphate', 1, 2]], { 'Na+': 2 }),
    form('sodium phosphate dibasic dodecahydrate', ['Na2HPO4·12H2O', 'disodium hydrogen phosphate dodecahydrate', 'disodium phosphate dodecahydrate'], 'Na2HPO4·12H2O', 358.14, [['phosphate', 1, 2]], { 'Na+': 2 }),
    form('sodium phosphate tribasic dodecahydrate', ['Na3PO4·12H2O', 'trisodium phosphate dodecahydrate', 'TSP'], 'Na3PO4·12H2O', 380.12, [['phosphate', 1, 3]], { 'Na+': 3 }, {
      cautions: ['irritant'],
      cautionNote: 'Strongly alkaline in solution; irritating to eyes and skin.',
    }),
    form('potassium phosphate monobasic', ['potassium dihydrogen phosphate', 'monopotassium phosphate', 'KH2PO4', 'KDP'], 'KH2PO4', 136.09, [['phosphate', 1, 1]], { 'K+': 1 }),
    form('potassium phosphate dibasic anhydrous', ['dipotassium hydrogen phosphate', 'dipotassium phosphate', 'K2HPO4', 'potassium phosphate dibasic'], 'K2HPO4', 174.18, [['phosphate', 1, 2]], { 'K+': 2 }),
    form('potassium phosphate dibasic trihydrate', ['K2HPO4·3H2O', 'dipotassium hydrogen phosphate trihydrate'], 'K2HPO4·3H2O', 228.22, [['phosphate', 1, 2]], { 'K+': 2 }),
    form('potassium phosphate tribasic', ['tripotassium phosphate', 'K3PO4'], 'K3PO4', 212.27, [['phosphate', 1, 3]], { 'K+': 3 }, {
      cautions: ['irritant'],
      cautionNote: 'Strongly alkaline in solution; irritating to eyes and skin.',
    }),
  ]),
  system('carbonate', ['carbonic acid', 'bicarbonate', 'hydrogen carbonate', 'CO2', 'H2CO3'], 0, [
    gm('carbonic acid, H2CO3* (CO2 + H2O) ⇌ HCO3−', 6.351, 9.15, -371, '(memory) Another copy of the review table found by code search gives 6.352 (the Harned & Davis value); ΔH°, ΔCp° not checked.'),
    gv('carbonic acid, HCO3− ⇌ CO32−', 10.329, 14.7, -249),
  ], [
    form('sodium bicarbonate', ['sodium hydrogen carbonate', 'NaHCO3', 'baking soda'], 'NaHCO3', 84.01, [['carbonate', 1, 1]], { 'Na+': 1 }),
    form('sodium carbonate anhydrous', ['sodium carbonate', 'Na2CO3', 'Na2CO3 anhydrous', 'soda ash'], 'Na2CO3', 105.99, [['carbonate', 1, 2]], { 'Na+': 2 }, {
      cautions: ['irritant'],
      cautionNote: 'Causes serious eye irritation; alkaline in solution.',
    }),
    form('sodium carbonate decahydrate', ['Na2CO3·10H2O', 'washing soda'], 'Na2CO3·10H2O', 286.14, [['carbonate', 1, 2]], { 'Na+': 2 }, {
      cautions: ['irritant'],
      cautionNote: 'Causes serious eye irritation; alkaline in solution.',
    }),
    form('potassium bicarbonate', ['potassium hydrogen carbonate', 'KHCO3'], 'KHCO3', 100.12, [['carbonate', 1, 1]], { 'K+': 1 }),
    form('potassium carbonate', ['K2CO3', 'potash'], 'K2CO3', 138.21, [['carbonate', 1, 2]], { 'K+': 2 }, {
      cautions: ['irritant'],
      cautionNote: 'Causes serious eye irritation; alkaline in solution.',
    }),
  ], { note: 'Open solutions exchange CO2 with air; the model treats the system as closed (no gas exchange).' }),
  system('borate', ['boric acid', 'B(OH)3', 'tetraborate'], 0, [gv('boric acid, B(OH)3 + H2O ⇌ B(OH)4− + H+', 9.237, 13.8, -240)], [
    form('boric acid', ['H3BO3', 'orthoboric acid', 'B(OH)3'], 'H3BO3', 61.83, [['borate', 1, 0]]),
    form('sodium tetraborate decahydrate', ['borax', 'Na2B4O7·10H2O', 'disodium tetraborate decahydrate', 'sodium borate decahydrate'], 'Na2B4O7·10H2O', 381.37, [['borate', 4, 2]], { 'Na+': 2 }, {
      note: 'Dissolves to 2 B(OH)3 + 2 B(OH)4− + 2 Na+: four moles of borate with two protons lost in total. Polyborate ions at high concentration are not modelled.',
    }),
    form('sodium tetraborate anhydrous', ['Na2B4O7', 'sodium tetraborate', 'disodium tetraborate'], 'Na2B4O7', 201.22, [['borate', 4, 2]], { 'Na+': 2 }),
  ], { cautions: ['toxic'], cautionNote: 'Boric acid and borates may damage fertility or the unborn child (EU reproductive toxicant, category 1B); avoid dust.' }),
  system('sulfate', ['sulphate', 'sulfuric acid', 'bisulfate', 'hydrogen sulfate', 'HSO4-'], 0, [
    step('commonlyStated', 'sulfuric acid, H2SO4 ⇌ HSO4−', false, -3, undefined, undefined, 'Strong first step: commonly stated pKa about −3 (order of magnitude only); any value below 0 gives the same result in buffers.'),
    step('harnedOwen1958', 'hydrogen sulfate ion, HSO4− ⇌ SO42−', false, 1.99, -22.4, undefined, '(memory) pKa 1.99 as commonly cited from Harned & Owen (1.987 in later work); ΔH° about −22 kJ/mol from memory; ΔCp° not recorded.'),
  ], [
    form('sulfuric acid', ['H2SO4', 'sulphuric acid', 'oil of vitriol'], 'H2SO4', 98.08, [['sulfate', 1, 0]], {}, {
      cautions: ['corrosive'],
      cautionNote: 'Causes severe burns; concentrated acid reacts violently with water: always add acid to water, slowly, never water to acid.',
    }),
    form('sodium sulfate anhydrous', ['Na2SO4', 'sodium sulphate'], 'Na2SO4', 142.04, [['sulfate', 1, 2]], { 'Na+': 2 }),
    form('potassium sulfate', ['K2SO4', 'potassium sulphate'], 'K2SO4', 174.26, [['sulfate', 1, 2]], { 'K+': 2 }),
    form('magnesium sulfate heptahydrate', ['MgSO4·7H2O', 'Epsom salt', 'magnesium sulphate heptahydrate'], 'MgSO4·7H2O', 246.47, [['sulfate', 1, 2]], { 'Mg2+': 1 }),
  ], { temperatureRangeC: ROOM_ONLY_RANGE_C, note: 'The HSO4− step matters only below about pH 3.' }),

  // ── Carboxylic acids ────────────────────────────────────────────────────────────────
  system('formate', ['formic acid', 'methanoic acid', 'HCOOH'], 0, [gm('formic acid', 3.744, -0.1, -165)], [
    form('formic acid', ['HCOOH', 'methanoic acid'], 'CH2O2', 46.03, [['formate', 1, 0]], {}, {
      cautions: ['corrosive'],
      cautionNote: 'Concentrated acid causes severe burns and its vapour is toxic; flammable. Read the assay on the bottle.',
    }),
    form('sodium formate', ['HCOONa', 'sodium methanoate'], 'CHNaO2', 68.01, [['formate', 1, 1]], { 'Na+': 1 }),
  ]),
  system('lactate', ['lactic acid', '2-hydroxypropanoic acid'], 0, [step('crcDissociation', 'lactic acid', false, 3.86, undefined, undefined, '(memory) ΔH° not recorded: pKa treated as independent of temperature.')], [
    form('lactic acid', ['DL-lactic acid', 'L-lactic acid'], 'C3H6O3', 90.08, [['lactate', 1, 0]], {}, {
      cautions: ['corrosive'],
      cautionNote: 'Concentrated solutions cause eye damage and skin irritation. Commercial lactic acid contains lactide; read the assay.',
    }),
    form('sodium lactate', ['sodium L-lactate', 'sodium DL-lactate'], 'C3H5NaO3', 112.06, [['lactate', 1, 1]], { 'Na+': 1 }, { note: 'Often sold as a 50–60 % syrup: read the assay.' }),
  ], { temperatureRangeC: ROOM_ONLY_RANGE_C }),
  system('acetate', ['acetic acid', 'ethanoic acid', 'OAc', 'AcOH'], 0, [gv('acetic acid', 4.756, -0.41, -142)], [
    form('acetic acid glacial', ['glacial acetic acid', 'acetic acid', 'AcOH', 'CH3COOH', 'ethanoic acid'], 'C2H4O2', 60.05, [['acetate', 1, 0]], {}, {
      cautions: ['corrosive'],
      cautionNote: 'Glacial acetic acid causes severe burns and is flammable; pungent vapour.',
    }),
    form('sodium acetate anhydrous', ['sodium acetate', 'NaOAc', 'CH3COONa', 'anhydrous sodium acetate'], 'C2H3NaO2', 82.03, [['acetate', 1, 1]], { 'Na+': 1 }),
    form('sodium acetate trihydrate', ['NaOAc·3H2O', 'CH3COONa·3H2O'], 'C2H3NaO2·3H2O', 136.08, [['acetate', 1, 1]], { 'Na+': 1 }),
    form('potassium acetate', ['KOAc', 'CH3COOK'], 'C2H3KO2', 98.14, [['acetate', 1, 1]], { 'K+': 1 }),
  ]),
  system('succinate', ['succinic acid', 'butanedioic acid'], 0, [
    gv('succinic acid, H2L ⇌ HL−', 4.207, 3.0, -121),
    gv('succinic acid, HL− ⇌ L2−', 5.636, -0.5, -217),
  ], [
    form('succinic acid', ['butanedioic acid'], 'C4H6O4', 118.09, [['succinate', 1, 0]], {}, { cautions: ['irritant'], cautionNote: 'Causes serious eye damage as a powder.' }),
    form('sodium succinate dibasic hexahydrate', ['disodium succinate hexahydrate', 'sodium succinate hexahydrate'], 'C4H4Na2O4·6H2O', 270.14, [['succinate', 1, 2]], { 'Na+': 2 }),
  ]),
  system('maleate', ['maleic acid', 'cis-butenedioic acid'], 0, [
    gm('maleic acid, H2L ⇌ HL−', 1.92, 1.1),
    gm('maleic acid, HL− ⇌ L2−', 6.27, -3.6),
  ], [
    form('maleic acid', ['cis-butenedioic acid'], 'C4H4O4', 116.07, [['maleate', 1, 0]]),
  ], { cautions: ['irritant', 'toxic'], cautionNote: 'Harmful if swallowed; irritates eyes and skin and may cause skin sensitisation.' }),
  system('malate', ['malic acid', 'hydroxybutanedioic acid'], 0, [
    step('crcDissociation', 'malic acid, H2L ⇌ HL−', false, 3.4, undefined, undefined, '(memory) ΔH° not recorded: pKa treated as independent of temperature.'),
    step('crcDissociation', 'malic acid, HL− ⇌ L2−', false, 5.2, undefined, undefined, '(memory) ΔH° not recorded: pKa treated as independent of temperature.'),
  ], [
    form('DL-malic acid', ['malic acid', 'L-malic acid'], 'C4H6O5', 134.09, [['malate', 1, 0]], {}, { cautions: ['irritant'], cautionNote: 'Causes serious eye irritation.' }),
  ], { temperatureRangeC: ROOM_ONLY_RANGE_C }),
  system('citrate', ['citric acid', '2-hydroxypropane-1,2,3-tricarboxylic acid'], 0, [
    gv('citric acid, H3L ⇌ H2L−', 3.128, 4.07, -131),
    gv('citric acid, H2L− ⇌ HL2−', 4.761, 2.23, -178),
    gv('citric acid, HL2− ⇌ L3−', 6.396, -3.38, -254),
  ], [
    form('citric acid anhydrous', ['citric acid', 'anhydrous citric acid', 'C6H8O7'], 'C6H8O7', 192.12, [['citrate', 1, 0]], {}, { cautions: ['irritant'], cautionNote: 'Causes serious eye irritation.' }),
    form('citric acid monohydrate', ['C6H8O7·H2O'], 'C6H8O7·H2O', 210.14, [['citrate', 1, 0]], {}, { cautions: ['irritant'], cautionNote: 'Causes serious eye irritation.' }),
    form('sodium citrate monobasic', ['monosodium citrate', 'sodium dihydrogen citrate'], 'C6H7NaO7', 214.11, [['citrate', 1, 1]], { 'Na+': 1 }),
    form('trisodium citrate dihydrate', ['sodium citrate', 'sodium citrate tribasic dihydrate', 'sodium citrate dihydrate', 'Na3C6H5O7·2H2O'], 'Na3C6H5O7·2H2O', 294.1, [['citrate', 1, 3]], { 'Na+': 3 }),
    form('trisodium citrate anhydrous', ['sodium citrate anhydrous', 'sodium citrate tribasic anhydrous'], 'Na3C6H5O7', 258.07, [['citrate', 1, 3]], { 'Na+': 3 }),
    form('tripotassium citrate monohydrate', ['potassium citrate', 'potassium citrate monohydrate', 'K3C6H5O7·H2O'], 'K3C6H5O7·H2O', 324.41, [['citrate', 1, 3]], { 'K+': 3 }),
  ], { note: 'Binds Ca2+ and Mg2+ strongly; complexes are not modelled.' }),
  system('phthalate', ['phthalic acid', 'benzene-1,2-dicarboxylic acid'], 0, [
    gm('phthalic acid, H2L ⇌ HL−', 2.95, 2.7, -88),
    gm('phthalic acid, HL− ⇌ L2−', 5.408, -2.17, -295),
  ], [
    form('potassium hydrogen phthalate', ['KHP', 'potassium biphthalate', 'potassium acid phthalate', 'KHC8H4O4'], 'C8H5KO4', 204.22, [['phthalate', 1, 1]], { 'K+': 1 }),
    form('phthalic acid', ['benzene-1,2-dicarboxylic acid'], 'C8H6O4', 166.13, [['phthalate', 1, 0]], {}, { cautions: ['irritant'], cautionNote: 'Irritating to eyes and airways.' }),
  ]),
  system('oxalate', ['oxalic acid', 'ethanedioic acid'], 0, [
    gm('oxalic acid, H2L ⇌ HL−', 1.27, -3.9),
    gm('oxalic acid, HL− ⇌ L2−', 4.266, 7.0, -231),
  ], [
    form('oxalic acid dihydrate', ['oxalic acid', 'C2H2O4·2H2O'], 'C2H2O4·2H2O', 126.07, [['oxalate', 1, 0]], {}, { cautions: ['corrosive'], cautionNote: 'Causes serious eye damage.' }),
    form('sodium oxalate', ['Na2C2O4', 'disodium oxalate'], 'Na2C2O4', 134.0, [['oxalate', 1, 2]], { 'Na+': 2 }),
  ], { cautions: ['toxic'], cautionNote: 'Oxalates are harmful if swallowed or in contact with skin (they bind calcium in the body).' }),
  system('tartrate', ['tartaric acid', 'L-tartaric acid', '2,3-dihydroxybutanedioic acid'], 0, [
    step('bates1973', 'L-tartaric acid, H2L ⇌ HL−', false, 3.036, undefined, undefined, '(memory) ΔH° not recorded: pKa treated as independent of temperature.'),
    step('bates1973', 'L-tartaric acid, HL− ⇌ L2−', false, 4.366, undefined, undefined, '(memory) ΔH° not recorded: pKa treated as independent of temperature.'),
  ], [
    form('L-tartaric acid', ['tartaric acid'], 'C4H6O6', 150.09, [['tartrate', 1, 0]], {}, { cautions: ['irritant'], cautionNote: 'Causes serious eye damage as a powder.' }),
    form('potassium sodium tartrate tetrahydrate', ['Rochelle salt', 'Seignette salt', 'KNaC4H4O6·4H2O'], 'KNaC4H4O6·4H2O', 282.22, [['tartrate', 1, 2]], { 'K+': 1, 'Na+': 1 }),
  ], { temperatureRangeC: ROOM_ONLY_RANGE_C }),
  system('cacodylate', ['cacodylic acid', 'dimethylarsinic acid', 'dimethylarsinate'], 0, [gm('cacodylic acid', 6.28, -3.0, -86)], [
    form('sodium cacodylate trihydrate', ['sodium cacodylate', 'sodium dimethylarsinate trihydrate'], 'C2H6AsNaO2·3H2O', 214.03, [['cacodylate', 1, 1]], { 'Na+': 1 }),
    form('cacodylic acid', ['dimethylarsinic acid'], 'C2H7AsO2', 138.0, [['cacodylate', 1, 0]]),
  ], {
    cautions: ['arsenic', 'toxic'],
    cautionNote: 'Contains arsenic: toxic if swallowed or inhaled, and a carcinogen. Weigh in a fume hood with gloves; collect all waste as arsenic waste.',
  }),

  // ── Strong electrolytes and titrants ────────────────────────────────────────────────
  strong('sodium chloride', ['NaCl', 'salt'], [form('sodium chloride', ['NaCl', 'halite'], 'NaCl', 58.44, [], { 'Na+': 1, 'Cl-': 1 }, {
      solubility: { gramsPerLitre: 317, temperatureC: 25, source: 'crcSolubility', verified: false },
    })]),
  strong('potassium chloride', ['KCl'], [form('potassium chloride', ['KCl', 'sylvite'], 'KCl', 74.55, [], { 'K+': 1, 'Cl-': 1 })]),
  strong('magnesium chloride', ['MgCl2'], [
    form('magnesium chloride anhydrous', ['MgCl2', 'magnesium chloride'], 'MgCl2', 95.21, [], { 'Mg2+': 1, 'Cl-': 2 }, { note: 'Anhydrous MgCl2 takes up water from air and dissolves exothermically; the hexahydrate is the usual form.' }),
    form('magnesium chloride hexahydrate', ['MgCl2·6H2O'], 'MgCl2·6H2O', 203.3, [], { 'Mg2+': 1, 'Cl-': 2 }),
  ]),
  strong('calcium chloride', ['CaCl2'], [
    form('calcium chloride anhydrous', ['CaCl2', 'calcium chloride'], 'CaCl2', 110.98, [], { 'Ca2+': 1, 'Cl-': 2 }, { cautions: ['irritant'], cautionNote: 'Causes serious eye irritation; dissolves exothermically.' }),
    form('calcium chloride dihydrate', ['CaCl2·2H2O'], 'CaCl2·2H2O', 147.01, [], { 'Ca2+': 1, 'Cl-': 2 }, { cautions: ['irritant'], cautionNote: 'Causes serious eye irritation.' }),
  ]),
  strong('hydrochloric acid', ['HCl', 'muriatic acid', 'hydrogen chloride'], [
    form('hydrochloric acid', ['HCl', 'hydrogen chloride', 'muriatic acid'], 'HCl', 36.46, [], { 'Cl-': 1 }, {
      protonsReleased: 1,
      note: 'Strong acid: adds Cl− to the charge balance; its proton goes to water. The amount is that of HCl (concentrated acid is about 37 %, 12 mol/L).',
    }),
  ], ['corrosive'], 'Corrosive: causes burns; concentrated acid gives off choking fumes. Dilute by adding acid to water in a fume hood.'),
  strong('sodium hydroxide', ['NaOH', 'caustic soda', 'lye'], [
    form('sodium hydroxide', ['NaOH', 'caustic soda', 'lye'], 'NaOH', 40.0, [], { 'Na+': 1 }, { protonsReleased: -1, note: 'Strong base: adds Na+ to the charge balance.' }),
  ], ['corrosive'], 'Corrosive: causes severe burns and eye damage. Solid NaOH dissolves with strong heating: add it slowly to cold water while stirring. Takes up CO2 from air.'),
  strong('potassium hydroxide', ['KOH', 'caustic potash'], [
    form('potassium hydroxide', ['KOH', 'caustic potash'], 'KOH', 56.11, [], { 'K+': 1 }, { protonsReleased: -1, note: 'Strong base: adds K+ to the charge balance. Pellets are typically about 85 % KOH: read the assay.' }),
  ], ['corrosive'], 'Corrosive: causes severe burns and eye damage. Solid KOH dissolves with strong heating: add it slowly to cold water while stirring.'),
];
