import data from '../../data/electrode-e0.json';
import { kelvin } from '../constants';

/** The salt of a saturated filling and the temperature function of its solubility product. */
interface SaltRow {
  readonly salt: string;
  readonly anion: string;
  readonly nuCation: number;
  readonly nuAnion: number;
  /** log10 Ksp = A1 + A2·T + A3/T + A4·log10 T + A5/T², T in K. */
  readonly analytic: readonly number[];
}

/** A saturated filling: the salt, its anion and the anion's activity at saturation. */
export interface SaturatedFilling {
  readonly salt: string;
  /** The anion as written in half-reactions ("Cl-", "SO4^2-"). */
  readonly anion: string;
  /** ln of the anion's activity in the saturated solution at a temperature in °C. */
  lnAnionActivity(temperatureC: number): number;
}

const SALTS = new Map<string, SaltRow>((data.saturatedFillings as readonly SaltRow[]).map((r) => [r.salt.toLowerCase(), r]));

/** "…/KCl(sat)", "…/K2SO4(saturated)", "…/NaCl(sat)" at the end of a name. */
const SATURATED = /\/([A-Za-z0-9]+)\(\s*sat(urated)?\s*\)\s*$/i;

function lnKsp(row: SaltRow, temperatureC: number): number {
  const T = kelvin(temperatureC);
  const [a1, a2, a3, a4, a5] = row.analytic;
  return (a1 + a2 * T + a3 / T + a4 * Math.log10(T) + a5 / (T * T)) * Math.LN10;
}

/**
 * The saturated salt filling of a reference electrode, read from its key or alias ("Hg/Hg2Cl2/KCl(sat)",
 * "Hg/Hg2SO4/K2SO4(sat)", "Ag/AgCl/KCl(sat)", "Hg/Hg2Cl2/NaCl(sat)"), with the activity of its anion at
 * saturation: Ksp(T) = a₊^ν₊·a₋^ν₋ from the salt's published log K(T) (data/electrode-e0.json,
 * Thermoddem), with each ion's activity m·γ± (the mean-activity convention for a single ion), so
 * a₋ = ν₋·(Ksp/(ν₊^ν₊·ν₋^ν₋))^(1/ν): for KCl a(Cl-) = √Ksp, for K2SO4 a(SO4^2-) = (Ksp/4)^(1/3).
 *
 * Syntax: saturatedFilling(names)
 * Example: saturatedFilling(["SCE", "Hg/Hg2Cl2/KCl(sat)"]).lnAnionActivity(25) → 1.0036 (a(Cl-) = 2.728)
 * See also: refPotential, secondKindReaction
 *
 * @param names the electrode's key and aliases
 * @returns the filling, or null when no name ends in a saturated salt the data list
 */
export function saturatedFilling(names: readonly string[]): SaturatedFilling | null {
  for (const name of names) {
    const m = SATURATED.exec(name.trim());
    if (m === null) continue;
    const row = SALTS.get(m[1].toLowerCase());
    if (row === undefined) continue;
    const nu = row.nuCation + row.nuAnion;
    const lnNorm = row.nuCation * Math.log(row.nuCation) + row.nuAnion * Math.log(row.nuAnion);
    return {
      salt: row.salt,
      anion: row.anion,
      lnAnionActivity: (t: number) => Math.log(row.nuAnion) + (lnKsp(row, t) - lnNorm) / nu,
    };
  }
  return null;
}
