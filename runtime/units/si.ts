// Exact SI values of the trade units, for library functions that compute in the
// units a code clause states. Engine values are always SI base units (m, kg, s, N, Pa, rad).

export const m = 1;
export const mm = 0.001;
export const cm = 0.01;
export const inch = 0.0254; // exact, by definition of the international inch
export const ft = 0.3048; // exact
export const lbf = 4.4482216152605; // exact: 0.45359237 kg × 9.80665 m/s²
export const kip = 1000 * lbf;
export const N = 1;
export const kN = 1000;
export const MN = 1e6;
export const Pa = 1;
export const kPa = 1000;
export const MPa = 1e6;
export const psi = lbf / (inch * inch);
export const ksi = 1000 * psi;
export const psf = lbf / (ft * ft);
export const ksf = 1000 * psf;
export const pcf = lbf / (ft * ft * ft);
export const plf = lbf / ft;
export const klf = kip / ft;
export const kipFt = kip * ft;
export const kNm = kN * m;
export const deg = Math.PI / 180;
