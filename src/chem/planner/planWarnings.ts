/** The warnings only a plan can give (the titrant's size, weighings, solubility, hydrates). */
import { readSaltsField } from '../input';
import { ChemWarning, warning } from '../warnings';
import { MESSAGES } from '../errors';
import { SubstanceLibrary } from '../library/lookup';
import { RecipeComponent, RecipeInput, TitrationPlan } from './types';
import { volumeText } from './protocol';
import { SMALLEST_TITRANT_ML, NO_TITRANT_PH, MAX_STOCK_DILUTION_ADVICE, SMALLEST_GOOD_WEIGHING_G } from './constants';
import { RouteResult, Settled } from './settle';

/**
 * The warning for one name that leaves the hydration state open, or undefined when the name
 * says which form it is: the form weighed, its molar mass, and the other forms listed.
 *
 * @param field - the input the name came from, when there is one
 */
export function hydrateWarning(library: SubstanceLibrary, name: string, field?: string): ChemWarning | undefined {
  const others = library.hydrateAlternatives(name);
  if (others.length === 0) return undefined;
  const used = library.findForm(name, field);
  const message = MESSAGES.hydrateAssumed(
    name,
    used.name,
    used.molarMass,
    others.map((f) => `${f.name} (${f.molarMass.toFixed(2)} g/mol)`),
  );
  return warning('hydrateAssumed', message, field);
}

/**
 * A name that leaves the hydration state open (`sodium phosphate dibasic`) is weighed as the
 * form the library lists under it (docs/substances.md); the plan says which, with its molar
 * mass, and names the other forms, so a heptahydrate on the shelf is not weighed as anhydrous.
 */
export function hydrateWarnings(input: RecipeInput, library: SubstanceLibrary): ChemWarning[] {
  const typed: { name: string; field: string }[] = [];
  for (const field of ['form', 'acidForm', 'baseForm'] as const) {
    const name = input[field];
    if (typeof name === 'string' && name.trim() !== '') typed.push({ name, field });
  }
  if (input.salts !== undefined) readSaltsField(input.salts).forEach((salt, i) => typed.push({ name: salt.form, field: `salts[${i}].form` }));
  if (typeof input.saltTarget?.form === 'string') typed.push({ name: input.saltTarget.form, field: 'saltTarget.form' });
  const out: ChemWarning[] = [];
  for (const { name, field } of typed) {
    const w = hydrateWarning(library, name, field);
    if (w) out.push(w);
  }
  return out;
}

/** Warnings only a plan can give: the titrant's size, small weighings, solubility, no titrant needed. */
export function planWarnings(s: Settled, made: RouteResult, components: readonly RecipeComponent[], volumeL: number, titration: TitrationPlan | undefined): ChemWarning[] {
  const w: ChemWarning[] = [];
  if (titration) {
    const totalMl = volumeL * 1000;
    if (titration.volumeMl > 0.5 * totalMl) w.push(warning('titrantOverHalf', MESSAGES.titrantOverHalf(titration.volumeMl, totalMl), 'titrant.concentrationM'));
    if (titration.volumeMl < SMALLEST_TITRANT_ML) {
      const fold = Math.pow(10, Math.ceil(Math.log10(SMALLEST_TITRANT_ML / titration.volumeMl)));
      if (fold <= MAX_STOCK_DILUTION_ADVICE) {
        w.push(
          warning('titrantTiny', MESSAGES.titrantTiny(titration.volumeMl * 1000, fold, titration.stockM / fold, volumeText(titration.volumeMl * fold)), 'titrant.concentrationM'),
        );
      } else {
        const unadjusted = made.unadjustedPh ?? s.targetPh;
        w.push(
          warning(
            'titrantTinyCheckMeter',
            MESSAGES.titrantTinyCheckMeter(titration.volumeMl * 1000, Math.abs(s.targetPh - unadjusted), MAX_STOCK_DILUTION_ADVICE, titration.stockM / MAX_STOCK_DILUTION_ADVICE),
            'targetPh',
          ),
        );
      }
    }
    if (titration.highMl > totalMl * s.partFraction)
      w.push(warning('titrantMayNotFit', MESSAGES.titrantMayNotFit(titration.highMl, totalMl * s.partFraction), 'titrant.concentrationM'));
  }
  if (!titration && made.unadjustedPh !== undefined) w.push(warning('noTitrantNeeded', MESSAGES.noTitrantNeeded(made.unadjustedPh, s.useT, NO_TITRANT_PH), 'targetPh'));
  made.weighed.forEach((item, i) => {
    // componentsOf lists the weighed forms first, in this order, with the grams printed (purity applied).
    const grams = components[i].grams ?? 0;
    if (grams > 0 && grams < SMALLEST_GOOD_WEIGHING_G)
      w.push(warning('smallWeighing', MESSAGES.smallWeighing(grams * 1000, item.form.name, SMALLEST_GOOD_WEIGHING_G * 1000), 'volumeMl'));
    const sol = item.form.solubility;
    if (!sol) return;
    const gPerL = (item.concentrationM * item.form.molarMass) / s.partFraction;
    if (gPerL > sol.gramsPerLitre) w.push(warning('aboveSolubility', MESSAGES.aboveSolubility(item.form.name, gPerL, sol.gramsPerLitre, sol.temperatureC), 'concentrationMm'));
  });
  return w;
}
