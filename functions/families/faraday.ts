/** Faraday's law and production: molar mass, electrochemical equivalent, deposits, plating, energy, gas. */
import { currentEfficiency } from '../../src/faraday/currentEfficiency';
import { depositMass } from '../../src/faraday/depositMass';
import { depositTime } from '../../src/faraday/depositTime';
import { ecEquiv } from '../../src/faraday/ecEquiv';
import { gasVolume } from '../../src/faraday/gasVolume';
import { molarMass } from '../../src/faraday/molarMass';
import { plateThickness } from '../../src/faraday/plateThickness';
import { plateTime } from '../../src/faraday/plateTime';
import { specificCapacity } from '../../src/faraday/specificCapacity';
import { specificEnergy } from '../../src/faraday/specificEnergy';
import { STANDARD_PRESSURE_BAR } from '../../src/constants';
import { type ArgSpec, domains, worksheet } from '../adapter';
import { electrons, num, optNum, temperatureC } from '../args';


/** A formula text ("Ni", "CuSO4·5H2O") or a molar mass in g/mol. */
const species: ArgSpec = { name: 'species', kind: 'species', domain: domains.positive, unit: 'g/mol' };

/** Current efficiency, a fraction in (0, 1], default 1. */
const efficiency: ArgSpec = optNum('efficiency', 1, domains.efficiency);

export const MOLARMASS = worksheet({
  id: 'MOLARMASS',
  description: 'Molar mass of a formula in g/mol from IUPAC standard atomic weights, summed exactly in decimal; parentheses, square brackets and hydrate dots (·, * or .) understood. A space is read only as a hydrate dot before a number ("CuSO4 5H2O" = "CuSO4·5H2O"); any other space inside a formula is #VALUE!. Case matters: a capital starts a new element, so "CO" is carbon monoxide (28.01) and "Co" cobalt (58.93); the deposition functions refuse "NI", "CU", "CO"… and ask which element was meant. Unicode subscripts and superscripts (NiSO₄, Cu²⁺) read as ASCII.',
  args: [
    { name: 'formula', kind: 'text', help: 'Chemical formula, e.g. "NiSO4·6H2O" or "K3[Fe(CN)6]" (element symbols are case-sensitive).' },
  ],
  result: 'Molar mass in g/mol.',
  helpAnchor: 'molarmass',
  compute: molarMass,
});

export const ECEQUIV = worksheet({
  id: 'ECEQUIV',
  description: 'Electrochemical equivalent M·3600/(nF), in g/(A·h).',
  args: [
    { ...species, help: 'Formula such as "Ni", or a molar mass in g/mol.' },
    { ...electrons, help: 'Electrons per formula unit (a whole number ≥ 1).' },
  ],
  result: 'g/(A·h).',
  helpAnchor: 'ecequiv',
  compute: ecEquiv,
});

export const DEPOSITMASS = worksheet({
  id: 'DEPOSITMASS',
  description: 'Mass deposited or dissolved by a current (Faraday\'s law), in g.',
  args: [
    { ...num('current_A', domains.nonNegative, 'A'), help: 'Current, in A.' },
    { ...num('time_h', domains.nonNegative, 'h'), help: 'Time, in h (an Excel time value is a fraction of a day: multiply it by 24).' },
    { ...species, help: 'Formula such as "Cu", or a molar mass in g/mol.' },
    { ...electrons, help: 'Electrons per formula unit (a whole number ≥ 1).' },
    { ...efficiency, help: 'Current efficiency as a fraction, 0 to 1 (default 1).' },
  ],
  result: 'Mass in g.',
  helpAnchor: 'depositmass',
  compute: depositMass,
});

export const DEPOSITTIME = worksheet({
  id: 'DEPOSITTIME',
  description: 'Time to deposit a mass at a current (Faraday\'s law), in h.',
  args: [
    { ...num('mass_g', domains.nonNegative, 'g'), help: 'Mass wanted, in g.' },
    { ...num('current_A', domains.positive, 'A'), help: 'Current, in A.' },
    { ...species, help: 'Formula such as "Cu", or a molar mass in g/mol.' },
    { ...electrons, help: 'Electrons per formula unit (a whole number ≥ 1).' },
    { ...efficiency, help: 'Current efficiency as a fraction, 0 to 1 (default 1).' },
  ],
  result: 'Time in h.',
  helpAnchor: 'deposittime',
  compute: depositTime,
});

export const PLATETHICKNESS = worksheet({
  id: 'PLATETHICKNESS',
  description: 'Thickness of a uniform deposit, in µm, from current density (A/dm²), time (min) and deposit density (g/cm³).',
  args: [
    { ...num('current_density_A_dm2', domains.nonNegative, 'A/dm²'), help: 'Current density, in A/dm².' },
    { ...num('time_min', domains.nonNegative, 'min'), help: 'Plating time, in min (an Excel time value is a fraction of a day: multiply it by 1440).' },
    { ...species, help: 'Formula such as "Ni", or a molar mass in g/mol.' },
    { ...electrons, help: 'Electrons per formula unit (a whole number ≥ 1).' },
    { ...num('density_g_cm3', domains.positive, 'g/cm³'), help: 'Density of the deposit, in g/cm³.' },
    { ...efficiency, help: 'Cathode current efficiency as a fraction, 0 to 1 (default 1).' },
  ],
  result: 'Thickness in µm.',
  helpAnchor: 'platethickness',
  compute: plateThickness,
});

