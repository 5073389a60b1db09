/**
 * Typed errors raised by the chemistry core, with every message drawn from one catalogue.
 *
 * Hosts (worksheet functions, command line, task pane) translate these into their own
 * error forms; they never parse message text, they read `kind`, `field` and `allowed`.
 */

/** The three things that can go wrong in the core. */
export type ChemErrorKind = 'invalid-input' | 'no-convergence' | 'infeasible-target';

/** Every message the core can produce, keyed by a stable code. */
export const MESSAGES = {
  notFinite: (field: string, value: unknown) => `${field} must be a finite number; got ${describe(value)}.`,
  outOfRange: (field: string, value: unknown, allowed: string) => `${field} is ${describe(value)}; allowed: ${allowed}.`,
  notInteger: (field: string, value: unknown) => `${field} must be a whole number; got ${describe(value)}.`,
  emptyComposition: () => 'The composition is empty: give at least one acid–base system or strong ion.',
  stepsOutOfOrder: (field: string, prev: number, next: number) => `${field}: pKa values must ascend (each step loses one proton); got ${prev} then ${next}.`,
  listLengthMismatch: (field: string, expected: number, got: number) => `${field} must list one value per pKa step (${expected}); got ${got}.`,
  unknownIon: (field: string, name: string, allowed: string) => `${field}: "${name}" is not a strong ion this tool knows; allowed: ${allowed}.`,
  unknownModel: (field: string, name: string, allowed: string) => `${field}: "${name}" is not an activity model; allowed: ${allowed}.`,
  noConvergence: (what: string, iterations: number) => `${what} did not converge within ${iterations} iterations.`,
  unreachablePh: (targetPh: number, detail: string) => `pH ${targetPh} cannot be reached: ${detail}.`,
  unknownSubstance: (field: string, name: string, suggestions: readonly string[]) =>
    suggestions.length > 0
      ? `${field}: "${name}" is not in the substance library; did you mean ${suggestions.map((s) => `"${s}"`).join(', ')}?`
      : `${field}: "${name}" is not in the substance library; list the library to see every name it knows.`,
  duplicateSubstance: (field: string, name: string, existing: string) => `${field}: "${name}" is already a name in the substance library (${existing}); choose another name.`,
  badFormula: (field: string, formula: string, detail: string) => `${field}: cannot read the formula "${formula}": ${detail}.`,
  formNotNeutral: (field: string, name: string, netCharge: number) =>
    `${field}: the form "${name}" would add a net charge of ${netCharge} per mole; protons lost and counter-ions must balance to 0.`,
  missingValue: (field: string, what: string) => `${field} is missing; give ${what}.`,
  formNotOfSystem: (field: string, form: string, system: string) => `${field}: "${form}" does not contain ${system}; choose a form of ${system}.`,
  formsOfSystem: (field: string, system: string, forms: readonly string[]) => `${field}: name the forms of ${system} to weigh; its forms are ${forms.join(', ')}.`,
  unreachableByMixing: (targetPh: number, lowPh: number, highPh: number) =>
    `pH ${targetPh} cannot be reached by mixing these two forms: they span pH ${lowPh.toFixed(2)} to ${highPh.toFixed(2)} at this concentration and temperature.`,
  notATitrant: (field: string, form: string) => `${field}: "${form}" cannot serve as a titrant (it adds more than one acid–base system).`,
  notANumber: (field: string, value: unknown, example: string) => `${field} must be a number (typed, or as text such as ${example}); got ${describe(value)}.`,
  ambiguousNumber: (field: string, value: unknown) =>
    `${field}: cannot tell how to read ${describe(value)}; write the number with one decimal mark and no thousands separators (e.g. 1000, 7.4 or 7,4).`,
  wrongUnit: (field: string, unit: string, allowed: readonly string[]) =>
    `${field}: the unit "${unit}" does not fit; ${allowed.length ? `allowed: ${allowed.join(', ')} (or a plain number)` : 'give a plain number'}.`,
  ambiguousUnit: (field: string, unit: string, allowed: readonly string[]) =>
    `${field}: the unit "${unit}" is ambiguous (mM is millimolar, M is molar: case matters); write one of ${allowed.join(', ')}.`,
  listTooLong: (field: string, limit: number) => `${field} lists too many items; allowed: up to ${limit}, separated by ";".`,
  unknownField: (field: string, suggestions: readonly string[], allowed: string) =>
    suggestions.length > 0 ? `"${field}" is not an option; did you mean ${suggestions.map((s) => `"${s}"`).join(', ')}?` : `"${field}" is not an option; allowed: ${allowed}.`,
  badSaltItem: (field: string, item: string, allowed: string) => `${field}: cannot read "${item}" as a salt and its amount; allowed: ${allowed}.`,
  titrantTooLarge: (titrantMl: number, roomMl: number, stockM: number, suggestion: string) =>
    `The ${stockM} M titrant stock is too dilute: it would take ${titrantMl.toPrecision(4)} mL, more than the ${roomMl.toPrecision(4)} mL part volume the pH is adjusted in; use ${suggestion}.`,
  notJson: (detail: string) => `The input is not valid JSON: ${detail}.`,
  unknownCommand: (command: string, commands: readonly string[]) => `"${command}" is not a command; the commands are ${commands.join(', ')} (proton-ledger --help lists them).`,
  additiveNotTitrated: (field: string, additive: string) => `${field}: ${additive} is a neutral additive; it takes no titrant or pH (leave them blank).`,
  ofTheStockNamed: (stock: string, message: string) => `The stock "${stock}": ${message}`,
  duplicateStock: (field: string, name: string, existing: string) => `${field}: a stock named "${name}" is already on the shelf (${existing}); give each stock its own name.`,
  noStockFor: (field: string, component: string, stocks: readonly string[]) =>
    `${field}: no stock on the shelf holds "${component}"; the stocks are ${stocks.map((s) => `"${s}"`).join(', ')}.`,
  ambiguousStock: (field: string, component: string, stocks: readonly string[]) =>
    `${field}: more than one stock holds "${component}" (${stocks.map((s) => `"${s}"`).join(', ')}); name the stock to use.`,
  targetTwice: (field: string, component: string) => `${field}: "${component}" is already a target; give each component once.`,
  stocksDoNotFit: (neededMl: number, finalMl: number, detail: string) =>
    `The stocks do not fit: they take ${neededMl.toPrecision(4)} mL, more than the ${finalMl.toPrecision(4)} mL final volume (${detail}); use more concentrated stocks or lower targets.`,
  badTargetItem: (field: string, item: string) => `${field}: "${item}" needs a component and its amount, e.g. "NaCl 150 mM" or "glycerol 10 %".`,
  percentForAdditivesOnly: (field: string, component: string) => `${field}: "${component}" is not a neutral additive; give its final concentration in mM.`,
  // Warnings (a result with a caveat); see warnings.ts.
  constantsFromMemory: (systems: readonly string[]) =>
    `Constants for ${systems.join(', ')} were written from memory of their source and not yet checked against it; see the substance list for the source, and check them there before relying on the result.`,
  aboveFittedRange: (temperatureC: number, limitC: number) =>
    `Temperature ${temperatureC} °C is above ${limitC} °C, beyond the range most pKa temperature fits were made over; treat the pH as an estimate.`,
  beyondActivityModel: (ionicStrengthM: number, limitM: number, model: string) =>
    `Ionic strength ${ionicStrengthM.toPrecision(3)} M is above ${limitM} M, beyond where the ${model} activity model is reliable; the pH is an extrapolation.`,
  titrantAddsBuffer: (titrant: string, system: string, statedMm: number, totalMm: number) =>
    `The titrant ${titrant} is itself a form of ${system}: the finished buffer holds ${Number(totalMm.toPrecision(4))} mM ${system} in all, not the ${Number(statedMm.toPrecision(4))} mM stated. To hold the stated total, set the option "titrantInBuffer" to "hold" (less of the form is weighed).`,
  hydrateAssumed: (typed: string, used: string, molarMass: number, others: readonly string[]) =>
    `"${typed}" does not say which form is weighed: ${used} (${molarMass.toFixed(2)} g/mol) is used; the library also lists ${others.join(', ')}. Name the form on your shelf to weigh the right mass.`,
  hydrateAmbiguous: (field: string, typed: string, choices: readonly string[]) =>
    `${field}: "${typed}" is sold in several forms (${choices.join(', ')}); name the one on your shelf.`,
  weakBuffering: (pH: number, halfWidth: number, listed: string) =>
    `pH ${pH.toFixed(2)} is more than ${halfWidth} unit from every pKa′ in the solution (${listed}): it buffers weakly there, and small additions move the pH far.`,
  metalComplexes: (metals: string, binders: string, calciumNote: string) =>
    `${metals} with ${binders}: metal–buffer complexes are not modelled, so the pH and the free ion amounts are estimates (binding releases protons, so the real pH is usually lower).${calciumNote}`,
  chelatorBindsMetals: (chelators: string, metals: string, chelatorMm: number, metalMm: number, freeMm: number) =>
    `${chelators} (${chelatorMm.toPrecision(3)} mM) binds ${metals} (${metalMm.toPrecision(3)} mM) about 1:1 and almost completely above pH 6; these complexes are not modelled: the free ${metals} is roughly ${freeMm.toPrecision(3)} mM (what exceeds the chelator), and binding releases protons, so the real pH lies below the predicted one.`,
  belowPipetteVolume: (what: string, microlitres: number, smallestUl: number, fold: number, takeUl: number) =>
    `${what}: only ${microlitres.toPrecision(3)} µL, below the ${smallestUl} µL your pipettes measure accurately; dilute it ${fold}× first and take ${takeUl} µL.`,
  mixDiffersFromLabel: (stock: string, labelPh: number, labelC: number, mixedPh: number, useC: number, dilutedPh: number, othersPh: number) =>
    `The mixture reads pH ${mixedPh.toFixed(2)} at ${useC} °C, not the ${labelPh.toFixed(2)} on the label of "${stock}" (set at ${labelC} °C): diluting that stock alone gives ${dilutedPh.toFixed(2)} (its ionic strength falls), the other stocks bring it to ${othersPh.toFixed(2)} at ${labelC} °C, and the temperature of use does the rest. Check it with a meter at ${useC} °C.`,
  stockBeyondActivityModel: (stock: string, ionicStrengthM: number, limitM: number, model: string) =>
    `The stock "${stock}" has an ionic strength of about ${ionicStrengthM.toPrecision(2)} M, beyond the ${limitM} M where the ${model} model holds: the titrant it holds (from its label pH) is an estimate, and so is what it brings to the mix.`,
  additiveEffectNotModelled: (additives: string) =>
    `${additives}: counted for volume and osmolarity only; their effect on pKa values, activities and conductivity (co-solvents move all three) is not modelled: measure the pH of the finished mixture.`,
  correctionNeeded: (predictedPh: number, targetPh: number, tolerance: number, millilitres: string, titrant: string) =>
    `The stocks alone give pH ${predictedPh.toFixed(2)}, more than ${tolerance} from the target ${targetPh.toFixed(2)}: add about ${millilitres} of ${titrant} (in the plan) and check with the meter.`,
  conductivityEstimated: (names: string, lambdaPerCharge: number) =>
    `No published limiting conductivity for ${names}: ${lambdaPerCharge} S cm²/mol per charge was assumed, so the conductivity is an estimate.`,
  conductivityTemperature: (temperatureC: number, lowC: number, highC: number) =>
    `Temperature ${temperatureC} °C is outside ${lowC}–${highC} °C, the range of the conductivity model; the conductivity is an extrapolation.`,
  conductivityIonicStrength: (ionicStrengthM: number, limitM: number) =>
    `Ionic strength ${ionicStrengthM.toPrecision(3)} M is above ${limitM} M, beyond where the conductivity model was checked; the conductivity is an extrapolation.`,
  beyondPitzerRange: (ionicStrengthMolal: number, limitMolal: number) =>
    `Ionic strength ${ionicStrengthMolal.toPrecision(3)} mol/kg is above ${limitMolal} mol/kg, beyond the range most Pitzer parameters were fitted over; the pH is an extrapolation.`,
  pitzerFallback: (systems: string, sharePercent: number, ionicStrengthMolal: number) =>
    `Ions without published Pitzer parameters (${systems}) carry ${sharePercent.toFixed(0)} % of the ionic strength (${ionicStrengthMolal.toPrecision(3)} mol/kg): their activity coefficients use a generic interaction, so the pH may be off by a few tenths.`,
  pitzerTemperature: (temperatureC: number) =>
    `At ${temperatureC} °C some Pitzer parameters are used at their 25 °C values (no published temperature slope) or past the 0–50 °C of their slopes; in a solution this concentrated the pH is an estimate.`,
  stockAtMeter: (fold: number, message: string) => `Stock (${fold}×) at the meter: ${message}`,
  ofTheStock: (message: string) => `The stock: ${message}`,
  titrantOverHalf: (titrantMl: number, totalMl: number) =>
    `The titrant (${titrantMl.toFixed(1)} mL) is more than half the final volume (${totalMl.toFixed(0)} mL): use a more concentrated stock.`,
  titrantTiny: (microlitres: number, fold: number, dilutedM: number, volume: string) =>
    `The whole titrant is only ${microlitres.toPrecision(3)} µL: too little to add in portions that approach the target; dilute the stock ${fold}× (${dilutedM.toPrecision(3)} M) to add about ${volume}.`,
  titrantTinyCheckMeter: (microlitres: number, withinPh: number, fold: number, dilutedM: number) =>
    `The whole titrant is only ${microlitres.toPrecision(2)} µL: the solution without titrant is already within ${withinPh.toFixed(3)} pH of the target; check it with the meter and adjust, if at all, drop by drop with a ${fold}× diluted stock (${dilutedM.toPrecision(2)} M).`,
  titrantMayNotFit: (highMl: number, partMl: number) =>
    `The titrant may not fit: up to ${highMl.toFixed(1)} mL is expected, more than the ${partMl.toFixed(0)} mL part volume; use a more concentrated stock.`,
  noTitrantNeeded: (pH: number, temperatureC: number, tolerance: number) =>
    `The weighed form alone gives pH ${pH.toFixed(3)} at ${temperatureC} °C, within ${tolerance} of the target: no titrant is needed; check it with the meter.`,
  smallWeighing: (milligrams: number, form: string, leastMg: number) =>
    `${milligrams.toPrecision(3)} mg of ${form} is too little to weigh well on an analytical balance (about ${leastMg} mg at least): make a larger volume or a concentrated stock and take a part of it.`,
  aboveSolubility: (form: string, gramsPerLitre: number, solubility: number, temperatureC: number) =>
    `${form} at ${gramsPerLitre.toFixed(0)} g/L in the part volume is above its solubility (about ${solubility} g/L at ${temperatureC} °C).`,
  givenTwice: (field: string) => `${field} is given twice; give it once.`,
  notText: (field: string, value: unknown) => `${field} must be text (a name); got ${describe(value)}.`,
  unknownChoice: (field: string, value: unknown, allowed: readonly string[]) =>
    `${field}: ${describe(value)} is not one of the choices; allowed: ${allowed.map((a) => `"${a}"`).join(', ')}.`,
  saltTargetUnreachable: (what: string, target: number, reached: number) =>
    `The ${what} target ${target} cannot be met: without any added salt the buffer already gives ${reached}.`,
  saltTargetBeyondSalt: (what: string, target: number, reached: number, salt: string, maxSaltM: number) =>
    `The ${what} target ${target} cannot be met: even ${maxSaltM} M of ${salt} gives only ${reached}.`,
  outsideDataRange: (where: string, temperatureC: number, system: string, steps: string, lowC: number, highC: number) =>
    `${where} ${temperatureC} °C lies outside ${lowC}–${highC} °C, the temperatures the data for ${system} (${steps}) cover: its pKa there is an extrapolation; check the pH with a meter at that temperature.`,
  noEnthalpy: (where: string, temperatureC: number, system: string, steps: string, toleranceC: number) =>
    `${system} has no ΔH° for ${steps}: its pKa is held at the 25 °C value, so at ${where.toLowerCase()} ${temperatureC} °C (beyond 25 ± ${toleranceC} °C) the pH is an estimate; measure it at that temperature.`,
  // A batch as made, and the correction at the bench (src/chem/batch).
  notWeighed: (form: string) => `${form} is in the plan but no actual mass is given for it; enter the grams weighed (0 if it was left out).`,
  nothingToTitrate: (route: string) => `This recipe (route ${route}) adds no titrant, so there is nothing to correct with one; weigh the forms again or plan it with a titrant.`,
  readingUnexplained: (readingPh: number, startPh: number, titrant: string, direction: string) =>
    `The reading pH ${readingPh.toFixed(2)} lies beyond pH ${startPh.toFixed(2)}, what the weighed forms give before any titrant, although ${titrant} ${direction} the pH: no amount of titrant explains it; check the meter on a standard buffer, the electrode, and that the right substances went in.`,
  correctionTooLarge: (millilitres: number, roomMl: number, titrant: string) =>
    `${millilitres.toPrecision(3)} mL of ${titrant} would be needed, more than the ${roomMl.toPrecision(3)} mL left before the final volume; use a stronger stock or start the batch again.`,
  otherFormWeighed: (weighed: string, planned: string, ratio: number) =>
    `${weighed} was weighed where the plan has ${planned}: the same mass gives ${(ratio * 100).toFixed(1)} % of the planned amount (molar masses differ); the check uses the form weighed.`,
  formNotInPlan: (form: string) => `${form} is not in the plan; it is counted in the as-made solution as weighed.`,
  stockOffNominal: (nominalM: number, standardisedM: number, tolerancePercent: number) =>
    `The titrant stock was standardised at ${standardisedM} M, not the nominal ${nominalM} M (beyond its ±${tolerancePercent} %): volumes poured by the plan give a different amount.`,
  benchTemperatureOffPlan: (actualC: number, plannedC: number, readingPh: number, plannedReadingPh: number) =>
    `The bench was at ${actualC} °C, not the planned ${plannedC} °C: there the meter should read pH ${readingPh.toFixed(2)} at the end point, not ${plannedReadingPh.toFixed(2)}; adjusting to the planned reading at this temperature misses the target.`,
  readingOffPlan: (readingPh: number, predictedPh: number, bandPh: number) =>
    `The meter reads pH ${readingPh.toFixed(2)} where pH ${predictedPh.toFixed(2)} was expected (band ±${bandPh.toFixed(2)}): the solution differs from the plan, and the next amount is worked out from the reading.`,
  readingOffAsMade: (readingPh: number, predictedPh: number, bandPh: number) =>
    `The recorded meter reading pH ${readingPh.toFixed(2)} differs from pH ${predictedPh.toFixed(2)}, what the recorded amounts give at the bench (band ±${bandPh.toFixed(2)}): an amount, a concentration or the meter is not as recorded.`,
  causeStockConcentration: (effectiveM: number, statedM: number) =>
    `Likely cause, the titrant stock: the reading fits a stock of ${effectiveM.toPrecision(3)} M rather than ${statedM} M; standardise it.`,
  causeHydrate: (plannedForm: string, otherForm: string) =>
    `Likely cause, the form weighed: the reading fits ${otherForm} weighed in place of ${plannedForm} (another hydrate of the same salt); check the bottle's label.`,
  causeSaltForm: (plannedForm: string, otherForm: string) =>
    `Likely cause, the bottle: the reading fits ${otherForm} weighed in place of ${plannedForm} (another form of the same buffer, with a different proton or counter-ion content); check the label against the recipe.`,
  causeTemperature: (fittedC: number, statedC: number) =>
    `Likely cause, the temperature: the reading fits the solution at ${fittedC.toFixed(1)} °C rather than ${statedC} °C; read the thermometer in the solution and let it settle.`,
  causeCalibration: (offsetPh: number, nearPh: number) =>
    `Possible cause, the meter: an offset of ${offsetPh >= 0 ? '+' : ''}${offsetPh.toFixed(2)} pH; check it on a standard buffer near pH ${nearPh.toFixed(1)} at this temperature.`,
  overshoot: (titrant: string, counter: string) =>
    `The target is passed: more ${titrant} would move further away; bring it back with ${counter} (it adds salt: the ionic strength ends a little above the plan's).`,
  benchOnTarget: (readingPh: number, tolerancePh: number) => `The meter reads pH ${readingPh.toFixed(2)}, within ±${tolerancePh} of the end point: add no more; make up to volume.`,
} as const;

