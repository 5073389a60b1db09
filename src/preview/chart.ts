/**
 * Charts of the preview page, drawn as SVG with DOM calls (no chart library, no inline
 * styles, no innerHTML): x–y lines with a marked target point and an optional shaded band.
 * Values come from the sheet's cells, so a chart follows the formulas.
 */
import type { ChartSpec, RangeRef } from '../workbook/port';
import type { PreviewWorkbook } from './workbook';

const SVG = 'http://www.w3.org/2000/svg';
const WIDTH = 460;
const HEIGHT = 260;
const MARGIN = { left: 56, right: 16, top: 14, bottom: 44 };

function el<K extends keyof SVGElementTagNameMap>(name: K, attrs: Record<string, string | number>, parent?: Element): SVGElementTagNameMap[K] {
  const node = document.createElementNS(SVG, name);
  for (const [k, v] of Object.entries(attrs)) node.setAttribute(k, String(v));
  if (parent) parent.appendChild(node);
  return node;
}

function numbers(book: PreviewWorkbook, sheet: string, range: RangeRef): (number | null)[] {
  return book.values(sheet, range).map((line) => (typeof line[0] === 'number' && Number.isFinite(line[0]) ? line[0] : null));
}

/** Round tick steps (1, 2, 5 × 10^n) giving about `count` ticks. */
export function ticks(lo: number, hi: number, count = 5): number[] {
  if (!(hi > lo)) return [lo];
  const raw = (hi - lo) / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * mag).find((s) => s >= raw) ?? raw;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) out.push(Number(v.toPrecision(10)));
  return out;
}

function label(v: number): string {
  return Math.abs(v) >= 1000 ? v.toFixed(0) : String(Number(v.toPrecision(4)));
}

