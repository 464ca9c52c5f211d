import { cachedOf, dataPart } from '../dataset/active';
import type { DataParts } from '../dataset/parts';
import { LN10 } from '../constants';
import { InputError, NotFoundError, finite } from '../errors';
import { debyeHuckelParameters } from './debyeHuckelParameters';

type SaltRow = DataParts['debyehuckel']['pitzer']['salts'][number];

/** The salts with Pitzer parameters, by their formula in lower case. */
const saltsByName = cachedOf('debyehuckel', (part) => new Map(part.pitzer.salts.map((row) => [row.salt.toLowerCase(), row])));

/** The Pitzer ionic-strength function term 2β/(α²I)·[1 − (1 + α√I − α²I/2)·e^(−α√I)] of B^γ (0 when β or α is 0). */
function bGammaTerm(beta: number, alpha: number, ionicStrength: number): number {
  if (beta === 0 || alpha === 0) return 0;
  const x = alpha * Math.sqrt(ionicStrength);
  return ((2 * beta) / (x * x)) * (1 - (1 + x - (x * x) / 2) * Math.exp(-x));
}

/**
 * Mean ionic activity coefficient γ± (molality scale) of a salt alone in water at 25 °C, by the
 * binary Pitzer equation (Pitzer & Mayorga 1973, 1974) with the parameters of May et al. (J. Chem. Eng.
 * Data 56 (2011) 5066). Reaches the concentrated solutions of plating baths and tankhouse liquors
 * (ZnSO4 to 3.5 mol/kg, I = 14) where the Debye–Hückel and Davies equations do not. Each salt holds up
 * to its own molality; beyond it, or at another temperature, it throws an InputError naming the range.
 * A pure solution of that salt: in a mixed liquor (acid, other salts) the coefficient differs.
 *
 * Syntax: saltActivityCoef(salt, molality, temperatureC)
 * Example: saltActivityCoef("ZnSO4", 1, 25) → 0.0435 (CRC Handbook, measured: 0.0435)
 * See also: meanActivityCoef, activityCoef
 *
 * @param salt formula of the salt, such as "ZnSO4" or "NiCl2" (case and subscript digits ignored)
 * @param molality molality of the salt, mol/kg of water (≥ 0)
 * @param temperatureC temperature, °C (25 only)
 */
export function saltActivityCoef(salt: string, molality: number, temperatureC: number): number {
  const data = dataPart('debyehuckel').pitzer;
  const row: SaltRow | undefined = saltsByName().get(salt.trim().normalize('NFKC').toLowerCase());
  if (row === undefined) {
    const shown = salt.length > 40 ? `${salt.slice(0, 37)}…` : salt;
    throw new NotFoundError(`no Pitzer parameters for "${shown}"; available: ${data.salts.map((r) => r.salt).join(', ')}`);
  }
  if (temperatureC !== data.temperature_C) {
    throw new InputError(`temperature ${temperatureC} °C: the Pitzer parameters (May et al. 2011) hold at ${data.temperature_C} °C only`);
  }
  const max = row.maxMolality_mol_kg;
  if (!(molality >= 0 && molality <= max)) {
    throw new InputError(`${row.salt} molality ${molality} mol/kg is outside the parameters' range 0–${max} mol/kg (May et al. 2011); the molality is in mol per kg of water`);
  }
  if (molality === 0) return 1;
  const zc = Math.abs(row.zCation);
  const za = Math.abs(row.zAnion);
  const nc = row.nuCation;
  const na = row.nuAnion;
  const nu = nc + na;
  const I = 0.5 * molality * (nc * zc * zc + na * za * za);
  const [alpha1, alpha2] = zc === 2 && za === 2 ? data.alpha.twoTwo : data.alpha.default;
  const b = data.b;
  const aPhi = (debyeHuckelParameters(data.temperature_C).A * LN10) / 3;
  const sqrtI = Math.sqrt(I);
  const fGamma = -aPhi * (sqrtI / (1 + b * sqrtI) + (2 / b) * Math.log(1 + b * sqrtI));
  const bGamma = 2 * row.beta0 + bGammaTerm(row.beta1, alpha1, I) + bGammaTerm(row.beta2, alpha2, I);
  const cGamma = 1.5 * row.Cphi;
  const lnGamma = zc * za * fGamma + molality * ((2 * nc * na) / nu) * bGamma + molality * molality * ((2 * Math.pow(nc * na, 1.5)) / nu) * cGamma;
  return finite(Math.exp(lnGamma), 'the activity coefficient');
}
