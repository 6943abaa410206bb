// A small SVG string builder for the figure renderers: every text is escaped, every
// number written short. DOM-free, so the record export can draw figures in Node.

/** Escapes text for SVG/XML content and attribute values. */
export function esc(text: string): string {
  return String(text).replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/** A coordinate with at most two decimals. */
export function n(x: number): string {
  if (!Number.isFinite(x)) return '0';
  const r = Math.round(x * 100) / 100;
  return String(Object.is(r, -0) ? 0 : r);
}

type Attrs = Record<string, string | number | undefined>;

function attrs(a: Attrs): string {
  let out = '';
  for (const [k, v] of Object.entries(a)) {
    if (v === undefined) continue;
    out += ` ${k}="${typeof v === 'number' ? n(v) : esc(v)}"`;
  }
  return out;
}

export function el(tag: string, a: Attrs, children = ''): string {
  return children === '' ? `<${tag}${attrs(a)}/>` : `<${tag}${attrs(a)}>${children}</${tag}>`;
}

export function line(x1: number, y1: number, x2: number, y2: number, cls: string, extra: Attrs = {}): string {
  return el('line', { x1, y1, x2, y2, class: cls, ...extra });
}

export function rect(x: number, y: number, w: number, h: number, cls: string, extra: Attrs = {}): string {
  return el('rect', { x: Math.min(x, x + w), y: Math.min(y, y + h), width: Math.abs(w), height: Math.abs(h), class: cls, ...extra });
}

/** A polyline as a path: `M x y L x y ...`, closed with Z when asked. */
export function path(points: [number, number][], cls: string, closed = false, extra: Attrs = {}): string {
  const d = points.map(([x, y], i) => `${i ? 'L' : 'M'}${n(x)} ${n(y)}`).join(' ') + (closed ? ' Z' : '');
  return el('path', { d, class: cls, ...extra });
}

export function text(x: number, y: number, content: string, cls: string, extra: Attrs = {}): string {
  return el('text', { x, y, class: cls, ...extra }, esc(content));
}

/** Shared marker and hatch definitions, plus the figure's style sheet. */
function defs(): string {
  return `<defs><marker id="lt-arrow" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="7" markerHeight="7" orient="auto-start-reverse"><path d="M0 1 L9 5 L0 9 Z" fill="#222"/></marker>`
    + `<marker id="lt-tick" viewBox="0 0 10 10" refX="5" refY="5" markerWidth="8" markerHeight="8" orient="auto"><path d="M2 8 L8 2" stroke="#222" stroke-width="1.4"/></marker>`
    + `<pattern id="lt-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><line x1="0" y1="0" x2="0" y2="6" stroke="#555" stroke-width="1"/></pattern>`
    + `<pattern id="lt-soil" width="10" height="10" patternUnits="userSpaceOnUse"><path d="M0 10 L10 0 M-2 2 L2 -2 M8 12 L12 8" stroke="#8a7a5a" stroke-width="0.8"/></pattern></defs>`;
}

const STYLE = `<style>
.lt-fig{max-width:100%;height:auto}
.lt-fig text{font:11px system-ui,sans-serif;fill:#222}
.lt-fig .title{font-weight:600;font-size:12px}
.lt-fig .small{font-size:9.5px}
.lt-fig .dim{stroke:#333;stroke-width:0.8;fill:none}
.lt-fig .ext{stroke:#777;stroke-width:0.6;fill:none}
.lt-fig .outline{stroke:#222;stroke-width:1.4;fill:none}
.lt-fig .concrete{fill:#e9e6df;stroke:#444;stroke-width:1}
.lt-fig .column{fill:url(#lt-hatch);stroke:#222;stroke-width:1.6}
.lt-fig .crit{stroke:#b0261e;stroke-width:2;stroke-dasharray:7 4;fill:none}
.lt-fig .crit2{stroke:#1d4f91;stroke-width:2;stroke-dasharray:2 3;fill:none}
.lt-fig .oneway{stroke:#1d4f91;stroke-width:1.6;stroke-dasharray:10 3 2 3;fill:none}
.lt-fig .drop{fill:#d9d4c8;stroke:#444;stroke-width:1;stroke-dasharray:4 2}
.lt-fig .edge-free{stroke:#222;stroke-width:2.4}
.lt-fig .bar{stroke:#333;stroke-width:1}
.lt-fig .bar-dot{fill:#222}
.lt-fig .load{stroke:#333;stroke-width:1;fill:none}
.lt-fig .soil{fill:url(#lt-soil);stroke:none}
.lt-fig .contour{stroke:#222;stroke-width:0.7;fill:none}
.lt-fig .grid{stroke:#ddd;stroke-width:0.6}
.lt-fig .axis{stroke:#333;stroke-width:1}
.lt-fig .series{fill:none;stroke-width:1.8}
.lt-fig .one{stroke:#b0261e;stroke-width:1;stroke-dasharray:5 3}
.lt-fig .now{stroke:#222;stroke-width:1;stroke-dasharray:3 3}
</style>`;

/**
 * The outer <svg>: width × height in px, with `data-scale` (px per metre of the model)
 * when the drawing is to scale, so tests and people can measure it.
 */
export function svgDoc(width: number, height: number, title: string, body: string, data: Attrs = {}): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" class="lt-fig" role="img"${attrs({ viewBox: `0 0 ${n(width)} ${n(height)}`, width, height, ...data })}>`
    + `<title>${esc(title)}</title>${defs()}${STYLE}${body}</svg>`;
}

