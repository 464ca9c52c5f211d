// The demo scenario: an invented week of electrochemistry work in one workbook.
//
// Every company, line, pipeline, stack and person here is invented. Input values are invented
// but plausible; every computed value comes from the CELLWRIGHT functions bundle when the demo runs
// (npm run demo). The layout language of the sheets is described in scripts/lib/workbook.mjs:
// a quantity is { key, label, value | formula, unit, note }, a formula names other quantities
// as {key}, table columns as {table.column}, and spills like it does in Excel.

export const scenario = {
  title: 'Cellwright demo: a week of electrochemistry in one workbook (invented scenario)',
  summary: [
    'Quorvane Plating Works, an invented contract plater, runs a bright-nickel line and an acid-copper line. Its process engineer plans plating times for the parts on order, checks the current efficiency from weighed test panels, and prices energy per kilogram deposited.',
    'The same engineer treats the rinse waters (copper recovery by cementation, chromium(VI) reduction) and keeps the bath chemistry in a QA-checked template: potentials at real concentrations and pH, with activity corrections.',
    'A consulting colleague reviews the close-interval survey of the Lintravel trunk main, an invented buried steel water main under cathodic protection, surveyed with a portable Cu/CuSO4 electrode and, at the estuary crossing, with a silver/silver chloride seawater electrode; the contract states its criterion against Cu/CuSO4.',
    'A third sheet sizes the Tessivar PS-2 pilot stack, an invented alkaline water electrolyser: reversible and thermoneutral voltages against temperature, hydrogen and oxygen output, and energy per kilogram of hydrogen.',
    'The last sheet is a what-if table: the copper half-cell potential over concentration and temperature, from one spilled formula.',
  ],
  howToUse: [
    'Each sheet lists inputs (plain values, yellow) and results (live CELLWRIGHT formulas, green). Every formula is stored with the value the Cellwright functions computed when this file was written.',
    'With the Cellwright add-in loaded in Excel (npm start, then sideload manifest.xml), change any input and the results recalculate; Ctrl+Alt+F9 recalculates every formula through the add-in.',
    'This file was written by the Cellwright demo script, not by Excel. Its formulas are stored in the form Excel uses for add-in functions, so Excel with the add-in loaded recognises them when it opens the file.',
    'Without the add-in, a viewer that shows stored values shows the results as computed. A program that recalculates a cell without the add-in cannot compute it and shows an error there instead (LibreOffice, for one, recalculates spilled tables and text results on opening). The terminal output of npm run demo lists every value.',
    'Spilled results (tables computed by one formula) are stored as dynamic arrays: the formula sits in the top-left cell and its results spill over the range they fill.',
    'The potentials come from the potential table in use: the built-in table unless the workbook holds its own (see the task pane). Every row of that table names its source; CELLWRIGHT.SOURCE shows it.',
    'Regenerate this file with: npm run demo',
  ],
  cautions: [
    'This workbook is a demonstration with invented names and inputs. It is not a design, a survey report or an operating procedure for any real plant, pipeline or stack.',
    'Gases: water electrolysis and many plating and charging operations evolve hydrogen and oxygen; their mixtures are explosive over a wide range. Chlorine evolves from chloride electrolytes. Hydrogen cyanide forms when cyanide baths meet acid: keep cyanide and acid processes, drains and drag-out apart.',
    'Baths: cyanide and chromium(VI) baths are acutely toxic, and chromium(VI) is a carcinogen. Handling, ventilation, monitoring and waste treatment follow the applicable regulations and the site\'s permits.',
    'Electricity: rectifiers, DC bus bars and battery banks deliver very large currents; short circuits cause burns, arcs and fires even at low voltage. Battery banks and electrolyser stacks stay energised when the supply is off.',
    'Cathodic protection: which criterion applies, how IR drop is handled, and whether a structure is adequately protected are decisions of the responsible corrosion engineer under the applicable standards and local codes. The criterion in this workbook is an input from an invented contract.',
    'Defer to local codes, standards and licensed professional practice. Check every calculation template against independent data before relying on it.',
  ],
  sheets: [
    /* ------------------------------------------------------------------------------------ */
    {
      name: 'Plating',
      title: 'Quorvane Plating Works (invented): bright-nickel and acid-copper lines',
      intro: [
        "Plating times for this week's orders, current efficiency from weighed test panels, and energy per kilogram deposited (Faraday's law).",
      ],
      blocks: [
        { section: 'Bright-nickel line: order 24-118, brackets, 25 µm minimum' },
        { key: 'niT', label: 'Specified thickness', value: 25, unit: 'µm', note: 'customer drawing (invented)' },
        { key: 'niCd', label: 'Cathode current density', value: 4.0, unit: 'A/dm²', note: 'line setting' },
        { key: 'niEffAssumed', label: 'Cathode efficiency (planning value)', value: 0.955, unit: 'fraction', note: 'from last month\'s panels' },
        { key: 'niRho', label: 'Density of nickel', value: 8.908, unit: 'g/cm³', note: 'handbook value' },
        { key: 'niN', label: 'Electrons per Ni atom (Ni²⁺ + 2e⁻ → Ni)', value: 2 },
        { key: 'niEq', label: 'Electrochemical equivalent of Ni', formula: '=CELLWRIGHT.ECEQUIV("Ni",{niN})', unit: 'g/(A·h)', digits: 4 },
        { key: 'niTime', label: 'Plating time to the specified thickness', formula: '=CELLWRIGHT.PLATETIME({niT},{niCd},"Ni",{niN},{niRho},{niEffAssumed})', unit: 'min', digits: 1, note: 'set the hoist program to the next whole minute' },
        { key: 'niCycle', label: 'Standard hoist cycle on the line', value: 30, unit: 'min' },
        { key: 'niCycleT', label: 'Thickness in one standard cycle', formula: '=CELLWRIGHT.PLATETHICKNESS({niCd},{niCycle},"Ni",{niN},{niRho},{niEffAssumed})', unit: 'µm', digits: 1, note: 'below the 25 µm minimum: this order needs the longer program (average thickness; recesses run thinner)' },
        { section: 'Bright-nickel line: weighed test panels (Monday)' },
        { key: 'niArea', label: 'Panel area on the rack', value: 6.0, unit: 'dm²' },
        { key: 'niI', label: 'Rack current', formula: '={niCd}*{niArea}', unit: 'A', digits: 1 },
        { key: 'niHours', label: 'Time on load', value: 0.75, unit: 'h' },
        { key: 'niMass', label: 'Mass gained (weighed, dried)', value: 18.82, unit: 'g' },
        { key: 'niMass100', label: 'Mass at 100 % efficiency', formula: '=CELLWRIGHT.DEPOSITMASS({niI},{niHours},"Ni",{niN})', unit: 'g', digits: 2 },
        { key: 'niEff', label: 'Measured cathode efficiency', formula: '=CELLWRIGHT.CURRENTEFFICIENCY({niMass},{niI},{niHours},"Ni",{niN})', unit: 'fraction', digits: 3, note: 'a value above 1 means a weighing or current reading to question' },
        { key: 'niV', label: 'Tank voltage (rectifier display)', value: 5.2, unit: 'V' },
        { label: 'DC energy per kg of nickel deposited', formula: '=CELLWRIGHT.SPECIFICENERGY({niV},"Ni",{niN},{niEff})', unit: 'kWh/kg', digits: 2, note: 'at the measured efficiency; rectifier losses not included' },

        { section: 'Acid-copper line: order 24-131, bus-bar links, 20 µm' },
        { key: 'cuT', label: 'Specified thickness', value: 20, unit: 'µm' },
        { key: 'cuCd', label: 'Cathode current density', value: 2.5, unit: 'A/dm²' },
        { key: 'cuEffAssumed', label: 'Cathode efficiency (planning value)', value: 0.98, unit: 'fraction' },
        { key: 'cuRho', label: 'Density of copper', value: 8.96, unit: 'g/cm³', note: 'handbook value' },
        { key: 'cuN', label: 'Electrons per Cu atom (Cu²⁺ + 2e⁻ → Cu)', value: 2 },
        { key: 'cuEq', label: 'Electrochemical equivalent of Cu', formula: '=CELLWRIGHT.ECEQUIV("Cu",{cuN})', unit: 'g/(A·h)', digits: 4 },
        { label: 'Plating time to the specified thickness', formula: '=CELLWRIGHT.PLATETIME({cuT},{cuCd},"Cu",{cuN},{cuRho},{cuEffAssumed})', unit: 'min', digits: 1 },
        { key: 'cuArea', label: 'Test panel area', value: 4.0, unit: 'dm²' },
        { key: 'cuI', label: 'Panel current', formula: '={cuCd}*{cuArea}', unit: 'A', digits: 1 },
        { key: 'cuHours', label: 'Time on load', value: 1.5, unit: 'h' },
        { key: 'cuMass', label: 'Mass gained (weighed, dried)', value: 17.45, unit: 'g' },
        { key: 'cuEff', label: 'Measured cathode efficiency', formula: '=CELLWRIGHT.CURRENTEFFICIENCY({cuMass},{cuI},{cuHours},"Cu",{cuN})', unit: 'fraction', digits: 3 },
        { key: 'cuV', label: 'Tank voltage', value: 1.9, unit: 'V' },
        { label: 'DC energy per kg of copper deposited', formula: '=CELLWRIGHT.SPECIFICENERGY({cuV},"Cu",{cuN},{cuEff})', unit: 'kWh/kg', digits: 2 },
        { key: 'cuLineI', label: 'Whole-line current (all racks)', value: 600, unit: 'A' },
        { key: 'cuShift', label: 'Shift length', value: 7.5, unit: 'h' },
        { label: 'Copper plated per shift', formula: '=CELLWRIGHT.DEPOSITMASS({cuLineI},{cuShift},"Cu",{cuN},{cuEff})/1000', unit: 'kg', digits: 2, note: 'anode copper to replace, about the same' },
        { label: 'Time to plate 1 kg of copper on the whole line', formula: '=CELLWRIGHT.DEPOSITTIME(1000,{cuLineI},"Cu",{cuN},{cuEff})', unit: 'h', digits: 2 },

        { section: 'Acid-copper bath: copper sulfate addition' },
        { key: 'saltM', label: 'Molar mass of copper sulfate pentahydrate', formula: '=CELLWRIGHT.MOLARMASS("CuSO4·5H2O")', unit: 'g/mol', digits: 3 },
        { key: 'cuM', label: 'Molar mass of copper', formula: '=CELLWRIGHT.MOLARMASS("Cu")', unit: 'g/mol', digits: 3 },
        { key: 'tankL', label: 'Working volume of the copper tank', value: 2400, unit: 'L' },
        { key: 'cuRaise', label: 'Raise copper metal by (from the weekly analysis)', value: 4.5, unit: 'g/L' },
        { label: 'Copper sulfate pentahydrate to add', formula: '={cuRaise}*{tankL}*{saltM}/{cuM}/1000', unit: 'kg', digits: 1, note: 'dissolve in bath solution in a separate tank; not directly into the plating tank' },
      ],
    },

    /* ------------------------------------------------------------------------------------ */
    {
      name: 'Bath chemistry',
      title: 'Quorvane Plating Works (invented): rinses, waste treatment and bath potentials',
      intro: [
        'Half-cell potentials at real concentrations and pH, with activity corrections (Davies and extended Debye–Hückel), and QA checks of the potential table.',
        'Potentials are in V vs SHE, reduction potentials of the couple as written in the table.',
      ],
      blocks: [
        { table: 'ions', caption: 'Drag-out rinse after the acid-copper line (invented analysis, 25 °C)', columns: [
          { key: 'ion', header: 'Ion', values: ['Cu2+', 'SO4^2-', 'H+'] },
          { key: 'm', header: 'Molality', unit: 'mol/kg', values: [0.015, 0.025, 0.02] },
          { key: 'z', header: 'Charge', values: [2, -2, 1] },
        ] },
        { section: 'Activity of copper in the rinse' },
        { key: 'I', label: 'Ionic strength', formula: '=CELLWRIGHT.IONICSTRENGTH({ions.m},{ions.z})', unit: 'mol/kg', digits: 4 },
        { key: 'gCu', label: 'γ(Cu²⁺), Davies', formula: '=CELLWRIGHT.ACTIVITYCOEF(2,{I})', digits: 4 },
        { label: 'γ(Cu²⁺), extended Debye–Hückel, ion size 6 Å', formula: '=CELLWRIGHT.ACTIVITYCOEF(2,{I},"EDH",,6)', digits: 4, note: 'two models side by side: their difference is part of the uncertainty' },
        { label: 'Mean γ± of CuSO4, Davies', formula: '=CELLWRIGHT.MEANACTIVITYCOEF(2,-2,{I})', digits: 4, note: 'for a 2:2 salt the Davies mean equals the single-ion value' },
        { key: 'aCu', label: 'Activity of Cu²⁺', formula: '={ions.m#1}*{gCu}', digits: 5 },
        { key: 'eCu', label: 'E(Cu²⁺/Cu) with the activity', formula: '=CELLWRIGHT.HALFCELL("Cu2+/Cu",{aCu})', unit: 'V', digits: 4 },
        { key: 'eCuIdeal', label: 'E(Cu²⁺/Cu) taking molality as activity', formula: '=CELLWRIGHT.HALFCELL("Cu2+/Cu",{ions.m#1})', unit: 'V', digits: 4 },
        { label: 'What the activity correction changes', formula: '=({eCu}-{eCuIdeal})*1000', unit: 'mV', digits: 1 },
        { label: 'The same through the Nernst equation', formula: '=CELLWRIGHT.NERNST(CELLWRIGHT.STDPOTENTIAL("Cu2+/Cu"),2,1/{aCu})', unit: 'V', digits: 4, note: 'Q = 1/a(Cu²⁺) for Cu²⁺ + 2e⁻ → Cu' },

        { section: 'Copper recovery from the rinse by cementation on scrap iron' },
        { key: 'cemEmf', label: 'Standard EMF, Cu²⁺/Cu against Fe²⁺/Fe', formula: '=CELLWRIGHT.EMF("Cu2+/Cu","Fe2+/Fe")', unit: 'V', digits: 4 },
        { label: 'Overall reaction', formula: '=CELLWRIGHT.CELLREACTION("Cu2+/Cu","Fe2+/Fe")' },
        { key: 'cemN', label: 'Electrons in the overall reaction', formula: '=CELLWRIGHT.CELLELECTRONS("Cu2+/Cu","Fe2+/Fe")' },
        { label: 'ΔG° of the reaction', formula: '=CELLWRIGHT.DELTAG({cemEmf},{cemN})', unit: 'kJ/mol', digits: 1 },
        { label: 'log10 K', formula: '=CELLWRIGHT.LOGK({cemEmf},{cemN})', digits: 2 },
        { key: 'cemK', label: 'K', formula: '=CELLWRIGHT.KEQ({cemEmf},{cemN})' },
        { key: 'aFe', label: 'Activity of Fe²⁺ in the spent rinse (estimate)', value: 0.05 },
        { label: 'Cell potential at the rinse composition', formula: '=CELLWRIGHT.CELLPOTENTIAL("Cu2+/Cu","Fe2+/Fe",{aFe}/{aCu})', unit: 'V', digits: 4, note: 'Q = a(Fe²⁺)/a(Cu²⁺); positive: the reaction runs as written' },
        { label: 'Cu²⁺ activity left at equilibrium', formula: '={aFe}/{cemK}', note: 'thermodynamics is not the limit; contact time and surface are' },

        { section: 'Chromium(VI) reduction before discharge (passivation rinse, invented analysis)' },
        { key: 'aCr6', label: 'Activity of Cr2O7²⁻', value: 2e-4 },
        { key: 'aCr3', label: 'Activity of Cr³⁺', value: 1e-4 },
        { table: 'crph', columns: [
          { key: 'pH', header: 'pH', values: [2.0, 2.5, 3.0, 5.0, 7.0] },
          { key: 'E', header: 'E(Cr2O7²⁻/Cr³⁺)', unit: 'V', formula: '=CELLWRIGHT.HALFCELL("Cr2O7^2-/Cr3+",{aCr6},{aCr3},{crph.pH})', digits: 4 },
        ] },
        { text: 'The oxidizing power of dichromate falls by about 0.14 V per pH unit (14 H+ per 6 electrons), which is why the reduction step runs acid.' },

        { section: 'Nickel bath: why cathode efficiency is below 1' },
        { key: 'aNi', label: 'Activity of Ni²⁺ in the bath (shop estimate)', value: 0.25, note: 'bath ionic strength is far beyond the Davies range; an input, not a computed value' },
        { key: 'bathPH', label: 'Bath pH', value: 4.0 },
        { label: 'E(Ni²⁺/Ni) in the bath', formula: '=CELLWRIGHT.HALFCELL("Ni2+/Ni",{aNi})', unit: 'V', digits: 4 },
        { label: 'E(H⁺/H2) at the bath pH, 1 bar H2', formula: '=CELLWRIGHT.HALFCELL("H+/H2",,,{bathPH})', unit: 'V', digits: 4, note: 'hydrogen is the more noble reaction: part of the current always goes to H2' },
        { label: 'Nernst slope for n = 2 at 55 °C', formula: '=CELLWRIGHT.NERNSTSLOPE(2,55)', unit: 'V/decade', digits: 5 },
        { label: 'Concentration cell: depleted cathode film (a = 0.05) against bulk (a = 0.25)', formula: '=CELLWRIGHT.CONCCELL(0.05,{aNi},2,55)', unit: 'V', digits: 4, note: 'the concentration overpotential that depletion alone costs' },

        { table: 'mn', caption: 'Permanganate titration of iron in the pickling acid: potential near the end point', columns: [
          { key: 'sp', header: 'Species', values: ['MnO4-', 'Mn2+', 'H+'] },
          { key: 'a', header: 'Activity', values: [1e-3, 5e-3, 0.5] },
        ] },
        { label: 'E(MnO4⁻/Mn²⁺) at these activities', formula: '=CELLWRIGHT.HALFCELLBYSPECIES("MnO4-/Mn2+",{mn.sp},{mn.a})', unit: 'V', digits: 4 },
        { label: 'O2 reduction in air at pH 13.5 (alkaline cleaner)', formula: '=CELLWRIGHT.HALFCELL("O2/OH-",0.21,,13.5)', unit: 'V', digits: 4 },

        { table: 'qa', caption: 'QA: the couples this workbook uses, straight from the potential table', columns: [
          { key: 'key', header: 'Couple', values: ['Cu2+/Cu', 'Cu2+/Cu+', 'Cu+/Cu', 'Fe2+/Fe', 'Ni2+/Ni', 'H+/H2', 'Cr2O7^2-/Cr3+', 'MnO4-/Mn2+', 'O2/OH-', 'Ag+/Ag', 'AgCl/Ag'] },
          { key: 'e0', header: 'E°', unit: 'V', formula: '=CELLWRIGHT.STDPOTENTIAL({qa.key})', digits: 4 },
          { key: 'n', header: 'n', formula: '=CELLWRIGHT.ELECTRONS({qa.key})' },
          { key: 'hr', header: 'Half-reaction', formula: '=CELLWRIGHT.HALFREACTION({qa.key})' },
          { key: 'src', header: 'Source', formula: '=CELLWRIGHT.SOURCE({qa.key})' },
        ] },
        { section: 'QA: consistency checks on the table' },
        { key: 'cuComb', label: 'E°(Cu²⁺/Cu) from Cu²⁺/Cu⁺ and Cu⁺/Cu (adding free energies)', formula: '=CELLWRIGHT.COMBINE({qa.e0#2}:{qa.e0#3},{qa.n#2}:{qa.n#3})', unit: 'V', digits: 4 },
        { key: 'cuStored', label: 'E°(Cu²⁺/Cu) as stored', formula: '={qa.e0#1}', unit: 'V', digits: 4 },
        { label: 'Difference', formula: '=({cuComb}-{cuStored})*1000', unit: 'mV', digits: 1, note: 'the compilation\'s own three values do not close exactly: a template should say which one it uses' },
        { key: 'ksp', label: 'Solubility product of AgCl at 25 °C', value: 1.77e-10, note: 'handbook value' },
        { label: 'E°(AgCl/Ag) from E°(Ag⁺/Ag) and Ksp', formula: '={qa.e0#10}+CELLWRIGHT.EFROMK({ksp},1)', unit: 'V', digits: 4 },
        { label: 'The same from log10 Ksp = −9.752', formula: '={qa.e0#10}+CELLWRIGHT.EFROMLOGK(-9.752,1)', unit: 'V', digits: 4 },
        { label: 'E°(AgCl/Ag) as stored', formula: '={qa.e0#11}', unit: 'V', digits: 4 },
        { label: 'A key that is not in the table (the error a typo gives)', formula: '=CELLWRIGHT.STDPOTENTIAL("Cu3+/Cu")', expect: '#N/A' },
      ],
    },

    /* ------------------------------------------------------------------------------------ */
    {
      name: 'CP survey',
      title: 'Lintravel trunk main (invented): cathodic-protection survey review',
      intro: [
        'Buried coated steel water main, impressed-current CP. Instant-off potentials from the close-interval survey; most read with a portable Cu/CuSO4 electrode (CSE), the estuary crossing with Ag/AgCl/seawater.',
        'The criterion and its application are the responsibility of the corrosion engineer under the applicable standards; the value below is an input from the (invented) contract.',
      ],
      blocks: [
        { section: 'Criterion and reference scales' },
        { key: 'crit', label: 'Contract criterion, polarized (instant-off) potential', value: -0.85, unit: 'V vs CSE', note: 'as written in the invented contract' },
        { key: 'soilT', label: 'Soil temperature at pipe depth', value: 10, unit: '°C' },
        { label: 'CSE against SHE at 25 °C', formula: '=CELLWRIGHT.REFPOTENTIAL("CSE")', unit: 'V', digits: 4 },
        { label: 'CSE against SHE at the soil temperature', formula: '=CELLWRIGHT.REFPOTENTIAL("CSE",{soilT})', unit: 'V', digits: 4, note: 'the electrode sits in the soil: its own temperature counts' },
        { table: 'scales', caption: 'The criterion on other scales (25 °C)', columns: [
          { key: 'scale', header: 'Scale', values: ['SHE', 'SCE', 'Ag/AgCl/KCl(sat)', 'Ag/AgCl/seawater', 'Zn/seawater'] },
          { key: 'v', header: 'Criterion', unit: 'V', formula: '=CELLWRIGHT.CONVERTPOTENTIAL({crit},"CSE",{scales.scale})', digits: 3 },
        ] },
        { table: 'survey', caption: 'Instant-off readings, converted to CSE and judged against the criterion', columns: [
          { key: 'ts', header: 'Test station', values: ['TS-01', 'TS-02', 'TS-03', 'TS-04', 'TS-05', 'TS-06', 'TS-07', 'TS-08'] },
          { key: 'km', header: 'Chainage', unit: 'km', values: [0.0, 0.8, 1.6, 2.4, 3.1, 3.3, 4.0, 4.9] },
          { key: 'el', header: 'Electrode', values: ['CSE', 'CSE', 'CSE', 'CSE', 'Ag/AgCl/seawater', 'Ag/AgCl/seawater', 'CSE', 'CSE'] },
          { key: 'off', header: 'Instant-off reading', unit: 'V', values: [-0.912, -0.887, -0.861, -0.834, -0.842, -0.771, -0.953, -1.021] },
          { key: 'cse', header: 'Reading vs CSE', unit: 'V', formula: '=CELLWRIGHT.CONVERTPOTENTIAL({survey.off},{survey.el},"CSE")', digits: 3 },
          { key: 'margin', header: 'Margin to criterion', unit: 'mV', formula: '=({survey.cse}-{crit})*1000', digits: 0 },
          { key: 'verdict', header: 'Verdict', formula: '=IF({survey.cse}<={crit},"meets criterion","investigate")' },
        ] },
        { text: 'A negative margin is more negative than the criterion. "investigate" rows go to the CP engineer: check the reading, the IR-drop handling and the rectifier output before any conclusion.' },

        { section: 'Field electrode check against the laboratory SCE' },
        { key: 'chkExpected', label: 'Expected reading, field CSE against lab SCE', formula: '=CELLWRIGHT.CONVERTPOTENTIAL(0,"CSE","SCE")', unit: 'V', digits: 4 },
        { key: 'chkRead', label: 'Measured (voltmeter + on CSE, − on SCE)', value: 0.068, unit: 'V' },
        { label: 'Offset of the field electrode', formula: '=({chkRead}-{chkExpected})*1000', unit: 'mV', digits: 1, note: 'the survey procedure sets the tolerance; recondition or replace beyond it' },

        { section: 'Unprotected steel coupon (linear polarization, invented data)' },
        { key: 'ba', label: 'Anodic Tafel slope βa', value: 0.065, unit: 'V/decade' },
        { key: 'bc', label: 'Cathodic Tafel slope βc', value: 0.14, unit: 'V/decade' },
        { key: 'rp', label: 'Polarization resistance', value: 3200, unit: 'Ω·cm²' },
        { key: 'icorr', label: 'Corrosion current density (Stern–Geary)', formula: '=CELLWRIGHT.STERNGEARY({ba},{bc},{rp})', unit: 'µA/cm²', digits: 2 },
        { label: 'Penetration rate of iron', formula: '=CELLWRIGHT.CORROSIONRATE({icorr},27.92,7.87)', unit: 'mm/year', digits: 3, note: 'equivalent weight 27.92 g (Fe → Fe²⁺), density 7.87 g/cm³' },

        { table: 'pairs', caption: 'Dissimilar metals at the valve chamber: which one corrodes', columns: [
          { key: 'a', header: 'Metal 1', values: ['Cu2+/Cu', 'Zn2+/Zn', 'Ni2+/Ni'] },
          { key: 'b', header: 'Metal 2', values: ['Fe2+/Fe', 'Fe2+/Fe', 'Fe2+/Fe'] },
          { header: 'E°cell', unit: 'V', formula: '=CELLWRIGHT.GALVANIC({pairs.a},{pairs.b})', digits: 3 },
          { header: 'Cathode', spill: true },
          { header: 'Anode (corrodes)', spill: true },
        ] },
        { text: 'Standard potentials only rank the metals; in soil and water the galvanic series of the actual alloys and the area ratio decide.' },
      ],
    },

    /* ------------------------------------------------------------------------------------ */
    {
      name: 'Electrolyser',
      title: 'Tessivar PS-2 pilot stack (invented): alkaline water electrolysis',
      intro: [
        'H2O(l) → H2(g) + ½ O2(g). An electrolysis reaction as written has a negative potential; the voltages below are the magnitudes a cell needs.',
        'ΔH and ΔS are taken as constant at their 25 °C values, and the vapour pressure over the lye is ignored: good for trends, not for a heat balance.',
      ],
      blocks: [
        { section: 'Thermodynamics of water splitting (standard values at 25 °C)' },
        { key: 'dH', label: 'ΔH° (liquid water → H2 + ½ O2)', value: 285.83, unit: 'kJ/mol', note: 'standard thermochemical tables' },
        { key: 'dS', label: 'ΔS°', value: 163.3, unit: 'J/(mol·K)', note: 'standard entropies of H2, O2 and liquid water' },
        { key: 'dG', label: 'ΔG°', value: 237.13, unit: 'kJ/mol' },
        { label: 'Reversible voltage at 25 °C from ΔG°', formula: '=-CELLWRIGHT.EFROMDELTAG({dG},2)', unit: 'V', digits: 4 },
        { label: 'The same from the table: EMF(O2/OH⁻, H2O/H2)', formula: '=CELLWRIGHT.EMF("O2/OH-","H2O/H2")', unit: 'V', digits: 4, note: 'the fuel-cell direction: same magnitude' },
        { key: 'utn', label: 'Thermoneutral voltage', formula: '=-CELLWRIGHT.THERMONEUTRAL({dH},2)', unit: 'V', digits: 4, note: 'above it the stack makes heat; below it the stack needs heat' },
        { table: 'tv', caption: 'Against temperature', columns: [
          { key: 'T', header: 'Temperature', unit: '°C', values: [25, 40, 50, 60, 70, 80] },
          { key: 'urev', header: 'Reversible voltage', unit: 'V', formula: '=-CELLWRIGHT.EFROMTHERMO({dH},{dS},2,{tv.T})', digits: 4 },
          { key: 'g', header: 'ΔG', unit: 'kJ/mol', formula: '=CELLWRIGHT.DELTAG(-{tv.urev},2)', digits: 2 },
        ] },

        { section: 'Stack operation (test run 7, invented log)' },
        { key: 'cells', label: 'Cells in the stack', value: 20 },
        { key: 'I', label: 'Stack current', value: 250, unit: 'A' },
        { key: 'area', label: 'Active area per cell', value: 1000, unit: 'cm²' },
        { key: 'i', label: 'Current density', formula: '={I}/{area}', unit: 'A/cm²', digits: 3 },
        { key: 'T', label: 'Lye temperature', value: 70, unit: '°C' },
        { key: 'Ucell', label: 'Mean cell voltage', value: 1.92, unit: 'V' },
        { key: 'eta', label: 'Faradaic efficiency (gas analysis)', value: 0.97, unit: 'fraction' },
        { key: 'hours', label: 'Run time', value: 8, unit: 'h' },
        { label: 'Hydrogen, normal conditions (0 °C, 1.01325 bar)', formula: '={cells}*CELLWRIGHT.GASVOLUME({I},{hours},2,0,1.01325,{eta})/1000', unit: 'm³', digits: 2 },
        { label: 'Oxygen, normal conditions', formula: '={cells}*CELLWRIGHT.GASVOLUME({I},{hours},4,0,1.01325,{eta})/1000', unit: 'm³', digits: 2 },
        { label: 'Hydrogen at the separator (70 °C, 1.2 bar, dry basis)', formula: '={cells}*CELLWRIGHT.GASVOLUME({I},{hours},2,{T},1.2,{eta})/1000', unit: 'm³', digits: 2 },
        { key: 'mH2', label: 'Hydrogen mass', formula: '={cells}*CELLWRIGHT.DEPOSITMASS({I},{hours},"H2",2,{eta})/1000', unit: 'kg', digits: 3 },
        { key: 'kwh', label: 'DC energy into the stack', formula: '={cells}*{Ucell}*{I}*{hours}/1000', unit: 'kWh', digits: 1 },
        { label: 'DC energy per kg of hydrogen (from the log)', formula: '={kwh}/{mH2}', unit: 'kWh/kg', digits: 1 },
        { label: 'DC energy per kg of hydrogen (CELLWRIGHT.SPECIFICENERGY)', formula: '=CELLWRIGHT.SPECIFICENERGY({Ucell},"H2",2,{eta})', unit: 'kWh/kg', digits: 1, note: 'same number by another route: a template check' },
        { label: 'Voltage efficiency against the thermoneutral voltage', formula: '={utn}/{Ucell}', unit: 'fraction', digits: 3 },

        { section: 'Anode kinetics (oxygen evolution, invented fit to polarization data)' },
        { key: 'i0', label: 'Exchange current density', value: 1e-6, unit: 'A/cm²' },
        { key: 'aa', label: 'Apparent anodic transfer coefficient', value: 1.2 },
        { key: 'ac', label: 'Apparent cathodic transfer coefficient', value: 0.8 },
        { label: 'Tafel slope at the lye temperature', formula: '=CELLWRIGHT.TAFELSLOPE({aa},{T})', unit: 'V/decade', digits: 4 },
        { key: 'etaA', label: 'Anode overpotential at the operating current density', formula: '=CELLWRIGHT.OVERPOTENTIAL({i},{i0},{aa},{ac},{T})', unit: 'V', digits: 4 },
        { label: 'Check: Butler–Volmer current density at that overpotential', formula: '=CELLWRIGHT.BUTLERVOLMER({i0},{etaA},{aa},{ac},{T})', unit: 'A/cm²', digits: 4 },
      ],
    },

    /* ------------------------------------------------------------------------------------ */
    {
      name: 'What-if',
      title: 'The copper half-cell potential over concentration and temperature',
      intro: [
        'One spilled formula fills the table: activity = molality × γ(Cu²⁺) from the Davies equation at each temperature (CuSO4 alone, so I = 4m), then the Cu²⁺/Cu potential at E°(T).',
        'Above I ≈ 0.5 mol/kg the Davies equation is an extrapolation; treat those rows as trends.',
      ],
      blocks: [
        { key: 'couple', label: 'Couple', value: 'Cu2+/Cu' },
        { key: 'z', label: 'Charge of the metal ion', value: 2 },
        { grid: 'wi', corner: 'Molality (mol/kg) \\ Temperature (°C)', rows: { values: [0.0005, 0.001, 0.002, 0.005, 0.01, 0.02, 0.05, 0.1] }, cols: { values: [20, 30, 40, 50, 60] },
          formula: '=CELLWRIGHT.HALFCELL({couple},{wi.rows}*CELLWRIGHT.ACTIVITYCOEF({z},4*{wi.rows},"DAVIES",{wi.cols}),,,{wi.cols})', unit: 'V', digits: 4 },
        { text: 'Each cell is E in V vs SHE. Change the couple, the molalities or the temperatures and the whole table follows.' },
      ],
    },
  ],
};
