import { type HalfReaction, fixedHalfReaction } from '../chem/halfReaction';

/** Electrodes of the second kind, by the metal/salt part of their key, and the reaction that sets their potential. */
const KINDS: ReadonlyArray<[RegExp, string]> = [
  [/^Ag\/AgCl\//i, 'AgCl + e- -> Ag + Cl-'],
  [/^Hg\/Hg2Cl2\//i, 'Hg2Cl2 + 2e- -> 2Hg(l) + 2Cl-'],
  [/^Hg\/HgO\//i, 'HgO + H2O + 2e- -> Hg(l) + 2OH-'],
  [/^Hg\/Hg2SO4\//i, 'Hg2SO4 + 2e- -> 2Hg(l) + SO4^2-'],
];

/**
 * The reaction that sets the potential of an electrode of the second kind, read from the metal/salt
 * part of one of its names, whatever the filling: "Ag/AgCl/…" → AgCl + e- → Ag + Cl-,
 * "Hg/Hg2Cl2/…" (calomel), "Hg/HgO/…", "Hg/Hg2SO4/…". Null for any other electrode.
 *
 * Syntax: secondKindReaction(names)
 * Example: secondKindReaction(["SCE", "Hg/Hg2Cl2/KCl(sat)"]).text → "Hg2Cl2 + 2e- -> 2Hg(l) + 2Cl-"
 * See also: electrodeReaction, saturatedFilling, refPotential
 *
 * @param names the electrode's key and aliases
 * @returns the half-reaction of the first name that names a kind, or null
 */
export function secondKindReaction(names: readonly string[]): HalfReaction | null {
  for (const name of names) {
    const text = name.trim();
    for (const [re, reaction] of KINDS) {
      if (re.test(text)) return fixedHalfReaction(reaction);
    }
  }
  return null;
}
