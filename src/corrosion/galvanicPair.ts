import { galvanicSeries } from './galvanicSeries';

/**
 * A coating and its substrate as a galvanic couple, from the practical galvanic series in flowing
 * seawater (galvanicSeries, V vs SCE): the difference of the midpoints of their corrosion-potential
 * ranges, E(coating) − E(substrate), and the one that is anodic (the more negative range, which
 * corrodes at a pore or a cut edge). When the two ranges overlap, neither is reliably anodic and the
 * answer says so. The farther apart two metals are in a galvanic series, the stronger their galvanic
 * effect (MIL-STD-889B, Dissimilar metals, Notice 1 (1979), 5.1.2, read in the scribd copy
 * scribd.com/document/372446683), but that standard's compatibility table was not read here, so no
 * verdict on compatibility: the series is for seawater, the difference at a pore
 * depends on the electrolyte, aeration, area ratio and temperature, and limits belong to the
 * design standard that applies.
 *
 * Syntax: galvanicPair(coating, substrate)
 * Example: galvanicPair("Zinc", "Mild steel, cast iron") → [−0.345, "Zinc"]
 * See also: galvanicSeries
 */
export function galvanicPair(coating: string, substrate: string): [number, string] {
  const c = galvanicSeries(coating);
  const s = galvanicSeries(substrate);
  const difference = (c.min_V + c.max_V) / 2 - (s.min_V + s.max_V) / 2;
  let anodic: string;
  if (c.max_V < s.min_V) anodic = c.alloy;
  else if (s.max_V < c.min_V) anodic = s.alloy;
  else anodic = 'ranges overlap: neither reliably anodic';
  // 1 µV is far below the data's 10 mV resolution: round away the midpoints' binary noise
  return [Math.round(difference * 1e6) / 1e6 || 0, anodic];
}
