/**
 * Dew point by the Magnus formula with the constants of Alduchov & Eskridge (1996,
 * "Improved Magnus form approximation of saturation vapor pressure", J. Appl. Meteor. 35,
 * 601–609): es(T) = 6.1094 hPa · exp(b·T / (c + T)), b = 17.625, c = 243.04 °C, over liquid
 * water from −40 to 50 °C. The dew point solves es(Td) = RH/100 · es(T):
 *
 *   γ = ln(RH/100) + b·T / (c + T)        Td = c·γ / (b − γ)
 */
export const MAGNUS_B = 17.625;
export const MAGNUS_C_CELSIUS = 243.04;
export const MAGNUS_A_HPA = 6.1094;

/** Saturation vapour pressure over water in hPa (Magnus, Alduchov & Eskridge 1996). */
export function saturationVapourPressure(temperatureC: number): number {
  return MAGNUS_A_HPA * Math.exp((MAGNUS_B * temperatureC) / (MAGNUS_C_CELSIUS + temperatureC));
}

/** Dew point in °C of air at a temperature (°C) and relative humidity (%, above 0). */
export function dewPoint(
  temperatureC: number,
  rh: number,
  constants: { b: number; c: number } = { b: MAGNUS_B, c: MAGNUS_C_CELSIUS },
): number {
  const gamma = Math.log(rh / 100) + (constants.b * temperatureC) / (constants.c + temperatureC);
  return (constants.c * gamma) / (constants.b - gamma);
}
