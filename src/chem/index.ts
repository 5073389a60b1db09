/**
 * The chemistry core's public face: everything hosts (worksheet functions, task pane,
 * command line) may call. Pure TypeScript; no Office, DOM or I/O.
 */
export {
  ACTIVITY_MODELS,
  ACTIVITY_MODEL_LIMIT_M,
  ACTIVITY_MODEL_NAMES,
  DEFAULT_ACTIVITY_MODEL,
  PITZER_LIMIT_MOLAL,
  apparentPKa,
  ionicStrengthFactor,
  log10Gamma,
} from './activity';
export { saltCoefficients } from './pitzer/model';
export type { ActivityModel } from './activity';
export {
  MAX_CONCENTRATION_M,
  MAX_STEPS,
  MAX_TEMPERATURE_C,
  MIN_TEMPERATURE_C,
  FITTED_RANGE_MAX_C,
  chemistryOf,
  prepare,
  prepareWith,
  systemAt,
  withConditions,
} from './composition';
export type { AcidBaseChemistry, AcidBaseStep, AcidBaseSystem, ChemistryAt, Composition, PreparedComposition } from './composition';
export { BUFFERING_HALF_WIDTH, CHELATORS, chelatorWarning, metalComplexWarning, solutionWarnings, weakBufferingWarning } from './checks';
export { ChemError, MESSAGES } from './errors';
export { uniqueWarnings, warning, warningTexts } from './warnings';
export type { ChemWarning } from './warnings';
export type { ChemErrorKind } from './errors';
export { STRONG_IONS, findStrongIon } from './strongIons';
export { chargeLabel, report, solvePh, solvePrepared, speciate } from './speciation';
export type { PitzerCoverage, SpeciationResult, SpeciesAmount, SystemSpeciation } from './speciation';
export { HYDROCHLORIC_ACID, SODIUM_HYDROXIDE, titrantForPh, withTitrant, netStrongBaseForPh } from './titration';
export type { Titrant, TitrantAmount } from './titration';
export { afterDilution, afterLoad, atTemperature, capacity, capacityOfPrepared, idealCapacityAt, scaleComposition } from './capacity';
export type { AcidBaseLoad, Capacity } from './capacity';
export { idealOsmolarity } from './osmolarity';
export { CONDUCTIVITY_MAX_C, CONDUCTIVITY_MIN_C, conductivityAt, conductivityOf, onsagerCoefficients, waterViscosity } from './conductivity';
export type { ConductivityEstimate, ConductivityResult, IonConductivity } from './conductivity';
export { IRRELEVANT_STEP_DISTANCE, NO_ENTHALPY_TOLERANCE_C, temperatureWarnings } from './temperatureChecks';
export type { TemperatureWarning } from './temperatureChecks';
export { pKaAt } from './vantHoff';
export { debyeHuckelA, pKw, waterDensity, waterPermittivity } from './water';
