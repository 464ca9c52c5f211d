import { NotFoundError } from '../errors';

/** The activity-coefficient models: Debye–Hückel limiting law, extended Debye–Hückel, Davies. */
export type ActivityModel = 'DHLL' | 'EDH' | 'DAVIES';

const MODELS: readonly ActivityModel[] = ['DHLL', 'EDH', 'DAVIES'];

/**
 * Reads a model name ("DHLL", "EDH", "DAVIES"; case and white space ignored). Unknown names throw
 * NotFoundError naming them.
 *
 * Syntax: activityModel(name)
 * Example: activityModel("davies") → "DAVIES"
 * See also: log10ActivityCoef
 */
export function activityModel(name: string): ActivityModel {
  if (name === 'DAVIES' || name === 'EDH' || name === 'DHLL') return name; // as written in the docs: no clean-up needed
  const bare = name.replace(/\s+/g, '').toUpperCase();
  const found = MODELS.find((m) => m === bare);
  if (found === undefined) {
    const shown = name.length > 40 ? `${name.slice(0, 37)}…` : name;
    throw new NotFoundError(`unknown activity model "${shown}"; use "DHLL" (limiting law), "EDH" (extended Debye–Hückel) or "DAVIES"`);
  }
  return found;
}
