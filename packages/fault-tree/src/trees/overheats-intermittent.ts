// Shipped tree: the engine overheats now and then and no fault code is stored. Checks run from the
// cheapest and least invasive (talk to the driver, cold level, look for leaks, coolant strength,
// cap and pressure tests, block test) to the hot checks with live data and an IR thermometer, and
// only then to taking parts off. Thresholds marked "common practice" are Heatpath's working
// figures from trade practice, not published limits; a maker's figure always overrides them.
import type { TreeDefinitionInput } from '../schema/tree-schema.js';
import { cautions } from './cautions.js';
import { followUps } from './follow-ups.js';

const temperatureRange = { min: -40, max: 150 };

export const overheatsIntermittentDefinition = {
  format: 'heatpath.tree',
  formatVersion: 1,
  id: 'overheats-intermittent-no-codes',
  title: 'Overheats now and then, no fault codes stored',
  symptom:
    'The temperature gauge or warning climbs from time to time, and the engine computer has no stored fault code.',
  summary:
    'Works from the cheap, cold checks towards the hot checks with live data and only then to taking parts off. Reaches a finding for each common mechanical or hydraulic cause of intermittent overheating.',
  applicability: [
    'Liquid-cooled petrol and diesel engines with an expansion tank and electric radiator fan(s).',
    'Steps about a switchable coolant pump or an electrically pumped low-temperature loop apply only where the engine has one; the tree asks.',
    'Figures marked common practice are working guides; the vehicle maker’s figures and procedures always take precedence.',
  ],
  start: 'interview-pattern',
  computed: [
    {
      name: 'egProtection',
      label: 'Freeze protection (ethylene glycol)',
      formula: 'egFreezePoint(egPercent)',
      quantity: 'temperature',
      unit: 'degC',
    },
    {
      name: 'pgProtection',
      label: 'Freeze protection (propylene glycol)',
      formula: 'pgFreezePoint(pgPercent)',
      quantity: 'temperature',
      unit: 'degC',
    },
    {
      name: 'boilingAtCapRating',
      label: 'Boiling point of water at the cap rating',
      formula: 'waterBoilingPoint(capRating)',
      quantity: 'temperature',
      unit: 'degC',
      hint: 'A glycol mix boils somewhat higher; this is the figure for plain water.',
    },
    {
      name: 'pressureFall',
      label: 'Pressure lost during the hold',
      formula: 'testPressure - pressureAfterHold',
      quantity: 'pressure',
      unit: 'bar',
    },
    {
      name: 'readingGap',
      label: 'Live data minus IR at the sensor housing',
      formula: 'liveDataTemp - sensorHousingIr',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'radiatorDrop',
      label: 'Temperature drop across the radiator',
      formula: 'temperatureDrop(radiatorInletTemp, radiatorOutletTemp)',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'inletLag',
      label: 'How much cooler the radiator inlet hose is than the engine',
      formula: 'liveDataTemp - radiatorInletTemp',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'thermostatLate',
      label: 'Thermostat opening above its stamped temperature',
      formula: 'thermostatOpenedAt - thermostatRated',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'chargeAirRise',
      label: 'Charge-air temperature above ambient',
      formula: 'chargeAirTempMax - ambientTemp',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
  ],
  nodes: {
    'interview-pattern': {
      kind: 'question',
      title: 'When does it run hot?',
      prompt:
        'Ask the driver, or read a road-test log: when does the temperature climb? Also note whether the A/C was on, whether coolant has been topped up lately, and any recent work on the cooling system.',
      notes:
        'Every pattern runs the same cheap checks first. The answer is kept with the case so the workshop can see which patterns end in which findings.',
      estimatedMinutes: 5,
      choices: [
        {
          id: 'idle-or-traffic',
          label: 'At idle or in slow traffic; fine at speed',
          to: 'level-cold',
        },
        { id: 'speed-or-load', label: 'At speed, uphill or towing', to: 'level-cold' },
        {
          id: 'after-cooling-work',
          label: 'Only since the system was drained, refilled or repaired',
          to: 'level-cold',
        },
        { id: 'no-pattern', label: 'No clear pattern', to: 'level-cold' },
      ],
    },
    'level-cold': {
      kind: 'measurement',
      title: 'Coolant level, engine cold',
      prompt:
        'With the engine cold, read the level against the marks on the expansion tank. Top it up to the MAX mark with the coolant the maker specifies and enter how much you added (0 if none).',
      tools: ['Measuring jug'],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      estimatedMinutes: 5,
      inputs: [
        {
          name: 'topUpLitres',
          label: 'Coolant added to reach MAX',
          quantity: 'volume',
          unit: 'L',
          range: { min: 0, max: 20 },
        },
      ],
      fallback: { to: 'visual-leaks', label: 'Level recorded' },
    },
    'visual-leaks': {
      kind: 'question',
      title: 'Look for leaks',
      prompt:
        'Look over the hoses and clamps, radiator and its end tanks, the expansion tank and its seams, the pump’s weep hole and the heater hose joints. Wet patches, drips, or dried crusty residue in the coolant’s colour all count.',
      tools: ['Inspection lamp', 'Mirror'],
      hazards: ['lifting'],
      cautions: [cautions.lifting],
      estimatedMinutes: 10,
      choices: [
        { id: 'leak-seen', label: 'Yes, a leak or fresh residue', to: 'locate-visible-leak' },
        { id: 'none-seen', label: 'No sign of a leak', to: 'glycol-type' },
      ],
    },
    'locate-visible-leak': {
      kind: 'procedure',
      title: 'Confirm the leak under pressure',
      instruction:
        'On the cold system, fit the pressure tester to the expansion tank and pump it to the pressure stamped on the cap. Watch the suspect area for fresh coolant. Release the pressure slowly when done.',
      tools: ['Cooling-system pressure tester and adapters'],
      estimatedMinutes: 15,
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      evidence: [{ kind: 'photo', label: 'Photo of the leak', required: false }],
      done: 'visible-leak-confirmed',
      couldNotDo: 'glycol-type',
    },
    'visible-leak-confirmed': {
      kind: 'question',
      title: 'Is the leak confirmed?',
      prompt: 'Under pressure, does coolant come out where you saw the trace?',
      choices: [
        { id: 'confirmed', label: 'Yes, it leaks there', to: 'external-leak-low-coolant' },
        { id: 'old-residue', label: 'No, it was old residue', to: 'glycol-type' },
      ],
    },
    'glycol-type': {
      kind: 'question',
      title: 'Which glycol is in the system?',
      prompt:
        'Check the service record, the label on the tank or the coolant bottle: is the system filled with ethylene glycol or propylene glycol coolant?',
      notes:
        'A refractometer has a separate scale for each glycol. Reading the wrong scale, or a mix of both, gives a wrong answer by 10 K or more (ASTM D3321).',
      choices: [
        { id: 'ethylene', label: 'Ethylene glycol', to: 'concentration-eg' },
        { id: 'propylene', label: 'Propylene glycol', to: 'concentration-pg' },
        {
          id: 'unknown-or-mixed',
          label: 'Unknown or mixed',
          hint: 'The concentration cannot be read reliably; note it on the repair order and go on.',
          to: 'cap-test',
        },
      ],
    },
    'concentration-eg': {
      kind: 'measurement',
      title: 'Coolant concentration (ethylene glycol)',
      prompt:
        'Take a sample from the expansion tank of the cold engine and read it on the refractometer’s ethylene glycol scale. Enter the concentration in volume percent.',
      tools: ['Refractometer'],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      estimatedMinutes: 5,
      notes:
        'Coolant concentrates are meant to be used at 40–60 vol % (ASTM D3306). Heatpath flags protection weaker than about −24 °C, which is close to 40 vol %.',
      inputs: [
        {
          name: 'egPercent',
          label: 'Ethylene glycol concentration',
          quantity: 'percentage',
          unit: '%',
          range: { min: 0, max: 100 },
        },
      ],
      branches: [
        {
          when: 'egPercent > 60',
          to: 'wrong-concentration',
          label: 'Over-concentrated (above 60 %)',
        },
        {
          when: 'egFreezePoint(egPercent) > -24 degC',
          to: 'wrong-concentration',
          label: 'Too weak: protection above about −24 °C',
        },
      ],
      fallback: { to: 'cap-test', label: 'Within 40–60 %' },
    },
    'concentration-pg': {
      kind: 'measurement',
      title: 'Coolant concentration (propylene glycol)',
      prompt:
        'Take a sample from the expansion tank of the cold engine and read it on the refractometer’s propylene glycol scale. Enter the concentration in volume percent.',
      tools: ['Refractometer'],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      estimatedMinutes: 5,
      notes: 'Coolant concentrates are meant to be used at 40–60 vol % (ASTM D3306).',
      inputs: [
        {
          name: 'pgPercent',
          label: 'Propylene glycol concentration',
          quantity: 'percentage',
          unit: '%',
          range: { min: 0, max: 100 },
        },
      ],
      branches: [
        {
          when: 'pgPercent > 60',
          to: 'wrong-concentration',
          label: 'Over-concentrated (above 60 %)',
        },
        { when: 'pgPercent < 40', to: 'wrong-concentration', label: 'Too weak (below 40 %)' },
      ],
      fallback: { to: 'cap-test', label: 'Within 40–60 %' },
    },
    'cap-test': {
      kind: 'measurement',
      title: 'Pressure cap test',
      prompt:
        'Take the cap off the cold system and fit it to the tester with the right adapter. Pump slowly and note the pressure at which it opens; then let it settle and note the pressure it still holds after one minute. Enter the rating stamped on the cap or given by the maker.',
      tools: ['Cooling-system pressure tester', 'Cap adapter'],
      hazards: ['hot-pressurised-coolant'],
      cautions: [cautions.coldSystemOnly],
      estimatedMinutes: 10,
      notes:
        'A good cap opens at its rating and holds it for at least a minute (published service practice). Heatpath allows 0.15 bar below the rating and a 0.1 bar settle (common practice).',
      inputs: [
        {
          name: 'capRating',
          label: 'Cap rating',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0.3, max: 2.5 },
          hint: 'Usually 0.8–1.2 bar (12–18 psi) gauge.',
        },
        {
          name: 'capOpening',
          label: 'Pressure at which the cap opened',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0, max: 3 },
        },
        {
          name: 'capHeldAfterMinute',
          label: 'Pressure the cap still holds after one minute',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0, max: 3 },
        },
      ],
      branches: [
        {
          when: 'capOpening < capRating - 0.15',
          to: 'cap-not-holding',
          label: 'Opens well below its rating',
        },
        {
          when: 'capHeldAfterMinute < capOpening - 0.1',
          to: 'cap-not-holding',
          label: 'Does not hold pressure',
        },
      ],
      fallback: { to: 'pressure-test', label: 'Cap good' },
    },
    'pressure-test': {
      kind: 'measurement',
      title: 'System pressure test (cold)',
      prompt:
        'Refit the tester to the cold system and pump it to the cap rating. Hold for at least ten minutes without pumping, then enter the starting pressure, the pressure at the end and how long you held it.',
      tools: ['Cooling-system pressure tester and adapters'],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      estimatedMinutes: 30,
      notes:
        'Hold 10–30 minutes; the gauge should not fall (common practice; no allowable drop is published). Heatpath treats a fall of more than 0.1 bar as a leak.',
      inputs: [
        {
          name: 'testPressure',
          label: 'Pressure at the start',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0.3, max: 2.5 },
        },
        {
          name: 'pressureAfterHold',
          label: 'Pressure at the end',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0, max: 2.5 },
        },
        {
          name: 'holdMinutes',
          label: 'Time held',
          quantity: 'time',
          unit: 'min',
          range: { min: 10, max: 120 },
          hint: 'At least ten minutes; a shorter hold proves nothing.',
        },
      ],
      branches: [
        { when: 'pressureFall > 0.1', to: 'find-leak-under-pressure', label: 'Pressure falls' },
      ],
      fallback: { to: 'block-test', label: 'Holds pressure' },
    },
    'find-leak-under-pressure': {
      kind: 'procedure',
      title: 'Find where the pressure goes',
      instruction:
        'Keep the cold system under test pressure and search for the leak: hoses and clamps, radiator tanks and core, pump weep hole, heater joints at the bulkhead, tank seams. Where the maker allows, add UV dye and search with the UV lamp. Check the passenger footwell for damp carpet.',
      tools: ['Pressure tester', 'UV lamp and dye', 'Inspection lamp'],
      estimatedMinutes: 30,
      hazards: ['hot-pressurised-coolant', 'glycol', 'lifting'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.lifting],
      evidence: [{ kind: 'photo', label: 'Photo of the leak', required: false }],
      done: 'leak-found-under-pressure',
      couldNotDo: 'block-test',
    },
    'leak-found-under-pressure': {
      kind: 'question',
      title: 'Where did it leak?',
      prompt: 'Did you find coolant escaping outside the engine?',
      choices: [
        {
          id: 'external',
          label: 'Yes, outside (hose, radiator, pump, tank)',
          to: 'external-leak-low-coolant',
        },
        {
          id: 'nothing-outside',
          label: 'Pressure falls but nothing leaks outside',
          hint: 'Points to a leak inside the engine; the block test is next.',
          to: 'block-test',
        },
      ],
    },
    'block-test': {
      kind: 'procedure',
      title: 'Block test for combustion gas',
      instruction:
        'Start with the engine cold. Remove the cap, lower the level a little if the tester needs room, fill the tester with fresh test fluid and fit it to the tank neck. Start the engine and draw air from above the coolant through the fluid while the engine warms, with a few blips of the throttle. Stop well before the coolant gets hot or can reach the tester, remove the tester and refit the cap.',
      tools: ['Combustion-gas tester with fresh fluid'],
      estimatedMinutes: 15,
      notes:
        'Done while the engine warms from cold, because that is the only time the cap may be off with the engine running.',
      hazards: ['hot-pressurised-coolant', 'fan', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.fan, cautions.glycol],
      done: 'block-test-result',
      couldNotDo: 'warm-up-live-data',
    },
    'block-test-result': {
      kind: 'question',
      title: 'Block test result',
      prompt:
        'Did the test fluid change colour the way the kit says it does for combustion gas, or did a stream of bubbles keep rising in the tank?',
      evidence: [{ kind: 'photo', label: 'Photo of the test fluid', required: true }],
      choices: [
        { id: 'gas-found', label: 'Yes, combustion gas', to: 'combustion-gas-in-coolant' },
        { id: 'no-gas', label: 'No change', to: 'warm-up-live-data' },
      ],
    },
    'warm-up-live-data': {
      kind: 'measurement',
      title: 'Warm up with live data',
      prompt:
        'With the cap on, connect the scan tool and let the engine warm at fast idle, then idle with the A/C on, until live data stops rising or reaches the customer’s complaint. Enter the highest coolant temperature in live data and, at the same moment, an IR reading on the housing next to the coolant temperature sensor.',
      tools: ['Scan tool', 'IR thermometer'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 20,
      evidence: [{ kind: 'log', label: 'Scan-tool log of the warm-up', required: false }],
      notes:
        'IR thermometers read surfaces and shiny metal reads low, so compare on a painted or dull part of the housing. A gap of more than 10 K is worth confirming with a contact probe (common practice). If the fault does not show in the bay, log a road test and enter its highest reading.',
      inputs: [
        {
          name: 'liveDataTemp',
          label: 'Coolant temperature in live data',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'sensorHousingIr',
          label: 'IR reading at the sensor housing',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
      ],
      branches: [
        {
          when: 'abs(readingGap) > 10',
          to: 'confirm-with-contact-probe',
          label: 'Live data and housing disagree',
        },
      ],
      fallback: { to: 'hose-temps', label: 'Readings agree' },
    },
    'confirm-with-contact-probe': {
      kind: 'measurement',
      title: 'Confirm with a contact probe',
      prompt:
        'Hold a contact thermometer probe firmly on a clean, dull spot of the sensor housing and enter its reading while live data shows the same value as before.',
      tools: ['Contact thermometer'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 10,
      notes:
        'Heatpath treats a difference of more than 8 K from live data as a wrong reading (common practice).',
      inputs: [
        {
          name: 'probeTemp',
          label: 'Contact probe reading',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
      ],
      branches: [
        {
          when: 'abs(liveDataTemp - probeTemp) > 8',
          to: 'temperature-reading-wrong',
          label: 'Live data is wrong',
        },
      ],
      fallback: { to: 'hose-temps', label: 'Live data is right' },
    },
    'hose-temps': {
      kind: 'measurement',
      title: 'Radiator hose temperatures',
      prompt:
        'With live data past the thermostat’s opening temperature, take IR readings on the radiator inlet hose near the radiator and on the outlet hose near the radiator, on dull rubber, not on clamps. Note the ambient temperature, engine speed and A/C state on the case.',
      tools: ['IR thermometer', 'Scan tool'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 10,
      notes:
        'With good flow the coolant loses around 5–6 K across the radiator; much more points to weak flow, much less to an air-side problem (trade rule of thumb). An inlet hose more than 25 K cooler than a 100 °C engine means almost nothing flows through the radiator (common practice).',
      inputs: [
        {
          name: 'radiatorInletTemp',
          label: 'Radiator inlet hose',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'radiatorOutletTemp',
          label: 'Radiator outlet hose',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
      ],
      branches: [
        {
          when: 'liveDataTemp >= 100 and inletLag > 25',
          to: 'thermostat-test',
          label: 'Engine hot, radiator inlet hose barely warm',
        },
        { when: 'radiatorDrop > 20', to: 'core-scan', label: 'Large drop across the radiator' },
        {
          when: 'radiatorDrop < 3',
          to: 'fan-switch',
          label: 'Very small drop across the radiator',
        },
      ],
      fallback: { to: 'fan-switch', label: 'Flow through the radiator looks normal' },
    },
    'core-scan': {
      kind: 'question',
      title: 'Scan the radiator core',
      prompt:
        'At operating temperature, sweep the IR thermometer across the radiator core from top to bottom and side to side. Are there cold bands or patches, clearly cooler than the rest?',
      tools: ['IR thermometer'],
      hazards: ['fan', 'hot-surface'],
      cautions: [cautions.fan, cautions.hotSurface],
      estimatedMinutes: 5,
      choices: [
        { id: 'cold-patches', label: 'Yes, cold bands or patches', to: 'radiator-core-restricted' },
        { id: 'even', label: 'No, the core warms evenly', to: 'main-loop-bleed' },
      ],
    },
    'thermostat-test': {
      kind: 'procedure',
      title: 'Take the thermostat out and test it',
      instruction:
        'Let the engine cool completely. Drain enough coolant to get below the thermostat, remove it and heat it in a pan of water with a thermometer. Note the temperature at which it starts to open and whether it opens fully; note the temperature stamped on it. Where the thermostat is built into a housing with a heater element, follow the maker’s test instead.',
      tools: ['Drain tray', 'Pan and heat source', 'Thermometer'],
      estimatedMinutes: 60,
      hazards: ['hot-pressurised-coolant', 'glycol', 'hot-surface'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.hotSurface],
      evidence: [{ kind: 'photo', label: 'Photo of the thermostat in the test', required: false }],
      done: 'thermostat-opening',
      couldNotDo: 'main-loop-bleed',
    },
    'thermostat-opening': {
      kind: 'measurement',
      title: 'Thermostat opening temperature',
      prompt:
        'Enter the temperature stamped on the thermostat and the water temperature at which it began to open. If it never opened, enter the hottest water temperature you reached.',
      estimatedMinutes: 2,
      notes:
        'Thermostats usually open at 82–91 °C (trade textbook). Heatpath treats opening more than 5 K above the stamped figure as stuck (common practice).',
      inputs: [
        {
          name: 'thermostatRated',
          label: 'Stamped opening temperature',
          quantity: 'temperature',
          unit: 'degC',
          range: { min: 60, max: 110 },
        },
        {
          name: 'thermostatOpenedAt',
          label: 'Water temperature when it began to open',
          quantity: 'temperature',
          unit: 'degC',
          range: { min: 20, max: 100 },
        },
      ],
      branches: [
        {
          when: 'thermostatLate > 5',
          to: 'thermostat-stuck-closed',
          label: 'Opens late or not at all',
        },
        { when: 'thermostatLate <= 5', to: 'main-loop-bleed', label: 'Opens on time' },
      ],
    },
    'main-loop-bleed': {
      kind: 'procedure',
      title: 'Refill and bleed the main loop',
      instruction:
        'With the engine cold, refit the thermostat, top up and bleed the main loop exactly as the maker describes (bleed screws, vacuum filler or scan-tool routine). Then drive or run the engine at full operating temperature for ten minutes or more, and watch the radiator inlet hose and live data.',
      tools: ['Vacuum filler (if used by the maker)', 'Scan tool'],
      estimatedMinutes: 45,
      hazards: ['hot-pressurised-coolant', 'glycol', 'fan', 'road-test'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.fan, cautions.roadTest],
      done: 'main-loop-retest',
      couldNotDo: 'pump-removal',
    },
    'main-loop-retest': {
      kind: 'question',
      title: 'Does coolant flow now?',
      prompt:
        'After bleeding and the run at operating temperature: does the radiator inlet hose now get hot soon after the thermostat’s opening temperature, with live data staying in its normal band?',
      choices: [
        { id: 'flows-now', label: 'Yes, it flows and stays normal', to: 'main-loop-air-lock' },
        { id: 'still-no-flow', label: 'No, the inlet hose still stays cool', to: 'pump-removal' },
      ],
    },
    'pump-removal': {
      kind: 'procedure',
      title: 'Remove the coolant pump for inspection',
      instruction:
        'With the engine cold, drain the coolant and remove the main coolant pump as the maker describes. On many engines the pump is driven by the timing belt, so this is a timing-belt job; where an engine mount has to come off, support the engine first.',
      tools: ['Drain tray', 'Engine support bar', 'Timing locking tools for this engine'],
      estimatedMinutes: 180,
      hazards: ['hot-pressurised-coolant', 'glycol', 'belt-drive', 'lifting'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.beltDrive, cautions.lifting],
      evidence: [{ kind: 'photo', label: 'Photos of the pump, impeller side', required: true }],
      done: 'shroud-inspection',
      couldNotDo: 'no-cause-found',
    },
    'shroud-inspection': {
      kind: 'question',
      title: 'Inspect the pump shroud',
      prompt:
        'On a switchable pump, a sleeve (shroud) slides over the impeller to stop the flow while the engine warms. Is the shroud stuck out over the impeller, or does it move back under its spring only with force?',
      choices: [
        {
          id: 'stuck-out',
          label: 'Yes, the shroud is stuck over the impeller',
          to: 'pump-shroud-stuck',
        },
        {
          id: 'free-or-none',
          label: 'It moves freely, or the pump has no shroud',
          to: 'impeller-inspection',
        },
      ],
    },
    'impeller-inspection': {
      kind: 'question',
      title: 'Inspect the impeller',
      prompt: 'Is the impeller damaged, eroded, or slipping on its shaft?',
      choices: [
        { id: 'damaged', label: 'Yes, damaged or slipping', to: 'pump-impeller-not-circulating' },
        { id: 'looks-good', label: 'No, it looks good', to: 'no-cause-found' },
      ],
    },
    'fan-switch': {
      kind: 'measurement',
      title: 'Fan switch-on temperature',
      prompt:
        'At idle with the A/C off, watch live data and the radiator fan. Enter the coolant temperature at which the first fan stage came on. If it had not come on by 110 °C, switch off and enter the highest temperature reached.',
      tools: ['Scan tool'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 15,
      notes:
        'Most engines bring a fan stage in before about 105 °C (common practice; the maker’s switch point overrides).',
      inputs: [
        {
          name: 'fanOnTemp',
          label: 'Coolant temperature when the fan came on',
          quantity: 'temperature',
          unit: 'degC',
          range: { min: 60, max: 130 },
        },
      ],
      branches: [
        {
          when: 'fanOnTemp > 105',
          to: 'fan-stage-not-switching',
          label: 'Fan comes on late or not at all',
        },
        { when: 'fanOnTemp <= 105', to: 'fan-ac-stage', label: 'First stage switches on time' },
      ],
    },
    'fan-ac-stage': {
      kind: 'question',
      title: 'Fan with the A/C on',
      prompt:
        'Switch the A/C on at maximum. Within a minute, does the fan run at its higher speed (or the second fan start)?',
      hazards: ['fan'],
      cautions: [cautions.fan],
      estimatedMinutes: 5,
      choices: [
        { id: 'higher-stage-runs', label: 'Yes', to: 'aux-loop-present' },
        { id: 'no-higher-stage', label: 'No', to: 'fan-stage-not-switching' },
      ],
    },
    'aux-loop-present': {
      kind: 'question',
      title: 'Low-temperature loop?',
      prompt:
        'Does this engine have a separate low-temperature coolant loop with an electric auxiliary pump (for example for a water-cooled charge-air cooler)? Check the maker’s information.',
      choices: [
        { id: 'has-loop', label: 'Yes', to: 'aux-pump-check' },
        { id: 'no-loop', label: 'No', to: 'no-cause-found' },
      ],
    },
    'aux-pump-check': {
      kind: 'question',
      title: 'Auxiliary pump running?',
      prompt:
        'With the ignition on, or using the scan tool’s output test, feel and listen to the auxiliary pump and watch its tank. What do you find?',
      tools: ['Scan tool'],
      hazards: ['fan'],
      cautions: [cautions.fan],
      estimatedMinutes: 10,
      choices: [
        { id: 'runs-quietly', label: 'It runs quietly', to: 'charge-air-log' },
        {
          id: 'runs-with-air',
          label: 'It runs but gurgles, or the flow in its tank is weak and bubbly',
          to: 'aux-bleed',
        },
        { id: 'not-running', label: 'It does not run', to: 'auxiliary-pump-not-running' },
      ],
    },
    'charge-air-log': {
      kind: 'measurement',
      title: 'Charge-air temperature on a road test',
      prompt:
        'Log a road test with sustained load (a long climb or motorway), recording coolant temperature, fan command, speed, load and charge-air temperature. Enter the highest charge-air temperature and the ambient temperature.',
      tools: ['Scan tool with logging'],
      hazards: ['road-test'],
      cautions: [cautions.roadTest],
      estimatedMinutes: 30,
      evidence: [{ kind: 'log', label: 'Road-test log', required: true }],
      notes:
        'With a water-cooled charge-air cooler, more than about 35 K above ambient under sustained load suggests the low-temperature loop is not flowing (common practice).',
      inputs: [
        {
          name: 'chargeAirTempMax',
          label: 'Highest charge-air temperature',
          quantity: 'temperature',
          unit: 'degC',
          range: { min: -40, max: 200 },
        },
        {
          name: 'ambientTemp',
          label: 'Ambient temperature',
          quantity: 'temperature',
          unit: 'degC',
          range: { min: -40, max: 55 },
        },
      ],
      branches: [{ when: 'chargeAirRise > 35', to: 'aux-bleed', label: 'Charge air runs hot' }],
      fallback: { to: 'no-cause-found', label: 'Charge-air temperature normal' },
    },
    'aux-bleed': {
      kind: 'procedure',
      title: 'Bleed the low-temperature loop',
      instruction:
        'With the system cold, top up the low-temperature loop and run the maker’s bleed routine for the auxiliary pump (often a scan-tool function that runs the pumps in turn). Vacuum filling may not clear an air lock here: drive at full operating temperature for ten minutes or more, let the engine cool, and recheck the level.',
      tools: ['Scan tool'],
      estimatedMinutes: 45,
      notes:
        'Air locks in auxiliary loops can survive vacuum filling; driving to temperature purges them (common practice).',
      hazards: ['hot-pressurised-coolant', 'glycol', 'fan', 'road-test'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.fan, cautions.roadTest],
      done: 'aux-bleed-result',
      couldNotDo: 'no-cause-found',
    },
    'aux-bleed-result': {
      kind: 'question',
      title: 'Did bleeding cure it?',
      prompt:
        'After bleeding and the drive: is the pump quiet, the charge-air temperature normal, and does a repeat of the customer’s conditions stay cool?',
      choices: [
        { id: 'cured', label: 'Yes', to: 'auxiliary-loop-air-lock' },
        { id: 'not-cured', label: 'No', to: 'no-cause-found' },
      ],
    },

    'pump-shroud-stuck': {
      kind: 'outcome',
      title: 'Switchable pump shroud stuck over the impeller',
      rootCause:
        'The shroud of the switchable coolant pump stays out over the impeller, so the pump turns but moves almost no coolant once the engine is warm. The engine overheats while the radiator stays cool, and no fault code is set.',
      correction:
        'Replace the coolant pump (with its control valve where the maker supplies them together), refill with the specified coolant and bleed as the maker describes.',
      parts: [
        { description: 'Switchable coolant pump', quantity: 1 },
        { description: 'Pump gasket or seal set', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 6 },
        { description: 'Timing belt kit, where the pump sits behind the belt', quantity: 1 },
      ],
      labour: [
        { operation: 'Remove and refit coolant pump (timing-belt job where applicable)', hours: 3 },
        { operation: 'Refill, bleed and road test', hours: 0.7 },
      ],
      followUps: [
        followUps.purgeAndRecheck,
        followUps.leakCheckAfterDrive,
        followUps.labelTimingCover,
        followUps.roadTestConfirm,
        followUps.tellAdvisor,
      ],
      hazards: ['belt-drive'],
      cautions: [cautions.beltDrive],
    },
    'auxiliary-loop-air-lock': {
      kind: 'outcome',
      title: 'Air trapped in the low-temperature loop',
      rootCause:
        'An air lock in the electrically pumped low-temperature loop stopped it circulating, so the charge-air cooler (and the engine under load) ran hot.',
      correction:
        'Bleed the low-temperature loop with the maker’s routine and drive to full operating temperature to purge the remaining air; top up once cold.',
      parts: [{ description: 'Coolant to the maker’s specification (litres)', quantity: 1 }],
      labour: [{ operation: 'Bleed low-temperature loop and road test', hours: 0.8 }],
      followUps: [followUps.purgeAndRecheck, followUps.roadTestConfirm, followUps.tellAdvisor],
    },
    'thermostat-stuck-closed': {
      kind: 'outcome',
      title: 'Thermostat sticking closed',
      rootCause:
        'The thermostat opens late or not at all, so coolant does not reach the radiator when the engine needs it.',
      correction: 'Fit a new thermostat (and seal) of the maker’s specification, refill and bleed.',
      parts: [
        { description: 'Thermostat with seal', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 2 },
      ],
      labour: [{ operation: 'Replace thermostat, refill and bleed', hours: 1.2 }],
      followUps: [followUps.purgeAndRecheck, followUps.leakCheckAfterDrive, followUps.tellAdvisor],
    },
    'fan-stage-not-switching': {
      kind: 'outcome',
      title: 'Radiator fan stage not switching on',
      rootCause:
        'A radiator fan stage does not come on when it should, so the engine overheats at low speed and in traffic where there is no ram air.',
      correction:
        'Check whether the engine computer commands the stage (live data). If it does, test the fan motor, its fuse, relay or control module and the wiring; if it does not, check the inputs that request it (coolant temperature, A/C pressure) as the maker describes. Repair what is at fault.',
      parts: [{ description: 'Fan motor, relay or control module as found faulty', quantity: 1 }],
      labour: [{ operation: 'Diagnose and repair fan circuit', hours: 1 }],
      followUps: [followUps.roadTestConfirm, followUps.tellAdvisor],
      hazards: ['fan'],
      cautions: [cautions.fan],
    },
    'cap-not-holding': {
      kind: 'outcome',
      title: 'Pressure cap not holding',
      rootCause:
        'The pressure cap opens too early or leaks, so the system runs at lower pressure: the coolant boils sooner and is pushed out of the tank.',
      correction: 'Fit a new cap of the rating the maker specifies and top up the level.',
      parts: [{ description: 'Pressure cap of the specified rating', quantity: 1 }],
      labour: [{ operation: 'Test and replace pressure cap', hours: 0.3 }],
      followUps: [followUps.purgeAndRecheck, followUps.tellAdvisor],
    },
    'combustion-gas-in-coolant': {
      kind: 'outcome',
      title: 'Combustion gas in the coolant',
      rootCause:
        'Combustion gas is getting into the coolant, usually past the cylinder head gasket or, on diesels, through a leaking exhaust-gas recirculation cooler. Gas pockets stop circulation and push coolant out.',
      correction:
        'Find the path before quoting: on diesels pressure-test the exhaust-gas recirculation cooler; check compression or cylinder leak-down to find the cylinder. Repair as found (cooler, head gasket with head check).',
      labour: [{ operation: 'Locate combustion leak (cooler test, leak-down)', hours: 1.5 }],
      followUps: [followUps.tellAdvisor, followUps.purgeAndRecheck],
    },
    'external-leak-low-coolant': {
      kind: 'outcome',
      title: 'Low coolant from an external leak',
      rootCause:
        'Coolant escapes through an external leak, the level falls and the engine overheats when it runs low.',
      correction:
        'Repair the leaking part (hose, clamp, radiator, tank or pump), refill with the specified coolant and bleed.',
      parts: [
        { description: 'Leaking part as found', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 3 },
      ],
      labour: [{ operation: 'Repair leak, refill and bleed', hours: 1 }],
      followUps: [
        followUps.purgeAndRecheck,
        followUps.leakCheckAfterDrive,
        followUps.labelTimingCover,
        followUps.tellAdvisor,
      ],
    },
    'wrong-concentration': {
      kind: 'outcome',
      title: 'Wrong coolant concentration',
      rootCause:
        'The coolant is too weak or too strong. Too much water lowers the boiling point and the frost and corrosion protection; too much glycol carries heat away less well.',
      correction:
        'Bring the mix to the maker’s concentration (usually 40–60 %, ASTM D3306) with the specified coolant technology: drain the calculated amount and refill with concentrate or water, or drain and refill completely.',
      parts: [
        { description: 'Coolant concentrate to the maker’s specification (litres)', quantity: 3 },
      ],
      labour: [{ operation: 'Correct coolant concentration and bleed', hours: 0.7 }],
      followUps: [
        followUps.purgeAndRecheck,
        'Recheck the concentration with the refractometer once the engine has run and cooled, so the new coolant has mixed.',
        'If it still runs hot afterwards, open a new case and continue from the cap test.',
        followUps.tellAdvisor,
      ],
    },
    'temperature-reading-wrong': {
      kind: 'outcome',
      title: 'Temperature sensor or its reading wrong',
      rootCause:
        'The engine is not as hot as the gauge or live data says: the coolant temperature sensor, its wiring or connector gives a wrong reading.',
      correction:
        'Check the sensor’s reading with the engine cold against the ambient temperature, check its wiring and connector as the maker describes, and replace the sensor if it reads wrong.',
      parts: [{ description: 'Coolant temperature sensor and seal', quantity: 1 }],
      labour: [{ operation: 'Test and replace coolant temperature sensor', hours: 0.6 }],
      followUps: [followUps.purgeAndRecheck, followUps.tellAdvisor],
    },
    'radiator-core-restricted': {
      kind: 'outcome',
      title: 'Radiator core partly blocked',
      rootCause:
        'Part of the radiator core is blocked inside, so coolant only flows through some of it: the drop across the radiator is large and the core shows cold bands.',
      correction:
        'Replace the radiator. Check the condition of the coolant; if it is contaminated, flush the system before refilling.',
      parts: [
        { description: 'Radiator', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 6 },
      ],
      labour: [{ operation: 'Replace radiator, refill and bleed', hours: 1.8 }],
      followUps: [followUps.purgeAndRecheck, followUps.leakCheckAfterDrive, followUps.tellAdvisor],
      hazards: ['lifting'],
      cautions: [cautions.lifting],
    },
    'auxiliary-pump-not-running': {
      kind: 'outcome',
      title: 'Auxiliary coolant pump not running',
      rootCause:
        'The electric auxiliary pump of the low-temperature loop does not run, so that loop does not circulate.',
      correction:
        'Check the pump’s supply, ground and control signal as the maker describes; replace the pump if it gets what it needs and still does not run, or repair the circuit.',
      parts: [{ description: 'Auxiliary coolant pump, or circuit parts as found', quantity: 1 }],
      labour: [{ operation: 'Diagnose auxiliary pump circuit and replace pump', hours: 1.2 }],
      followUps: [followUps.purgeAndRecheck, followUps.tellAdvisor],
    },
    'pump-impeller-not-circulating': {
      kind: 'outcome',
      title: 'Coolant pump impeller not circulating',
      rootCause:
        'The pump’s impeller is damaged or slipping on its shaft, so it turns without moving enough coolant.',
      correction: 'Replace the coolant pump, refill with the specified coolant and bleed.',
      parts: [
        { description: 'Coolant pump with seal', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 6 },
        { description: 'Timing belt kit, where the pump sits behind the belt', quantity: 1 },
      ],
      labour: [{ operation: 'Replace coolant pump (timing-belt job where applicable)', hours: 3 }],
      followUps: [
        followUps.purgeAndRecheck,
        followUps.leakCheckAfterDrive,
        followUps.labelTimingCover,
        followUps.tellAdvisor,
      ],
      hazards: ['belt-drive'],
      cautions: [cautions.beltDrive],
    },
    'main-loop-air-lock': {
      kind: 'outcome',
      title: 'Air trapped in the main loop',
      rootCause:
        'An air pocket in the main loop stopped the coolant circulating through the radiator; bleeding restored the flow.',
      correction:
        'Bleed done. If the system had been worked on, check the refill was done as the maker describes.',
      parts: [{ description: 'Coolant to the maker’s specification (litres)', quantity: 1 }],
      labour: [{ operation: 'Bleed main loop and road test', hours: 0.8 }],
      followUps: [followUps.purgeAndRecheck, followUps.roadTestConfirm, followUps.tellAdvisor],
    },
    'no-cause-found': {
      kind: 'outcome',
      title: 'No cause found with these checks',
      rootCause: 'None of the checks in this tree showed a fault.',
      correction:
        'Log a road test that reproduces the customer’s conditions (coolant temperature, fan command, speed, load, charge-air temperature) and ask the workshop lead to review the case and the maker’s information.',
      labour: [{ operation: 'Diagnosis time', hours: 1 }],
      followUps: [followUps.tellAdvisor],
    },
  },
} satisfies TreeDefinitionInput;
