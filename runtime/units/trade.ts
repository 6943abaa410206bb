// Trade units mathjs lacks, added once at start-up. `kip` is redefined because
// mathjs's own is not exactly 1000 lbf.
import type { MathJsInstance } from 'mathjs';

const TRADE_UNITS: [string, string, string[]][] = [
  ['kip', '1000 lbf', ['kips']],
  ['ksi', '1000 psi', []],
  ['psf', '1 lbf/ft^2', []],
  ['ksf', '1000 lbf/ft^2', []],
  ['pcf', '1 lbf/ft^3', []],
  ['plf', '1 lbf/ft', []],
  ['klf', '1000 lbf/ft', []],
  ['kipft', '1000 lbf ft', []],
];

export function addTradeUnits(math: MathJsInstance): void {
  for (const [name, definition, aliases] of TRADE_UNITS) {
    math.createUnit(name, { definition, aliases }, { override: true });
  }
}

export const TRADE_UNIT_NAMES = TRADE_UNITS.flatMap(([n, , a]) => [n, ...a]);
