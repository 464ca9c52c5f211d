/**
 * Debye–Hückel A and B of water from its dielectric constant and density (data/debye-huckel.json).
 */
import { dataPart } from '../dataset/active';
import type { DataParts } from '../dataset/parts';
import { BUILTIN_PARTS } from '../dataset/parts';
import { AVOGADRO_PER_MOL, BOLTZMANN_J_PER_K, ELEMENTARY_CHARGE_C, LN10, kelvin } from '../constants';
import { InputError } from '../errors';

type Data = DataParts['debyehuckel'];

/** Temperatures at which A and B are available with the built-in data, °C (where the dielectric constant was measured). */
export const DEBYE_HUCKEL_RANGE_C: { readonly min: number; readonly max: number } = {
  min: BUILTIN_PARTS.debyehuckel.temperatureRange_C.min,
  max: BUILTIN_PARTS.debyehuckel.temperatureRange_C.max,
};

/** m per Å. */
const M_PER_ANGSTROM = 1e-10;

/** Relative permittivity of water at t °C (Malmberg & Maryott 1956). */
function dielectricConstant(data: Data, t: number): number {
  const c = data.dielectricConstant.coefficients;
  return c[0] + t * (c[1] + t * (c[2] + t * c[3]));
}

/** Density of water at t °C and 101.325 kPa, kg/m³ (Kell 1975). */
function waterDensity(data: Data, t: number): number {
  const n = data.density.numerator;
  let num = 0;
  for (let i = n.length - 1; i >= 0; i--) num = num * t + n[i];
  return num / (1 + data.density.d1 * t);
}

export interface DebyeHuckelParameters {
  /** A in (kg/mol)^½, for log10 γ = −A·z²·√I with I in mol/kg. */
  readonly A: number;
  /** B in Å⁻¹·(kg/mol)^½, for the ion-size term 1 + B·a·√I with a in Å. */
  readonly B: number;
  /** Relative permittivity of water used. */
  readonly dielectricConstant: number;
  /** Density of water used, kg/m³. */
  readonly density_kg_m3: number;
}

/**
 * Debye–Hückel parameters of water on the molality scale at a temperature, computed from the
 * dielectric constant (Malmberg & Maryott 1956) and density (Kell 1975) of water:
 * l_B = e²/(4π·ε0·εr·k·T), B = √(8π·N_A·ρw·l_B), A = √(2π·N_A·ρw)·l_B^(3/2)/ln 10.
 * Throws InputError outside 0…100 °C.
 *
 * Syntax: debyeHuckelParameters(temperatureC)
 * Example: debyeHuckelParameters(25) → { A: 0.5108, B: 0.3287, … }
 * See also: activityCoef, meanActivityCoef
 */
export function debyeHuckelParameters(temperatureC: number): DebyeHuckelParameters {
  // A range of ACTIVITYCOEF calls is usually at one temperature: keep the last answer.
  const data = dataPart('debyehuckel');
  if (temperatureC === lastTemperatureC && lastParameters !== null && lastData === data) return lastParameters;
  const p = computeParameters(data, temperatureC);
  lastTemperatureC = temperatureC;
  lastParameters = p;
  lastData = data;
  return p;
}

let lastTemperatureC = Number.NaN;
let lastParameters: DebyeHuckelParameters | null = null;
let lastData: Data | null = null;

function computeParameters(data: Data, temperatureC: number): DebyeHuckelParameters {
  const range = data.temperatureRange_C;
  if (!(temperatureC >= range.min && temperatureC <= range.max)) {
    throw new InputError(`temperature ${temperatureC} °C is outside the data's range: Debye–Hückel parameters are available from ${range.min} to ${range.max} °C`);
  }
  const epsR = dielectricConstant(data, temperatureC);
  const rho = waterDensity(data, temperatureC);
  const eps0 = data.vacuumPermittivity_F_m.value;
  const bjerrum = (ELEMENTARY_CHARGE_C * ELEMENTARY_CHARGE_C) / (4 * Math.PI * eps0 * epsR * BOLTZMANN_J_PER_K * kelvin(temperatureC));
  const B = Math.sqrt(8 * Math.PI * AVOGADRO_PER_MOL * rho * bjerrum) * M_PER_ANGSTROM;
  const A = (Math.sqrt(2 * Math.PI * AVOGADRO_PER_MOL * rho) * Math.pow(bjerrum, 1.5)) / LN10;
  return Object.freeze({ A, B, dielectricConstant: epsR, density_kg_m3: rho });
}
