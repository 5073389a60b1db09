/**
 * One declaration of every input: the worksheet functions, the pane and the command line
 * accept and refuse the same values, with the same error code and field, because all of
 * them read through src/chem/input. Table-driven over fields and typed values.
 */
import { checkForm, defaultInput, FieldName } from '../src/taskpane/form';
import { recipeRow } from '../src/functions/functions';
import { toSheetError } from '../src/functions/errors';
import { run } from '../src/cli/main';

const GOOD = { buffer: 'HEPES', targetPh: 7.4, concentrationMm: 25, volumeMl: 500 };

/** What each host says of one value: 'ok', or the error's code and field. */
type Verdict = 'ok' | { code: string; field: string };

function cell(field: 'targetPh' | 'concentrationMm' | 'volumeMl' | 'useTemperatureC', value: unknown): Verdict {
  const args = { ...GOOD, useTemperatureC: undefined as unknown, [field]: value };
  try {
    recipeRow(args.buffer, args.targetPh, args.concentrationMm, args.volumeMl, args.useTemperatureC);
    return 'ok';
  } catch (e) {
    const err = toSheetError(e);
    return { code: err.code, field: err.field ?? '' };
  }
}

function cellOption(name: string, value: unknown): Verdict {
  try {
    recipeRow(GOOD.buffer, GOOD.targetPh, GOOD.concentrationMm, GOOD.volumeMl, '', undefined, [[name, value]]);
    return 'ok';
  } catch (e) {
    const err = toSheetError(e);
    return { code: err.code, field: err.field ?? '' };
  }
}

function commandLine(input: Record<string, unknown>): Verdict {
  let out = '';
  const code = run(['recipe', '--json', JSON.stringify({ ...GOOD, ...input })], (t) => (out += t));
  if (code === 0) return 'ok';
  const { error } = JSON.parse(out) as { error: { code: string; field: string } };
  return { code: error.code, field: error.field };
}

function pane(field: FieldName, value: string): 'ok' | { code: string } {
  const checked = checkForm({ ...defaultInput(), phMode: 'list', phList: '7.4', [field]: value });
  if (checked.ok) return 'ok';
  return { code: checked.codes[field] ?? `no code (${JSON.stringify(checked.errors)})` };
}

const codeOf = (v: Verdict | 'ok' | { code: string }) => (v === 'ok' ? 'ok' : v.code);

describe('every host accepts and refuses the same inputs, with the same code', () => {
  // [declared field, pane field, typed value, expected code ('ok' when accepted)]
  const cases: [string, FieldName, string, string][] = [
    ['concentrationMm', 'concentrationsMm', '50 mM', 'ok'],
    ['concentrationMm', 'concentrationsMm', '0,05 M', 'ok'],
    ['concentrationMm', 'concentrationsMm', '5 m', 'ambiguousUnit'],
    ['concentrationMm', 'concentrationsMm', '9000', 'outOfRange'],
    ['concentrationMm', 'concentrationsMm', '1,000', 'ambiguousNumber'],
    ['concentrationMm', 'concentrationsMm', 'lots', 'notANumber'],
    ['concentrationMm', 'concentrationsMm', '20 mL', 'wrongUnit'],
    ['volumeMl', 'volumeMl', '0,5 L', 'ok'],
    ['volumeMl', 'volumeMl', '0', 'outOfRange'],
    ['volumeMl', 'volumeMl', '2000 L', 'outOfRange'],
    ['useTemperatureC', 'useTemperaturesC', '4 °C', 'ok'],
    ['useTemperatureC', 'useTemperaturesC', '120', 'outOfRange'],
    ['targetPh', 'phList', '7,4', 'ok'],
    ['targetPh', 'phList', '15', 'outOfRange'],
  ];
  it.each(cases)('%s given %j (pane field %s): %s', (field, paneField, value, expected) => {
    const fromCell = cell(field as 'concentrationMm', value);
    const fromCli = commandLine({ [field]: value });
    const fromPane = pane(paneField, value);
    expect([codeOf(fromCell), codeOf(fromCli), codeOf(fromPane)]).toEqual([expected, expected, expected]);
    if (fromCell !== 'ok') expect(fromCell.field).toBe(field);
    if (fromCli !== 'ok') expect(fromCli.field).toBe(field);
  });

  // Options: the options range (cells), the command line's nested JSON and the pane's settings.
  const options: [string, FieldName, string, string][] = [
    ['titrant.concentrationM', 'titrantStockM', '5 M', 'ok'],
    ['titrant.concentrationM', 'titrantStockM', '25', 'outOfRange'],
    ['titrant.concentrationM', 'titrantStockM', '500 mM', 'ok'],
    ['benchTemperatureC', 'benchTemperatureC', '22 °C', 'ok'],
    ['benchTemperatureC', 'benchTemperatureC', '-5', 'outOfRange'],
    ['partVolumeFraction', 'partVolumeFraction', '0,8', 'ok'],
    ['partVolumeFraction', 'partVolumeFraction', '1.5', 'outOfRange'],
    ['formPurityPercent', 'purityPercent', '99.5%', 'ok'],
    ['formPurityPercent', 'purityPercent', '0,995', 'ok'],
    ['formPurityPercent', 'purityPercent', '120', 'outOfRange'],
    ['activityModel', 'activityModel', 'Bates Guggenheim', 'ok'],
    ['activityModel', 'activityModel', 'magic', 'unknownChoice'],
  ];
  it.each(options)('option %s given %j (pane field %s): %s', (field, paneField, value, expected) => {
    const nested = field.includes('.') ? { [field.split('.')[0]]: { form: 'NaOH', [field.split('.')[1]]: value } } : { [field]: value };
    const fromCell = cellOption(field, value);
    const fromCli = commandLine({ form: 'HEPES free acid', ...nested });
    const fromPane = pane(paneField, value);
    expect([codeOf(fromCell), codeOf(fromCli), codeOf(fromPane)]).toEqual([expected, expected, expected]);
    if (fromCell !== 'ok') expect(fromCell.field).toBe(field);
    if (fromCli !== 'ok') expect(fromCli.field).toBe(field);
  });

  it('the command line names an unknown key and suggests the declared one', () => {
    let out = '';
    expect(run(['recipe', '--json', JSON.stringify({ ...GOOD, targetPH: 7.4 })], (t) => (out += t))).toBe(2);
    const { error } = JSON.parse(out);
    expect(error).toMatchObject({ code: 'unknownField', field: 'targetPH' });
    expect(error.message).toContain('"targetPh"');
  });
});
