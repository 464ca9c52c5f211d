import type { HalfReaction } from '../chem/halfReaction';
import { secondKindReaction } from './secondKindReaction';

/** A filling of fixed concentration written in the key: "(3M)", "(0.1M)", "(1 mol/L)", "(1 mol/kg)". */
const FIXED_FILLING = /\(\s*\d+(\.\d+)?\s*(M|mol\/L|mol\/kg)\s*\)\s*$/i;

/**
 * The electrode reaction of a reference electrode of the second kind with a filling of fixed
 * concentration, read from its key or alias: "Ag/AgCl/KCl(3M)" → AgCl + e- → Ag + Cl-,
 * "Hg/Hg2Cl2/KCl(0.1M)", "Hg/HgO/NaOH(1M)", "Hg/Hg2SO4/H2SO4(1M)". Saturated fillings ("(sat)"),
 * seawater and field electrodes have none: their filling's composition changes with temperature
 * (saturated fillings: see saturatedFilling).
 *
 * Syntax: electrodeReaction(names)
 * Example: electrodeReaction(["Ag/AgCl/KCl(3M)"]).n → 1
 * See also: refPotential, secondKindReaction, saturatedFilling
 *
 * @param names the electrode's key and aliases
 * @returns the half-reaction, or null when none applies
 */
export function electrodeReaction(names: readonly string[]): HalfReaction | null {
  for (const name of names) {
    const text = name.trim();
    if (!FIXED_FILLING.test(text)) continue;
    const hr = secondKindReaction([text]);
    if (hr !== null) return hr;
  }
  return null;
}
