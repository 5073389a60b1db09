/**
 * A mix plan as printable text: what to measure, the pH it lands on and why, warnings and
 * cautions. One text for every host (the command line's --text, the pane, a printed sheet).
 */
import { MixPlan, volumeWords } from './mix';

function pad(text: string, width: number): string {
  return text.length >= width ? text : text + ' '.repeat(width - text.length);
}

/**
 * The mix as lines of text.
 *
 * @example formatMix(planMix({ stocks: [{ name: 'NaCl 5 M', form: 'NaCl', concentration: 5 }], targets: [{ component: 'NaCl', concentrationMm: 150 }], volumeMl: 50 })).split('\n')[0] //=> 'Mix 50 mL, used at 25 °C'
 */
export function formatMix(plan: MixPlan): string {
  const p = plan.predictions;
  const lines = [`Mix ${plan.volumeMl} mL, used at ${plan.useTemperatureC} °C`];
  for (const c of plan.components) {
    const amount = c.millilitres !== undefined ? volumeWords(c.millilitres) : `${Number((c.grams ?? 0).toPrecision(4))} g`;
    const what = c.role === 'water' ? `water (to ${plan.volumeMl} mL)` : c.role === 'titrant' ? `${c.name} (pH correction)` : c.name;
    const gives = c.finalText ? `→ ${c.finalText}${c.component && c.component !== c.name ? ` ${c.component}` : ''}` : '';
    const weighed = c.role === 'additive' && c.millilitres !== undefined && c.grams !== undefined ? ` (or weigh ${Number(c.grams.toPrecision(4))} g)` : '';
    lines.push(`  ${pad(amount, 10)} ${pad(what, 28)} ${gives}${weighed}`.trimEnd());
  }
  lines.push('');
  lines.push(`Predicted pH ${p.pHAtUse.toFixed(2)} at ${plan.useTemperatureC} °C; the meter reads ${p.pHAtBench.toFixed(2)} at the bench (${plan.benchTemperatureC} °C).`);
  if (plan.correction)
    lines.push(
      `Without the correction the stocks give pH ${plan.correction.uncorrectedPh.toFixed(2)}; the ${plan.correction.stockM} M ${plan.correction.titrant} ${plan.correction.direction} it to the target ${plan.targetPh?.toFixed(2)}.`,
    );
  const osm = p.osmolalityMosmKg !== undefined ? `, osmolality ${p.osmolalityMosmKg.toFixed(0)} mOsm/kg` : '';
  lines.push(
    `Ionic strength ${p.ionicStrengthM.toPrecision(3)} M; conductivity ${p.conductivityMsPerCm.toPrecision(3)} mS/cm at ${plan.useTemperatureC} °C; ideal osmolarity ${p.idealOsmolarityMosm.toFixed(0)} mOsm/L${osm}.`,
  );
  for (const s of plan.labelShifts) {
    lines.push(
      `Label of ${s.stock}: pH ${s.labelPh.toFixed(2)} at ${s.labelTemperatureC} °C → diluted alone ${s.dilutedAlonePh.toFixed(2)} → in the mix ${s.mixedAtLabelTemperaturePh.toFixed(2)} at ${s.labelTemperatureC} °C → ${s.mixedAtUsePh.toFixed(2)} at ${plan.useTemperatureC} °C.`,
    );
  }
  if (plan.warnings.length > 0) {
    lines.push('', 'Warnings:');
    for (const w of plan.warnings) lines.push(`  - ${w.message}`);
  }
  lines.push('', 'Cautions:');
  for (const c of plan.cautions) lines.push(`  - ${c}`);
  return lines.join('\n');
}
