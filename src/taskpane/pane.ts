/**
 * The task pane's DOM: the recipe form, its field messages, progress and the values-copy
 * button. It reads the form, hands it to src/taskpane/writer.ts and shows what came back;
 * every workbook call goes through the port it is given. Text goes in with textContent.
 */
import { listSubstances } from '../chem/library';
import type { WorkbookPort } from '../workbook/port';
import { defaultInput, FieldName, FormInput } from './form';
import { buildRecipeTable, mergedSettings, valuesCopy } from './writer';
import { mountMixSection } from './mixSection';
import { mountBatchRecordBox } from './batchRecordBox';

interface FieldSpec {
  readonly name: FieldName;
  readonly label: string;
  readonly hint?: string;
  readonly kind?: 'text' | 'select';
  readonly options?: readonly [string, string][];
  readonly list?: string;
  readonly inputMode?: 'decimal' | 'text';
}

const GROUPS: readonly { legend: string; fields: readonly FieldSpec[]; id?: string }[] = [
  {
    legend: 'Buffer and titrant',
    fields: [
      { name: 'buffer', label: 'Buffer system', hint: 'As on the bottle: HEPES, tris, phosphate…', list: 'list-substances' },
      { name: 'form', label: 'Form you weigh', hint: 'e.g. HEPES, tris base, sodium phosphate monobasic', list: 'list-forms' },
      { name: 'purityPercent', label: 'Purity of that form (%)', hint: 'From its label or certificate; blank: 100', inputMode: 'decimal' },
      { name: 'titrant', label: 'Titrant', list: 'list-titrants' },
      { name: 'titrantStockM', label: 'Titrant stock (M)', inputMode: 'decimal' },
    ],
  },
  {
    legend: 'Target pH at the temperature of use',
    id: 'ph-group',
    fields: [
      { name: 'phMode', label: 'Give the pH values as', kind: 'select', options: [['range', 'a series: first, last, step'], ['list', 'a typed list']] },
      { name: 'phStart', label: 'First pH', inputMode: 'decimal' },
      { name: 'phStop', label: 'Last pH', inputMode: 'decimal' },
      { name: 'phStep', label: 'Step', inputMode: 'decimal' },
      { name: 'phList', label: 'pH values', hint: 'Separate with semicolons: 7.2; 7.4' },
    ],
  },
  {
    legend: 'Solution',
    fields: [
      { name: 'useTemperaturesC', label: 'Used at (°C)', hint: 'One or more: 4; 25' },
      { name: 'concentrationsMm', label: 'Buffer concentration (mM)', hint: 'One or more: 20; 50' },
      { name: 'saltForm', label: 'Salt (optional)', list: 'list-forms' },
      { name: 'saltMm', label: 'Salt (mM)', inputMode: 'decimal' },
      { name: 'volumeMl', label: 'Final volume (mL)', inputMode: 'decimal' },
    ],
  },
  {
    legend: 'Bench settings (kept in this workbook)',
    fields: [
      { name: 'benchTemperatureC', label: 'Bench temperature (°C)', inputMode: 'decimal' },
      { name: 'partVolumeFraction', label: 'Adjust pH at this fraction of the volume', hint: '0.8 means at 800 mL of 1 L', inputMode: 'decimal' },
      {
        name: 'activityModel',
        label: 'Activity model',
        kind: 'select',
        options: [['pitzer', 'Pitzer (default, stocks too)'], ['davies', 'Davies (dilute only)'], ['bates-guggenheim', 'Debye–Hückel, Bates–Guggenheim'], ['ideal', 'Ideal (no activity correction)']],
      },
      { name: 'userSubstances', label: 'Your substances (range, optional)', hint: "e.g. 'My substances'!A2:J20" },
    ],
  },
];

const TITRANTS = ['NaOH', 'KOH', 'HCl', 'acetic acid', 'tris base'];

