export { BENCH_TEMPERATURE_SLACK_C, METER_RESOLUTION_PH, asMade, osmolalityOf, readTolerances } from './asMade';
export { OFF_PLAN_PORTION_SHARE, STOCK_CAUSE_RANGE, benchCorrection } from './correction';
export { madeVolumeMlOf, plannedAsWeighed, plannedWeighings } from './weighed';
export type { AsMadeResult, BatchActuals, BatchTolerances, BenchCorrection, BenchState, ComponentCheck, LikelyCause, QuantityCheck, WeighedActual } from './types';
