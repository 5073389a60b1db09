import { checkForm, defaultInput, readList, readNumber, readNumberIn } from '../../src/taskpane/form';

describe('pane form: numbers as people type them', () => {
  it('reads decimal commas and the field\'s own unit', () => {
    expect(readNumber('7,4')).toBe(7.4);
    expect(readNumberIn('150 mM', ' mM')).toBe(150);
    expect(readNumberIn('25 °C', ' °C')).toBe(25);
    expect(readNumberIn('25C', ' °C')).toBe(25);
    expect(readNumberIn('500mL', ' mL')).toBe(500);
    expect(readList('4 °C; 25 °C', ' °C')).toEqual([4, 25]);
  });

  it('refuses another unit rather than guess a conversion', () => {
    expect(readNumberIn('0.15 M', ' mM')).toBeNull();
    expect(readNumberIn('1 L', ' mL')).toBeNull();
  });

  it('accepts a form typed with units and decimal commas', () => {
    const checked = checkForm({ ...defaultInput(), saltMm: '150 mM', volumeMl: '500 mL', benchTemperatureC: '21,5 °C', useTemperaturesC: '4 °C; 25 °C' });
    expect(checked.ok).toBe(true);
  });

  it('says which unit to use when a field gets another', () => {
    const checked = checkForm({ ...defaultInput(), volumeMl: '0.5 L', saltMm: 'NaN', benchTemperatureC: '-20' });
    expect(checked.ok).toBe(false);
    if (checked.ok) return;
    expect(checked.errors.volumeMl).toMatch(/must be a number in mL/);
    expect(checked.errors.saltMm).toMatch(/must be a number in mM/);
    expect(checked.errors.benchTemperatureC).toMatch(/must be from/);
  });
});
