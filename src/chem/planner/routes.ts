/** How a buffer is put together: one form plus titrant, or two forms, from the charge balance at the target (titration.ts). */
import { readTextField } from '../input';
import { scaleComposition } from '../capacity';
import { ChemWarning, warning } from '../warnings';
import { Composition, prepare } from '../composition';
import { ChemError, MESSAGES } from '../errors';
import { LibraryForm, SubstanceRecord } from '../library/types';
import { titrantFromForm } from '../library/titrant';
import { nameKey } from '../library/names';
import { PitzerStart, solvePh, solvePrepared } from '../speciation';
import { titrantForPh, withTitrant } from '../titration';
import { DEFAULT_STOCK_TOLERANCE_PERCENT, NO_TITRANT_PH, HOLD_TOTAL_STEPS, HOLD_TOTAL_TOLERANCE } from './constants';
import { RouteResult, Settled } from './settle';

/** Moles of the buffer system one mole of a form adds (0 if none). */
export function systemMolesIn(form: LibraryForm, system: SubstanceRecord): number {
  const key = nameKey(system.name);
  return form.adds.filter((a) => nameKey(a.system) === key).reduce((sum, a) => sum + a.moles, 0);
}

/** True when weighing the form adds the buffer system (tris base and tris HCl both hold tris). */
export function formContains(form: LibraryForm, system: SubstanceRecord): boolean {
  return systemMolesIn(form, system) > 0;
}

export function requireFormOf(field: string, name: string | undefined, s: Settled): LibraryForm {
  if (name === undefined || name === '') {
    throw new ChemError(
      'invalid-input',
      'formsOfSystem',
      MESSAGES.formsOfSystem(
        field,
        s.system.name,
        s.system.forms.map((f) => f.name),
      ),
      field,
      s.system.forms.map((f) => f.name).join(', '),
    );
  }
  const form = s.library.findForm(name);
  if (!formContains(form, s.system)) {
    throw new ChemError('invalid-input', 'formNotOfSystem', MESSAGES.formNotOfSystem(field, form.name, s.system.name), field, s.system.forms.map((f) => f.name).join(', '));
  }
  return form;
}

/** The form weighed on the titrate and stock routes: the one named, or the system's first form without counter-ions. */
export function weighedForm(s: Settled): LibraryForm {
  const named = readTextField('form', s.input.form);
  if (named !== undefined) return requireFormOf('form', named, s);
  const plain = s.system.forms.find((f) => Object.keys(f.counterIons).length === 0 && f.adds.length === 1);
  return requireFormOf('form', plain?.name, s);
}

/** The starting composition: the weighed forms and salts at the temperature of use. */
export function baseComposition(s: Settled, items: readonly { form: LibraryForm; concentrationM: number }[], saltTargetM: number): Composition {
  const all = [...items, ...s.salts];
  if (saltTargetM > 0 && s.saltTarget) all.push({ form: s.saltTarget.form, concentrationM: saltTargetM });
  return s.library.compositionFromForms(
    all.map((i) => ({ form: i.form, concentrationM: i.concentrationM })),
    { temperatureC: s.useT, activityModel: s.model },
  );
}

export function saltComponents(s: Settled, saltTargetM: number): RouteResult['weighed'] {
  const salts: RouteResult['weighed'][number][] = s.salts.map((x) => ({ role: 'salt', form: x.form, concentrationM: x.concentrationM }));
  if (saltTargetM > 0 && s.saltTarget) salts.push({ role: 'salt', form: s.saltTarget.form, concentrationM: saltTargetM, toTarget: true });
  return salts;
}

