// Labelling figure quantities in the sheet's units: the unit of the cell an argument
// came from when there is one, else the sheet system's usual unit for the quantity.

import { formatNumber } from '../formula/display';
import { unitInfo } from '../units/dimension';
import type { FigureBase, UnitSystem } from './spec';

export type Quantity = 'length' | 'span' | 'force' | 'pressure' | 'soil' | 'moment' | 'bending' | 'deflection';

/** Usual unit per quantity and system: [unit to convert with, text to show]. */
const DEFAULTS: Record<UnitSystem, Record<Quantity, [string, string]>> = {
  US: {
    length: ['in', 'in'], span: ['ft', 'ft'], force: ['kip', 'kip'], pressure: ['psf', 'psf'],
    soil: ['ksf', 'ksf'], moment: ['kip', 'kip·ft/ft'], bending: ['kip*ft', 'kip·ft'], deflection: ['in', 'in'],
  },
  SI: {
    length: ['mm', 'mm'], span: ['m', 'm'], force: ['kN', 'kN'], pressure: ['kPa', 'kPa'],
    soil: ['kPa', 'kPa'], moment: ['kN', 'kN·m/m'], bending: ['kN*m', 'kN·m'], deflection: ['mm', 'mm'],
  },
};

function factorOf(unit: string): number | undefined {
  try {
    return unitInfo(unit).factor;
  } catch {
    return undefined;
  }
}

/**
 * A quantity in SI shown for people: in the unit recorded for parameter `param`
 * when there is one, else in the system's usual unit for `q`.
 */
export function show(spec: FigureBase, param: string, q: Quantity, si: number, sig = 4): string {
  const own = spec.units[param];
  const f = own ? factorOf(own) : undefined;
  if (own && f) return `${formatNumber(si / f, sig)} ${own}`;
  const [u, label] = DEFAULTS[spec.system][q];
  return `${formatNumber(si / factorOf(u)!, sig)} ${label}`;
}

/** The unit text a quantity is shown in (for legends and axes). */
export function unitText(spec: FigureBase, param: string, q: Quantity): { factor: number; label: string } {
  const own = spec.units[param];
  const f = own ? factorOf(own) : undefined;
  if (own && f) return { factor: f, label: own };
  const [u, label] = DEFAULTS[spec.system][q];
  return { factor: factorOf(u)!, label };
}
