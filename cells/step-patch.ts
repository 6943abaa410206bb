// Writing a re-typeset cell into the page, keeping the hand-calc steps whose HTML did
// not change (on a value edit the symbolic step, symbol = formula, stays the same, and
// KaTeX HTML is costly to parse again: reusing its nodes halves the HTML parsed), and
// keeping a focused value field where it is, with what is typed in it.

const STEP_OPEN = '<span class="hc-step"';
/** The HTML each step on the page was made from. */
const made = new WeakMap<Element, string>();

/** Where each hand-calc step (a whole `<span class="hc-step">` element) lies in `html`. */
export function stepRanges(html: string): { start: number; end: number }[] {
  const out: { start: number; end: number }[] = [];
  let from = 0;
  for (;;) {
    const start = html.indexOf(STEP_OPEN, from);
    if (start < 0) return out;
    // Document text reaches KaTeX and labels escaped, so every "<span" here is a tag.
    let depth = 0;
    let i = start;
    for (;;) {
      const open = html.indexOf('<span', i);
      const close = html.indexOf('</span>', i);
      if (close < 0) return out; // not well formed: leave the rest alone
      if (open >= 0 && open < close) {
        depth++;
        i = open + 5;
      } else {
        depth--;
        i = close + 7;
        if (depth === 0) break;
      }
    }
    out.push({ start, end: i });
    from = i;
  }
}

/** Sets `target`'s content to `html`, moving in the old nodes of steps whose HTML is unchanged. */
export function writeCellHtml(target: Element, html: string): void {
  const ranges = stepRanges(html);
  const old = ranges.length ? target.querySelectorAll('.hc-step') : [];
  let text = '';
  let at = 0;
  const kept: Element[] = [];
  ranges.forEach((r, i) => {
    const step = html.slice(r.start, r.end);
    text += html.slice(at, r.start);
    if (old[i] && made.get(old[i]) === step) {
      text += `<lt-keep data-i="${kept.length}"></lt-keep>`;
      kept.push(old[i]);
    } else text += step;
    at = r.end;
  });
  target.innerHTML = kept.length ? text + html.slice(at) : html;
  for (const slot of target.querySelectorAll<HTMLElement>('lt-keep')) slot.replaceWith(kept[Number(slot.dataset.i)]);
  const now = target.querySelectorAll('.hc-step');
  ranges.forEach((r, i) => now[i] && made.set(now[i], html.slice(r.start, r.end)));
}

/**
 * Writes a cell's new HTML into `content`. A focused field inside keeps its place; when
 * the new HTML has another shape around it, `replaceAll` writes everything anew.
 */
export function writeCellContent(content: Element, html: string, replaceAll: () => void): void {
  const active = document.activeElement;
  if (!(active instanceof HTMLElement) || !content.contains(active)) {
    writeCellHtml(content, html);
    return;
  }
  const fresh = document.createElement('template');
  fresh.innerHTML = html;
  if (!patchAround(content, fresh.content, active)) replaceAll();
}

/**
 * Makes `target` hold `source`'s nodes, except that the element `keep` (inside target)
 * stays where it is; the node standing in its place in `source` is dropped. Returns
 * false when the two trees differ in shape along the way to `keep`.
 */
function patchAround(target: Element, source: ParentNode, keep: Element): boolean {
  let old: Element = keep;
  const path: Element[] = [];
  while (old !== target) {
    path.unshift(old);
    old = old.parentElement!;
  }
  let oldParent: Element = target;
  let newParent: ParentNode = source;
  for (const oldChild of path) {
    const index = Array.prototype.indexOf.call(oldParent.children, oldChild);
    const newChild = newParent.children[index];
    if (!newChild || newChild.tagName !== oldChild.tagName || newChild.className !== oldChild.className) return false;
    // Replace the siblings before and after the kept path with the new ones.
    while (oldChild.previousSibling) oldChild.previousSibling.remove();
    while (oldChild.nextSibling) oldChild.nextSibling.remove();
    const before: ChildNode[] = [];
    for (let n = newParent.firstChild; n && n !== newChild; n = n.nextSibling) before.push(n);
    oldChild.before(...before);
    while (newChild.nextSibling) oldParent.append(newChild.nextSibling);
    if (oldChild === keep) {
      for (const attr of Array.from(newChild.attributes)) {
        if (attr.name !== 'value' && oldChild.getAttribute(attr.name) !== attr.value) oldChild.setAttribute(attr.name, attr.value);
      }
      return true;
    }
    oldParent = oldChild;
    newParent = newChild;
  }
  return true;
}
