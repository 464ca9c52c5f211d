/**
 * Cathodic protection: criteria as the standards state them, survey helpers, galvanic-anode design
 * (DNV-RP-B401 / ISO 15589-2), impressed-current groundbeds and circuits, soil and seawater
 * resistivity. Each argument carries its name, unit, default, domain and help text.
 */
import { PLAUSIBLE, plausible } from '../../src/corrosion/plausible';
import { anodeCount } from '../../src/cp/anodeCount';
import { anodeData } from '../../src/cp/anodeData';
import { anodeLife } from '../../src/cp/anodeLife';
import { anodeMass } from '../../src/cp/anodeMass';
import { anodeOutput } from '../../src/cp/anodeOutput';
import { anodeResistance } from '../../src/cp/anodeResistance';
import { cableDrop } from '../../src/cp/cableDrop';
import { coatingBreakdown } from '../../src/cp/coatingBreakdown';
import { currentDemand } from '../../src/cp/currentDemand';
import { groundbedResistance } from '../../src/cp/groundbedResistance';
import { irDrop } from '../../src/cp/irDrop';
import { layerResistivity } from '../../src/cp/layerResistivity';
import { polarisationShift } from '../../src/cp/polarisationShift';
import { protectionCriterion } from '../../src/cp/protectionCriterion';
import { readingAt25 } from '../../src/cp/readingAt25';
import { rectifierVoltage } from '../../src/cp/rectifierVoltage';
import { seawaterResistivity } from '../../src/cp/seawaterResistivity';
import { wennerResistivity } from '../../src/cp/wennerResistivity';
import type { ElectrodeRow } from '../../src/table/types';
import { type ArgSpec, type Domain, domains, worksheet } from '../adapter';

/** An argument with its help text (the spec carries it for the generated reference). */
type Arg = ArgSpec & { readonly help: string };
const arg = (a: Arg): Arg => a;
const req = (name: string, unit: string, domain: Domain, help: string): Arg => arg({ name, kind: 'number', unit, domain, help });
const opt = (name: string, unit: string, def: number | string | null, domain: Domain, help: string): Arg =>
  arg({ name, kind: 'number', optional: true, default: def, unit, domain, help });
const text = (name: string, help: string, def?: string): Arg =>
  arg(def === undefined ? { name, kind: 'text', unit: '', help } : { name, kind: 'text', optional: true, default: def, unit: '', help });

/** Fractions 0…1 inclusive (breakdown factors). */
const fraction: Domain = { test: (x) => x >= 0 && x <= 1, accepts: 'between 0 and 1' };
const volts = (name: string, help: string): Arg => req(name, 'V', domains.any, `${help} In V (plausible −5 to 5 V; a value like −850 is refused as millivolts).`);
const V = (name: string, x: number): number => plausible(name, x, PLAUSIBLE.volts);

export const PROTECTIONCRITERION = worksheet({
  id: 'PROTECTIONCRITERION',
  args: [
    arg({ name: 'electrode', kind: 'electrode', unit: '', help: 'Reference electrode the reading is taken with: "CSE", "Ag/AgCl/seawater" or "Zn/seawater" (aliases accepted).' }),
    text('condition', '"standard" (default), "polarisation" (100 mV shift), "limit" (most negative potential), "anaerobic", "hightemperature" or "highstrength".', 'standard'),
  ],
  compute: (row: ElectrodeRow, condition: string) => protectionCriterion(row.key, condition).value,
  usesTable: true,
});

export const POLARIZATIONSHIFT = worksheet({
  id: 'POLARIZATIONSHIFT',
  args: [volts('instant_off_V', 'Instant-OFF potential.'), volts('native_V', 'Native (static) potential before protection, same electrode.')],
  compute: (off: number, native: number) => polarisationShift(V('instant_off_V', off), V('native_V', native)),
});

export const IRDROP = worksheet({
  id: 'IRDROP',
  args: [volts('on_V', 'ON potential (current flowing).'), volts('instant_off_V', 'Instant-OFF potential, same electrode.')],
  compute: (on: number, off: number) => irDrop(V('on_V', on), V('instant_off_V', off)),
});

export const READINGAT25 = worksheet({
  id: 'READINGAT25',
  args: [
    volts('reading_V', 'The reading against the reference electrode.'),
    arg({ name: 'electrode', kind: 'electrode', unit: '', help: 'The reference electrode used.' }),
    req('electrode_temperature_C', '°C', domains.temperature, 'Temperature of the reference electrode itself (0 to 100 °C).'),
  ],
  compute: (e: number, row: ElectrodeRow, t: number) => readingAt25(V('reading_V', e), row, t),
  usesTable: true,
});