export type MessageCode = keyof typeof MESSAGES;

function describe(value: unknown): string {
  if (typeof value === 'string') return JSON.stringify(value);
  if (typeof value === 'number') return Number.isNaN(value) ? 'NaN' : String(value);
  if (value === undefined) return 'nothing';
  if (value === null) return 'null';
  return typeof value;
}

/** An error from the chemistry core: what was wrong, where, and what is allowed. */
export class ChemError extends Error {
  readonly kind: ChemErrorKind;
  readonly code: MessageCode;
  /** The input field at fault, as a dotted path (e.g. `systems[1].pKa[0]`), when there is one. */
  readonly field?: string;
  /** What the field would accept, in words, when that can be said. */
  readonly allowed?: string;

  constructor(kind: ChemErrorKind, code: MessageCode, message: string, field?: string, allowed?: string) {
    super(message);
    this.name = 'ChemError';
    this.kind = kind;
    this.code = code;
    this.field = field;
    this.allowed = allowed;
  }
}

/** Throws unless `value` is a finite number within [min, max]. Returns the value. */
export function requireNumber(field: string, value: unknown, min: number, max: number, allowed?: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new ChemError('invalid-input', 'notFinite', MESSAGES.notFinite(field, value), field, allowed ?? `${min} to ${max}`);
  }
  if (value < min || value > max) {
    const words = allowed ?? `${min} to ${max}`;
    throw new ChemError('invalid-input', 'outOfRange', MESSAGES.outOfRange(field, value, words), field, words);
  }
  return value;
}

/** Throws unless `value` is a whole number within [min, max]. Returns the value. */
export function requireInteger(field: string, value: unknown, min: number, max: number): number {
  requireNumber(field, value, min, max);
  if (!Number.isInteger(value)) {
    throw new ChemError('invalid-input', 'notInteger', MESSAGES.notInteger(field, value), field, `whole numbers ${min} to ${max}`);
  }
  return value as number;
}