/** Route 1 (and the stock route's finished buffer): one form plus titrant. */
export function titrateRoute(s: Settled, saltTargetM: number): RouteResult {
  const form = weighedForm(s);
  const perMole = systemMolesIn(form, s.system);
  // Each attempt's γ start the next one's (the secant's attempts differ by a little buffer): Pitzer only.
  let near: PitzerStart | undefined;
  const attempt = (formM: number): RouteResult => {
    const start = baseComposition(s, [{ form, concentrationM: formM }], saltTargetM);
    const weighed = [{ role: 'buffer' as const, form, concentrationM: formM }, ...saltComponents(s, saltTargetM)];
    const before = solvePrepared(prepare(start), 7, near);
    const startPh = before.pH;
    if (Math.abs(startPh - s.targetPh) <= NO_TITRANT_PH) return { composition: start, weighed, unadjustedPh: startPh, pitzer: before.pitzer };
    // The amount's γ iteration starts from the unadjusted solution's γ when the titrant adds no new species (NaOH to a buffer with NaCl).
    const chosen = chooseTitrant(s, start, near ?? before.pitzer);
    near = chosen.pitzer;
    const composition = withTitrant(start, chosen.titrant, chosen.concentrationM);
    // Written field by field: a spread that adds a field costs more here than a pH solve.
    const titrant = { form: chosen.form, titrant: chosen.titrant, concentrationM: chosen.concentrationM, stock: chosen.stock, before: start };
    return { composition, weighed, titrant, unadjustedPh: startPh, pitzer: chosen.pitzer };
  };
  const stated = attempt(s.concentrationM / perMole);
  const shared = stated.titrant ? systemMolesIn(stated.titrant.form, s.system) : 0;
  if (shared === 0 || s.titrantInBuffer === 'state') return stated;
  // Hold the stated total: weigh x of the form so that x·perMole + titrant(x)·shared = C. The
  // titrant needed is close to proportional to x at a fixed target, so a secant on x converges
  // in a few steps.
  const total = (r: RouteResult) => r.weighed[0].concentrationM * perMole + (r.titrant?.concentrationM ?? 0) * shared;
  let [x0, r0] = [s.concentrationM / perMole, stated];
  let x1 = (x0 * s.concentrationM) / total(r0);
  let r1 = attempt(x1);
  for (let i = 0; i < HOLD_TOTAL_STEPS && Math.abs(total(r1) - s.concentrationM) > HOLD_TOTAL_TOLERANCE * s.concentrationM; i++) {
    const slope = (total(r1) - total(r0)) / (x1 - x0);
    const x2 = x1 - (total(r1) - s.concentrationM) / slope;
    [x0, r0] = [x1, r1];
    x1 = x2 > 0 && Number.isFinite(x2) ? x2 : x1 / 2;
    r1 = attempt(x1);
  }
  return r1;
}

/**
 * When the titrant is a form of the buffer and the weighed amount was not reduced for it:
 * the total it makes, as a warning (code titrantAddsBuffer).
 */
export function titrantTotalWarning(s: Settled, base: RouteResult): ChemWarning | undefined {
  if (!base.titrant || s.titrantInBuffer === 'hold' || s.route === 'two-forms') return undefined;
  const shared = systemMolesIn(base.titrant.form, s.system);
  if (shared === 0) return undefined;
  const totalMm =
    base.weighed.filter((w) => w.role === 'buffer').reduce((sum, w) => sum + w.concentrationM * systemMolesIn(w.form, s.system), 0) * 1000 +
    base.titrant.concentrationM * shared * 1000;
  return warning('titrantAddsBuffer', MESSAGES.titrantAddsBuffer(base.titrant.form.name, s.system.name, s.concentrationM * 1000, totalMm), 'titrantInBuffer');
}

/**
 * The titrant named, or 1 M NaOH / 1 M HCl, whichever reaches the target; with the Pitzer model, the γ of the
 * titrated solution besides (`near`: a neighbouring solution's γ to start the amount's iteration from).
 */
export function chooseTitrant(s: Settled, start: Composition, near?: PitzerStart): Omit<NonNullable<RouteResult['titrant']>, 'before'> & { readonly pitzer?: PitzerStart } {
  const stockM = s.titrant?.concentrationM ?? 1;
  const tolerance = s.titrant?.tolerancePercent ?? DEFAULT_STOCK_TOLERANCE_PERCENT;
  const candidates = s.titrant?.form
    ? [{ form: s.titrant.form, concentrationM: stockM, tolerancePercent: tolerance }]
    : [
        { form: 'sodium hydroxide', concentrationM: stockM, tolerancePercent: tolerance },
        { form: 'hydrochloric acid', concentrationM: stockM, tolerancePercent: tolerance },
      ];
  let firstError: unknown;
  for (const { form: name, concentrationM, tolerancePercent } of candidates) {
    const form = s.library.findForm(name, 'titrant.form');
    const titrant = titrantFromForm(form, s.library, 'titrant.form');
    try {
      const amount = titrantForPh(start, titrant, s.targetPh, near);
      return { form, titrant, concentrationM: amount.concentrationM, stock: { concentrationM, tolerancePercent }, pitzer: amount.pitzer };
    } catch (e) {
      firstError ??= e;
    }
  }
  throw firstError;
}

