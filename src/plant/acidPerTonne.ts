import { InputError, finite } from '../errors';
import { molarMass } from '../faraday/molarMass';
import { speciesMolarMass } from '../faraday/speciesMolarMass';

/**
 * Net sulfuric acid formed per tonne of metal electrowon from a sulfate liquor with oxygen-evolving
 * anodes, in t H2SO4 per t of metal (= kg/kg).
 *
 * Model (the sulfate balance of the liquor): sulfate is neither made nor destroyed, so every mole of
 * a metal ion M^n+ taken out of solution leaves n/2 mol of sulfate paired with H+, as in the overall
 * reaction MSO4 + H2O → M + H2SO4 + ½O2 (n = 2): n/2 mol H2SO4 per mol of metal harvested. The
 * cathode current efficiency ε does not change this figure when the charge lost at the cathode goes
 * to hydrogen evolution, to redissolution of deposited metal by acid, or to an iron couple cycling
 * between the electrodes: the acid those consume (or the anode charge they take) cancels the extra
 * acid the anode makes for that charge. It enters only through a side reaction that takes a second
 * cation out of solution at the anode: Mn2+ + 2H2O → MnO2 + 4H+ + 2e−, 1 mol H2SO4 per mol MnO2.
 * With a fraction f of the cell charge going to MnO2 and ε to metal, MnO2 is n·f/(2ε) mol per mol of
 * metal, so the acid is (n/2)·(1 + f/ε)·M(H2SO4)/M(metal). Ferric iron fed in and leaving as ferrous
 * is not covered (it adds acid without a metal deposit).
 *
 * Syntax: acidPerTonne(metal, n, cathodeEfficiency, mno2Fraction)
 * Example: acidPerTonne("Zn", 2, 1, 0) → 1.5001 t/t (98.072/65.38)
 * See also: depositMass, specificEnergy
 *
 * @param metal formula of the metal ("Zn", "Cu", "Ni") or its molar mass in g/mol
 * @param n charge of the metal ion (electrons per atom deposited)
 * @param cathodeEfficiency cathode current efficiency, a fraction in (0, 1]
 * @param mno2Fraction fraction of the cell charge that forms MnO2 at the anode, in [0, 1)
 */
export function acidPerTonne(metal: string | number, n: number, cathodeEfficiency: number, mno2Fraction: number): number {
  if (!(mno2Fraction >= 0 && mno2Fraction < 1)) throw new InputError(`mno2_fraction must be a fraction in [0, 1); got ${mno2Fraction}`);
  if (mno2Fraction + cathodeEfficiency > 1 + 1e-12) {
    throw new InputError(
      `the cathode efficiency ${cathodeEfficiency} and the MnO2 fraction ${mno2Fraction} of the same charge add up to more than 1`,
    );
  }
  const m = speciesMolarMass(metal);
  return finite(((n / 2) * (1 + mno2Fraction / cathodeEfficiency) * molarMass('H2SO4')) / m, 'the acid per tonne');
}
