/** How the pane writes numbers, times, counts and field names. */
import { parseHalfReaction } from '../src/chem/halfReaction';

export function signed(x: number): string {
  return `${x > 0 ? '+' : x < 0 ? '\u2212' : ''}${Math.abs(x)}`;
}

export function when(iso: string): string {
  if (iso === '') return 'not recorded';
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : d.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}

export function plural(n: number, one: string, many = `${one}s`): string {
  return `${n.toLocaleString('en-US')} ${n === 1 ? one : many}`;
}

export function electronsOf(halfReaction: string): number | undefined {
  try {
    return parseHalfReaction(halfReaction).n;
  } catch {
    return undefined;
  }
}

export function fieldLabel(f: string): string {
  return ({ e0: 'E°', potential: 'potential', dEdT_mV_K: 'dE/dT', halfReaction: 'half-reaction', aliases: 'other names' } as Record<string, string>)[f] ?? f;
}
