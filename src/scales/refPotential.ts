import data from '../../data/electrode-e0.json';
import { parseSpecies } from '../chem/formula';
import type { HalfReaction } from '../chem/halfReaction';
import { InputError, NotFoundError } from '../errors';
import { kelvin, thermalVoltage } from '../constants';
import { speciesE0 } from '../species/speciesE0';
import type { ElectrodeRow } from '../table/types';
import { electrodeReaction } from './electrodeReaction';
import { measuredE0 } from './measuredE0';
import { saturatedFilling } from './saturatedFilling';
import { secondKindReaction } from './secondKindReaction';

/** Temperatures at which reference-electrode potentials are given, °C. */
export const REF_TEMPERATURE_RANGE_C = { min: 0, max: 100 } as const;

/** Highest temperature of use by electrode reaction (data/electrode-e0.json, temperatureLimits). */
const LIMITS = new Map<string, number>(data.temperatureLimits.map((l) => [l.reaction, l.max_C]));

/** What the electrodes of a reaction are called in a message. */
const KIND_NAMES: Readonly<Record<string, string>> = {
  'Hg2Cl2 + 2e- -> 2Hg(l) + 2Cl-': 'calomel electrodes',
  'HgO + H2O + 2e- -> Hg(l) + 2OH-': 'mercury/mercuric oxide electrodes',
};

/** E°(T) of an electrode reaction: the measured one where data/electrode-e0.json lists it, else the species-derived one. */
const e0 = (hr: HalfReaction, t: number): number => measuredE0(hr, t) ?? speciesE0(hr, t);

/** Stoichiometric coefficient of an anion among the products of a half-reaction (0 when absent). */
function anionCoefficient(hr: HalfReaction, anion: string): number {
  const key = parseSpecies(anion).key;
  return hr.species.find((s) => s.side === 'red' && s.species.key === key)?.coefficient ?? 0;
}

/**
 * Potential of a reference electrode in V vs SHE (the hydrogen electrode at the same temperature),
 * with the electrode itself at that temperature. At 25 °C the stored value is returned as it is.
 * Calomel electrodes are used up to 80 °C and Hg/HgO up to 90 °C (data/electrode-e0.json,
 * temperatureLimits); above, InputError naming the limit. Elsewhere, the first that applies:
 *
 * 1. The row's published dE/dT: E(T) = E(25 °C) + (dE/dT)·(T − 25).
 * 2. An electrode of the second kind with a filling of fixed concentration (electrodeReaction:
 *    Ag/AgCl, Hg/Hg2Cl2, Hg/HgO, Hg/Hg2SO4 with "(3M)", "(0.1M)"… in the key): the standard potential
 *    E°(T) of its reaction with the filling's activities held at their 25 °C values,
 *    E(T) = E°(T) + (T/298.15 K)·(E(25 °C) − E°(25 °C)). E°(T) is the measured one where
 *    data/electrode-e0.json lists the reaction (measuredE0: AgCl/Ag by Bates & Bower, 0–95 °C, and
 *    calomel from it), else the one derived from the species data. The change of the activity
 *    coefficient with temperature and the liquid junction are neglected.
 * 3. An electrode of the second kind in a saturated salt (saturatedFilling: KCl, K2SO4, NaCl): the
 *    electrode reaction at the anion activity the salt's solubility product sets at that temperature,
 *    g(T) = E°(T) − (RT/nF)·ν·ln a(anion), moved to the row's 25 °C value:
 *    E(T) = E(25 °C) + g(T) − g(25 °C). The liquid junction is neglected.
 * 4. Otherwise (seawater and field electrodes) NotFoundError: known at 25 °C only.
 *
 * Syntax: refPotential(row, temperatureC)
 * Example: refPotential(Ag/AgCl/KCl(1M) row, 60) → 0.2118 V; refPotential(SCE row, 60) → 0.2156 V
 * See also: convertPotential, electrodeReaction, saturatedFilling, measuredE0
 *
 * @param row reference electrode from the table
 * @param temperatureC temperature, °C (0…100)
 */
export function refPotential(row: ElectrodeRow, temperatureC: number): number {
  if (temperatureC === 25) return row.potential;
  if (!(temperatureC >= REF_TEMPERATURE_RANGE_C.min && temperatureC <= REF_TEMPERATURE_RANGE_C.max)) {
    throw new InputError(`temperature ${temperatureC} °C is outside the reference electrodes' range: reference potentials are given only within ${REF_TEMPERATURE_RANGE_C.min}…${REF_TEMPERATURE_RANGE_C.max} °C`);
  }
  const names = [row.key, ...row.aliases];
  const kind = secondKindReaction(names);
  const limit = kind === null ? undefined : LIMITS.get(kind.text);
  if (kind !== null && limit !== undefined && temperatureC > limit) {
    throw new InputError(
      `temperature ${temperatureC} °C is above the ${limit} °C up to which ${KIND_NAMES[kind.text] ?? 'these electrodes'} are used ("${row.key}"): give ${REF_TEMPERATURE_RANGE_C.min}…${limit} °C`,
    );
  }
  if (row.dEdT_mV_K !== undefined) return row.potential + (row.dEdT_mV_K / 1000) * (temperatureC - 25);
  const hr = electrodeReaction(names);
  if (hr !== null) {
    return e0(hr, temperatureC) + (kelvin(temperatureC) / 298.15) * (row.potential - e0(hr, 25));
  }
  const sat = saturatedFilling(names);
  if (kind !== null && sat !== null) {
    const nu = anionCoefficient(kind, sat.anion);
    if (nu > 0) {
      const g = (t: number): number => e0(kind, t) - (thermalVoltage(t) / kind.n) * nu * sat.lnAnionActivity(t);
      return row.potential + g(temperatureC) - g(25);
    }
  }
  throw new NotFoundError(
    `the electrode table has no dE/dT for "${row.key}" and its filling is neither of fixed concentration nor a saturated salt of the data, so its potential is known only at 25 °C`,
  );
}
