/**
 * pKw = −log10 Kw, the ion product of water, on the liquid side of the saturation curve
 * (at 0–100 °C within 0.001 of its value at 0.1 MPa). Model and coefficients: data/water.json
 * (Bandura & Lvov, J. Phys. Chem. Ref. Data 35 (2006) 15, with the saturated-liquid density of
 * Wagner & Pruß, J. Phys. Chem. Ref. Data 22 (1993) 783).
 */
import { dataPart } from '../dataset/active';
import { kelvin } from '../constants';
import { InputError } from '../errors';


/** Lowest and highest temperature accepted, °C (the triple point to just below the critical point). */
export const WATER_PKW_RANGE_C = { min: 0, max: 350 } as const;

function saturatedDensity_g_cm3(T: number): number {
  const rho = dataPart('water').saturatedLiquidDensity;
  const tau = 1 - T / rho.Tc_K;
  let s = 1;
  for (let i = 0; i < rho.b.length; i++) s += rho.b[i] * Math.pow(tau, rho.exponents[i]);
  return (s * rho.rhoc_kg_m3) / 1000;
}

/**
 * pKw of liquid water at a temperature in °C (13.995 at 25 °C).
 *
 * Syntax: waterPKw(temperatureC)
 * Example: waterPKw(25) → 13.995
 * See also: halfCell
 *
 * @throws InputError outside 0…350 °C
 */
export function waterPKw(temperatureC: number): number {
  if (!(temperatureC >= WATER_PKW_RANGE_C.min && temperatureC <= WATER_PKW_RANGE_C.max)) {
    throw new InputError(`temperature ${temperatureC} °C is outside the data's range: the ion product of water is available from ${WATER_PKW_RANGE_C.min} to ${WATER_PKW_RANGE_C.max} °C`);
  }
  const kw = dataPart('water').ionProduct;
  const T = kelvin(temperatureC);
  const d = saturatedDensity_g_cm3(T);
  const [a0, a1, a2] = kw.alpha;
  const [b0, b1, b2] = kw.beta;
  const [g0, g1, g2, g3] = kw.gamma;
  const Q = d * Math.exp(a0 + a1 / T + (a2 / (T * T)) * Math.pow(d, 2 / 3));
  const pKwGas = g0 + g1 / T + g2 / (T * T) + g3 / (T * T * T);
  return -2 * kw.n * (Math.log10(1 + Q) - (Q / (Q + 1)) * d * (b0 + b1 / T + b2 * d)) + pKwGas + 2 * Math.log10(kw.molarMass_g_mol / 1000);
}
