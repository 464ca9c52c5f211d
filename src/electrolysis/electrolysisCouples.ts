import { type HalfReaction, parseHalfReaction } from '../chem/halfReaction';
import { InputError, NotFoundError } from '../errors';

/** The overall electrolysis reactions these functions know: water splitting and metal electrowinning from sulfate. */
export interface ElectrolysisReaction {
  /** The overall reaction as text, electrolysis direction. */
  readonly overall: string;
  /** The cathode half-reaction (a reduction). */
  readonly cathode: HalfReaction;
  /** The anode half-reaction, written as a reduction (it runs backwards in the cell). */
  readonly anode: HalfReaction;
  /** Electrons per formula unit of the overall reaction. */
  readonly n: number;
}

const OXYGEN = 'O2 + 4H+ + 4e- -> 2H2O';

const REACTIONS = new Map<string, { overall: string; cathode: string }>(Object.entries({
  H2O: { overall: 'H2O(l) -> H2(g) + 1/2 O2(g)', cathode: '2H+ + 2e- -> H2' },
  Zn: { overall: 'ZnSO4(aq) + H2O(l) -> Zn(s) + H2SO4(aq) + 1/2 O2(g)', cathode: 'Zn2+ + 2e- -> Zn' },
  Cu: { overall: 'CuSO4(aq) + H2O(l) -> Cu(s) + H2SO4(aq) + 1/2 O2(g)', cathode: 'Cu2+ + 2e- -> Cu' },
  Ni: { overall: 'NiSO4(aq) + H2O(l) -> Ni(s) + H2SO4(aq) + 1/2 O2(g)', cathode: 'Ni2+ + 2e- -> Ni' },
}));

const NAMES = new Map<string, string>(Object.entries({ h2o: 'H2O', water: 'H2O', zn: 'Zn', zinc: 'Zn', cu: 'Cu', copper: 'Cu', ni: 'Ni', nickel: 'Ni' }));

/** Temperatures the electrolysis functions accept, °C (liquid water at 1 bar; the range of the species data's use here). */
export const ELECTROLYSIS_RANGE_C = { min: 0, max: 100 } as const;

const cache = new Map<string, ElectrolysisReaction>();

/**
 * The overall reaction of an electrolysis, as a cathode and an anode half-reaction: "H2O" (water
 * splitting, H2 at the cathode and O2 at the anode) or the electrowinning of "Zn", "Cu" or "Ni"
 * from their sulfates (metal at the cathode, O2 at the anode; sulfate is a spectator). Also checks
 * the temperature against 0…100 °C.
 *
 * Syntax: electrolysisReaction(process, temperatureC)
 * Example: electrolysisReaction("Zn", 40).overall → "ZnSO4(aq) + H2O(l) -> Zn(s) + H2SO4(aq) + 1/2 O2(g)"
 * See also: decompositionVoltage, thermoneutralVoltage
 *
 * @param process "H2O" (or "water"), "Zn", "Cu", "Ni" (or "zinc", "copper", "nickel"); case is ignored
 * @param temperatureC temperature, °C
 * @throws NotFoundError for another process; InputError for a temperature outside 0…100 °C
 */
export function electrolysisReaction(process: string, temperatureC: number): ElectrolysisReaction {
  if (!(temperatureC >= ELECTROLYSIS_RANGE_C.min && temperatureC <= ELECTROLYSIS_RANGE_C.max)) {
    throw new InputError(
      `temperature_C must be between ${ELECTROLYSIS_RANGE_C.min} and ${ELECTROLYSIS_RANGE_C.max} °C (liquid water; the range of the species data used here); got ${temperatureC}`,
    );
  }
  const name = NAMES.get(String(process).trim().toLowerCase());
  if (name === undefined) {
    throw new NotFoundError(`unknown electrolysis "${process}": accepted are H2O (water), Zn, Cu and Ni (zinc, copper, nickel electrowinning from sulfate)`);
  }
  let r = cache.get(name);
  if (r === undefined) {
    const def = REACTIONS.get(name) as { overall: string; cathode: string };
    r = { overall: def.overall, cathode: parseHalfReaction(def.cathode), anode: parseHalfReaction(OXYGEN), n: 2 };
    cache.set(name, r);
  }
  return r;
}
