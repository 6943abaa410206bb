// The codes and published references the library and templates cite, each recognised in a
// clause's text by a pattern and listed in a package under its full title. A clause that
// names none of them is not a reference (e.g. "common practice", "geometry", "statics").

export interface Source {
  /** The key a citation is filed under: the code with its edition, or author and year. */
  key: string;
  /** The full title as a reference list gives it. */
  title: string;
  /** Codes first, in this order; then published references by author. */
  order: number;
  code: boolean;
  /** A code's name without its edition ('ACI 318'); editions of one family are told apart. */
  family?: string;
  /** The edition, when the text names one. */
  edition?: string;
}

interface SourcePattern {
  re: RegExp;
  make(m: RegExpExecArray): Source;
}

const code = (key: string, family: string, edition: string | undefined, title: string, order: number): Source =>
  ({ key, title, order, code: true, family, edition });
const book = (key: string, title: string): Source => ({ key, title, order: 100, code: false });

/**
 * Each pattern matches where a source is named. The editions follow the text (ACI 318-14
 * and 318-19, ASCE 7-16 and 7-22); titles of the codes are their published titles; the
 * papers' and books' details are from memory.
 */
export const SOURCE_PATTERNS: readonly SourcePattern[] = [
  {
    re: /\b(?:ACI\s+)?318-(\d\d)\b/g,
    make: (m) => code(`ACI 318-${m[1]}`, 'ACI 318', m[1], `American Concrete Institute, Building Code Requirements for Structural Concrete (ACI 318-${m[1]}) and Commentary`, 1),
  },
  {
    re: /\bASCE(?:\/SEI)?\s+7-(\d\d)\b/g,
    make: (m) => code(`ASCE 7-${m[1]}`, 'ASCE 7', m[1], `ASCE/SEI 7-${m[1]}, Minimum Design Loads and Associated Criteria for Buildings and Other Structures, American Society of Civil Engineers`, 2),
  },
  {
    re: /\bIBC(?:\s+(20\d\d))?\b/g,
    make: (m) => code(m[1] ? `IBC ${m[1]}` : 'IBC', 'IBC', m[1], `International Code Council, International Building Code${m[1] ? ` (${m[1]} edition)` : ' (the edition the jurisdiction has adopted)'}`, 3),
  },
  { re: /\bPrandtl\s*\(1921\)/g, make: () => book('Prandtl (1921)', 'Prandtl, L. (1921). Über die Eindringungsfestigkeit (Härte) plastischer Baustoffe und die Festigkeit von Schneiden. Zeitschrift für Angewandte Mathematik und Mechanik 1(1) [from memory]') },
  { re: /\bReissner\s*\(1924\)/g, make: () => book('Reissner (1924)', 'Reissner, H. (1924). Zum Erddruckproblem. Proceedings of the First International Congress of Applied Mechanics, Delft [from memory]') },
  { re: /\bTerzaghi\s*\(1943\)/g, make: () => book('Terzaghi (1943)', 'Terzaghi, K. (1943). Theoretical Soil Mechanics. Wiley, New York [from memory]') },
  { re: /\bMeyerhof\s*\(1953\)/g, make: () => book('Meyerhof (1953)', 'Meyerhof, G. G. (1953). The bearing capacity of foundations under eccentric and inclined loads. Proceedings of the 3rd International Conference on Soil Mechanics and Foundation Engineering, Zürich [from memory]') },
  { re: /\bMeyerhof\s*\(1963\)/g, make: () => book('Meyerhof (1963)', 'Meyerhof, G. G. (1963). Some recent research on the bearing capacity of foundations. Canadian Geotechnical Journal 1(1) [from memory]') },
  { re: /\bHansen\s*\(1970\)/g, make: () => book('Hansen (1970)', 'Brinch Hansen, J. (1970). A revised and extended formula for bearing capacity. Danish Geotechnical Institute Bulletin 28 [from memory]') },
  { re: /\bVesi[cć]\s*\(1973\)/g, make: () => book('Vesic (1973)', 'Vesić, A. S. (1973). Analysis of ultimate loads of shallow foundations. Journal of the Soil Mechanics and Foundations Division, ASCE, 99(SM1) [from memory]') },
  { re: /\bDas\b/g, make: () => book('Das', 'Das, B. M. Principles of Foundation Engineering. Cengage Learning (the edition the engineer holds; chapter 3, bearing capacity) [from memory]') },
  { re: /\bTimoshenko\b/g, make: () => book('Timoshenko & Woinowsky-Krieger (1959)', 'Timoshenko, S. P., and Woinowsky-Krieger, S. (1959). Theory of Plates and Shells, 2nd ed. McGraw-Hill [from memory]') },
];
