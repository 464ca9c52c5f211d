/** Faraday's law and production: molar mass, electrochemical equivalent, deposits, plating, energy, gas. */
import { currentEfficiency } from '../../src/faraday/currentEfficiency';
import { depositMass } from '../../src/faraday/depositMass';
import { depositTime } from '../../src/faraday/depositTime';
import { ecEquiv } from '../../src/faraday/ecEquiv';
import { gasVolume } from '../../src/faraday/gasVolume';
import { molarMass } from '../../src/faraday/molarMass';
import { plateThickness } from '../../src/faraday/plateThickness';
import { plateTime } from '../../src/faraday/plateTime';
import { specificEnergy } from '../../src/faraday/specificEnergy';
import { STANDARD_PRESSURE_BAR } from '../../src/constants';
import { type ArgSpec, domains, worksheet } from '../adapter';
import { electrons, num, optNum, temperatureC } from '../args';


/** A formula text ("Ni", "CuSO4·5H2O") or a molar mass in g/mol. */
const species: ArgSpec = { name: 'species', kind: 'species', domain: domains.positive, unit: 'g/mol' };

/** Current efficiency, a fraction in (0, 1], default 1. */
const efficiency: ArgSpec = optNum('efficiency', 1, domains.efficiency);

export const MOLARMASS = worksheet({ id: 'MOLARMASS', args: [{ name: 'formula', kind: 'text' }], compute: molarMass });

export const ECEQUIV = worksheet({ id: 'ECEQUIV', args: [species, electrons], compute: ecEquiv });

export const DEPOSITMASS = worksheet({
  id: 'DEPOSITMASS',
  args: [num('current_A', domains.nonNegative, 'A'), num('time_h', domains.nonNegative, 'h'), species, electrons, efficiency],
  compute: depositMass,
});

export const DEPOSITTIME = worksheet({
  id: 'DEPOSITTIME',
  args: [num('mass_g', domains.nonNegative, 'g'), num('current_A', domains.positive, 'A'), species, electrons, efficiency],
  compute: depositTime,
});

export const PLATETHICKNESS = worksheet({
  id: 'PLATETHICKNESS',
  args: [
    num('current_density_A_dm2', domains.nonNegative, 'A/dm²'),
    num('time_min', domains.nonNegative, 'min'),
    species,
    electrons,
    num('density_g_cm3', domains.positive, 'g/cm³'),
    efficiency,
  ],
  compute: plateThickness,
});

export const PLATETIME = worksheet({
  id: 'PLATETIME',
  args: [
    num('thickness_um', domains.nonNegative, 'µm'),
    num('current_density_A_dm2', domains.positive, 'A/dm²'),
    species,
    electrons,
    num('density_g_cm3', domains.positive, 'g/cm³'),
    efficiency,
  ],
  compute: plateTime,
});

export const CURRENTEFFICIENCY = worksheet({
  id: 'CURRENTEFFICIENCY',
  args: [num('mass_g', domains.nonNegative, 'g'), num('current_A', domains.positive, 'A'), num('time_h', domains.positive, 'h'), species, electrons],
  compute: currentEfficiency,
});

export const SPECIFICENERGY = worksheet({
  id: 'SPECIFICENERGY',
  args: [num('cell_voltage_V', domains.positive, 'V'), species, electrons, efficiency],
  compute: specificEnergy,
});

export const GASVOLUME = worksheet({
  id: 'GASVOLUME',
  args: [
    num('current_A', domains.nonNegative, 'A'),
    num('time_h', domains.nonNegative, 'h'),
    electrons,
    efficiency,
    temperatureC,
    { name: 'pressure_bar', kind: 'number', optional: true, default: STANDARD_PRESSURE_BAR, domain: domains.positive, unit: 'bar' },
    { name: 'saturated', kind: 'boolean', optional: true, default: false, unit: '' },
  ],
  compute: gasVolume,
});