function make<K extends keyof HTMLElementTagNameMap>(tag: K, props: { className?: string; text?: string; id?: string } = {}, parent?: Element): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  if (props.className) node.className = props.className;
  if (props.text !== undefined) node.textContent = props.text;
  if (props.id) node.id = props.id;
  if (parent) parent.appendChild(node);
  return node;
}

function datalist(id: string, values: readonly string[], parent: Element): void {
  const list = make('datalist', { id }, parent);
  for (const v of values) {
    const option = document.createElement('option');
    option.value = v;
    list.appendChild(option);
  }
}

export interface PaneOptions {
  readonly port: WorkbookPort;
  readonly version: string;
  /** Called after a table or copy is written (the preview uses it to show the sheet). */
  readonly onWritten?: (sheet: string) => void;
}

/** Renders the pane into `root` and wires it to the port. */
export async function mountPane(root: HTMLElement, options: PaneOptions): Promise<void> {
  const saved = mergedSettings(await options.port.loadSettings().catch(() => ({})));
  const initial = defaultInput(saved);
  root.replaceChildren();
  root.classList.add('pane');
  const header = make('header', { className: 'pane-head' }, root);
  make('h2', { text: 'Recipe table' }, header);
  make('p', { className: 'pane-lede', text: 'Writes a new sheet: your inputs in shaded cells, every result a live PROTON formula.' }, header);

  const form = make('form', { className: 'pane-form', id: 'recipe-form' }, root);
  form.noValidate = true;
  const substances = listSubstances();
  datalist('list-substances', substances.filter((s) => s.kind === 'acid-base').map((s) => s.name), form);
  datalist('list-forms', substances.flatMap((s) => s.forms), form);
  datalist('list-titrants', TITRANTS, form);

  const controls = new Map<FieldName, HTMLInputElement | HTMLSelectElement>();
  const errors = new Map<FieldName, HTMLElement>();
  const rows = new Map<FieldName, HTMLElement>();
  for (const group of GROUPS) {
    const fieldset = make('fieldset', { id: group.id }, form);
    make('legend', { text: group.legend }, fieldset);
    for (const spec of group.fields) {
      const row = make('div', { className: `field field-${spec.name}` }, fieldset);
      const id = `field-${spec.name}`;
      const label = make('label', { text: spec.label }, row);
      label.htmlFor = id;
      let control: HTMLInputElement | HTMLSelectElement;
      if (spec.kind === 'select') {
        control = make('select', { id }, row);
        for (const [value, text] of spec.options ?? []) {
          const o = make('option', { text }, control);
          o.value = value;
        }
      } else {
        control = make('input', { id }, row);
        control.type = 'text';
        control.autocomplete = 'off';
        control.spellcheck = false;
        if (spec.list) control.setAttribute('list', spec.list);
        if (spec.inputMode) control.inputMode = spec.inputMode;
      }
      control.name = spec.name;
      control.value = initial[spec.name];
      const described: string[] = [];
      if (spec.hint) {
        const hint = make('p', { className: 'hint', text: spec.hint, id: `hint-${spec.name}` }, row);
        described.push(hint.id);
      }
      const error = make('p', { className: 'field-error', id: `error-${spec.name}` }, row);
      described.push(error.id);
      control.setAttribute('aria-describedby', described.join(' '));
      controls.set(spec.name, control);
      errors.set(spec.name, error);
      rows.set(spec.name, row);
    }
  }
  const modeControl = controls.get('phMode') as HTMLSelectElement;
  const showMode = () => {
    const list = modeControl.value === 'list';
    for (const f of ['phStart', 'phStop', 'phStep'] as FieldName[]) rows.get(f)!.hidden = list;
    rows.get('phList')!.hidden = !list;
  };
  modeControl.addEventListener('change', showMode);
  showMode();

  const actions = make('div', { className: 'actions' }, form);
  const build = make('button', { className: 'primary', text: 'Build recipe table', id: 'build-table' }, actions);
  build.type = 'submit';
  const progress = make('progress', { id: 'build-progress' }, actions);
  progress.hidden = true;
  progress.max = 1;
  progress.setAttribute('aria-label', 'Rows written');
  const status = make('p', { className: 'status', id: 'pane-status' }, root);
  status.setAttribute('role', 'status');
  status.setAttribute('aria-live', 'polite');

  const copyBox = make('section', { className: 'copy-box' }, root);
  make('h3', { text: 'Values copy' }, copyBox);
  make('p', { className: 'hint', text: 'Copies the sheet you have selected as plain numbers on a new sheet, with a provenance block (add-in version, activity model, temperatures, constant sources, date).' }, copyBox);
  const copyButton = make('button', { text: 'Copy selected sheet as values', id: 'values-copy' }, copyBox);
  copyButton.type = 'button';

  mountMixSection(make('section', {}, root), options);
  mountBatchRecordBox(root, { port: options.port, version: options.version, ...(options.onWritten ? { onWritten: options.onWritten } : {}) });

  const cautions = make('section', { className: 'pane-cautions' }, root);
  make('h3', { text: 'Before you weigh' }, cautions);
  make('p', { text: 'This is a planning aid. Verify the final pH with a calibrated meter at the working temperature; follow your safety data sheets and local rules. Strong acid and base titrants are corrosive; dissolving solid NaOH gives off heat; cacodylate contains arsenic.' }, cautions);

  const read = (): FormInput => {
    const out: Partial<Record<FieldName, string>> = {};
    for (const [name, control] of controls) out[name] = control.value;
    return out as FormInput;
  };
  const showErrors = (found: Partial<Record<FieldName, string>>) => {
    let first: HTMLElement | null = null;
    for (const [name, el] of errors) {
      const message = found[name] ?? '';
      el.textContent = message;
      const control = controls.get(name)!;
      control.setAttribute('aria-invalid', String(message !== ''));
      if (message && !first && !rows.get(name)!.hidden) first = control;
    }
    first?.focus();
  };

  let busy = false;
  form.addEventListener('submit', (event) => {
    event.preventDefault();
    if (busy) return;
    busy = true;
    build.disabled = true;
    status.textContent = 'Checking…';
    status.className = 'status';
    void buildRecipeTable(options.port, read(), {
      version: options.version,
      onProgress: (done, total) => {
        progress.hidden = false;
        progress.max = total;
        progress.value = done;
        status.textContent = `Writing rows: ${done} of ${total}`;
      },
    })
      .then((result) => {
        if (!result.ok) {
          showErrors(result.errors);
          status.textContent = 'Nothing written: correct the fields marked below.';
          status.className = 'status status-error';
          return;
        }
        showErrors({});
        status.textContent = `Wrote ${result.rows} rows to the new sheet "${result.sheet}". The protocol is beside the settings; the charts are right of the table (column R).`;
        status.className = 'status status-done';
        options.onWritten?.(result.sheet);
      })
      .catch((error: unknown) => {
        status.textContent = `Could not write the table: ${(error as Error).message}`;
        status.className = 'status status-error';
      })
      .finally(() => {
        busy = false;
        build.disabled = false;
        progress.hidden = true;
      });
  });

  copyButton.addEventListener('click', () => {
    copyButton.disabled = true;
    status.textContent = 'Copying values…';
    status.className = 'status';
    void valuesCopy(options.port, { version: options.version })
      .then(({ sheet, source }) => {
        status.textContent = `Copied "${source}" as values to "${sheet}".`;
        status.className = 'status status-done';
        options.onWritten?.(sheet);
      })
      .catch((error: unknown) => {
        status.textContent = `Nothing copied: ${(error as Error).message}`;
        status.className = 'status status-error';
      })
      .finally(() => (copyButton.disabled = false));
  });
}
