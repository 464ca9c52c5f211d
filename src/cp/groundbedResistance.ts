import { InputError, finite } from '../errors';

/**
 * Resistance to remote earth of impressed-current anodes (a groundbed), in Ω:
 * - "vertical": one vertical anode, Dwight (1936): R = ρ/(2πL)·(ln(8L/d) − 1);
 * - "horizontal": one horizontal anode of length L at depth h, Dwight (1936) for a buried wire:
 *   R = ρ/(2πL)·[ln(2L²/(r·h)) − 2 + 2h/L − (h/L)² + (h/L)⁴/2], r = d/2;
 * - "parallel": N vertical anodes in a line at spacing S, the parallel-anode formula of the CP trade
 *   (after Sunde): R = ρ/(2πNL)·[ln(8L/d) − 1 + (2L/S)·ln(0.656·N)].
 * Lengths in m, resistivity in Ω·m (the backfill column's dimensions when the anode is in coke).
 *
 * Syntax: groundbedResistance(layout, resistivityOhmM, lengthM, diameterM, count, spacingM, depthM)
 * Example: groundbedResistance("vertical", 30, 2, 0.1, 1, null, null) → 11.51 Ω
 * See also: rectifierVoltage
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
  switch (layout.trim().toLowerCase()) {
    case 'vertical':
      return finite((rho / (2 * Math.PI * L)) * (Math.log((8 * L) / d) - 1), 'the resistance');
    case 'horizontal': {
      if (depthM === null || !(depthM > 0)) throw new InputError('"horizontal" needs depth_m > 0 (depth of the anode below the surface)');
      const h = depthM;
      const x = h / L;
      return finite((rho / (2 * Math.PI * L)) * (Math.log((2 * L * L) / ((d / 2) * h)) - 2 + 2 * x - x * x + (x ** 4) / 2), 'the resistance');
    }
    case 'parallel': {
      if (!(count >= 2)) throw new InputError('"parallel" needs count ≥ 2 anodes');
      if (spacingM === null || !(spacingM > 0)) throw new InputError('"parallel" needs spacing_m > 0 between anodes');
      if (spacingM < L) throw new InputError(`the parallel-anode formula assumes spacing (${spacingM} m) not smaller than the anode length (${L} m)`);
      return finite((rho / (2 * Math.PI * count * L)) * (Math.log((8 * L) / d) - 1 + ((2 * L) / spacingM) * Math.log(0.656 * count)), 'the resistance');
    }
    default:
      throw new InputError(`unknown layout "${layout}"; use "vertical", "horizontal" or "parallel"`);
  }
}
