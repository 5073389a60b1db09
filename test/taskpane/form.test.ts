import { checkForm, defaultInput } from '../../src/taskpane/form';

describe('pane form: numbers as people type them (the one input reader)', () => {
  it('accepts a form typed with units and decimal commas', () => {
    const checked = checkForm({
      ...defaultInput(),
      salts: 'NaCl 150 mM',
      volumeMl: '0,5 L',
      benchTemperatureC: '21,5 °C',
      useTemperaturesC: '4 °C; 25 °C',
      concentrationsMm: '0,025 M',
    });
    expect(checked.ok).toBe(true);
    if (!checked.ok) return;
    expect(checked.request.volumeMl).toBe(500);
    expect(checked.request.concentrationsMm).toEqual([25]);
    expect(checked.request.benchTemperatureC).toBe(21.5);
  });

  it('reads "7,4" in a pH list as one pH, as the functions do', () => {
    const checked = checkForm({ ...defaultInput(), phMode: 'list', phList: '7,4' });
    expect(checked.ok && checked.request.targetPhs).toEqual([7.4]);
  });

  it('names the field and gives the reader’s code when a field gets another unit, no number or a value out of range', () => {
    const checked = checkForm({ ...defaultInput(), volumeMl: '5 mM', salts: 'NaCl NaN', benchTemperatureC: '-20', titrantStockM: '25' });
    expect(checked.ok).toBe(false);
    if (checked.ok) return;
    expect(checked.codes).toEqual({ volumeMl: 'wrongUnit', salts: 'notANumber', benchTemperatureC: 'outOfRange', titrantStockM: 'outOfRange' });
    expect(checked.errors.volumeMl).toMatch(/final volume: the unit "mM" does not fit/);
  });
});
