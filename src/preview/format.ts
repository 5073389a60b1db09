/**
 * How the preview grid shows a computed value: numbers by the cell's number format
 * (`0.00`, `0.0`, `0`, `0.000`), or with up to six significant digits when it has none.
 */
import type { ComputedValue } from './workbook';

/** Text for a value under a spreadsheet-style number format (the subset our tables use). */
export function formatValue(value: ComputedValue, numberFormat?: string): string {
  if (value === null) return '';
  if (typeof value === 'object') return value.error;
  if (typeof value === 'boolean') return value ? 'TRUE' : 'FALSE';
  if (typeof value === 'string') return value;
  if (!Number.isFinite(value)) return String(value);
  const fixed = numberFormat ? /^[#0,]*0(?:\.(0+))?$/.exec(numberFormat.trim()) : null;
  if (fixed) return value.toFixed(fixed[1]?.length ?? 0);
  if (numberFormat && /^0(\.0+)?%$/.test(numberFormat.trim())) return `${(value * 100).toFixed((numberFormat.split('.')[1] ?? '%').length - 1)}%`;
  if (value !== 0 && (Math.abs(value) >= 1e9 || Math.abs(value) < 1e-4)) return value.toExponential(4);
  return String(Number(value.toPrecision(6)));
}
