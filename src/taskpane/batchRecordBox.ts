/**
 * The pane's "Batch record" box: a recipe in a few fields (labels and examples from the one
 * declaration of every input, src/chem/input), and a button that writes the recipe's batch
 * record sheet through the workbook port (src/workbook/batchRecord.ts) — in Excel and in the
 * preview alike. The planner reads and checks every field; an error is shown under the field
 * it names.
 */
import { ChemError } from '../chem';
import { field } from '../chem/input';
import { RecipeInput, planRecipe } from '../chem/planner';
import { writeBatchRecord } from '../workbook/batchRecord';
import type { WorkbookPort } from '../workbook/port';

/** The recipe fields the box asks for, in order (the rest take their defaults). */
export const RECORD_FIELDS = [
  'buffer',
  'targetPh',
  'concentrationMm',
  'volumeMl',
  'useTemperatureC',
  'form',
  'titrant.form',
  'titrant.concentrationM',
  'benchTemperatureC',
  'salts',
] as const;

export interface BatchRecordBoxOptions {
  readonly port: WorkbookPort;
  readonly version: string;
  /** Called with the new sheet's name. */
  readonly onWritten?: (sheet: string) => void;
}

function el<K extends keyof HTMLElementTagNameMap>(tag: K, parent: Element, props: { className?: string; text?: string; id?: string } = {}): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  if (props.className) node.className = props.className;
  if (props.text !== undefined) node.textContent = props.text;
  if (props.id) node.id = props.id;
  parent.appendChild(node);
  return node;
}

function setPath(target: Record<string, unknown>, path: string, value: unknown): void {
  const parts = path.split('.');
  let at = target;
  for (const part of parts.slice(0, -1)) at = (at[part] ??= {}) as Record<string, unknown>;
  at[parts[parts.length - 1]] = value;
}

/** Adds the box to the pane. */
export function mountBatchRecordBox(root: HTMLElement, options: BatchRecordBoxOptions): void {
  const box = el('section', root, { className: 'copy-box batch-record-box', id: 'batch-record' });
  el('h3', box, { text: 'Batch record' });
  el('p', box, {
    className: 'hint',
    text: 'A sheet to print and fill in at the bench: materials with lots and actual amounts, the titrant, the meter, final checks and sign-off; a live as-made check (PROTON.AS.MADE) passes or fails the batch as it is filled in.',
  });
  const form = el('form', box, { className: 'pane-form', id: 'batch-record-form' });
  form.noValidate = true;
  const controls = new Map<string, HTMLInputElement>();
  const errors = new Map<string, HTMLElement>();
  for (const name of RECORD_FIELDS) {
    const f = field(name);
    const row = el('div', form, { className: 'field' });
    const id = `record-${name.replace('.', '-')}`;
    const label = el('label', row, { text: f.label });
    label.htmlFor = id;
    const input = el('input', row, { id });
    input.type = 'text';
    input.autocomplete = 'off';
    input.spellcheck = false;
    input.placeholder = f.example;
    const error = el('p', row, { className: 'field-error', id: `${id}-error` });
    input.setAttribute('aria-describedby', error.id);
    controls.set(name, input);
    errors.set(name, error);
  }
  const actions = el('div', form, { className: 'actions' });
  const button = el('button', actions, { text: 'Create batch record', id: 'batch-record-create' });
  button.type = 'submit';
  const status = el('p', box, { className: 'status', id: 'batch-record-status' });
  status.setAttribute('role', 'status');
  status.setAttribute('aria-live', 'polite');

  form.addEventListener('submit', (event) => {
    event.preventDefault();
    for (const e of errors.values()) e.textContent = '';
    const input: Record<string, unknown> = {};
    for (const [name, control] of controls) if (control.value.trim() !== '') setPath(input, name, control.value);
    let plan;
    try {
      plan = planRecipe(input as unknown as RecipeInput);
    } catch (error) {
      const e = error as ChemError;
      const at = [...errors.keys()].find((k) => e.field === k || e.field?.startsWith(`${k}`));
      if (at) errors.get(at)!.textContent = e.message;
      status.textContent = `Nothing written: ${e.message}`;
      status.className = 'status status-error';
      return;
    }
    button.disabled = true;
    status.textContent = 'Writing the batch record…';
    status.className = 'status';
    void writeBatchRecord(options.port, input as unknown as RecipeInput, plan, options.version)
      .then((sheet) => {
        status.textContent = `Wrote the batch record "${sheet}": fill in the shaded cells; the as-made check below them computes as you go.`;
        status.className = 'status status-done';
        options.onWritten?.(sheet);
      })
      .catch((error: unknown) => {
        status.textContent = `Could not write the batch record: ${(error as Error).message}`;
        status.className = 'status status-error';
      })
      .finally(() => (button.disabled = false));
  });
}
