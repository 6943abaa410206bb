// A value with its unit as plain text reads better with ² and · than with ^2 and *.

/** `ft^2` → `ft²`, `kip*ft` / `kip * ft` → `kip·ft` (a power like ^2.5 stays as it is). */
export function unitText(text: string): string {
  return text.replace(/\^2(?![\d.])/g, '²').replace(/\^3(?![\d.])/g, '³').replace(/\s*\*\s*/g, '·');
}
