// Cell names as a hand calc writes them: M_u → M with an upright u subscript,
// phi_Vc → φV_c, beta1 → β₁, f_c_prime → f′_c. Every result is one braced group,
// so it can follow any TeX command without gluing to it (`\cdot{b}` not `\cdotb`).

const GREEK = new Set([
  'alpha', 'beta', 'gamma', 'delta', 'epsilon', 'varepsilon', 'zeta', 'eta', 'theta', 'vartheta',
  'iota', 'kappa', 'lambda', 'mu', 'nu', 'xi', 'pi', 'rho', 'sigma', 'tau', 'upsilon', 'phi',
  'varphi', 'chi', 'psi', 'omega', 'Gamma', 'Delta', 'Theta', 'Lambda', 'Xi', 'Pi', 'Sigma',
  'Upsilon', 'Phi', 'Psi', 'Omega',
]);

/** Upright text safe inside \mathrm{}. */
function roman(text: string): string {
  return `\\mathrm{${text}}`;
}

/** One subscript part: Greek stays Greek, digits stay, words are upright. */
function subTex(part: string): string {
  if (GREEK.has(part)) return `\\${part}`;
  if (/^\d+$/.test(part)) return part;
  const m = /^([A-Za-z]+?)(\d+)$/.exec(part);
  if (m && GREEK.has(m[1])) return `\\${m[1]}${m[2]}`;
  return roman(part);
}

/** The head of a name (before the first `_`): its main symbol and any subscript it implies. */
function headTex(head: string, alone: boolean): { main: string; subs: string[] } {
  if (GREEK.has(head)) return { main: `\\${head}`, subs: [] };
  const digits = /^([A-Za-z]+?)(\d+)$/.exec(head);
  if (digits && (GREEK.has(digits[1]) || digits[1].length === 1)) {
    return { main: GREEK.has(digits[1]) ? `\\${digits[1]}` : digits[1], subs: [digits[2]] };
  }
  if (head.length === 1) return { main: head, subs: [] };
  // A Greek word run into a capital: phiVc → φ V_c.
  const greekRun = /^([a-z]+)([A-Z].*)$/.exec(head);
  if (greekRun && GREEK.has(greekRun[1])) {
    const inner = headTex(greekRun[2], alone);
    return { main: `\\${greekRun[1]} ${inner.main}`, subs: inner.subs };
  }
  if (/^[A-Z]+$/.test(head)) return { main: roman(head), subs: [] };
  // Short trade symbols read as a letter with a subscript: Vu, fc, Ast, bo (and Vu_slab,
  // but not chk_w, where a lower-case word is the head of a longer name).
  if ((alone || /^[A-Z]/.test(head)) && head.length <= 3 && /^[A-Za-z][a-z0-9]+$/.test(head)) return { main: head[0], subs: [head.slice(1)] };
  return { main: `\\mathit{${head}}`, subs: [] };
}

function symbolTex(parts: string[]): string {
  const prime = parts.includes('prime');
  const rest = parts.filter((p) => p !== 'prime');
  if (rest.length === 0) return 'x';
  const { main, subs } = headTex(rest[0], rest.length === 1);
  const allSubs = [...subs, ...rest.slice(1)];
  const sub = allSubs.length ? `_{${allSubs.map(subTex).join(',')}}` : '';
  return `${main}${prime ? "'" : ''}${sub}`;
}

/**
 * TeX for a cell name, as one braced group. A Greek head followed by a part that
 * starts with a capital reads as a product, as resistance factors are written:
 * phi_Vc → {\phi V_{\mathrm{c}}}, phi_Mn → {\phi M_{\mathrm{n}}}.
 */
export function nameTex(name: string): string {
  const parts = name.split('_').filter((p) => p !== '');
  if (parts.length >= 2 && GREEK.has(parts[0]) && /^[A-Z]/.test(parts[1])) {
    const tail = parts.slice(1);
    const first = tail[0];
    // Vc → V with subscript c, merged with any later parts.
    const split = first.length > 1 ? [first[0], first.slice(1), ...tail.slice(1)] : tail;
    return `{\\${parts[0]} ${symbolTex(split)}}`;
  }
  return `{${symbolTex(parts)}}`;
}

/** TeX-escaped plain text for \text{}. */
export function textTex(text: string): string {
  const escaped = text.replace(/[\\{}$&#^_%~]/g, (ch) => {
    switch (ch) {
      case '\\': return '\\textbackslash{}';
      case '^': return '\\textasciicircum{}';
      case '~': return '\\textasciitilde{}';
      default: return `\\${ch}`;
    }
  });
  return `\\text{${escaped}}`;
}

/** Longest text a hand calc sets as it is; longer text is cut and its length said. */
const SHOWN_TEXT = 200;

/** A formula the engine cannot read, set as text: cut short when long, so display stays small. */
export function clippedTex(text: string): string {
  if (text.length <= SHOWN_TEXT) return textTex(text);
  return `${textTex(`${text.slice(0, SHOWN_TEXT)}…`)}\ \text{(${text.length.toLocaleString('en-US')} characters)}`;
}
