// Cell names as a hand calc writes them: trade symbols from one table (symbols.ts), the
// rest by plain rules. M_u → M with an upright u subscript, phi_Vc and phiVc → φV_c,
// lam_s → λ_s, beta1 → β₁, fc → f′c (the prime belongs to the symbol), l_n → ℓn; a plain
// word (bar, floors, chk) stays an upright word set as text, never a row of italic letters.
// Every result is one braced group, so it can follow any TeX command (`\cdot{b}` not `\cdotb`).

import { GREEK, HEADS, LETTERS, WHOLE } from './symbols';

/** A word as upright text: one letter as \mathrm, more as \text (one MathML element, not a letter each). */
function wordTex(text: string): string {
  return text.length === 1 ? `\\mathrm{${text}}` : textTex(text);
}

/** One subscript part: Greek stays Greek, digits stay, words are upright. */
function subTex(part: string): string {
  if (GREEK.has(part)) return `\\${part}`;
  if (/^\d+$/.test(part)) return part;
  const m = /^([A-Za-z]+?)(\d+)$/.exec(part);
  if (m && GREEK.has(m[1])) return `\\${m[1]}${m[2]}`;
  return wordTex(part);
}

/** Two-letter words that are not a letter with a subscript. */
const SHORT_WORDS = new Set(['ok', 'no', 'on', 'of', 'to', 'by', 'up', 'so', 'do', 'go']);

interface Head {
  main: string;
  subs: string[];
  /** A plain word, not a symbol. */
  word?: true;
}

/** The head of a name (before the first `_`): its main symbol and any subscript it implies. */
function headTex(head: string): Head {
  const known = HEADS[head];
  if (known) return { main: known.main, subs: [...known.subs] };
  if (GREEK.has(head)) return { main: `\\${head}`, subs: [] };
  const digits = /^([A-Za-z]+?)(\d+)$/.exec(head);
  if (digits && (GREEK.has(digits[1]) || digits[1].length === 1 || HEADS[digits[1]])) {
    const inner = headTex(digits[1]);
    return { main: inner.main, subs: [...inner.subs, digits[2]] };
  }
  if (head.length === 1) return { main: LETTERS[head] ?? head, subs: [] };
  // A Greek word run into a capital: phiVc → φ V_c.
  const greekRun = /^([a-z]+)([A-Z].*)$/.exec(head);
  if (greekRun && GREEK.has(greekRun[1])) {
    const inner = headTex(greekRun[2]);
    return { main: `\\${greekRun[1]} ${inner.main}`, subs: inner.subs };
  }
  if (/^[A-Z]+$/.test(head)) return { main: textTex(head), subs: [], word: true };
  // Short trade symbols read as a letter with a subscript: Vu, bo, vc, db, Ast (not bar, chk, ok).
  const short = (head.length === 2 && /^[A-Za-z][a-z0-9]$/.test(head) && !SHORT_WORDS.has(head))
    || (head.length === 3 && /^[A-Z][a-z0-9]{2}$/.test(head));
  if (short) return { main: LETTERS[head[0]] ?? head[0], subs: [head.slice(1)] };
  return { main: textTex(head), subs: [], word: true };
}

function symbolTex(parts: string[]): string {
  if (parts.length === 0) return 'x';
  const whole = WHOLE[parts.join('_')];
  if (whole) return whole;
  if (parts[0] === 'sqrt' && parts.length > 1) return `\\sqrt{${symbolTex(parts.slice(1))}}`;
  const head = headTex(parts[0]);
  const rest = parts.slice(1);
  // A phrase of words (tension_controlled, spans_ok) reads as words.
  if (head.word && rest.length && rest.every((p) => p.length > 1 && /^[a-z]+$/.test(p))) return textTex(parts.join(' '));
  const allSubs = [...head.subs, ...rest];
  const sub = allSubs.length ? `_{${allSubs.map(subTex).join(',')}}` : '';
  return `${head.main}${sub}`;
}

/**
 * TeX for a cell name, as one braced group. A Greek head followed by a part that
 * starts with a capital reads as a product, as resistance factors are written:
 * phi_Vc → {\\phi V_{\\mathrm{c}}}, phi_Mn → {\\phi M_{\\mathrm{n}}}.
 */
export function nameTex(name: string): string {
  const parts = name.split('_').filter((p) => p !== '');
  if (parts.length >= 2 && (GREEK.has(parts[0]) || HEADS[parts[0]]?.subs.length === 0) && /^[A-Z]/.test(parts[1])) {
    const greek = headTex(parts[0]).main;
    const tail = parts.slice(1);
    const first = tail[0];
    // Vc → V with subscript c, merged with any later parts.
    const split = first.length > 1 && !HEADS[first] ? [first[0], first.slice(1), ...tail.slice(1)] : tail;
    return `{${greek} ${symbolTex(split)}}`;
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
