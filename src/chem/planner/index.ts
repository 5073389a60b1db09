/** The recipe planner: from a target to bench amounts, steps and predictions. */
export {
  planRecipe,
  bufferSystemOf,
  checkTitrantFits,
  formContains,
  hydrateWarning,
  DEFAULT_PART_VOLUME_FRACTION,
  DEFAULT_PKA_UNCERTAINTY,
  DEFAULT_STOCK_TOLERANCE_PERCENT,
} from './plan';
export { formatRecipe, GENERAL_CAUTION } from './protocol';
export type {
  MeterReading,
  RecipeComponent,
  RecipeInput,
  RecipePlan,
  RecipePredictions,
  RecipeRoute,
  SaltAmount,
  SaltTarget,
  StockPlan,
  TitrantStock,
  TitrationPlan,
} from './types';
