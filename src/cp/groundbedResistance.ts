import { InputError, finite } from '../errors';

/**
 * Σ_{k=1}^{N−1} (N − k)/k: half the sum, over every ordered pair of N anodes equally spaced in a
 * line, of spacing/distance. Over π·N² it is the paralleling factor of the US military CP handbooks
 * (divided by 30.48 there, for ρ in Ω·cm and spacing in ft); for large N it tends to N·ln(0.656·N),
 * the term of Sunde's formula.
 */
function lineSum(n: number): number {
  let s = 0;
  for (let k = 1; k < n; k++) s += (n - k) / k;
  return s;
}

/**
 * Resistance to remote earth of impressed-current anodes (a groundbed), in Ω:
 * - "vertical": one vertical anode, Dwight (1936): R = ρ/(2πL)·(ln(8L/d) − 1). In the US military
 *   CP handbooks this is R = ρK/L with the tabulated shape function K (ρ in Ω·cm, L in ft).
 * - "horizontal": one horizontal anode of length L at depth h, Dwight (1936) for a buried wire:
 *   R = ρ/(2πL)·[ln(2L²/(r·h)) − 2 + 2h/L − (h/L)² + (h/L)⁴/2], r = d/2;
 * - "parallel": N vertical anodes in a line at spacing S (centre to centre), each of resistance Rv
 *   by Dwight, with the mutual resistance of point sources:
 *   R = Rv/N + ρ/(πN²S)·Σ_{k=1}^{N−1} (N − k)/k. This is R = Rv/N + ρ·PF/S with the paralleling
 *   factor PF tabulated in MIL-HDBK-1004/10 §6.2.1.4 and USACE ETL 1110-9-10 table 3-5; Sunde's
 *   ln(0.656N) form is its large-N approximation (about 3 % low for 9 anodes).
 * Lengths in m, resistivity in Ω·m (the backfill column's dimensions when the anode is in coke).
 * The anodes must be slender (d < L); the parallel formula assumes spacing of at least one anode length.
 *
 * Syntax: groundbedResistance(layout, resistivityOhmM, lengthM, diameterM, count, spacingM, depthM)
 * Example: groundbedResistance("vertical", 30, 2, 0.1, 1, null, null) → 9.729 Ω
 * See also: rectifierVoltage, wennerResistivity
 */
export function groundbedResistance(
  layout: string,
  resistivityOhmM: number,
  lengthM: number,
  diameterM: number,
  count: number,
  spacingM: number | null,
  depthM: number | null,
): number {
  const rho = resistivityOhmM;
  const L = lengthM;
  const d = diameterM;
  if (d >= L) throw new InputError(`the anode diameter (${d} m) must be much smaller than its length (${L} m); these formulas are for slender anodes`);
  const vertical = (): number => (rho / (2 * Math.PI * L)) * (Math.log((8 * L) / d) - 1);
  switch (layout.trim().toLowerCase()) {
    case 'vertical':
      return finite(vertical(), 'the resistance');
    case 'horizontal': {
      if (depthM === null || !(depthM > 0)) throw new InputError('"horizontal" needs depth_m > 0 (depth of the anode below the surface)');
      const h = depthM;
      const x = h / L;
      return finite((rho / (2 * Math.PI * L)) * (Math.log((2 * L * L) / ((d / 2) * h)) - 2 + 2 * x - x * x + (x ** 4) / 2), 'the resistance');
    }
    case 'parallel': {
      if (!(count >= 2)) throw new InputError('"parallel" needs count ≥ 2 anodes');
      if (count > 1000) throw new InputError(`"parallel" takes at most 1000 anodes in one line (got ${count})`);
      if (spacingM === null || !(spacingM > 0)) throw new InputError('"parallel" needs spacing_m > 0 between anodes');
      if (spacingM < L) throw new InputError(`the parallel-anode formula assumes spacing (${spacingM} m) not smaller than the anode length (${L} m)`);
      const n = count;
      return finite(vertical() / n + (rho / (Math.PI * n * n * spacingM)) * lineSum(n), 'the resistance');
    }
    default:
      throw new InputError(`unknown layout "${layout}"; use "vertical", "horizontal" or "parallel"`);
  }
}
