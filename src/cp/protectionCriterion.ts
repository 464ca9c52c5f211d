import { dataPart } from '../dataset/active';
import { InputError, NotFoundError } from '../errors';

/** One criterion as a standard states it. */
export interface CriterionRow {
  readonly electrode: string;
  readonly condition: string;
  readonly value: number;
  readonly kind: string;
  readonly meaning: string;
  readonly clause: string;
  readonly source: string;
  readonly note?: string;
}

/** Conditions accepted, with their other spellings. */
const CONDITIONS: Record<string, string> = {
  standard: 'standard',
  '': 'standard',
  aerobic: 'standard',
  polarisation: 'polarisation',
  polarization: 'polarisation',
  '100mv': 'polarisation',
  limit: 'limit',
  mostnegative: 'limit',
  anaerobic: 'anaerobic',
  srb: 'anaerobic',
  hightemperature: 'hightemperature',
  hightemp: 'hightemperature',
  highstrength: 'highstrength',
  hydrogen: 'highstrength',
};

const norm = (s: string): string => s.toLowerCase().replace(/[\s_\-·]+/g, '');

/**
 * The cathodic-protection criterion a standard states for a reference electrode and condition,
 * with its clause and source (data/cp-criteria.json). A criterion, never a verdict. Criteria are
 * stated per electrode as the standards state them, never converted from another electrode.
 * Throws NotFoundError for an electrode or condition the standards' rows here do not cover, with
 * a message saying where the value is stated (the rows under "notRead" name the standard for a
 * condition, or for a condition on the listed electrodes, whose value was not read in a source).
 *
 * Syntax: protectionCriterion(electrodeKey, condition)
 * Example: protectionCriterion("Ag/AgCl/seawater", "standard").value → −0.80;
 *          protectionCriterion("CSE", "anaerobic").value → −0.95
 * See also: polarisationShift, convertPotential
 *
 * @param electrodeKey the key of the reference electrode (as found in the potential table)
 * @param condition "standard", "polarisation", "limit", "anaerobic", "hightemperature" or "highstrength"
 */
export function protectionCriterion(electrodeKey: string, condition: string): CriterionRow {
  const c = CONDITIONS[norm(condition)];
  if (c === undefined) {
    throw new InputError(`unknown condition "${condition}"; use "standard", "polarisation", "limit", "anaerobic", "hightemperature" or "highstrength"`);
  }
  const data = dataPart('cpcriteria');
  const wanted = c === 'polarisation' ? null : electrodeKey;
  const row = data.criteria.find((r) => r.condition === c && (wanted === null || r.electrode === wanted));
  if (row === undefined) {
    // a condition whose value was not read (for every electrode, or for the electrodes listed) names its standard
    const missing = data.notRead.find((r) => r.condition === c && (r.electrodes === undefined || r.electrodes.includes(electrodeKey)));
    if (missing) throw new NotFoundError(missing.message);
    const stated = data.criteria.filter((r) => r.condition === c).map((r) => r.electrode);
    throw new NotFoundError(
      `no ${c} criterion is stated for "${electrodeKey}"; the standards state it for ${stated.join(', ')}: measure with that electrode, or take the criterion from the standard you work to (do not convert another electrode's figure)`,
    );
  }
  return row;
}
