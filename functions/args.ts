/**
 * Argument declarations shared by many worksheet functions (name, kind, default, domain, unit).
 * Declaring them once keeps names, defaults and domains identical across the families. A family
 * gives each argument its help text, `{ ...num('Q', domains.positive), help: 'Reaction quotient
 * (> 0).' }`; temperatureC and electrons carry a help text that most functions share.
 */
import { DEFAULT_TEMPERATURE_C } from '../src/constants';
import { type ArgSpec, domains } from './adapter';

/** Optional temperature in °C, default 25, above absolute zero. */
export const temperatureC: ArgSpec = {
  name: 'temperature_C',
  kind: 'number',
  optional: true,
  default: DEFAULT_TEMPERATURE_C,
  domain: domains.temperature,
  unit: '°C',
  help: 'Temperature in °C (default 25).',
};

/** Electrons transferred: a whole number ≥ 1. */
export const electrons: ArgSpec = {
  name: 'n',
  kind: 'number',
  domain: domains.positiveInteger,
  unit: '',
  help: 'Electrons transferred (a whole number ≥ 1).',
};

/** A potential in V (any finite number). */
export function potential(name = 'potential_V'): ArgSpec {
  return { name, kind: 'number', domain: domains.any, unit: 'V' };
}

/** A couple key of the potential table ("Cu2+/Cu"). */
export function couple(name = 'couple'): ArgSpec {
  return { name, kind: 'couple', unit: '' };
}

/** A required number with a domain. */
export function num(name: string, domain = domains.any, unit = ''): ArgSpec {
  return { name, kind: 'number', domain, unit };
}

/** An optional number with a default. */
export function optNum(name: string, def: number | null, domain = domains.any, unit = ''): ArgSpec {
  return { name, kind: 'number', optional: true, default: def, domain, unit };
}

/** An activity (dimensionless, > 0), optional with default 1. */
export function activity(name: string): ArgSpec {
  return { name, kind: 'number', optional: true, default: 1, domain: domains.positive, unit: '' };
}
