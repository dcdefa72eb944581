/**
 * How fast a climate ages what it holds, relative to 20 °C and 50 % RH: the isoperm
 * approach (Sebera, "Isoperms: An Environmental Management Tool", Commission on
 * Preservation and Access, 1994). Screens call the rate "ageing speed" and its inverse
 * "life multiplier" (our own plain names).
 *
 * Equation (the form the isoperm approach publishes, as implemented and documented in the
 * ConSciR R package, `calcLM`: LM = (50 %/RH)^1.3 · exp[(Ea/R)(1/T − 1/293 K)]):
 *
 *   rate(T, RH) = (RH / 50 %)^n · exp[ −(Ea / R) · (1/T − 1/T₀) ]      T in kelvin
 *   life multiplier = 1 / rate
 *
 * - n = 1.3: the RH exponent of the isoperm approach (ConSciR `calcLM` documentation, which
 *   takes it from the isoperm literature; that Sebera's own paper uses 1.3 is from memory).
 * - Ea = 100 kJ/mol: activation energy of cellulose (paper) degradation, ConSciR `calcLM`
 *   default for "cellulosic (paper)". Sebera 1994 worked isoperms for several activation
 *   energies around this value (from memory).
 * - R = 8.314 462 618 J/(mol·K): the molar gas constant (CODATA 2018, exact in the 2019 SI).
 * - T₀ = 293.15 K (20 °C) and RH₀ = 50 %: the reference climate (ConSciR rounds T₀ to 293 K).
 */
export const ACTIVATION_ENERGY_J_PER_MOL = 100_000;
export const GAS_CONSTANT_J_PER_MOL_K = 8.314462618;
export const RH_EXPONENT = 1.3;
export const REFERENCE_TEMPERATURE_C = 20;
export const REFERENCE_RH = 50;
const KELVIN = 273.15;

/** Below this RH the power law is taken no further (a dry store is not eternal). */
export const LOWEST_RH = 5;

/** Relative rate of chemical decay at one climate; 1 at 20 °C / 50 % RH, higher is faster. */
export function relativeDecayRate(
  temperatureC: number,
  rh: number,
  activationEnergy = ACTIVATION_ENERGY_J_PER_MOL,
): number {
  const t = temperatureC + KELVIN;
  const t0 = REFERENCE_TEMPERATURE_C + KELVIN;
  const humidity = Math.max(rh, LOWEST_RH) / REFERENCE_RH;
  return (
    humidity ** RH_EXPONENT *
    Math.exp(-(activationEnergy / GAS_CONSTANT_J_PER_MOL_K) * (1 / t - 1 / t0))
  );
}

/** The expected life a rate implies, given the life at 20 °C / 50 % RH (any unit). */
export function expectedLife(rate: number, lifeAtReference: number): number {
  return lifeAtReference / rate;
}

/**
 * The equivalent constant climate of a varying one: damage adds up as ∫ rate dt, so the
 * rate that does the same damage over the period is the time-weighted arithmetic mean of
 * the rates, and its life multiplier the time-weighted harmonic mean of the multipliers.
 * `weights` are the durations (or reading counts at a fixed interval); equal when omitted.
 */
export function equivalentRate(
  rates: readonly number[],
  weights?: readonly number[],
): number | null {
  let sum = 0;
  let total = 0;
  for (let i = 0; i < rates.length; i += 1) {
    const weight = weights ? weights[i]! : 1;
    sum += rates[i]! * weight;
    total += weight;
  }
  return total > 0 ? sum / total : null;
}
