import type { HalfReaction } from '../chem/halfReaction';

function gcd(a: number, b: number): number {
  while (b) [a, b] = [b, a % b];
  return a;
}

/**
 * Electrons of the balanced overall cell reaction: the least common multiple of the two
 * half-reactions' n.
 *
 * Syntax: cellElectrons(cathode, anode)
 * Example: cellElectrons(parse("MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O"), parse("Fe3+ + e- -> Fe2+")) → 5
 * See also: cellReaction, cellPotential
 */
export function cellElectrons(cathode: Pick<HalfReaction, 'n'>, anode: Pick<HalfReaction, 'n'>): number {
  return (cathode.n / gcd(cathode.n, anode.n)) * anode.n;
}
