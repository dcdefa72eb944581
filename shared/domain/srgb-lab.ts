/**
 * sRGB → CIELAB (D50), pure. The steps and constants come from the standards:
 *
 * - IEC 61966-2-1:1999 (sRGB): the piecewise transfer function (0.04045 / 12.92 / 2.4)
 *   and the RGB → XYZ matrix of its primaries under D65.
 * - Bradford chromatic adaptation (Lam 1985; the matrix as published in ICC.1:2010,
 *   Annex E) from D65 to D50, the graphic-arts measuring illuminant (ISO 13655).
 * - CIE 15:2004, §8.2.1: XYZ → L*a*b* with the D50 white (0.96422, 1, 0.82521) and the
 *   exact ε = 216/24389, κ = 24389/27 of the later CIE 15:2018 wording.
 */

export interface Lab {
  L: number;
  a: number;
  b: number;
}

type Vec3 = [number, number, number];
type Mat3 = [Vec3, Vec3, Vec3];

/** IEC 61966-2-1 decoding: an encoded component 0–1 to linear light 0–1. */
export function srgbToLinear(value: number): number {
  return value <= 0.04045 ? value / 12.92 : ((value + 0.055) / 1.055) ** 2.4;
}

/** IEC 61966-2-1 encoding: linear light 0–1 to an encoded component 0–1. */
export function linearToSrgb(value: number): number {
  return value <= 0.0031308 ? value * 12.92 : 1.055 * value ** (1 / 2.4) - 0.055;
}

/** Linear sRGB → XYZ (D65), IEC 61966-2-1 §5.2, Y of white = 1. */
const SRGB_TO_XYZ_D65: Mat3 = [
  [0.4124, 0.3576, 0.1805],
  [0.2126, 0.7152, 0.0722],
  [0.0193, 0.1192, 0.9505],
];

const D65: Vec3 = [0.95047, 1, 1.08883];
export const D50_WHITE: Vec3 = [0.96422, 1, 0.82521];

const BRADFORD: Mat3 = [
  [0.8951, 0.2664, -0.1614],
  [-0.7502, 1.7135, 0.0367],
  [0.0389, -0.0685, 1.0296],
];

function multiply(m: Mat3, v: Vec3): Vec3 {
  return [
    m[0][0] * v[0] + m[0][1] * v[1] + m[0][2] * v[2],
    m[1][0] * v[0] + m[1][1] * v[1] + m[1][2] * v[2],
    m[2][0] * v[0] + m[2][1] * v[1] + m[2][2] * v[2],
  ];
}

function invert(m: Mat3): Mat3 {
  const [[a, b, c], [d, e, f], [g, h, i]] = m;
  const A = e * i - f * h;
  const B = -(d * i - f * g);
  const C = d * h - e * g;
  const det = a * A + b * B + c * C;
  return [
    [A / det, -(b * i - c * h) / det, (b * f - c * e) / det],
    [B / det, (a * i - c * g) / det, -(a * f - c * d) / det],
    [C / det, -(a * h - b * g) / det, (a * e - b * d) / det],
  ];
}

/** Bradford adaptation of XYZ from one white to another (von Kries in the Bradford cone space). */
export function bradfordAdapt(xyz: Vec3, from: Vec3, to: Vec3): Vec3 {
  const coneFrom = multiply(BRADFORD, from);
  const coneTo = multiply(BRADFORD, to);
  const cone = multiply(BRADFORD, xyz);
  const scaled: Vec3 = [
    (cone[0] * coneTo[0]) / coneFrom[0],
    (cone[1] * coneTo[1]) / coneFrom[1],
    (cone[2] * coneTo[2]) / coneFrom[2],
  ];
  return multiply(invert(BRADFORD), scaled);
}

const EPSILON = 216 / 24389;
const KAPPA = 24389 / 27;

/** CIE 15 XYZ → L*a*b* relative to a white point. */
export function xyzToLab(xyz: Vec3, white: Vec3 = D50_WHITE): Lab {
  const f = (t: number) => (t > EPSILON ? Math.cbrt(t) : (KAPPA * t + 16) / 116);
  const [fx, fy, fz] = [f(xyz[0] / white[0]), f(xyz[1] / white[1]), f(xyz[2] / white[2])];
  return { L: 116 * fy - 16, a: 500 * (fx - fy), b: 200 * (fy - fz) };
}

/** Linear-light sRGB components (0–1) → CIELAB D50. */
export function linearSrgbToLabD50(linear: Vec3): Lab {
  const xyzD65 = multiply(SRGB_TO_XYZ_D65, linear);
  return xyzToLab(bradfordAdapt(xyzD65, D65, D50_WHITE));
}

/** Encoded sRGB components (0–1) → CIELAB D50. */
export function srgbToLabD50(rgb: Vec3): Lab {
  return linearSrgbToLabD50([srgbToLinear(rgb[0]), srgbToLinear(rgb[1]), srgbToLinear(rgb[2])]);
}