/** Draws one chart into a new <figure>; returns it. */
export function drawChart(book: PreviewWorkbook, sheet: string, spec: ChartSpec): HTMLElement {
  const figure = document.createElement('figure');
  figure.className = 'chart';
  // The title is page text above the drawing, so a long one wraps instead of being cut at the drawing's edge.
  const heading = document.createElement('p');
  heading.className = 'chart-title';
  heading.textContent = spec.title;
  figure.appendChild(heading);
  const svg = el('svg', { viewBox: `0 0 ${WIDTH} ${HEIGHT}`, role: 'img', 'aria-label': spec.title, class: 'chart-svg' });
  figure.appendChild(svg);

  const series = spec.series.map((s) => {
    const xs = numbers(book, sheet, s.x);
    const ys = numbers(book, sheet, s.y);
    const points: [number, number][] = [];
    xs.forEach((x, i) => {
      const y = ys[i];
      if (x !== null && y !== null && y !== undefined) points.push([x, y]);
    });
    return { spec: s, points };
  });
  const all = series.flatMap((s) => s.points);
  const bandXs = spec.xBand ? numbers(book, sheet, spec.xBand.x).filter((v): v is number => v !== null) : [];
  const band = spec.xBand && bandXs.length > 0 ? { from: Math.min(...bandXs), to: Math.max(...bandXs), label: spec.xBand.label } : null;
  if (all.length === 0) {
    const t = el('text', { x: WIDTH / 2, y: HEIGHT / 2, 'text-anchor': 'middle', class: 'chart-empty' }, svg);
    t.textContent = 'No numeric values to plot (see the data cells).';
    return figure;
  }
  let [x0, x1] = [Math.min(...all.map((p) => p[0])), Math.max(...all.map((p) => p[0]))];
  let [y0, y1] = [Math.min(...all.map((p) => p[1])), Math.max(...all.map((p) => p[1]))];
  if (y0 > 0 && y0 < (y1 - y0) * 0.5) y0 = 0;
  if (x1 === x0) [x0, x1] = [x0 - 1, x1 + 1];
  if (y1 === y0) [y0, y1] = [y0 - 1, y1 + 1];
  const pad = (y1 - y0) * 0.06;
  y1 += pad;
  if (y0 !== 0) y0 -= pad;
  const px = (x: number) => MARGIN.left + ((x - x0) / (x1 - x0)) * (WIDTH - MARGIN.left - MARGIN.right);
  const py = (y: number) => HEIGHT - MARGIN.bottom - ((y - y0) / (y1 - y0)) * (HEIGHT - MARGIN.top - MARGIN.bottom);

  if (band && band.to > band.from) {
    const a = Math.max(x0, band.from);
    const b = Math.min(x1, band.to);
    if (b > a) {
      el('rect', { x: px(a), y: MARGIN.top, width: px(b) - px(a), height: HEIGHT - MARGIN.top - MARGIN.bottom, class: 'chart-band' }, svg);
      // At the foot of the band: the capacity curve peaks at the top of its middle.
      const t = el('text', { x: (px(a) + px(b)) / 2, y: HEIGHT - MARGIN.bottom - 6, 'text-anchor': 'middle', class: 'chart-band-label' }, svg);
      t.textContent = band.label;
    }
  }
  for (const t of ticks(y0, y1)) {
    el('line', { x1: MARGIN.left, x2: WIDTH - MARGIN.right, y1: py(t), y2: py(t), class: 'chart-grid' }, svg);
    const text = el('text', { x: MARGIN.left - 6, y: py(t) + 4, 'text-anchor': 'end', class: 'chart-tick' }, svg);
    text.textContent = label(t);
  }
  for (const t of ticks(x0, x1, 6)) {
    el('line', { x1: px(t), x2: px(t), y1: HEIGHT - MARGIN.bottom, y2: HEIGHT - MARGIN.bottom + 4, class: 'chart-axis' }, svg);
    const text = el('text', { x: px(t), y: HEIGHT - MARGIN.bottom + 16, 'text-anchor': 'middle', class: 'chart-tick' }, svg);
    text.textContent = label(t);
  }
  el('line', { x1: MARGIN.left, x2: WIDTH - MARGIN.right, y1: HEIGHT - MARGIN.bottom, y2: HEIGHT - MARGIN.bottom, class: 'chart-axis' }, svg);
  el('line', { x1: MARGIN.left, x2: MARGIN.left, y1: MARGIN.top, y2: HEIGHT - MARGIN.bottom, class: 'chart-axis' }, svg);
  const xt = el('text', { x: (MARGIN.left + WIDTH - MARGIN.right) / 2, y: HEIGHT - 8, 'text-anchor': 'middle', class: 'chart-axis-title' }, svg);
  xt.textContent = spec.xTitle;
  const yt = el(
    'text',
    {
      x: 14,
      y: (MARGIN.top + HEIGHT - MARGIN.bottom) / 2,
      'text-anchor': 'middle',
      transform: `rotate(-90 14 ${(MARGIN.top + HEIGHT - MARGIN.bottom) / 2})`,
      class: 'chart-axis-title',
    },
    svg,
  );
  yt.textContent = spec.yTitle;

  series.forEach((s, i) => {
    if (s.spec.markersOnly) {
      for (const [x, y] of s.points) {
        const d = 6;
        el('path', { d: `M ${px(x)} ${py(y) - d} L ${px(x) + d} ${py(y)} L ${px(x)} ${py(y) + d} L ${px(x) - d} ${py(y)} Z`, class: 'chart-marker' }, svg);
      }
    } else if (s.points.length > 0) {
      const sorted = [...s.points];
      const d = sorted.map(([x, y], k) => `${k === 0 ? 'M' : 'L'} ${px(x).toFixed(1)} ${py(y).toFixed(1)}`).join(' ');
      el('path', { d, class: `chart-line chart-line-${i}` }, svg);
    }
  });
  const legend = document.createElement('figcaption');
  legend.className = 'chart-legend';
  series.forEach((s, i) => {
    const item = document.createElement('span');
    item.className = s.spec.markersOnly ? 'legend-item legend-marker' : `legend-item legend-line-${i}`;
    item.textContent = s.spec.name;
    legend.appendChild(item);
  });
  if (band) {
    const item = document.createElement('span');
    item.className = 'legend-item legend-band';
    item.textContent = band.label;
    legend.appendChild(item);
  }
  figure.appendChild(legend);
  return figure;
}
