/**
 * A form on the shelf as a titrant: what one mole of it adds (its counter-ions, and its
 * acid–base system when it is a weak acid or base).
 */
import { ChemError, MESSAGES } from '../errors';
import type { Titrant } from '../titration';
import { SubstanceLibrary, chemistryOf } from './lookup';
import type { LibraryForm } from './types';

/**
 * The titrant a form makes.
 *
 * @param form - the form (NaOH, HCl, KOH, acetic acid, tris base, …)
 * @param library - the library its system is looked up in
 * @param field - the input field naming it, for messages
 * @returns a Titrant for titrantForPh
 * @throws ChemError when the form adds more than one acid–base system
 */
export function titrantFromForm(form: LibraryForm, library: SubstanceLibrary, field = 'titrant'): Titrant {
  if (form.adds.length > 1) {
    throw new ChemError('invalid-input', 'notATitrant', MESSAGES.notATitrant(field, form.name), field, 'a strong acid or base, or a form of one weak acid or base');
  }
  let byForm = TITRANTS.get(library);
  if (!byForm) TITRANTS.set(library, (byForm = new WeakMap()));
  let titrant = byForm.get(form);
  if (!titrant) {
    const portion = form.adds[0];
    titrant = portion
      ? { name: form.name, strongIons: form.counterIons, system: chemistryOf(library.findSystem(portion.system)), systemPerMole: portion.moles }
      : { name: form.name, strongIons: form.counterIons };
    byForm.set(form, titrant);
  }
  return titrant;
}

/**
 * Titrants already made, per library and form: the same object each time, so what the chemistry keeps per titrant
 * (the prepared Pitzer setup of a composition with it) is found again for a weak titrant too.
 */
const TITRANTS = new WeakMap<SubstanceLibrary, WeakMap<LibraryForm, Titrant>>();
