/**
 * Mixing from stock solutions (docs/stocks.md): the stock shelf and the mix planner.
 */
export { additiveMolarFromPercent, mergeSystems, percentBasis, resolveShelf, resolveStock, stockPh } from './stocks';
export type { Amount, Stock, StockInput } from './stocks';
export { LABEL_DIFFERENCE_PH, VOLUME_SIGNIFICANT_FIGURES, mixByVolumes, osmolalityOf, planMix, printedVolume, volumeWords } from './mix';
export type { LabelShift, MixComponent, MixCorrection, MixInput, MixPlan, MixTarget, Mixture, StockVolume } from './mix';
export { formatMix } from './format';
export { NEUTRAL_ADDITIVES, findAdditive } from '../library/additives';
export type { NeutralAdditive } from '../library/additives';