/** Route 2: two forms of the same system in the proportion that gives the target. */
export function twoFormsRoute(s: Settled, saltTargetM: number): RouteResult {
  const acid = requireFormOf('acidForm', readTextField('acidForm', s.input.acidForm), s);
  const base = requireFormOf('baseForm', readTextField('baseForm', s.input.baseForm), s);
  const mA = systemMolesIn(acid, s.system);
  const mB = systemMolesIn(base, s.system);
  // Start from all-acid-form; swapping one mole of base form in for mB/mA moles of acid
  // form changes only the counter-ions, so the split follows from the charge balance at
  // the target exactly as a titrant amount does.
  const allAcid = baseComposition(s, [{ form: acid, concentrationM: s.concentrationM / mA }], saltTargetM);
  const swap: Record<string, number> = {};
  for (const [ion, n] of Object.entries(base.counterIons)) swap[ion] = (swap[ion] ?? 0) + n;
  for (const [ion, n] of Object.entries(acid.counterIons)) swap[ion] = (swap[ion] ?? 0) - (n * mB) / mA;
  const maxBaseM = s.concentrationM / mB;
  let baseM: number;
  let pitzer: PitzerStart | undefined;
  try {
    const found = titrantForPh(allAcid, { name: base.name, strongIons: swap }, s.targetPh);
    baseM = found.concentrationM;
    pitzer = found.pitzer;
  } catch (e) {
    if (!(e instanceof ChemError) || e.kind !== 'infeasible-target') throw e;
    baseM = Infinity;
  }
  if (!(baseM <= maxBaseM * (1 + 1e-12))) {
    const allBase = baseComposition(s, [{ form: base, concentrationM: maxBaseM }], saltTargetM);
    const [lo, hi] = [solvePh(allAcid), solvePh(allBase)].sort((a, b) => a - b);
    throw new ChemError('infeasible-target', 'unreachableByMixing', MESSAGES.unreachableByMixing(s.targetPh, lo, hi), 'targetPh', `pH ${lo.toFixed(2)} to ${hi.toFixed(2)}`);
  }
  baseM = Math.min(baseM, maxBaseM);
  const acidM = Math.max(0, (s.concentrationM - baseM * mB) / mA);
  const weighed = [
    { role: 'acid form' as const, form: acid, concentrationM: acidM },
    { role: 'base form' as const, form: base, concentrationM: baseM },
  ];
  return {
    composition: baseComposition(s, weighed, saltTargetM),
    weighed: [...weighed, ...saltComponents(s, saltTargetM)],
    pitzer,
  };
}

export function routeResult(s: Settled, saltTargetM: number): RouteResult {
  return s.route === 'two-forms' ? twoFormsRoute(s, saltTargetM) : titrateRoute(s, saltTargetM);
}

/** A route's result with every concentration multiplied by a fold (the stock). Built field by field (no spreads: each cost about a microsecond). */
export function scaleRoute(r: RouteResult, fold: number): RouteResult {
  const composition = scaleComposition(r.composition, fold);
  const weighed = r.weighed.map((w) =>
    w.toTarget
      ? { role: w.role, form: w.form, concentrationM: w.concentrationM * fold, toTarget: w.toTarget }
      : { role: w.role, form: w.form, concentrationM: w.concentrationM * fold },
  );
  const t = r.titrant;
  const titrant = t ? { form: t.form, titrant: t.titrant, concentrationM: t.concentrationM * fold, stock: t.stock, before: scaleComposition(t.before, fold) } : undefined;
  // The finished buffer's unadjusted pH, as the plan reports it (not the stock's).
  if (titrant) return r.unadjustedPh === undefined ? { composition, weighed, titrant } : { composition, weighed, titrant, unadjustedPh: r.unadjustedPh };
  return r.unadjustedPh === undefined ? { composition, weighed } : { composition, weighed, unadjustedPh: r.unadjustedPh };
}
