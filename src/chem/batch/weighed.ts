/**
 * The forms actually weighed, matched to the plan: moles from grams (m·purity/M of the exact
 * form on the bottle), and the planned component each one stands for. A form weighed in place
 * of a planned one (another hydrate or salt form of the same substance, adding the same
 * system and counter-ions) is matched to it and named in a warning.
 */
import { Composition, systemAt } from '../composition';
import { ChemError, MESSAGES } from '../errors';
import { readPurityField, requireNumberField, readTextField } from '../input';
import { SubstanceLibrary } from '../library/lookup';
import { nameKey } from '../library/names';
import { titrantFromForm } from '../library/titrant';
import { LibraryForm } from '../library/types';
import { RecipeComponent, RecipePlan } from '../planner/types';
import { Titrant } from '../titration';
import { ChemWarning, warning } from '../warnings';
import { WeighedActual } from './types';

/** One weighed item: the form, its moles, and the planned component it stands for (if any). */
export interface WeighedItem {
  readonly form: LibraryForm;
  readonly moles: number;
  readonly planned?: RecipeComponent;
  readonly lot?: string;
}

/** The volume the weighing and titration make: the stock's on the stock route, the final volume otherwise, mL. */
export function madeVolumeMlOf(plan: RecipePlan): number {
  return plan.stock?.stockVolumeMl ?? plan.volumeMl;
}

/** The plan's weighed components (buffer forms and salts), in the plan's order. */
export function plannedWeighings(plan: RecipePlan): RecipeComponent[] {
  return plan.components.filter((c) => c.grams !== undefined);
}

/** True when two forms add the same systems in the same amounts with the same counter-ions (hydrates of one salt). */
function sameChemistry(a: LibraryForm, b: LibraryForm): boolean {
  const adds = (f: LibraryForm) => JSON.stringify([...f.adds].map((x) => [nameKey(x.system), x.moles, x.protonsLost]).sort());
  const ions = (f: LibraryForm) => JSON.stringify(Object.entries(f.counterIons).sort());
  return adds(a) === adds(b) && ions(a) === ions(b);
}

/**
 * Other forms of the same substance on the shelf, each marked `hydrate` when it has the same
 * chemistry as `form` (another hydrate of the one salt, of another molar mass) or not (the free
 * acid for its sodium salt, tris base for tris HCl): a bottle picked up for the planned one.
 * Hydrates come first, in shelf order.
 */
export function otherForms(form: LibraryForm, library: SubstanceLibrary): { readonly form: LibraryForm; readonly hydrate: boolean }[] {
  const record = library.records().find((r) => r.name === form.substance);
  if (!record) return [];
  return record.forms
    .map((f) => library.findForm(f.name))
    .filter((f) => f.name !== form.name)
    .map((f) => ({ form: f, hydrate: sameChemistry(f, form) }))
    .filter((o) => !o.hydrate || Math.abs(o.form.molarMass - form.molarMass) > 1e-6)
    .sort((a, b) => Number(b.hydrate) - Number(a.hydrate));
}

/** Other forms on the shelf with the same chemistry as `form` (its hydrates), with their molar masses. */
export function siblingForms(form: LibraryForm, library: SubstanceLibrary): LibraryForm[] {
  return otherForms(form, library)
    .filter((o) => o.hydrate)
    .map((o) => o.form);
}

/** The weighed forms as planned (planned grams and purity). */
export function plannedAsWeighed(plan: RecipePlan): WeighedActual[] {
  return plannedWeighings(plan).map((c) => ({ form: c.name, grams: c.grams!, purityPercent: c.purityPercent ?? 100 }));
}

/**
 * Reads the weighed forms and matches them to the plan.
 *
 * @throws ChemError invalid-input for a bad mass or purity (field `actual.weighed[i].grams`), an unknown form, or a planned form with no mass given (`notWeighed`)
 */
export function readWeighed(plan: RecipePlan, weighed: readonly WeighedActual[], library: SubstanceLibrary): { items: WeighedItem[]; warnings: ChemWarning[] } {
  if (!Array.isArray(weighed))
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('actual.weighed', 'a list of the forms weighed with their grams'), 'actual.weighed', 'a list');
  const planned = plannedWeighings(plan);
  const open = new Set(planned.map((_, i) => i));
  const warnings: ChemWarning[] = [];
  const items = weighed.map((w, i): WeighedItem => {
    const at = `actual.weighed[${i}]`;
    const name = readTextField('form', w?.form, `${at}.form`);
    if (name === undefined) throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue(`${at}.form`, 'a form name'), `${at}.form`, 'a name');
    const form = library.findForm(name, `${at}.form`);
    const grams = requireNumberField('actual.grams', w.grams, `${at}.grams`);
    const matchIndex = [...open].find((j) => library.findForm(planned[j].name).name === form.name) ?? [...open].find((j) => sameChemistry(library.findForm(planned[j].name), form));
    const match = matchIndex === undefined ? undefined : planned[matchIndex];
    if (matchIndex !== undefined) open.delete(matchIndex);
    const purity = readPurityField('actual.purityPercent', w.purityPercent, `${at}.purityPercent`) ?? match?.purityPercent ?? 100;
    if (match && library.findForm(match.name).name !== form.name) {
      warnings.push(warning('otherFormWeighed', MESSAGES.otherFormWeighed(form.name, match.name, match.molarMass! / form.molarMass), `${at}.form`));
    } else if (!match) {
      warnings.push(warning('formNotInPlan', MESSAGES.formNotInPlan(form.name), `${at}.form`));
    }
    return { form, moles: (grams * (purity / 100)) / form.molarMass, ...(match ? { planned: match } : {}), ...(w.lot ? { lot: w.lot } : {}) };
  });
  for (const j of open) {
    throw new ChemError('invalid-input', 'notWeighed', MESSAGES.notWeighed(planned[j].name), 'actual.grams', 'grams of every planned form');
  }
  return { items, warnings };
}

/** The solution of the weighed items in a volume, at a temperature (mol/L). */
export function weighedComposition(plan: RecipePlan, items: readonly WeighedItem[], volumeMl: number, temperatureC: number, library: SubstanceLibrary): Composition {
  return library.compositionFromForms(
    items.map((x) => ({ form: x.form, concentrationM: x.moles / (volumeMl / 1000) })),
    { temperatureC, activityModel: plan.activityModel },
  );
}

/** The plan's titrant as the solver's Titrant, with its form. */
export function titrantOf(plan: RecipePlan, library: SubstanceLibrary): { form: LibraryForm; titrant: Titrant } | undefined {
  if (!plan.titration) return undefined;
  const form = library.findForm(plan.titration.titrant);
  return { form, titrant: titrantFromForm(form, library) };
}

/** The composition with every pKa of the plan's buffer system moved by `shift` (for a band). */
export function shiftBuffer(c: Composition, bufferName: string, shift: number): Composition {
  return {
    ...c,
    systems: c.systems.map((sys) =>
      sys.name === bufferName
        ? systemAt(
            {
              name: sys.name,
              chargeOfMostProtonated: sys.chargeOfMostProtonated,
              steps: sys.steps.map((st) => ({ pKa: st.pKa + shift, deltaHkJ: st.deltaHkJ, deltaCpJ: st.deltaCpJ })),
            },
            sys.totalM,
          )
        : sys,
    ),
  };
}