export const COATINGBREAKDOWN = worksheet({
  id: 'COATINGBREAKDOWN',
  args: [
    req('a', '', fraction, 'Initial breakdown a (0 to 1), from the standard’s table for the coating category.'),
    req('b', '1/year', fraction, 'Yearly breakdown b (0 to 1 per year).'),
    req('design_life_years', 'years', domains.nonNegative, 'Design life t (0 to 200 years).'),
    text('phase', '"initial", "mean" (default) or "final".', 'mean'),
  ],
  compute: (a: number, b: number, t: number, phase: string) => coatingBreakdown(a, b, plausible('design_life_years', t, PLAUSIBLE.years), phase),
});

export const CURRENTDEMAND = worksheet({
  id: 'CURRENTDEMAND',
  args: [
    req('area_m2', 'm²', domains.nonNegative, 'Surface area.'),
    req('current_density_A_m2', 'A/m²', domains.nonNegative, 'Design current density for the phase, in A/m² (about 0.01 to 0.3; above 5 is refused as mA/m²).'),
    opt('breakdown_factor', '', 1, fraction, 'Coating breakdown factor for the same phase, 0 to 1 (default 1, bare steel).'),
  ],
  compute: currentDemand,
});

export const ANODEMASS = worksheet({
  id: 'ANODEMASS',
  args: [
    req('mean_current_A', 'A', domains.nonNegative, 'Mean current demand.'),
    req('design_life_years', 'years', domains.nonNegative, 'Design life (0 to 200 years).'),
    req('capacity_Ah_per_kg', 'A·h/kg', domains.positive, 'Electrochemical capacity of the anode material (100 to 3000 A·h/kg; ANODEDATA).'),
    req('utilisation', '', domains.efficiency, 'Utilisation factor u, a fraction in (0, 1] (DNV-RP-B401 Table 10-8: 0.90 long slender stand-off).'),
  ],
  compute: anodeMass,
});

export const ANODELIFE = worksheet({
  id: 'ANODELIFE',
  args: [
    req('net_mass_kg', 'kg', domains.nonNegative, 'Net anode mass installed.'),
    req('capacity_Ah_per_kg', 'A·h/kg', domains.positive, 'Electrochemical capacity (100 to 3000 A·h/kg).'),
    req('utilisation', '', domains.efficiency, 'Utilisation factor, (0, 1].'),
    req('mean_current_A', 'A', domains.positive, 'Mean current drawn.'),
  ],
  compute: anodeLife,
});

const len = (name: string, help: string): Arg => opt(name, 'm', null, domains.positive, help);
export const ANODERESISTANCE = worksheet({
  id: 'ANODERESISTANCE',
  args: [
    text('shape', '"long-standoff" (L ≥ 4r), "short-standoff" (L < 4r), "long-flush" (L ≥ 4·width and 4·thickness) or "bracelet" (also short flush-mounted and other shapes).'),
    req('resistivity_ohm_m', 'Ω·m', domains.positive, 'Resistivity of the electrolyte (seawater about 0.2 to 0.35 Ω·m).'),
    len('length_m', 'Anode length (stand-off and flush shapes).'),
    len('radius_m', 'Equivalent radius (stand-off shapes; for a non-cylindrical section, its perimeter/2π).'),
    len('width_m', 'Width (long-flush).'),
    len('thickness_m', 'Thickness (long-flush).'),
    opt('area_m2', 'm²', null, domains.positive, 'Exposed anode area (bracelet).'),
    opt('standoff_m', 'm', null, domains.nonNegative, 'Clear distance to the protected surface (stand-off shapes; omitted = at least 0.30 m; 0.15 to 0.30 m multiplies by 1.3; under 0.15 m refused).'),
  ],
  compute: (shape: string, rho: number, L: number | null, r: number | null, w: number | null, t: number | null, A: number | null, so: number | null) =>
    anodeResistance(shape, rho, { lengthM: L, radiusM: r, widthM: w, thicknessM: t, areaM2: A, standoffM: so }),
});

export const ANODEOUTPUT = worksheet({
  id: 'ANODEOUTPUT',
  args: [
    volts('protection_V', 'Design protective potential of the structure (e.g. −0.80 V Ag/AgCl/seawater).'),
    volts('anode_potential_V', 'Design closed-circuit potential of the anode, on the same electrode (e.g. −1.05 V).'),
    req('resistance_ohm', 'Ω', domains.positive, 'Anode resistance (ANODERESISTANCE).'),
  ],
  compute: anodeOutput,
});

