/**
 * The pane's "from stocks" mode, without the DOM: reads the lab's stock shelf from a range
 * through the workbook port, checks the targets with the core's mix planner, and writes a
 * new sheet whose amounts are one live =PROTON.MIX.VOLUMES(…) formula over the shelf and the
 * targets typed in it, with the plan's notes (how the label pH moves, warnings, cautions)
 * written beside it as values (docs/stocks.md).
 */
import { ChemError, MESSAGES } from '../chem';
import { isBlankValue } from '../chem/input';
import { splitList } from '../chem/input/quantity';
import { MixPlan, MixTarget, planMix } from '../chem/mixing';
import { stocksFrom } from '../functions/stockRange';
import { CellBlock, CellWrite, WorkbookPort, literal, parseRangeText, qualifiedAddress, uniqueName } from '../workbook/port';
import { call } from './formulas';

/** What the mix form holds, as typed. */
export interface MixForm {
  /** The shelf range, e.g. `'Stock shelf'!A1:F12` (the selected sheet when no sheet is named). */
  readonly shelf: string;
  /** Targets as a list: `tris 20 mM; NaCl 150 mM; glycerol 10 %` (mM when no unit). */
  readonly targets: string;
  readonly volumeMl: string;
  readonly useTemperatureC: string;
  /** Optional target pH at the temperature of use. */
  readonly targetPh: string;
}

export type MixFieldName = keyof MixForm;
export type MixFieldErrors = Partial<Record<MixFieldName, string>>;

/** Where the inputs and the formula sit on the sheet written (zero-based rows; column A labels, B values). */
export const MIX_LAYOUT = { titleRow: 0, firstInputRow: 2, targetsHeaderRow: 8, firstTargetRow: 9 } as const;

/** Example values of our own for a first look. */
export function defaultMixForm(): MixForm {
  return { shelf: '', targets: 'tris 20 mM; NaCl 150 mM; EDTA 1 mM', volumeMl: '50', useTemperatureC: '4', targetPh: '' };
}

/** One target item: the last word is the amount ("10 %", "20 mM" or "20"); the rest the component. */
export function readTargets(text: string): MixTarget[] {
  return splitList('targets', text).map((item) => {
    const words = item.trim().split(/\s+/);
    const unitWord = words.length > 2 && !/^[+-]?[\d.,]/.test(words[words.length - 1]);
    const amountWords = unitWord ? 2 : 1;
    if (words.length <= amountWords) throw new ChemError('invalid-input', 'badTargetItem', MESSAGES.badTargetItem('targets', item), 'targets', 'component amount; …');
    const amount = words.slice(words.length - amountWords).join(' ');
    const component = words.slice(0, words.length - amountWords).join(' ');
    return amount.endsWith('%') ? { component, percent: amount } : { component, concentrationMm: amount };
  });
}

/** The field a core error belongs to in this form. */
function fieldOf(error: ChemError): MixFieldName {
  const f = error.field ?? '';
  if (f.startsWith('stocks')) return 'shelf';
  if (f.startsWith('targets')) return 'targets';
  if (f === 'volumeMl') return 'volumeMl';
  if (f === 'useTemperatureC') return 'useTemperatureC';
  if (f === 'targetPh' || f.startsWith('titrant')) return 'targetPh';
  return 'targets';
}

export type MixResult = { readonly ok: true; readonly sheet: string; readonly plan: MixPlan } | { readonly ok: false; readonly errors: MixFieldErrors };

/**
 * Plans the mix and writes it on a new sheet: inputs, targets, the MIX.VOLUMES formula and the notes.
 *
 * @param port - the workbook
 * @param form - the form as typed
 * @param now - time the notes were computed
 */
