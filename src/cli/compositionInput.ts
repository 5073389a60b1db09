/**
 * The command line's JSON composition: what a user writes (mM, °C, pKa lists) and its
 * translation into the core's Composition (mol/L). Shape checks by zod; chemistry checks
 * by the core, whose messages name the field.
 */
import { z } from 'zod';
import { ACTIVITY_MODELS, ActivityModel, Composition } from '../chem';

const numberList = z.array(z.number());

/** One acid–base system written inline. */
export const inlineSystemSchema = z
  .object({
    name: z.string().min(1),
    chargeOfMostProtonated: z.number().int(),
    pKa: numberList.min(1),
    deltaHkJ: numberList.optional(),
    deltaCpJ: numberList.optional(),
    totalMm: z.number(),
  })
  .strict();

/** A composition as the command line reads it. */
export const compositionInputSchema = z
  .object({
    temperatureC: z.number().optional(),
    activityModel: z.enum(ACTIVITY_MODELS as [ActivityModel, ...ActivityModel[]]).optional(),
    systems: z.array(inlineSystemSchema).optional(),
    strongIonsMm: z.record(z.string(), z.number()).optional(),
  })
  .strict();

export type CompositionInput = z.infer<typeof compositionInputSchema>;

/** Turns validated command-line input into a core Composition (mM → mol/L). */
export function toComposition(input: CompositionInput): Composition {
  const systems = (input.systems ?? []).map((s, j) => {
    for (const key of ['deltaHkJ', 'deltaCpJ'] as const) {
      const list = s[key];
      if (list && list.length !== s.pKa.length) {
        throw new Error(`systems[${j}].${key} must list one value per pKa step (${s.pKa.length}); got ${list.length}.`);
      }
    }
    return {
      name: s.name,
      chargeOfMostProtonated: s.chargeOfMostProtonated,
      steps: s.pKa.map((pKa, k) => ({ pKa, deltaHkJ: s.deltaHkJ?.[k] ?? 0, deltaCpJ: s.deltaCpJ?.[k] ?? 0 })),
      totalM: s.totalMm / 1000,
    };
  });
  const strongIons: Record<string, number> = {};
  for (const [name, mM] of Object.entries(input.strongIonsMm ?? {})) strongIons[name] = mM / 1000;
  return { systems, strongIons, temperatureC: input.temperatureC, activityModel: input.activityModel };
}

/** Describes a zod failure as one readable line naming the field. */
export function describeSchemaError(error: z.ZodError): string {
  return error.issues
    .map((issue) => `${issue.path.length ? issue.path.join('.') : 'input'}: ${issue.message}`)
    .join('; ');
}