export const ANODECOUNT = worksheet({
  id: 'ANODECOUNT',
  args: [
    req('current_demand_A', 'A', domains.nonNegative, 'Current demand (initial or final).'),
    req('output_per_anode_A', 'A', domains.positive, 'Current output of one anode for the same phase (ANODEOUTPUT).'),
    opt('total_mass_kg', 'kg', null, domains.nonNegative, 'Total net mass needed (ANODEMASS); give with net_mass_per_anode_kg.'),
    opt('net_mass_per_anode_kg', 'kg', null, domains.positive, 'Net mass of one anode.'),
  ],
  compute: anodeCount,
});

export const ANODEDATA = worksheet({
  id: 'ANODEDATA',
  args: [
    text('anode', 'Anode material: "Al-Zn-In/seawater", "Al-Zn-In/sediment", "Zn/seawater", "Zn/sediment", "Mg/standard", "Mg/high-potential" (aliases such as "zinc" accepted).'),
    text('property', '"capacity" (A·h/kg), "potential" (V on the row’s electrode), "scale" or "source".', 'capacity'),
  ],
  compute: anodeData,
});

export const GROUNDBEDRESISTANCE = worksheet({
  id: 'GROUNDBEDRESISTANCE',
  args: [
    text('layout', '"vertical", "horizontal" or "parallel" (several vertical anodes in a line).'),
    req('resistivity_ohm_m', 'Ω·m', domains.positive, 'Soil (or backfill) resistivity.'),
    req('length_m', 'm', domains.positive, 'Length of one anode (or of its backfill column).'),
    req('diameter_m', 'm', domains.positive, 'Diameter of the anode (or backfill column).'),
    opt('count', '', 1, domains.positiveInteger, 'Number of anodes ("parallel", at least 2).'),
    opt('spacing_m', 'm', null, domains.positive, 'Spacing between anodes ("parallel").'),
    opt('depth_m', 'm', null, domains.positive, 'Depth below the surface ("horizontal").'),
  ],
  compute: groundbedResistance,
});

export const RECTIFIERVOLTAGE = worksheet({
  id: 'RECTIFIERVOLTAGE',
  args: [
    req('current_A', 'A', domains.nonNegative, 'Design current.'),
    req('circuit_resistance_ohm', 'Ω', domains.nonNegative, 'Circuit resistance: groundbed + cables + structure-to-electrolyte.'),
    opt('back_emf_V', 'V', 2, domains.nonNegative, 'Back EMF between anode and structure (default 2 V, common practice).'),
  ],
  compute: rectifierVoltage,
});

export const CABLEDROP = worksheet({
  id: 'CABLEDROP',
  args: [
    req('current_A', 'A', domains.nonNegative, 'Current in the cable.'),
    req('length_m', 'm', domains.nonNegative, 'Length of conductor in the circuit.'),
    req('resistance_ohm_per_km', 'Ω/km', domains.positive, 'Conductor resistance per km (cable data, at its temperature).'),
  ],
  compute: cableDrop,
});

export const WENNERRESISTIVITY = worksheet({
  id: 'WENNERRESISTIVITY',
  args: [req('spacing_m', 'm', domains.positive, 'Pin spacing a.'), req('resistance_ohm', 'Ω', domains.nonNegative, 'Resistance read on the meter.')],
  compute: wennerResistivity,
});

export const LAYERRESISTIVITY = worksheet({
  id: 'LAYERRESISTIVITY',
  args: [
    req('spacing1_m', 'm', domains.positive, 'Smaller pin spacing a1.'),
    req('resistance1_ohm', 'Ω', domains.positive, 'Resistance at a1.'),
    req('spacing2_m', 'm', domains.positive, 'Larger pin spacing a2.'),
    req('resistance2_ohm', 'Ω', domains.positive, 'Resistance at a2 (smaller than at a1).'),
  ],
  compute: layerResistivity,
});

export const SEAWATERRESISTIVITY = worksheet({
  id: 'SEAWATERRESISTIVITY',
  args: [
    req('salinity', '', domains.positive, 'Practical salinity (PSS-78, about g/kg; 2 to 42, open sea about 35).'),
    req('temperature_C', '°C', domains.temperature, 'Temperature (−2 to 35 °C, ITS-90).'),
  ],
  compute: seawaterResistivity,
});
