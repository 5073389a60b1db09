/**
 * Warnings about the temperature a solution is used or adjusted at: outside the range a
 * step's constants were measured over, pKa(T) is an extrapolation; and a step without ΔH°
 * keeps its 25 °C pKa at every temperature, so away from 25 °C its pH is only an estimate.
 *
 * Pure: reads the steps' own `deltaHkJ` and `temperatureRangeC` (library systems carry
 * both; a user's substance may carry neither). docs/constants.md explains the ranges.
 */
import type { AcidBaseChemistry } from './composition';
import { MESSAGES } from './errors';

/** Within 25 ± this many °C a pKa without ΔH° is taken as it stands (the usual spread of a room's temperature; below the scatter such a pKa carries anyway). */
export const NO_ENTHALPY_TOLERANCE_C = 2;

/** The reference temperature of tabulated pKa values, °C. */
const REFERENCE_C = 25;

/**
 * A step whose pKa lies further than this from the solution's pH holds under 0.1 % of the
 * system in one of its two forms there; a pKa(T) wrong by the few tenths a missing ΔH° or an
 * extrapolation can cause moves that share, and so the pH, by a negligible amount. Such steps
 * are not warned about when the pH is known (histidine's carboxyl step in a pH 6 buffer).
 */
export const IRRELEVANT_STEP_DISTANCE = 3;

/** A step whose pKa lies at or below this is a strong acid in water (H2SO4 → HSO4−): fully dissociated at any temperature, so its missing ΔH° does not matter. */
const STRONG_STEP_PKA = 0;

/** A temperature warning: what, for which system and steps, at which temperature. */
export interface TemperatureWarning {
  /** `outsideDataRange`: beyond the temperatures the step's data cover; `noEnthalpy`: no ΔH°, away from 25 ± 2 °C. */
  readonly code: 'outsideDataRange' | 'noEnthalpy';
  readonly message: string;
  /** Name of the acid–base system. */
  readonly system: string;
  /** Steps concerned, numbered from 1 in order of proton loss. */
  readonly steps: readonly number[];
  /** The temperature checked, °C. */
  readonly temperatureC: number;
  /** The range the steps' data cover, °C (outsideDataRange only). */
  readonly rangeC?: readonly [number, number];
}

/**
 * Temperature warnings for the acid–base systems of a solution at one temperature.
 *
 * Method: for each system (with a total above zero, when it has one) and each step that is
 * not a strong acid (pKa > 0) and, when the pH is given, lies within 3 units of it: a step
 * without ΔH° warns `noEnthalpy` when |t − 25| > 2 °C; a step with ΔH° warns
 * `outsideDataRange` when t lies outside its `temperatureRangeC`. Steps of one system with
 * the same range share one warning.
 *
 * @param systems - the solution's systems (library systems carry each step's range)
 * @param temperatureC - the temperature checked, °C
 * @param where - how the temperature is named in the message ("Temperature", "The bench temperature")
 * @param pH - the solution's pH at that temperature, when known: steps far from it are left out
 * @returns one warning per system and kind (and range), in the systems' order
 * @example temperatureWarnings([findSystem('malate')], 4)[0].code // 'noEnthalpy'
 */
export function temperatureWarnings(
  systems: readonly (AcidBaseChemistry & { readonly totalM?: number })[],
  temperatureC: number,
  where = 'Temperature',
  pH?: number,
): TemperatureWarning[] {
  const out: TemperatureWarning[] = [];
  const awayFromReference = Math.abs(temperatureC - REFERENCE_C) > NO_ENTHALPY_TOLERANCE_C;
  for (const sys of systems) {
    if (sys.totalM !== undefined && !(sys.totalM > 0)) continue;
    const noEnthalpy: number[] = [];
    const outside = new Map<string, { range: readonly [number, number]; steps: number[] }>();
    sys.steps.forEach((step, k) => {
      if (step.pKa <= STRONG_STEP_PKA) return;
      if (pH !== undefined && Math.abs(step.pKa - pH) > IRRELEVANT_STEP_DISTANCE) return;
      if (step.deltaHkJ === undefined) {
        if (awayFromReference) noEnthalpy.push(k + 1);
        return;
      }
      const range = step.temperatureRangeC;
      if (range && (temperatureC < range[0] || temperatureC > range[1])) {
        const key = `${range[0]}:${range[1]}`;
        const entry = outside.get(key) ?? { range, steps: [] };
        entry.steps.push(k + 1);
        outside.set(key, entry);
      }
    });
    if (noEnthalpy.length > 0) {
      out.push({
        code: 'noEnthalpy',
        message: MESSAGES.noEnthalpy(where, temperatureC, sys.name, stepWords(noEnthalpy), NO_ENTHALPY_TOLERANCE_C),
        system: sys.name,
        steps: noEnthalpy,
        temperatureC,
      });
    }
    for (const { range, steps } of outside.values()) {
      out.push({
        code: 'outsideDataRange',
        message: MESSAGES.outsideDataRange(where, temperatureC, sys.name, stepWords(steps), range[0], range[1]),
        system: sys.name,
        steps,
        temperatureC,
        rangeC: range,
      });
    }
  }
  return out;
}

function stepWords(steps: readonly number[]): string {
  return steps.length === 1 ? `step ${steps[0]}` : `steps ${steps.join(', ')}`;
}
