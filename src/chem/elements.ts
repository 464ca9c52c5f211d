/**
 * The 118 element symbols, in order of atomic number (IUPAC nomenclature).
 * This is naming, not reference data: atomic weights live in data/atomic-weights.json.
 */
export const ELEMENT_SYMBOLS: readonly string[] = (
  'H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se Br Kr ' +
  'Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pr Nd Pm Sm Eu Gd Tb Dy Ho Er Tm Yb Lu ' +
  'Hf Ta W Re Os Ir Pt Au Hg Tl Pb Bi Po At Rn Fr Ra Ac Th Pa U Np Pu Am Cm Bk Cf Es Fm Md No Lr ' +
  'Rf Db Sg Bh Hs Mt Ds Rg Cn Nh Fl Mc Lv Ts Og'
).split(' ');

const SYMBOL_SET = new Set(ELEMENT_SYMBOLS);

/** True when s is an element symbol (case-sensitive: "Co" is cobalt, "CO" is not a symbol). */
export function isElementSymbol(s: string): boolean {
  return SYMBOL_SET.has(s);
}
