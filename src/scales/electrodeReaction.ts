import { type HalfReaction, parseHalfReaction } from '../chem/halfReaction';

/** Electrodes of the second kind, by the metal/salt part of their key, and the reaction that sets their potential. */
const KINDS: ReadonlyArray<[RegExp, string]> = [
  [/^Ag\/AgCl\//i, 'AgCl + e- -> Ag + Cl-'],
  [/^Hg\/Hg2Cl2\//i, 'Hg2Cl2 + 2e- -> 2Hg(l) + 2Cl-'],
  [/^Hg\/HgO\//i, 'HgO + H2O + 2e- -> Hg(l) + 2OH-'],
  [/^Hg\/Hg2SO4\//i, 'Hg2SO4 + 2e- -> 2Hg(l) + SO4^2-'],
];

/** A filling of fixed concentration written in the key: "(3M)", "(0.1M)", "(1 mol/L)", "(1 mol/kg)". */
const FIXED_FILLING = /\(\s*\d+(\.\d+)?\s*(M|mol\/L|mol\/kg)\s*\)\s*$/i;

const parsed = new Map<string, HalfReaction>();

/**
 * The electrode reaction of a reference electrode of the second kind with a filling of fixed
 * concentration, read from its key or alias: "Ag/AgCl/KCl(3M)" → AgCl + e- → Ag + Cl-,
 * "Hg/Hg2Cl2/KCl(0.1M)", "Hg/HgO/NaOH(1M)", "Hg/Hg2SO4/H2SO4(1M)". Saturated fillings ("(sat)"),
 * seawater and field electrodes have none: their filling's composition changes with temperature.
 *
 * Syntax: electrodeReaction(names)
 * Example: electrodeReaction(["Ag/AgCl/KCl(3M)"]).n → 1
 * See also: refPotential
 *
 * @param names the electrode's key and aliases
 * @returns the half-reaction, or null when none applies
 */
export function electrodeReaction(names: readonly string[]): HalfReaction | null {
  for (const name of names) {
    const text = name.trim();
    if (!FIXED_FILLING.test(text)) continue;
    for (const [re, reaction] of KINDS) {
      if (!re.test(text)) continue;
      let hr = parsed.get(reaction);
      if (hr === undefined) {
        hr = parseHalfReaction(reaction);
        parsed.set(reaction, hr);
      }
      return hr;
    }
  }
  return null;
}
