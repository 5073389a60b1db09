/** The substance library: sourced acid–base data, forms on the shelf, and lookup by name. */
export { SUBSTANCES } from './substances';
export { COPIES, SOURCES } from './sources';
export type { SourceId } from './sources';
export type { CautionFlag, FormRecord, LibraryForm, Solubility, SourcedStep, SubstanceRecord, SystemPortion } from './types';
export { ATOMIC_WEIGHTS, ATOMIC_WEIGHTS_SOURCE, elementCounts, molarMassOf } from './formula';
export { closestNames, editDistance, nameKey } from './names';
export {
  chemistryOf,
  compositionFromForms,
  createLibrary,
  defaultLibrary,
  findForm,
  findSystem,
  formAmount,
  listSubstances,
  netChargeOfForm,
  usefulPhRange,
  USEFUL_RANGE_HALF_WIDTH,
  MAX_FORM_CONCENTRATION_M,
} from './lookup';
export type { CompositionOptions, FormAmount, FormContribution, SubstanceLibrary, SubstanceListing } from './lookup';
export type { UserForm, UserSubstance } from './userSubstances';
export { titrantFromForm } from './titrant';
