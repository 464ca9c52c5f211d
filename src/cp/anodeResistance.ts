import { InputError, finite } from '../errors';

/** Dimensions of an anode; which are needed depends on the shape. */
export interface AnodeDims {
  readonly lengthM: number | null;
  readonly radiusM: number | null;
  readonly widthM: number | null;
  readonly thicknessM: number | null;
  readonly areaM2: number | null;
  /** Clear distance from the anode to the protected surface (stand-off anodes), m. */
  readonly standoffM: number | null;
}

function need(v: number | null, name: string, shape: string): number {
  if (v === null) throw new InputError(`${shape} needs ${name}`);
  if (!(v > 0)) throw new InputError(`${name} must be > 0; got ${v}`);
  return v;
}

/**
 * Anode resistance to the electrolyte by the formulas of DNV-RP-B401 Table 10-7 (also ISO 15589-2
 * annex), in Ω, with their validity conditions:
 * - "long-standoff" (L ≥ 4r): Ra = ρ/(2πL)·(ln(4L/r) − 1) (modified Dwight);
 * - "short-standoff" (L < 4r): Ra = ρ/(2πL)·[ln((2L/r)(1 + √(1 + (r/2L)²))) + r/(2L) − √(1 + (r/2L)²)];
 * - "long-flush" (L ≥ 4·width and L ≥ 4·thickness): Ra = ρ/(2S), S = (L + width)/2 (Lloyd);
 * - "bracelet" (also short flush-mounted and other shapes): Ra = 0.315·ρ/√A, A the exposed area (McCoy).
 * Stand-off formulas hold for anodes at least 0.30 m from the protected surface; from 0.15 to 0.30 m
 * they are multiplied by 1.3; closer than 0.15 m a stand-off formula is refused (use a flush formula).
 * A shape whose dimensions fall outside its condition is refused with the shape to use instead.
 *
 * Syntax: anodeResistance(shape, resistivityOhmM, dims)
 * Example: anodeResistance("long-standoff", 0.3, { lengthM: 2, radiusM: 0.1, … }) → 0.0807 Ω
 * See also: anodeOutput
 *
 * @param shape "long-standoff", "short-standoff", "long-flush" or "bracelet"
 * @param resistivityOhmM electrolyte resistivity, Ω·m
 * @param dims the anode's dimensions in m (area in m²)
 */
export function anodeResistance(shape: string, resistivityOhmM: number, dims: AnodeDims): number {
  const s = shape.trim().toLowerCase().replace(/[\s_]+/g, '-');
  const rho = resistivityOhmM;
  const standoffFactor = (): number => {
    const d = dims.standoffM;
    if (d === null || d >= 0.3) return 1;
    if (d >= 0.15) return 1.3;
    throw new InputError(`a stand-off formula needs at least 0.15 m between anode and surface (got ${d} m); use "long-flush" or "bracelet"`);
  };
  switch (s) {
    case 'long-standoff':
    case 'long-slender-standoff': {
      const L = need(dims.lengthM, 'length_m', s);
      const r = need(dims.radiusM, 'radius_m', s);
      if (L < 4 * r) throw new InputError(`long-standoff needs L ≥ 4r (L = ${L} m, r = ${r} m); use "short-standoff"`);
      return finite(((rho / (2 * Math.PI * L)) * (Math.log((4 * L) / r) - 1)) * standoffFactor(), 'the anode resistance');
    }
    case 'short-standoff':
    case 'short-slender-standoff': {
      const L = need(dims.lengthM, 'length_m', s);
      const r = need(dims.radiusM, 'radius_m', s);
      if (L >= 4 * r) throw new InputError(`short-standoff needs L < 4r (L = ${L} m, r = ${r} m); use "long-standoff"`);
      const q = r / (2 * L);
      const root = Math.sqrt(1 + q * q);
      return finite(((rho / (2 * Math.PI * L)) * (Math.log(((2 * L) / r) * (1 + root)) + q - root)) * standoffFactor(), 'the anode resistance');
    }
    case 'long-flush':
    case 'flush': {
      const L = need(dims.lengthM, 'length_m', s);
      const w = need(dims.widthM, 'width_m', s);
      const t = need(dims.thicknessM, 'thickness_m', s);
      if (L < 4 * w || L < 4 * t) throw new InputError(`long-flush needs L ≥ 4·width and L ≥ 4·thickness (L = ${L}, width = ${w}, thickness = ${t} m); use "bracelet" (short flush-mounted)`);
      return finite(rho / (2 * ((L + w) / 2)), 'the anode resistance');
    }
    case 'bracelet':
    case 'short-flush':
    case 'other': {
      const A = need(dims.areaM2, 'area_m2', s);
      return finite((0.315 * rho) / Math.sqrt(A), 'the anode resistance');
    }
    default:
      throw new InputError(`unknown anode shape "${shape}"; use "long-standoff", "short-standoff", "long-flush" or "bracelet"`);
  }
}
