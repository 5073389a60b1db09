/**
 * The pane's "from stocks" section: a small form (the shelf range, targets, final volume,
 * temperature of use, optional target pH) that writes a mix sheet through the port
 * (mixSheet.ts). Text goes in with textContent.
 */
import type { WorkbookPort } from '../workbook/port';
import { MixFieldName, MixForm, buildMixSheet, defaultMixForm } from './mixSheet';

const FIELDS: readonly { name: MixFieldName; label: string; hint?: string; decimal?: boolean }[] = [
  { name: 'shelf', label: 'Stock shelf (range)', hint: "One row per stock: name, form, concentration, titrant, pH, pH at °C — e.g. 'Stock shelf'!A1:F12" },
  { name: 'targets', label: 'Final amounts', hint: 'Separate with semicolons: tris 20 mM; NaCl 150 mM; glycerol 10 %' },
  { name: 'volumeMl', label: 'Final volume (mL)', decimal: true },
  { name: 'useTemperatureC', label: 'Used at (°C)', decimal: true },
  { name: 'targetPh', label: 'Target pH (optional)', hint: 'When the stocks miss it, the sheet adds the titrant that corrects it', decimal: true },
];

function make<K extends keyof HTMLElementTagNameMap>(tag: K, props: { className?: string; text?: string; id?: string } = {}, parent?: Element): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  if (props.className) node.className = props.className;
  if (props.text !== undefined) node.textContent = props.text;
  if (props.id) node.id = props.id;
  if (parent) parent.appendChild(node);
  return node;
}

/** Fills `section` with the "from stocks" form and wires it to the port. */
export function mountMixSection(section: HTMLElement, options: { readonly port: WorkbookPort; readonly onWritten?: (sheet: string) => void }): void {
  section.classList.add('mix-box');
  make('h3', { text: 'From stocks' }, section);
  make(
    'p',
    {
      className: 'hint',
      text: 'Mix a working buffer from your stock solutions: a new sheet with the mL of each stock (a live PROTON.MIX.VOLUMES formula), the pH it lands on and why.',
    },
    section,
  );
  const form = make('form', { className: 'pane-form', id: 'mix-form' }, section);
  form.noValidate = true;
  const initial = defaultMixForm();
  const controls = new Map<MixFieldName, HTMLInputElement>();
  const errors = new Map<MixFieldName, HTMLElement>();
  for (const spec of FIELDS) {
    const row = make('div', { className: `field field-mix-${spec.name}` }, form);
    const id = `mix-${spec.name}`;
    const label = make('label', { text: spec.label }, row);
    label.htmlFor = id;
    const control = make('input', { id }, row);
    control.type = 'text';
    control.autocomplete = 'off';
    control.spellcheck = false;
    if (spec.decimal) control.inputMode = 'decimal';
    control.name = spec.name;
    control.value = initial[spec.name];
    const described: string[] = [];
    if (spec.hint) described.push(make('p', { className: 'hint', text: spec.hint, id: `hint-mix-${spec.name}` }, row).id);
    const error = make('p', { className: 'field-error', id: `error-mix-${spec.name}` }, row);
    described.push(error.id);
    control.setAttribute('aria-describedby', described.join(' '));
    controls.set(spec.name, control);
    errors.set(spec.name, error);
  }
  const button = make('button', { text: 'Plan mix from stocks', id: 'build-mix' }, form);
  button.type = 'submit';
  const status = make('p', { className: 'status', id: 'mix-status' }, section);
  status.setAttribute('role', 'status');
  status.setAttribute('aria-live', 'polite');

  form.addEventListener('submit', (event) => {
    event.preventDefault();
    button.disabled = true;
    status.textContent = 'Planning…';
    status.className = 'status';
    const input = Object.fromEntries([...controls].map(([name, control]) => [name, control.value])) as unknown as MixForm;
    void buildMixSheet(options.port, input)
      .then((result) => {
        for (const [name, el] of errors) {
          const message = result.ok ? '' : (result.errors[name] ?? '');
          el.textContent = message;
          controls.get(name)!.setAttribute('aria-invalid', String(message !== ''));
        }
        if (!result.ok) {
          status.textContent = 'Nothing written: correct the fields marked above.';
          status.className = 'status status-error';
          return;
        }
        status.textContent = `Wrote the mix to the new sheet "${result.sheet}": pH ${result.plan.predictions.pHAtUse.toFixed(2)} at ${result.plan.useTemperatureC} °C.`;
        status.className = 'status status-done';
        options.onWritten?.(result.sheet);
      })
      .catch((error: unknown) => {
        status.textContent = `Could not write the mix: ${(error as Error).message}`;
        status.className = 'status status-error';
      })
      .finally(() => (button.disabled = false));
  });
}
