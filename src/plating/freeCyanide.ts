import { InputError, NotFoundError, finite } from '../errors';
import { molarMass } from '../faraday/molarMass';

/** The cyanide salts a free-cyanide result can be expressed as. */
const SALTS: Record<string, 'NaCN' | 'KCN'> = { nacn: 'NaCN', kcn: 'KCN', sodium: 'NaCN', potassium: 'KCN' };

/**
 * Free alkali cyanide of a plating bath from a silver nitrate titration (Liebig's method, usually
 * with potassium iodide as the end-point indicator): each Ag⁺ binds two CN⁻ as Ag(CN)₂⁻ until the
 * first permanent turbidity, so the sample held 2·V_t·c_t millimoles of free cyanide:
 * c(salt) = 2·V_t·c_t·M(salt)/V_s in g/L, with V_t and V_s in mL, c_t in mol/L and M from the
 * atomic weights in use.
 *
 * Method: R. M. Wick, "The analysis of cyanide silver-plating solutions", Bureau of Standards
 * Journal of Research 7 (1931), RP384 (the Liebig titration correct to better than 0.2 %, more
 * accurate with iodide added).
 *
 * Syntax: freeCyanide(titrantMl, titrantMolL, sampleMl, salt)
 * Example: freeCyanide(12.4, 0.1, 10, "NaCN") → 12.154 g/L of free NaCN
 * See also: metalFraction, saltMass
 *
 * @param titrantMl silver nitrate used to the end point, mL (≥ 0)
 * @param titrantMolL molarity of the silver nitrate, mol/L (> 0; 0.1 N AgNO3 is 0.1 mol/L)
 * @param sampleMl bath sample titrated, mL (> 0)
 * @param salt "NaCN" or "KCN": the salt the result is expressed as
 */
export function freeCyanide(titrantMl: number, titrantMolL: number, sampleMl: number, salt: string): number {
  const key = SALTS[salt.trim().toLowerCase()];
  if (key === undefined) throw new NotFoundError(`unknown cyanide salt "${salt}"; use "NaCN" or "KCN"`);
  if (titrantMolL > 1) throw new InputError(`titrant_mol_L must be at most 1 mol/L for a silver nitrate titrant; got ${titrantMolL} (is it in mmol/L? 0.1 N is 0.1)`);
  return finite((2 * titrantMl * titrantMolL * molarMass(key)) / sampleMl, 'the free cyanide');
}
