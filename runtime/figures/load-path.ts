// Load path: an elevation of the column from the roof down to the footing, storey
// heights to scale, with the axial load accumulated at the foot of each storey drawn as
// a stepped diagram (width ∝ load) and written beside it, factored and service.

import type { LoadPathSpec } from './spec';
import { el, line, path, rect, svgDoc, text } from './svg';
import { show } from './units';

const W = 640;

export function renderLoadPath(spec: LoadPathSpec): string {
  const storeys = spec.levels.length;
  const px = Math.max(14, Math.min(64, 380 / storeys)); // px per storey; heights to scale among themselves
  const top = 56, bottom = top + storeys * px;
  const height = bottom + 96;
  const colX = 190, colW = 14, slab0 = 120, slab1 = 262;
  const diag0 = 300, diagW = 150;
  const maxPu = Math.max(...spec.levels.map((l) => l.Pu), 1e-9);
  const every = Math.ceil(15 / px); // label every level when there is room, else every few

  let body = text(12, 20, `Load path: column from roof to footing, ${storeys} storey${storeys === 1 ? '' : 's'} of ${show(spec, 'h_storey', 'span', spec.hStorey)}`, 'title');
  body += text(diag0, top - 12, 'axial load at the foot of each storey', 'small');
  body += rect(colX - colW / 2, top, colW, storeys * px, 'column', { 'data-role': 'column' });

  const steps: [number, number][] = [[diag0, top]];
  spec.levels.forEach((lv, k) => {
    const y = top + k * px;
    body += rect(slab0, y - 3, slab1 - slab0, 6, 'concrete', { 'data-role': 'slab' });
    // Load from the level entering the column.
    body += el('line', { x1: colX + 30, y1: y - 16, x2: colX + 30, y2: y - 4, class: 'load', 'marker-end': 'url(#lt-arrow)' });
    if (k % every === 0 || k === storeys - 1) body += text(slab0 - 8, y + 4, lv.name, 'small', { 'text-anchor': 'end' });
    const w = (lv.Pu / maxPu) * diagW;
    steps.push([diag0 + w, y], [diag0 + w, y + px]);
    if (k % every === 0 || k === storeys - 1) {
      body += text(diag0 + w + 6, y + px - 3, `Pu = ${show(spec, 'Pu', 'force', lv.Pu)} · Ps = ${show(spec, 'Ps', 'force', lv.Ps)}`, 'small', { 'data-role': 'level-load', 'data-level': k });
    }
  });
  steps.push([diag0, bottom]);
  body += path(steps, 'outline', true, { fill: '#e9e6df', 'data-role': 'load-diagram' });
  body += line(diag0, top, diag0, bottom, 'axis');

  // Footing and soil.
  body += rect(colX - 48, bottom, 96, 22, 'concrete', { 'data-role': 'footing' });
  body += rect(colX - 90, bottom + 22, 180, 26, 'soil');
  body += line(colX - 90, bottom + 22, colX + 90, bottom + 22, 'outline');
  body += text(colX + 56, bottom + 16, 'footing', 'small');
  const last = spec.levels[storeys - 1];
  body += text(12, height - 18, `On the footing: Pu = ${show(spec, 'Pu', 'force', last.Pu)} (factored, ASCE ${spec.asce} §2.3.1), Ps = ${show(spec, 'Ps', 'force', last.Ps)} (service, §2.4.1).`, 'small');

  return svgDoc(W, height, 'Load path from roof to footing', body, { 'data-figure': 'load-path' });
}
