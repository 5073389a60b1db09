/**
 * The demo workbook the preview opens with: the North bench protein lab's prep sheet, our
 * own scenario — a HEPES saline wash buffer for the cold room (with its whole recipe spilled
 * beside it), a phosphate stock for the media kitchen and a tris buffer for gels — written
 * with PROTON formulas users can edit.
 */
import type { CellStyle } from '../workbook/port';

export interface DemoCell {
  readonly at: string;
  readonly content: string | number;
  readonly style?: CellStyle;
  readonly numberFormat?: string;
}

export const DEMO_SHEET = 'North bench prep';

/** Cells of the prep sheet (A1 addresses). Composition ranges: name, then mM. */
export const DEMO_CELLS: readonly DemoCell[] = [
  { at: 'A1', content: 'North bench protein lab: prep sheet for the week', style: 'title' },
  { at: 'A2', content: 'Shaded cells are inputs; the rest are PROTON formulas. Type your own formulas anywhere, e.g. =PROTON.PKA("tris", 1, 4).', style: 'note' },

  { at: 'A4', content: 'Cold-room wash buffer: HEPES saline, used at 4 °C', style: 'subtitle' },
  { at: 'A5', content: 'Name', style: 'header' },
  { at: 'B5', content: 'mM', style: 'header' },
  { at: 'A6', content: 'HEPES', style: 'input' },
  { at: 'B6', content: 20, style: 'input', numberFormat: '0.0' },
  { at: 'A7', content: 'NaOH', style: 'input' },
  { at: 'B7', content: 10, style: 'input', numberFormat: '0.0' },
  { at: 'A8', content: 'NaCl', style: 'input' },
  { at: 'B8', content: 150, style: 'input', numberFormat: '0.0' },
  { at: 'D5', content: 'Quantity', style: 'header' },
  { at: 'E5', content: 'Value', style: 'header' },
  { at: 'D6', content: 'pH at 4 °C', style: 'label' },
  { at: 'E6', content: '=PROTON.PH.OF(A6:B8, 4)', numberFormat: '0.00' },
  { at: 'D7', content: 'pH at 22 °C (bench)', style: 'label' },
  { at: 'E7', content: '=PROTON.PH.AT.TEMPERATURE(A6:B8, 22)', numberFormat: '0.00' },
  { at: 'D8', content: 'Ionic strength (mM)', style: 'label' },
  { at: 'E8', content: '=PROTON.IONIC.STRENGTH.MM(A6:B8, 4)', numberFormat: '0.0' },
  { at: 'D9', content: 'Ideal osmolarity (mOsm/L)', style: 'label' },
  { at: 'E9', content: '=PROTON.OSMOLARITY.IDEAL(A6:B8, 4)', numberFormat: '0' },
  { at: 'D10', content: 'HEPES to weigh for 2 L (g)', style: 'label' },
  { at: 'E10', content: '=PROTON.GRAMS("HEPES", B6, 2000)', numberFormat: '0.000' },
  { at: 'G4', content: 'The whole recipe, live: 2 L of the wash buffer at pH 7.70 at 4 °C, adjusted at 22 °C', style: 'subtitle' },
  { at: 'A9', content: 'Recipe option', style: 'header' },
  { at: 'B9', content: 'Value', style: 'header' },
  { at: 'A10', content: 'titrant', style: 'label' },
  { at: 'B10', content: 'NaOH', style: 'input' },
  { at: 'A11', content: 'benchTemperatureC', style: 'label' },
  { at: 'B11', content: 22, style: 'input', numberFormat: '0.0' },
  { at: 'G5', content: '=PROTON.RECIPE("HEPES", 7.7, B6, 2000, 4, A8:B8, A10:B11)' },
  { at: 'D11', content: 'Warnings at 4 °C', style: 'label' },
  { at: 'E11', content: '=PROTON.WARNINGS(A6:B8, 4)' },

  { at: 'A12', content: 'Media kitchen: 0.2 M sodium phosphate stock (10×), diluted 1:10 for use at 37 °C', style: 'subtitle' },
  { at: 'A13', content: 'Name', style: 'header' },
  { at: 'B13', content: 'mM', style: 'header' },
  { at: 'A14', content: 'sodium phosphate monobasic monohydrate', style: 'input' },
  { at: 'B14', content: 76, style: 'input', numberFormat: '0.0' },
  { at: 'A15', content: 'sodium phosphate dibasic heptahydrate', style: 'input' },
  { at: 'B15', content: 124, style: 'input', numberFormat: '0.0' },
  { at: 'D13', content: 'Quantity', style: 'header' },
  { at: 'E13', content: 'Value', style: 'header' },
  { at: 'D14', content: 'Stock pH at 25 °C', style: 'label' },
  { at: 'E14', content: '=PROTON.PH.OF(A14:B15, 25)', numberFormat: '0.00' },
  { at: 'D15', content: 'After 1:10 dilution, 37 °C', style: 'label' },
  { at: 'E15', content: '=PROTON.PH.DILUTED(A14:B15, 10, 37)', numberFormat: '0.00' },
  { at: 'D16', content: 'Monobasic for 500 mL (g)', style: 'label' },
  { at: 'E16', content: '=PROTON.GRAMS(A14, B14, 500)', numberFormat: '0.000' },
  { at: 'D17', content: 'Dibasic for 500 mL (g)', style: 'label' },
  { at: 'E17', content: '=PROTON.GRAMS(A15, B15, 500)', numberFormat: '0.000' },
  { at: 'D18', content: 'Warnings for the stock', style: 'label' },
  { at: 'E18', content: '=PROTON.WARNINGS(A14:B15, 25)' },

  { at: 'A19', content: 'Gel room: 375 mM tris, adjusted with 6 M HCl to pH 8.8 at 22 °C, 1 L', style: 'subtitle' },
  { at: 'D20', content: 'Quantity', style: 'header' },
  { at: 'E20', content: 'Value', style: 'header' },
  { at: 'A20', content: 'Input', style: 'header' },
  { at: 'B20', content: 'Value', style: 'header' },
  { at: 'A21', content: 'tris base', style: 'input' },
  { at: 'B21', content: 375, style: 'input', numberFormat: '0.0' },
  { at: 'A22', content: 'target pH', style: 'label' },
  { at: 'B22', content: 8.8, style: 'input', numberFormat: '0.00' },
  { at: 'A23', content: 'HCl stock (M)', style: 'label' },
  { at: 'B23', content: 6, style: 'input', numberFormat: '0.0' },
  { at: 'D21', content: 'Tris base to weigh (g)', style: 'label' },
  { at: 'E21', content: '=PROTON.GRAMS(A21, B21, 1000)', numberFormat: '0.00' },
  { at: 'D22', content: '6 M HCl to add (mL)', style: 'label' },
  { at: 'E22', content: '=PROTON.TITRANT.ML(A21, B21, 1000, B22, "HCl", B23, 22)', numberFormat: '0.0' },
  { at: 'D23', content: 'Tris pKa′ at 22 °C', style: 'label' },
  { at: 'E23', content: '=PROTON.PKA("tris", 1, 22)', numberFormat: '0.000' },
  { at: 'D24', content: 'Same pKa′ in the 4 °C cold room', style: 'label' },
  { at: 'E24', content: '=PROTON.PKA("tris", 1, 4)', numberFormat: '0.000' },
  { at: 'A26', content: 'Caution: 6 M HCl is corrosive; add it slowly with stirring, eye protection on.', style: 'caution' },
  { at: 'A27', content: 'Verify the final pH with a calibrated meter at the working temperature;', style: 'caution' },
  { at: 'A28', content: 'follow your safety data sheets and local rules.', style: 'caution' },
];

export const DEMO_COLUMN_WIDTHS = [40, 10, 2, 30, 12, 2, 10, 40, 12, 10];
