/** The `solve` command's answer for one composition (also a batch row's figures). */
import { conductivityAt, conductivityOf, solutionWarnings, speciate } from '../chem';
import { toComposition } from './compositionInput';

/** A composition's equilibrium, conductivity and warnings: what `solve` prints (one object; a batch row takes its figures). */
export function solveComposition(raw: unknown) {
  const composition = toComposition(raw);
  const result = speciate(composition);
  const kappa = conductivityOf(result);
  const conductivity = {
    temperatureC: result.temperatureC,
    msPerCm: kappa.conductivityMsPerCm,
    at25MsPerCm: result.temperatureC === 25 ? kappa.conductivityMsPerCm : conductivityAt(composition, 25).conductivityMsPerCm,
    estimates: kappa.estimates,
  };
  // The solver's own warnings plus the plain-words checks (weak buffering, metal complexes) and the conductivity model's.
  return { ...result, conductivity, warnings: [...solutionWarnings(composition, result), ...kappa.warnings] };
}
