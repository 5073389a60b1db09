/**
 * The command line's JSON composition: what a user writes (mM, °C, pKa lists) and its
 * translation into the core's Composition (mol/L). Shape checks by zod; chemistry checks
 * by the core, whose messages name the field.
 */
import { z } from 'zod';
import { ACTIVITY_MODELS, AcidBaseSystem, ActivityModel, Composition } from '../chem';
import { SubstanceLibrary, UserSubstance, createLibrary } from '../chem/library';

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

/** A form from the library (or the user's substances) by name, with an amount: mM, or grams in a volume. */
export const formInputSchema = z.union([
  z.object({ form: z.string().min(1), mM: z.number() }).strict(),
  z.object({ form: z.string().min(1), grams: z.number(), volumeMl: z.number().positive() }).strict(),
]);

/** The user's own substances, in the library's user-substance shape (checked by the library). */
export const userSubstancesSchema = z.array(z.record(z.string(), z.unknown())).optional();

/** A composition as the command line reads it. */
export const compositionInputSchema = z
  .object({
    temperatureC: z.number().optional(),
    activityModel: z.enum(ACTIVITY_MODELS as [ActivityModel, ...ActivityModel[]]).optional(),
    systems: z.array(inlineSystemSchema).optional(),
    forms: z.array(formInputSchema).optional(),
    strongIonsMm: z.record(z.string(), z.number()).optional(),
    userSubstances: userSubstancesSchema,
  })
  .strict();

export type CompositionInput = z.infer<typeof compositionInputSchema>;

/** The library for an input: built-in plus the input's own substances. */
export function libraryFor(userSubstances: CompositionInput['userSubstances']): SubstanceLibrary {
  return createLibrary((userSubstances ?? []) as unknown as UserSubstance[]);
}

/** Turns validated command-line input into a core Composition (mM → mol/L; forms by name through the library). */
export function toComposition(input: CompositionInput): Composition {
  const systems: AcidBaseSystem[] = (input.systems ?? []).map((s, j) => {
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
  if (input.forms?.length) {
    const library = libraryFor(input.userSubstances);
    const items = input.forms.map((f) => {
      if ('mM' in f) return { form: f.form, concentrationM: f.mM / 1000 };
      const form = library.findForm(f.form);
      return { form, concentrationM: f.grams / form.molarMass / (f.volumeMl / 1000) };
    });
    const fromForms = library.compositionFromForms(items);
    for (const [name, c] of Object.entries(fromForms.strongIons ?? {})) strongIons[name] = (strongIons[name] ?? 0) + c;
    systems.push(...fromForms.systems);
  }
  return { systems, strongIons, temperatureC: input.temperatureC, activityModel: input.activityModel };
}

/** Describes a zod failure as one readable line naming the field. */
export function describeSchemaError(error: z.ZodError): string {
  return error.issues
    .map((issue) => `${issue.path.length ? issue.path.join('.') : 'input'}: ${issue.message}`)
    .join('; ');
}
