// The trade symbols a hand calc writes, in one table: a name (or the head of a name,
// before its first `_`) and the symbol it stands for. Anything not here is set by the
// plain rules in names.ts. The prime of f′c is part of the symbol, never made from a
// word in the name. Sources: the notation of ACI 318-19 Ch. 2 and ASCE 7-22 §4.7 (common
// practice in hand calcs).

/** A symbol: its main letter(s) as TeX and the subscripts it always carries. */
export interface TradeSymbol {
  main: string;
  subs: readonly string[];
}

const s = (main: string, ...subs: string[]): TradeSymbol => ({ main, subs });

/** Heads of names: `fc` is f′c, and `fc_col` is f′c,col (later parts join the subscript). */
export const HEADS: Readonly<Record<string, TradeSymbol>> = {
  fc: s("f'", 'c'),
  fci: s("f'", 'ci'),
  KLL: s('K', 'LL'),
  AT: s('A', 'T'),
  Es: s('E', 's'),
  Ec: s('E', 'c'),
  lam: s('\\lambda'),
  eps: s('\\varepsilon'),
};

/** Whole names that read as more than one symbol. */
export const WHOLE: Readonly<Record<string, string>> = {
  L_Lo: 'L/L_{\\mathrm{o}}',
  KLL_AT: 'K_{\\text{LL}}A_{\\mathrm{T}}',
  sqrt_fc: "\\sqrt{f'_{\\mathrm{c}}}",
};

/** Letters that trade notation writes in another form: ℓ for lengths and spans. */
export const LETTERS: Readonly<Record<string, string>> = { l: '\\ell' };

/** Greek letters by name, and the short forms a formula may use. */
export const GREEK = new Set([
  'alpha', 'beta', 'gamma', 'delta', 'epsilon', 'varepsilon', 'zeta', 'eta', 'theta', 'vartheta',
  'iota', 'kappa', 'lambda', 'mu', 'nu', 'xi', 'pi', 'rho', 'sigma', 'tau', 'upsilon', 'phi',
  'varphi', 'chi', 'psi', 'omega', 'Gamma', 'Delta', 'Theta', 'Lambda', 'Xi', 'Pi', 'Sigma',
  'Upsilon', 'Phi', 'Psi', 'Omega',
]);
