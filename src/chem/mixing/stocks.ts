/**
 * Stocks as first-class substances: a named solution with its composition, either a plain
 * solution of one form (5 M NaCl), a stock made by titration (tris base brought to pH 8.0
 * with HCl at 25 °C, 1 M: its composition follows from the titrant amount the solver finds),
 * or a neutral additive (glycerol 50 %, sucrose 2 M). docs/stocks.md describes the format.
 *
 * Pure: hosts read a shelf (a workbook range, a JSON file) into `StockInput` objects and
 * call `resolveShelf`; every number goes through the one input reader.
 */
import type { ActivityModel } from '../activity';
import { AcidBaseSystem, Composition, systemAt, withConditions } from '../composition';
import { ChemError, MESSAGES } from '../errors';
import { isBlankValue, readNumberField, readTextField, requireNumberField } from '../input';
import { readQuantity } from '../input/quantity';
import { NeutralAdditive, findAdditive } from '../library/additives';
import { SubstanceLibrary, defaultLibrary } from '../library/lookup';
import { titrantFromForm } from '../library/titrant';
import type { LibraryForm } from '../library/types';
import { solvePh } from '../speciation';
import { titrantForPh, withTitrant } from '../titration';

/** A number as typed (in the field's unit) or text with a unit ("1 M", "500 mM", "50 %"). */
export type Amount = number | string;

/** One stock on the shelf, as a user writes it (a row of the shelf range, an entry of the JSON file). */
export interface StockInput {
  /** The stock's own name, as written on the bottle: `Tris-HCl 1 M pH 8.0`. */
  readonly name: string;
  /** What is dissolved: a library form (`tris base`, `NaCl`, `EDTA disodium salt dihydrate`) or a neutral additive (`glycerol`). */
  readonly form: string;
  /** Concentration: mol/L of the form (of its buffer system for a titrated stock), or "50 %" for a neutral additive. */
  readonly concentration: Amount;
  /** Made by titration: the titrant it was brought to pH with (`HCl`, `NaOH`, `KOH`). */
  readonly titrant?: string;
  /** Made by titration: the pH it was brought to (its label). */
  readonly ph?: Amount;
  /** Temperature at which that pH was set, °C (default 25). */
  readonly phTemperatureC?: Amount;
}

/** A stock resolved: its composition per litre and what a target can call it. */
export interface Stock {
  readonly name: string;
  readonly kind: 'plain' | 'titrated' | 'additive';
  /** The form dissolved (library forms), or the additive. */
  readonly form?: LibraryForm;
  readonly additive?: NeutralAdditive;
  /** The substance a target names: the buffer system, the strong electrolyte, or the additive. */
  readonly component: string;
  /** Concentration of that component in the stock, mol/L. */
  readonly componentM: number;
  /** The stock's acid–base systems and strong ions, mol/L (no neutral additives). */
  readonly composition: Composition;
  /** Neutral additives in the stock, mol/L, by additive name. */
  readonly additivesM: Readonly<Record<string, number>>;
  /** The label of a titrated stock: the pH it was brought to and at what temperature. */
  readonly label?: { readonly ph: number; readonly temperatureC: number };
  /** Titrant in the stock (titrated stocks), mol/L, its name, and the stock's ionic strength at its label (mol/L). */
  readonly titrant?: { readonly name: string; readonly concentrationM: number; readonly ionicStrengthM: number };
}

/**
 * Mol/L of an additive given as a percentage: % v/v of a neat liquid (× its density) or
 * % w/v of a solid.
 *
 * @example additiveMolarFromPercent(findAdditive('glycerol')!, 10) // ≈ 1.369 (10 mL × 1.261 g/mL per 100 mL ÷ 92.09 g/mol)
 */
export function additiveMolarFromPercent(additive: NeutralAdditive, percent: number): number {
  const gramsPerLitre = additive.state === 'liquid' ? percent * 10 * (additive.densityGPerMl ?? 1) : percent * 10;
  return gramsPerLitre / additive.molarMass;
}

/** The percentage basis an additive is given in. */
export function percentBasis(additive: NeutralAdditive): '% v/v' | '% w/v' {
  return additive.state === 'liquid' ? '% v/v' : '% w/v';
}

function isPercentText(value: unknown): boolean {
  return typeof value === 'string' && value.trim().endsWith('%');
}

/**
 * One stock resolved against the library.
 *
 * @param input - the stock as written
 * @param at - where it sits, for messages (`stocks[2]`)
 * @param library - the substance library (the user's own substances included)
 * @param activityModel - activity model used to find a titrated stock's titrant
 * @throws ChemError invalid-input naming the field; infeasible-target when a titrated stock's pH cannot be reached with its titrant
 */