/**
 * A dimension line between two points, offset sideways by `off` px, with extension
 * lines and the text at its middle (rotated along vertical dimensions).
 */
export function dimension(x1: number, y1: number, x2: number, y2: number, off: number, label: string): string {
  const dx = x2 - x1, dy = y2 - y1;
  const len = Math.hypot(dx, dy) || 1;
  const nx = -dy / len, ny = dx / len;
  const ax = x1 + nx * off, ay = y1 + ny * off, bx = x2 + nx * off, by = y2 + ny * off;
  const s = Math.sign(off) || 1;
  const ext = line(x1 + nx * 2 * s, y1 + ny * 2 * s, ax + nx * 4 * s, ay + ny * 4 * s, 'ext') + line(x2 + nx * 2 * s, y2 + ny * 2 * s, bx + nx * 4 * s, by + ny * 4 * s, 'ext');
  const dim = el('line', { x1: ax, y1: ay, x2: bx, y2: by, class: 'dim', 'marker-start': 'url(#lt-tick)', 'marker-end': 'url(#lt-tick)' });
  const mx = (ax + bx) / 2 + nx * 5 * s, my = (ay + by) / 2 + ny * 5 * s;
  const vertical = Math.abs(dy) > Math.abs(dx);
  const t = vertical
    ? text(mx + (nx > 0 ? 4 : 0), my, label, 'dimtext', { 'text-anchor': 'middle', transform: `rotate(-90 ${n(mx + (nx > 0 ? 4 : 0))} ${n(my)})`, 'dominant-baseline': nx > 0 ? 'hanging' : 'auto' })
    : text(mx, my + (s > 0 ? 8 : 0), label, 'dimtext', { 'text-anchor': 'middle' });
  return ext + dim + t;
}

/** A leader: an arrow from the text to a point. */
export function leader(tx: number, ty: number, px: number, py: number, label: string, anchor: 'start' | 'end' | 'middle' = 'start'): string {
  return el('line', { x1: tx, y1: ty, x2: px, y2: py, class: 'dim', 'marker-end': 'url(#lt-arrow)' })
    + text(tx + (anchor === 'start' ? 3 : anchor === 'end' ? -3 : 0), ty - 3, label, 'small', { 'text-anchor': anchor });
}

/** Maps model coordinates (m) to the drawing: one scale for both axes, so the drawing is to scale. */
export interface Frame {
  scale: number;
  x(m: number): number;
  y(m: number): number;
}

export function frame(minX: number, minY: number, maxX: number, maxY: number, box: { x: number; y: number; w: number; h: number }): Frame {
  const scale = Math.min(box.w / Math.max(maxX - minX, 1e-9), box.h / Math.max(maxY - minY, 1e-9));
  const ox = box.x + (box.w - (maxX - minX) * scale) / 2;
  const oy = box.y + (box.h - (maxY - minY) * scale) / 2;
  return { scale, x: (m) => ox + (m - minX) * scale, y: (m) => oy + (m - minY) * scale };
}
