/**
 * The published sources the substance library cites, keyed so that each record names its
 * source in one short field.
 */

/** Every source a library value may cite. */
export const SOURCES = {
  goldberg2002:
    'R. N. Goldberg, N. Kishore, R. M. Lennen, "Thermodynamic quantities for the ionization reactions of buffers", J. Phys. Chem. Ref. Data 31 (2002) 231–370, selected values at 298.15 K, I = 0 (most underlying data span about 0–60 °C)',
  harnedOwen1958: 'H. S. Harned, B. B. Owen, The Physical Chemistry of Electrolytic Solutions, 3rd ed., Reinhold (1958)',
  bates1973: 'R. G. Bates, Determination of pH, 2nd ed., Wiley (1973)',
  roy2014:
    'R. N. Roy, L. N. Roy, K. Hundley, T. Wehmeyer, L. Tebbe, "Thermodynamics of the second dissociation constants (pK2) of piperazine-N,N′-bis-2-hydroxypropanesulfonic acid (POPSO sesquisodium salt) … from (278.15 to 328.15) K", J. Biophys. Chem. 5 (2014) 143–151',
  roy1997:
    'R. N. Roy and co-workers, emf study of the second dissociation constant of MOPSO from 5 to 55 °C, J. Chem. Thermodyn. 29 (1997) 1323 (the fitted pK2(T) equation as its abstract gives it)',
  cleggRardPitzer1994:
    'S. L. Clegg, J. A. Rard, K. S. Pitzer, "Thermodynamic properties of 0–6 mol kg−1 aqueous sulfuric acid from 273.15 to 328.15 K", J. Chem. Soc., Faraday Trans. 90 (1994) 1875–1894, eq. 21 (K of HSO4−)',
  crcDissociation: 'CRC Handbook of Chemistry and Physics, "Dissociation constants of organic acids and bases" (edition not checked)',
  crcSolubility:
    'CRC Handbook of Chemistry and Physics, "Aqueous solubility of inorganic compounds at various temperatures" (edition not checked), converted to grams per litre of saturated solution',
  nist46:
    'A. E. Martell, R. M. Smith, R. J. Motekaitis, NIST Critically Selected Stability Constants of Metal Complexes, NIST Standard Reference Database 46 (the protonation constants at 25 °C and I = 0 with their enthalpies)',
  martellSmith:
    'A. E. Martell, R. M. Smith, Critical Stability Constants, Vol. 1: Amino Acids, Plenum (1974), the ethylenebis(oxyethylenenitrilo)tetraacetic acid entry (constants at I = 0.1 M)',
  commonlyStated: 'Value commonly stated in textbooks (no primary source checked)',
  supplierLabel: "Molar mass as printed on common suppliers' labels and catalogues (written from memory; checked against the formula with CIAAW 2021 atomic weights)",
  userDefined: 'Defined by the user',
} as const;

/** Key of a source in SOURCES. */
export type SourceId = keyof typeof SOURCES;

/**
 * The copies library values were checked against. A copy is a place a reader can open
 * (a journal table, a primary paper, or a public copy of one), named so that a
 * step's `checkedAgainst` list can say which copy, where in it, and what it gives. One
 * copy is not the journal: a value checked only against a copy says so.
 */
export const COPIES = {
  goldbergReviewNote: 'A public source-review note quoting the TAPSO and imidazole lines of the Goldberg et al. 2002 tables (Tables 7.62 and 7.41)',
  goldbergScanAda: 'A scanned page of the Goldberg et al. 2002 review (p. 242, the ADA literature table)',
  goldbergItcTable:
    'The buffer table (enum Buffer) of a public C# isothermal-titration-calorimetry analysis program (namespace AnalysisITC), found by code search: ionization ΔH° (J/mol) and ΔCp° for about 25 buffers, matching the Goldberg et al. 2002 selected values for most; its pKa column holds rounded working values, not the thermodynamic pK',
  pytzerDissociation:
    'The fitted equations copied in pytzer (github.com/mvdh7/pytzer, pytzer/dissociation.py): Bates & Hetzer 1961 eq. 3 (tris), Clegg, Rard & Pitzer 1994 eq. 21 (HSO4−), Millero 1979 (boric and carbonic acid), Plummer & Busenberg 1982 (carbonic acid), Bates & Pinching 1949 (ammonium), and the phosphoric-acid fits of Bates 1951, Bates & Acree 1943 and Schwarzenbach & Meier 1964 as given by Millero & Pierrot 1998. pK, ΔH° and ΔCp° at 298.15 K are read off each equation by differentiation (ΔH° = RT² d lnK/dT, ΔCp° = dΔH°/dT)',
  minteqV4:
    'minteq.v4.dat, the MINTEQA2 v4 thermodynamic database distributed with PHREEQC (github.com/usgs-coupled/phreeqc3, database/minteq.v4.dat): log K and ΔH of each protonation reaction at 25 °C and I = 0, with NIST Critical Stability Constants (NIST46) named as source. Read as pKa = log K of one protonation (cumulative constants differenced) and ΔH° of ionization = −ΔH of protonation',
  hummel2005ThermoChimie:
    'The ThermoChimie database as distributed with PHREEQC (github.com/usgs-coupled/phreeqc3, database/sit.dat, version 12a), whose EDTA protonation lines cite W. Hummel, G. Anderegg, L. Rao, I. Puigdomènech, O. Tochiyama, Chemical Thermodynamics of Compounds and Complexes of U, Np, Pu, Am, Tc, Se, Ni and Zr with Selected Organic Ligands, OECD-NEA, Elsevier (2005) ("05HUM/AND"): cumulative log β and ΔH at 25 °C and I = 0, extrapolated with the SIT and with the Na+ and K+ complexes of EDTA treated as species of their own',
  royAbstracts:
    "The abstracts (and, for J. Chem. Eng. Data 42 (1997) 41, the first page) of R. N. Roy and co-workers' emf studies of Good buffers from 5 to 55 °C, as shown on public index and publisher pages: each gives pK2 at 25 °C (and 37 °C) or the fitted pK2(T) equation. Where an equation is given, pK, ΔH° and ΔCp° at 298.15 K are read off it by differentiation; where two temperatures are given, they are compared with the stored constants",
  batesAllen1960:
    'The abstract of R. G. Bates, G. F. Allen, "Acidic dissociation constant and related thermodynamic quantities for triethanolammonium ion in water from 0 to 50 °C", J. Res. Natl. Bur. Stand. 64A (1960) 343, as indexed on PubMed (PMID 32196172)',
} as const;

/** Key of a copy in COPIES. */
export type CopyId = keyof typeof COPIES;
