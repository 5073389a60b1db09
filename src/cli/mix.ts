/**
 * The `mix` command: a working buffer mixed from the lab's stock solutions. The shelf comes
 * from the JSON itself (`stocks`) or from a shelf file (--shelf shelf.json: a list of stocks,
 * or an object with a `stocks` list); docs/stocks.md gives the format.
 */
import { readFileSync } from 'fs';
import { ChemError, MESSAGES } from '../chem';
import { MixInput, StockInput, planMix } from '../chem/mixing';
import type { MixPlan } from '../chem/mixing';
import { libraryFor } from './compositionInput';

export const MIX_HELP = `Usage: proton-ledger mix [--shelf <shelf.json>] [--json '<mix JSON>'] [--text]

Plans a working buffer from stock solutions: mL of each stock and of water, the pH the mix
lands on at use and at the bench, ionic strength, conductivity, ideal osmolarity, a titrant
correction when a target pH is missed, and how the tris stock's label pH moves (docs/stocks.md).

The mix JSON:
  stocks              the shelf (or give --shelf): [{"name", "form", "concentration", "titrant", "ph", "phTemperatureC"}]
  targets             [{"component": "<stock or what it holds>", "concentrationMm": <mM>} or {"component", "percent": <%>}]
  volumeMl            final volume, mL (or "0.5 L")
  targetPh            optional: pH wanted at the temperature of use
  phTolerance         how far the pH may miss before a correction is planned (default 0.05)
  useTemperatureC     °C (default 25)        benchTemperatureC  °C (default 25)
  titrant             optional: {"form": "NaOH", "concentrationM": 1} for the correction
  smallestVolumeUl    smallest volume pipetted accurately, µL (default 2)
  activityModel       davies (default), ideal, bates-guggenheim
  userSubstances      your own substances (see docs/functions.md)

Example (our own): proton-ledger mix --text --shelf docs/examples/shelf.json --json '{"volumeMl": 50, "useTemperatureC": 4, "targets": [{"component": "tris", "concentrationMm": 20}, {"component": "NaCl", "concentrationMm": 150}, {"component": "EDTA", "concentrationMm": 1}]}'`;

function shelfFrom(text: string, file: string): StockInput[] {
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch (e) {
    throw new ChemError('invalid-input', 'notJson', MESSAGES.notJson(`${file}: ${(e as Error).message}`), '--shelf', 'a JSON list of stocks');
  }
  const list = Array.isArray(parsed) ? parsed : (parsed as { stocks?: unknown })?.stocks;
  if (!Array.isArray(list))
    throw new ChemError(
      'invalid-input',
      'missingValue',
      MESSAGES.missingValue('--shelf', 'a JSON list of stocks, or an object with a "stocks" list'),
      '--shelf',
      'a JSON list of stocks',
    );
  return list as StockInput[];
}

/**
 * Plans a mix from the parsed JSON, with the shelf file's stocks when one is given (the JSON's own `stocks` come first).
 *
 * @param raw - the mix JSON
 * @param shelfFile - path of a shelf file, or undefined
 */
export function mixCommand(raw: unknown, shelfFile?: string): MixPlan {
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) {
    throw new ChemError('invalid-input', 'missingValue', MESSAGES.missingValue('input', 'one JSON object with targets and volumeMl'), 'input', 'one JSON object');
  }
  const input = raw as MixInput & { userSubstances?: readonly Record<string, unknown>[] };
  const fromFile = shelfFile ? shelfFrom(readFileSync(shelfFile, 'utf8'), shelfFile) : [];
  const stocks = [...(Array.isArray(input.stocks) ? input.stocks : []), ...fromFile];
  return planMix({ ...input, stocks }, libraryFor(input.userSubstances));
}
