// A tolerant well-formedness check for the SVG the renderers write: tags nest and close,
// attribute values are quoted, and no raw `<` or stray `&` appears in text or values.
// Returns the problems found (empty when well-formed) and the elements seen.

export interface XmlElement {
  name: string;
  attrs: Record<string, string>;
  /** Text content directly inside, entities decoded. */
  text: string;
}

const ENTITY = /&(?:amp|lt|gt|quot|apos|#[0-9]+|#x[0-9a-fA-F]+);/g;

function decode(s: string): string {
  return s.replace(ENTITY, (e) => ({ '&amp;': '&', '&lt;': '<', '&gt;': '>', '&quot;': '"', '&apos;': "'" })[e]
    ?? String.fromCodePoint(e[2] === 'x' ? parseInt(e.slice(3, -1), 16) : parseInt(e.slice(2, -1), 10)));
}

export function checkXml(src: string): { problems: string[]; elements: XmlElement[] } {
  const problems: string[] = [];
  const elements: XmlElement[] = [];
  const stack: XmlElement[] = [];
  let i = 0;
  const textBit = (t: string) => {
    if (t.replace(ENTITY, '').includes('&')) problems.push(`stray & in text near ${JSON.stringify(t.slice(0, 30))}`);
    if (t.includes('>') && !stack.some((e) => e.name === 'style')) problems.push(`raw > in text near ${JSON.stringify(t.slice(0, 30))}`);
    if (stack.length) stack[stack.length - 1].text += decode(t);
    else if (t.trim()) problems.push('text outside the root element');
  };
  while (i < src.length) {
    const lt = src.indexOf('<', i);
    if (lt < 0) {
      textBit(src.slice(i));
      break;
    }
    textBit(src.slice(i, lt));
    const gt = src.indexOf('>', lt);
    if (gt < 0) {
      problems.push('unclosed tag at the end');
      break;
    }
    const tag = src.slice(lt + 1, gt);
    i = gt + 1;
    if (tag.startsWith('!--')) continue;
    if (tag.startsWith('/')) {
      const name = tag.slice(1).trim();
      const top = stack.pop();
      if (!top || top.name !== name) problems.push(`</${name}> closes <${top?.name ?? 'nothing'}>`);
      continue;
    }
    const selfClosing = tag.endsWith('/');
    const body = selfClosing ? tag.slice(0, -1) : tag;
    const m = /^([A-Za-z][\w:.-]*)/.exec(body);
    if (!m) {
      problems.push(`bad tag <${tag.slice(0, 20)}`);
      continue;
    }
    const attrs: Record<string, string> = {};
    let rest = body.slice(m[1].length);
    const attrRe = /^\s+([A-Za-z_:][\w:.-]*)="([^"<]*)"/;
    for (;;) {
      const a = attrRe.exec(rest);
      if (!a) break;
      if (a[1] in attrs) problems.push(`duplicate attribute ${a[1]} on <${m[1]}>`);
      if (a[2].replace(ENTITY, '').includes('&')) problems.push(`stray & in ${a[1]}`);
      attrs[a[1]] = decode(a[2]);
      rest = rest.slice(a[0].length);
    }
    if (rest.trim() !== '') problems.push(`unreadable attributes on <${m[1]}>: ${JSON.stringify(rest.slice(0, 40))}`);
    const el: XmlElement = { name: m[1], attrs, text: '' };
    elements.push(el);
    if (!selfClosing) stack.push(el);
    else if (stack.length === 0 && elements.length > 1) problems.push('more than one root element');
  }
  if (stack.length) problems.push(`unclosed <${stack.map((e) => e.name).join('>, <')}>`);
  return { problems, elements };
}

/** Length of an `M x y L x y ... [Z]` path, in drawing units. */
export function pathLength(d: string): number {
  const tokens = d.match(/[MLZ]|-?[0-9.]+(?:e-?[0-9]+)?/g) ?? [];
  let len = 0;
  let start: [number, number] | undefined;
  let at: [number, number] | undefined;
  for (let k = 0; k < tokens.length; k++) {
    const t = tokens[k];
    if (t === 'Z') {
      if (at && start) len += Math.hypot(start[0] - at[0], start[1] - at[1]);
      at = start;
      continue;
    }
    if (t === 'M' || t === 'L') {
      const p: [number, number] = [Number(tokens[k + 1]), Number(tokens[k + 2])];
      k += 2;
      if (t === 'L' && at) len += Math.hypot(p[0] - at[0], p[1] - at[1]);
      if (t === 'M') start = p;
      at = p;
    }
  }
  return len;
}
