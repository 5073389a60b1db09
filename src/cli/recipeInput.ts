/**
 * The command line's recipe input: the planner's RecipeInput as JSON, shape-checked by zod
 * (numbers and ranges are checked by the planner, whose messages name the field), plus
 * optional user substances.
 */
import { z } from 'zod';
import { ACTIVITY_MODELS, ActivityModel } from '../chem';
import { RecipeInput } from '../chem/planner';
import { userSubstancesSchema } from './compositionInput';

const number = z.number();

export const recipeInputSchema = z
  .object({
    buffer: z.string().min(1),
    targetPh: number,
    useTemperatureC: number.optional(),
    concentrationMm: number,
    volumeMl: number,
    route: z.enum(['titrate', 'two-forms', 'stock']).optional(),
    form: z.string().optional(),
    titrant: z.object({ form: z.string().min(1), concentrationM: number, tolerancePercent: number.optional() }).strict().optional(),
    acidForm: z.string().optional(),
    baseForm: z.string().optional(),
    stock: z.object({ fold: number, volumeMl: number.optional() }).strict().optional(),
    salts: z.array(z.object({ form: z.string().min(1), concentrationMm: number }).strict()).optional(),
    saltTarget: z.object({ form: z.string().min(1), ionicStrengthM: number.optional(), idealOsmolarityMosm: number.optional(), osmolalityMosmKg: number.optional() }).strict().optional(),
    benchTemperatureC: number.optional(),
    partVolumeFraction: number.optional(),
    purityPercent: z.record(z.string(), number).optional(),
    formPurityPercent: number.optional(),
    activityModel: z.enum(ACTIVITY_MODELS as [ActivityModel, ...ActivityModel[]]).optional(),
    pKaUncertainty: number.optional(),
    userSubstances: userSubstancesSchema,
  })
  .strict();

export type RecipeCommandInput = z.infer<typeof recipeInputSchema>;

/** Splits the command input into the planner's input and the user substances. */
export function toRecipeInput(input: RecipeCommandInput): { recipe: RecipeInput; userSubstances: RecipeCommandInput['userSubstances'] } {
  const { userSubstances, ...recipe } = input;
  return { recipe, userSubstances };
}