export const PLATETIME = worksheet({
  id: 'PLATETIME',
  description: 'Time to plate a thickness, in min, at a current density (A/dm²) and deposit density (g/cm³).',
  args: [
    { ...num('thickness_um', domains.nonNegative, 'µm'), help: 'Thickness wanted, in µm.' },
    { ...num('current_density_A_dm2', domains.positive, 'A/dm²'), help: 'Current density, in A/dm².' },
    { ...species, help: 'Formula such as "Ni", or a molar mass in g/mol.' },
    { ...electrons, help: 'Electrons per formula unit (a whole number ≥ 1).' },
    { ...num('density_g_cm3', domains.positive, 'g/cm³'), help: 'Density of the deposit, in g/cm³.' },
    { ...efficiency, help: 'Cathode current efficiency as a fraction, 0 to 1 (default 1).' },
  ],
  result: 'Time in min.',
  helpAnchor: 'platetime',
  compute: plateTime,
});

export const CURRENTEFFICIENCY = worksheet({
  id: 'CURRENTEFFICIENCY',
  description: 'Current efficiency: mass obtained over the Faraday\'s-law mass for the charge passed, as a fraction (above 1 means a measurement to question).',
  args: [
    { ...num('mass_g', domains.nonNegative, 'g'), help: 'Mass obtained, in g.' },
    { ...num('current_A', domains.positive, 'A'), help: 'Current, in A.' },
    { ...num('time_h', domains.positive, 'h'), help: 'Time, in h (an Excel time value is a fraction of a day: multiply it by 24).' },
    { ...species, help: 'Formula such as "Cu", or a molar mass in g/mol.' },
    { ...electrons, help: 'Electrons per formula unit (a whole number ≥ 1).' },
  ],
  result: 'Efficiency as a fraction.',
  helpAnchor: 'currentefficiency',
  compute: currentEfficiency,
});

export const SPECIFICENERGY = worksheet({
  id: 'SPECIFICENERGY',
  description: 'Specific electrical energy of an electrolysis, U·nF/(efficiency·M), in kWh per kg of product.',
  args: [
    { ...num('cell_voltage_V', domains.positive, 'V'), help: 'Cell voltage, in V.' },
    { ...species, help: 'Product formula such as "Cu", or a molar mass in g/mol.' },
    { ...electrons, help: 'Electrons per formula unit (a whole number ≥ 1).' },
    { ...efficiency, help: 'Current efficiency as a fraction, 0 to 1 (default 1).' },
  ],
  result: 'kWh/kg.',
  helpAnchor: 'specificenergy',
  compute: specificEnergy,
});

export const SPECIFICCAPACITY = worksheet({
  id: 'SPECIFICCAPACITY',
  description: 'Theoretical specific charge capacity of an electrode material, n·F/(3.6·M), in mA·h per g of the formula given (graphite\'s 372 mA·h/g is per g of C6).',
  args: [
    { ...species, help: 'Formula of the material such as "LiFePO4" or "C6", or a molar mass in g/mol.' },
    { ...electrons, help: 'Electrons (or lithium ions) exchanged per formula unit (a whole number ≥ 1).' },
  ],
  result: 'mA·h/g.',
  helpAnchor: 'specificcapacity',
  compute: specificCapacity,
});

export const GASVOLUME = worksheet({
  id: 'GASVOLUME',
  description: 'Volume of gas evolved by a current (ideal gas, dry basis unless saturated is TRUE), in L.',
  args: [
    { ...num('current_A', domains.nonNegative, 'A'), help: 'Current, in A.' },
    { ...num('time_h', domains.nonNegative, 'h'), help: 'Time, in h (hours, not an Excel time value: an Excel time is a fraction of a day, multiply it by 24; 30 min is 0.5).' },
    { ...electrons, help: 'Electrons per gas molecule (2 for H2 and Cl2, 4 for O2).' },
    { ...efficiency, help: 'Current efficiency as a fraction, 0 to 1 (default 1).' },
    { ...temperatureC, help: 'Gas temperature in °C (default 25).' },
    { name: 'pressure_bar', kind: 'number', optional: true, default: STANDARD_PRESSURE_BAR, domain: domains.positive, unit: 'bar', help: 'Total gas pressure in bar (default 1).' },
    { name: 'saturated', kind: 'boolean', optional: true, default: false, unit: '', help: 'FALSE: dry gas at the total pressure. TRUE: gas saturated with water vapour at the temperature (IAPWS-IF97 saturation pressure), so the volume is larger by p/(p − p_water) (default FALSE).' },
  ],
  result: 'Volume in L.',
  helpAnchor: 'gasvolume',
  compute: gasVolume,
});
