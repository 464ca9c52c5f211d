import { type HalfReaction, type ReactionTerm, formatReaction, speciesState } from '../chem/halfReaction';
import { InputError } from '../errors';
import { cellElectrons } from './cellElectrons';

/**
 * The balanced overall reaction of a cell, as text: the cathode's half-reaction as written plus the
 * anode's reversed, each scaled so the electrons (the lcm of the two n) cancel; a species on both
 * sides (same formula, charge and state) is cancelled down to its net amount.
 *
 * Syntax: cellReaction(cathode, anode)
 * Example: cellReaction(parse("Cu2+ + 2e- -> Cu"), parse("Zn2+ + 2e- -> Zn")) → "Cu2+ + Zn -> Cu + Zn2+"
 * See also: cellElectrons, galvanic
 *
 * @throws InputError when everything cancels (the same half-reaction on both electrodes)
 */
export function cellReaction(cathode: HalfReaction, anode: HalfReaction): string {
  const n = cellElectrons(cathode, anode);
  const mc = n / cathode.n;
  const ma = n / anode.n;
  // net amount of each species: > 0 on the left (consumed), < 0 on the right (formed)
  const net = new Map<string, { term: ReactionTerm; amount: number; order: number }>();
  let order = 0;
  const add = (t: ReactionTerm, amount: number) => {
    const k = `${t.species.key}|${speciesState(t.species, t.phase)}`;
    const hit = net.get(k);
    if (hit) hit.amount += amount;
    else net.set(k, { term: t, amount, order: order++ });
  };
  // left: cathode's oxidized species, then anode's reduced species; right: the others
  for (const t of cathode.species) if (t.side === 'ox') add(t, t.coefficient * mc);
  for (const t of anode.species) if (t.side === 'red') add(t, t.coefficient * ma);
  for (const t of cathode.species) if (t.side === 'red') add(t, -t.coefficient * mc);
  for (const t of anode.species) if (t.side === 'ox') add(t, -t.coefficient * ma);

  const entries = [...net.values()].sort((a, b) => a.order - b.order);
  const tol = 1e-9;
  const left: ReactionTerm[] = [];
  const right: ReactionTerm[] = [];
  for (const e of entries) {
    if (e.amount > tol) left.push({ species: e.term.species, coefficient: e.amount, phase: e.term.phase });
    else if (e.amount < -tol) right.push({ species: e.term.species, coefficient: -e.amount, phase: e.term.phase });
  }
  if (left.length === 0 || right.length === 0) {
    throw new InputError('the cathode and anode half-reactions cancel out: there is no net cell reaction');
  }
  return formatReaction(left, right);
}