export async function buildMixSheet(port: WorkbookPort, form: MixForm, now: Date = new Date()): Promise<MixResult> {
  const typed = parseRangeText(form.shelf);
  if (!typed) return { ok: false, errors: { shelf: "Give the range of your stock shelf, such as 'Stock shelf'!A1:F12." } };
  const sheets = await port.sheetNames();
  const wanted = typed.sheet ?? (await port.readSelection()).sheet;
  const shelfSheet = sheets.find((n) => n.toLowerCase() === wanted.toLowerCase());
  if (shelfSheet === undefined) return { ok: false, errors: { shelf: `There is no sheet named "${wanted}" in this workbook.` } };

  let plan: MixPlan;
  let targets: MixTarget[];
  try {
    const values = await port.readValues(shelfSheet, typed.range);
    targets = readTargets(form.targets);
    plan = planMix({
      stocks: stocksFrom(values),
      targets,
      volumeMl: form.volumeMl,
      useTemperatureC: form.useTemperatureC,
      ...(isBlankValue(form.targetPh) ? {} : { targetPh: form.targetPh }),
    });
  } catch (error) {
    if (error instanceof ChemError) return { ok: false, errors: { [fieldOf(error)]: error.message } };
    const field: MixFieldName = (error as { field?: string })?.field?.startsWith('targets') ? 'targets' : 'shelf';
    return { ok: false, errors: { [field]: error instanceof Error ? error.message : String(error) } };
  }

  const sheet = uniqueName(`Mix ${plan.volumeMl} mL at ${plan.useTemperatureC} °C`, sheets);
  await port.addSheet(sheet);
  const shelfRef = qualifiedAddress(shelfSheet, typed.range);
  const v = (value: string | number, style: CellWrite['style'] = 'input'): CellWrite => ({ value: literal(value), style });
  const label = (text: string): CellWrite => ({ value: text, style: 'label' });
  const rows: (CellWrite | null)[][] = [];
  rows[MIX_LAYOUT.titleRow] = [{ value: 'Working buffer mixed from stock solutions', style: 'title' }];
  rows[1] = [{ value: 'Shaded cells are inputs; the amounts are one live PROTON.MIX.VOLUMES formula over your shelf.', style: 'note' }];
  const first = MIX_LAYOUT.firstInputRow;
  rows[first] = [label('Stock shelf'), v(shelfRef, 'provenance')];
  rows[first + 1] = [label('Final volume (mL)'), v(plan.volumeMl)];
  rows[first + 2] = [label('Used at (°C)'), v(plan.useTemperatureC)];
  rows[first + 3] = [label('Target pH (blank: none)'), plan.targetPh === undefined ? { value: null, style: 'input' } : v(plan.targetPh)];
  rows[MIX_LAYOUT.targetsHeaderRow] = [
    { value: 'component', style: 'header' },
    { value: 'final (mM, or %)', style: 'header' },
  ];
  targets.forEach((t, i) => {
    rows[MIX_LAYOUT.firstTargetRow + i] = [
      v(t.component),
      v(t.percent !== undefined ? String(t.percent) : Number.isFinite(Number(t.concentrationMm)) ? Number(t.concentrationMm) : String(t.concentrationMm)),
    ];
  });
  const lastTarget = MIX_LAYOUT.firstTargetRow + targets.length - 1;
  const tableRow = lastTarget + 2;
  const a = (row: number, col = 1) => `${String.fromCharCode(65 + col)}${row + 1}`;
  const formula = `=${call('MIX.VOLUMES', shelfRef, `A${MIX_LAYOUT.firstTargetRow + 1}:B${lastTarget + 1}`, a(first + 1), a(first + 3), a(first + 2))}`;
  rows[tableRow] = [{ formula }];
  // The spill takes targets + 5 rows; the notes go below it, as values with the time computed.
  let notes = tableRow + targets.length + 6;
  rows[notes++] = [{ value: `Notes, computed ${now.toISOString().slice(0, 16).replace('T', ' ')} UTC (values: recompute by rebuilding)`, style: 'subtitle' }];
  for (const s of plan.labelShifts) {
    rows[notes++] = [
      {
        value: `Label of ${s.stock}: pH ${s.labelPh.toFixed(2)} at ${s.labelTemperatureC} °C → diluted alone ${s.dilutedAlonePh.toFixed(2)} → in the mix ${s.mixedAtLabelTemperaturePh.toFixed(2)} → ${s.mixedAtUsePh.toFixed(2)} at ${plan.useTemperatureC} °C`,
        style: 'note',
      },
    ];
  }
  rows[notes++] = [
    {
      value: `Ionic strength ${plan.predictions.ionicStrengthM.toPrecision(3)} M; conductivity ${plan.predictions.conductivityMsPerCm.toPrecision(3)} mS/cm at ${plan.useTemperatureC} °C; ideal osmolarity ${plan.predictions.idealOsmolarityMosm.toFixed(0)} mOsm/L`,
      style: 'note',
    },
  ];
  for (const w of plan.warnings) rows[notes++] = [{ value: literal(w.message), style: 'warning' }];
  for (const c of plan.cautions) rows[notes++] = [{ value: literal(c), style: 'caution' }];
  const block: CellBlock = { row: 0, col: 0, cells: Array.from({ length: rows.length }, (_, i) => rows[i] ?? []) };
  await port.writeTable(sheet, block);
  await port.setColumnWidths(sheet, [34, 14, 8, 16]);
  await port.activateSheet(sheet);
  return { ok: true, sheet, plan };
}