export function resolveStock(input: StockInput, at: string, library: SubstanceLibrary = defaultLibrary(), activityModel?: ActivityModel): Stock {
  const e = (input ?? {}) as Partial<StockInput>;
  const name = readTextField('form', e.name, `${at}.name`);
  if (name === undefined) throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(`${at}.name`, 'the stock’s name'), `${at}.name`, 'a name');
  const formName = readTextField('form', e.form, `${at}.form`);
  if (formName === undefined)
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(`${at}.form`, 'the form dissolved, or a neutral additive'), `${at}.form`, 'a form or additive name');

  const additive = findAdditive(formName);
  let form: LibraryForm | undefined;
  if (!additive) form = library.findForm(formName, `${at}.form`);

  if (additive) {
    const componentM = isPercentText(e.concentration)
      ? additiveMolarFromPercent(additive, requireNumberField('stock.percent', e.concentration, `${at}.concentration`))
      : requireNumberField('stock.concentrationM', e.concentration, `${at}.concentration`);
    if (!isBlankValue(e.titrant) || !isBlankValue(e.ph)) {
      throw new ChemError('invalid-input', 'additiveNotTitrated', MESSAGES.additiveNotTitrated(`${at}.titrant`, additive.name), `${at}.titrant`, 'blank for a neutral additive');
    }
    return { name, kind: 'additive', additive, component: additive.name, componentM, composition: { systems: [] }, additivesM: { [additive.name]: componentM } };
  }

  const lib = form as LibraryForm;
  if (isPercentText(e.concentration)) {
    // A percentage is accepted for neutral additives only: the reader names what is allowed.
    readQuantity(`${at}.concentration`, e.concentration, 'concentration', 'M');
  }
  const formM = requireNumberField('stock.concentrationM', e.concentration, `${at}.concentration`);
  const portion = lib.adds[0];
  const component = portion ? portion.system : lib.substance;
  const componentM = portion ? formM * portion.moles : formM;
  const titrantName = readTextField('titrant.form', e.titrant, `${at}.titrant`);
  const ph = readNumberField('stock.ph', e.ph, `${at}.ph`);
  if (titrantName === undefined && ph === undefined) {
    return {
      name,
      kind: 'plain',
      form: lib,
      component,
      componentM,
      composition: library.compositionFromForms([{ form: lib, concentrationM: formM }], { activityModel }),
      additivesM: {},
    };
  }
  if (titrantName === undefined)
    throw new ChemError(
      'invalid-input',
      'missingValue',
      MESSAGES.missingValue(`${at}.titrant`, 'the titrant the stock was brought to pH with (HCl, NaOH, …)'),
      `${at}.titrant`,
      'a titrant form',
    );
  if (ph === undefined) throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(`${at}.ph`, 'the pH the stock was brought to'), `${at}.ph`, 'a pH');
  const labelT = requireNumberField('stock.phTemperatureC', e.phTemperatureC, `${at}.phTemperatureC`);
  const titrant = titrantFromForm(library.findForm(titrantName, `${at}.titrant`), library, `${at}.titrant`);
  const before = library.compositionFromForms([{ form: lib, concentrationM: formM }], { temperatureC: labelT, activityModel });
  let amount;
  try {
    amount = titrantForPh(before, titrant, ph);
  } catch (err) {
    if (err instanceof ChemError) throw new ChemError(err.kind, err.code, MESSAGES.ofTheStockNamed(name, err.message), `${at}.ph`, err.allowed);
    throw err;
  }
  const composition = withConditions(withTitrant(before, titrant, amount.concentrationM), undefined);
  return {
    name,
    kind: 'titrated',
    form: lib,
    component,
    componentM,
    composition,
    additivesM: {},
    label: { ph, temperatureC: labelT },
    titrant: { name: titrant.name, concentrationM: amount.concentrationM, ionicStrengthM: amount.ionicStrengthM },
  };
}

/**
 * A whole shelf resolved; stock names must be unique (case ignored).
 *
 * @param inputs - the stocks as written
 * @param library - the substance library
 * @param activityModel - activity model for titrated stocks
 */
export function resolveShelf(inputs: readonly StockInput[], library: SubstanceLibrary = defaultLibrary(), activityModel?: ActivityModel): Stock[] {
  if (!Array.isArray(inputs) || inputs.length === 0) {
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('stocks', 'at least one stock (name, form, concentration)'), 'stocks', 'a list of stocks');
  }
  const seen = new Map<string, string>();
  return inputs.map((input, i) => {
    const stock = resolveStock(input, `stocks[${i}]`, library, activityModel);
    const k = stock.name.toLowerCase();
    const before = seen.get(k);
    if (before !== undefined)
      throw new ChemError(
        'invalid-input',
        'duplicateStock',
        MESSAGES.duplicateStock(`stocks[${i}].name`, stock.name, before),
        `stocks[${i}].name`,
        'a name not used by another stock',
      );
    seen.set(k, `stocks[${i}]`);
    return stock;
  });
}

/** A stock's pH at a temperature (its own composition, undiluted). */
export function stockPh(stock: Stock, temperatureC: number): number | undefined {
  if (stock.composition.systems.length === 0 && Object.keys(stock.composition.strongIons ?? {}).length === 0) return undefined;
  return solvePh(withConditions(stock.composition, temperatureC));
}

/** Acid–base systems added up by name (mixing two stocks of the same buffer). */
export function mergeSystems(parts: readonly AcidBaseSystem[]): AcidBaseSystem[] {
  const byName = new Map<string, AcidBaseSystem>();
  for (const s of parts) {
    const prev = byName.get(s.name);
    byName.set(s.name, prev ? systemAt(prev, prev.totalM + s.totalM) : s);
  }
  return [...byName.values()];
}
