// A value with its unit as plain text reads better with ² and · than with ^2 and *.

/** Live: `ft^2` → `ft²`, `kip*ft` → `kip·ft`. */
export function prettyUnits(text: string): string {
  return text.replace(/\^2(?![0-9])/g, '²').replace(/\^3(?![0-9])/g, '³').replace(/\*/g, '·');
}

/** Record: a display text as the result column shows it: ft^2 → ft², kip*ft → kip·ft. */
export function resultText(text: string): string {
  return text.replace(/\^2(?![\d.])/g, '²').replace(/\^3(?![\d.])/g, '³').replace(/\s*\*\s*/g, '·');
}
