/**
 * The task pane's DOM: the recipe form, its field messages, progress and the values-copy
 * button. It reads the form, hands it to src/taskpane/writer.ts and shows what came back;
 * every workbook call goes through the port it is given. Text goes in with textContent.
 */
import { listSubstances } from '../chem/library';
import type { WorkbookPort } from '../workbook/port';
import { defaultInput, FieldName, FormInput, SALT_TARGET_GOALS } from './form';
import type { UnmakeableRow } from './protocol';
import { buildRecipeTable, mergedSettings, showProtocol, valuesCopy } from './writer';
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
    legend: 'Buffer and how it is made',
    fields: [
      { name: 'buffer', label: 'Buffer system', hint: 'As on the bottle: HEPES, tris, phosphate…', list: 'list-substances' },
      {
        name: 'route',
        label: 'Made by',
        kind: 'select',
        options: [
          ['titrate', 'weighing one form and titrating it'],
          ['two-forms', 'weighing two forms (no titration)'],
          ['stock', 'a concentrated stock, titrated, then diluted'],
        ],
      },
      { name: 'form', label: 'Form you weigh', hint: 'e.g. HEPES, tris base, sodium phosphate monobasic', list: 'list-forms' },
      { name: 'acidForm', label: 'Acid form you weigh', hint: 'e.g. sodium phosphate monobasic monohydrate', list: 'list-forms' },
      { name: 'baseForm', label: 'Base form you weigh', hint: 'e.g. sodium phosphate dibasic heptahydrate', list: 'list-forms' },
      { name: 'purityPercent', label: 'Purity of the form(s) (%)', hint: 'From its label or certificate; blank: 100', inputMode: 'decimal' },
      { name: 'titrant', label: 'Titrant', hint: 'A strong acid or base, or a weak one (e.g. acetic acid)', list: 'list-titrants' },
      { name: 'titrantStockM', label: 'Titrant stock (M)', inputMode: 'decimal' },
      {
        name: 'titrantInBuffer',
        label: 'If the titrant is a form of the buffer (acetic acid into sodium acetate)',
        kind: 'select',
        options: [
          ['state', 'weigh the stated amount; show the total it makes'],
          ['hold', 'weigh less, so the stated total holds'],
        ],
      },
      { name: 'stockFold', label: 'Stock strength (× the working buffer)', hint: 'e.g. 10 for a 10× stock', inputMode: 'decimal' },
      { name: 'stockVolumeMl', label: 'Stock to make (mL)', hint: 'Blank: as much as one batch of working buffer', inputMode: 'decimal' },
    ],
  },
  {
    legend: 'Target pH at the temperature of use',
    id: 'ph-group',
    fields: [
      {
        name: 'phMode',
        label: 'Give the pH values as',
        kind: 'select',
        options: [
          ['range', 'a series: first, last, step'],
          ['list', 'a typed list'],
        ],
      },
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
      { name: 'concentrationsMm', label: 'Buffer concentration (mM)', hint: 'One or more: 20; 50 (or with a unit: 0.05 M)' },
      { name: 'volumeMl', label: 'Final volume (mL)', hint: 'e.g. 1000, or 1 L', inputMode: 'decimal' },
      { name: 'salts', label: 'Salts (optional)', hint: 'Name and amount, separated by semicolons: NaCl 150 mM; KCl 2.7 mM' },
      {
        name: 'saltTargetGoal',
        label: 'Add a salt to reach',
        kind: 'select',
        options: [['none', 'no target'], ...SALT_TARGET_GOALS.map((g): [string, string] => [g.name, g.label])],
      },
      { name: 'saltTargetForm', label: 'Salt added to the target', list: 'list-forms' },
      { name: 'saltTargetValue', label: 'Target value', hint: 'In the unit of the target chosen above', inputMode: 'decimal' },
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
        options: [
          ['pitzer', 'Pitzer (default, stocks too)'],
          ['davies', 'Davies (dilute only)'],
          ['bates-guggenheim', 'Debye–Hückel, Bates–Guggenheim'],
          ['ideal', 'Ideal (no activity correction)'],
        ],
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
  /** Hides the pane (the host gives it a way back: Excel's ribbon button, the preview's "Show pane"). */
  readonly onHide?: () => void;
}

/** Renders the pane into `root` and wires it to the port. */
export async function mountPane(root: HTMLElement, options: PaneOptions): Promise<void> {
  const saved = mergedSettings(await options.port.loadSettings().catch(() => ({})));
  const initial = defaultInput(saved);
  root.replaceChildren();
  root.classList.add('pane');
  const header = make('header', { className: 'pane-head' }, root);
  make('h2', { text: 'Recipe table' }, header);
  if (options.onHide) {
    const hide = make('button', { className: 'pane-hide', text: 'Hide pane', id: 'hide-pane' }, header);
    hide.type = 'button';
    hide.addEventListener('click', () => options.onHide?.());
  }
  make('p', { className: 'pane-lede', text: 'Writes a new sheet: your inputs in shaded cells, every result a live PROTON formula.' }, header);

  const form = make('form', { className: 'pane-form', id: 'recipe-form' }, root);
  form.noValidate = true;
  const substances = listSubstances();
  datalist(
    'list-substances',
    substances.filter((s) => s.kind === 'acid-base').map((s) => s.name),
    form,
  );
  datalist(
    'list-forms',
    substances.flatMap((s) => s.forms),
    form,
  );
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
  const routeControl = controls.get('route') as HTMLSelectElement;
  const goalControl = controls.get('saltTargetGoal') as HTMLSelectElement;
  const showRoute = () => {
    const route = routeControl.value;
    for (const f of ['form', 'titrant', 'titrantStockM', 'titrantInBuffer'] as FieldName[]) rows.get(f)!.hidden = route === 'two-forms';
    for (const f of ['acidForm', 'baseForm'] as FieldName[]) rows.get(f)!.hidden = route !== 'two-forms';
    for (const f of ['stockFold', 'stockVolumeMl'] as FieldName[]) rows.get(f)!.hidden = route !== 'stock';
    for (const f of ['saltTargetForm', 'saltTargetValue'] as FieldName[]) rows.get(f)!.hidden = goalControl.value === 'none';
  };
  routeControl.addEventListener('change', showRoute);
  goalControl.addEventListener('change', showRoute);
  showRoute();

  const actions = make('div', { className: 'actions' }, form);
  const build = make('button', { className: 'primary', text: 'Build recipe table', id: 'build-table' }, actions);
  build.type = 'submit';
  const cancel = make('button', { text: 'Stop', id: 'cancel-build' }, actions);
  cancel.type = 'button';
  cancel.hidden = true;
  const progress = make('progress', { id: 'build-progress' }, actions);
  progress.hidden = true;
  progress.max = 1;
  progress.setAttribute('aria-label', 'Rows planned or written');
  const status = make('p', { className: 'status', id: 'pane-status' }, root);
  status.setAttribute('role', 'status');
  status.setAttribute('aria-live', 'polite');

  // Rows the planner cannot make: listed under the form, with a choice to leave them out.
  const unmakeableBox = make('section', { className: 'unmakeable', id: 'unmakeable' }, root);
  unmakeableBox.hidden = true;
  const unmakeableTitle = make('h3', {}, unmakeableBox);
  const unmakeableList = make('ul', { id: 'unmakeable-list' }, unmakeableBox);
  make('p', { className: 'hint', text: 'Fix the inputs above and build again, or leave these rows out of the table.' }, unmakeableBox);
  const drop = make('button', { text: 'Leave these rows out and build', id: 'drop-rows' }, unmakeableBox);
  drop.type = 'button';
  const showUnmakeable = (failed: readonly UnmakeableRow[] | undefined, allRows = 0) => {
    unmakeableBox.hidden = !failed || failed.length === 0;
    unmakeableList.replaceChildren();
    if (!failed) return;
    unmakeableTitle.textContent = `${failed.length} of ${allRows} rows cannot be made`;
    for (const f of failed) {
      const item = make('li', {}, unmakeableList);
      item.dataset.code = f.code;
      make('strong', { text: `Row ${f.index}: pH ${f.row.targetPh} at ${f.row.useTemperatureC} °C, ${f.row.concentrationMm} mM. ` }, item);
      make('span', { text: f.message }, item);
      make('code', { text: ` (${f.code})` }, item);
    }
    drop.hidden = failed.length === allRows;
  };

  const protocolBox = make('section', { className: 'protocol-box' }, root);
  make('h3', { text: 'Bench protocol' }, protocolBox);
  make(
    'p',
    { className: 'hint', text: 'Each table has a protocol sheet: live PROTON.RECIPE formulas over one row. Select a cell in the table, give a row number, and it shows that row.' },
    protocolBox,
  );
  const protocolRow = make('div', { className: 'field field-protocolRow' }, protocolBox);
  const protocolLabel = make('label', { text: 'Table row' }, protocolRow);
  protocolLabel.htmlFor = 'protocol-row';
  const protocolInput = make('input', { id: 'protocol-row' }, protocolRow);
  protocolInput.type = 'text';
  protocolInput.inputMode = 'numeric';
  protocolInput.value = '1';
  const protocolButton = make('button', { text: 'Show protocol for this row', id: 'show-protocol' }, protocolBox);
  protocolButton.type = 'button';

  const copyBox = make('section', { className: 'copy-box' }, root);
  make('h3', { text: 'Values copy' }, copyBox);
  make(
    'p',
    {
      className: 'hint',
      text: 'Copies the sheet you have selected as plain numbers on a new sheet, with a provenance block (add-in version, activity model, temperatures, constant sources, date).',
    },
    copyBox,
  );
  const copyButton = make('button', { text: 'Copy selected sheet as values', id: 'values-copy' }, copyBox);
  copyButton.type = 'button';

  mountMixSection(make('section', {}, root), options);
  mountBatchRecordBox(root, { port: options.port, version: options.version, ...(options.onWritten ? { onWritten: options.onWritten } : {}) });

  const cautions = make('section', { className: 'pane-cautions' }, root);
  make('h3', { text: 'Before you weigh' }, cautions);
  make(
    'p',
    {
      text: 'This is a planning aid. Verify the final pH with a calibrated meter at the working temperature; follow your safety data sheets and local rules. Strong acid and base titrants are corrosive; dissolving solid NaOH gives off heat; cacodylate contains arsenic.',
    },
    cautions,
  );

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
  let stop = false;
  const runBuild = (unmakeable: 'ask' | 'drop') => {
    if (busy) return;
    busy = true;
    stop = false;
    build.disabled = true;
    drop.disabled = true;
    cancel.hidden = false;
    // Indeterminate until the first rows are planned.
    progress.hidden = false;
    progress.removeAttribute('value');
    status.textContent = 'Checking…';
    status.className = 'status';
    void buildRecipeTable(options.port, read(), {
      version: options.version,
      unmakeable,
      cancelled: () => stop,
      onProgress: (done, total, phase) => {
        progress.hidden = false;
        progress.max = total;
        progress.value = done;
        status.textContent = phase === 'planning' ? `Planning rows: ${done} of ${total}` : `Writing rows: ${done} of ${total}`;
      },
    })
      .then((result) => {
        if (!result.ok) {
          showErrors(result.errors);
          showUnmakeable(result.unmakeable, result.allRows);
          if (result.cancelled) status.textContent = result.sheet ? `Stopped: "${result.sheet}" holds the rows written so far.` : 'Stopped: nothing written.';
          else if (result.unmakeable) status.textContent = 'Nothing written: some rows cannot be made (listed below).';
          else status.textContent = 'Nothing written: correct the fields marked below.';
          status.className = 'status status-error';
          if (result.cancelled && result.sheet) options.onWritten?.(result.sheet);
          return;
        }
        showErrors({});
        showUnmakeable(undefined);
        const left = result.dropped.length > 0 ? ` ${result.dropped.length} rows that cannot be made were left out.` : '';
        status.textContent = `Wrote ${result.rows} rows to the new sheet "${result.sheet}"; the bench protocol is on "${result.protocolSheet}".${left}`;
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
        drop.disabled = false;
        cancel.hidden = true;
        progress.hidden = true;
      });
  };
  form.addEventListener('submit', (event) => {
    event.preventDefault();
    runBuild('ask');
  });
  drop.addEventListener('click', () => runBuild('drop'));
  cancel.addEventListener('click', () => {
    stop = true;
    status.textContent = 'Stopping…';
  });
  protocolButton.addEventListener('click', () => {
    status.className = 'status';
    void showProtocol(options.port, Number(protocolInput.value.trim()))
      .then(({ sheet }) => {
        status.textContent = `The protocol sheet "${sheet}" now shows table row ${protocolInput.value.trim()}.`;
        status.className = 'status status-done';
        options.onWritten?.(sheet);
      })
      .catch((error: unknown) => {
        status.textContent = `No protocol: ${(error as Error).message}`;
        status.className = 'status status-error';
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
