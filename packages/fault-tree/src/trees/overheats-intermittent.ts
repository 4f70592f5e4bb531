// Shipped tree: the engine overheats now and then and no fault code is stored. Version 2 (version
// 1 is kept in history/overheats-intermittent-no-codes.1.json for the cases pinned to it).
//
// Checks run from the cheapest and least invasive to taking parts off: the driver's story (a
// fault that began after the system was drained or refilled is bled first), cold level, leaks,
// coolant strength, the cap's pressure and vacuum valves, a cold pressure test held at — never
// above — the cap's rating, a block test that is repeated on a bled system before it counts, then
// the hot checks: the temperature reading itself (a sensor can read high OR low), the radiator
// hoses read at the same moment as live data while the thermostat is known to be open (a
// map-controlled thermostat holds 100–110 °C at part load with a cool radiator inlet as normal),
// whether coolant moves through the engine at all, the thermostat in the pan (did it open, when,
// and fully?), bleeding, and only then the pump: its control valve, wiring and actuation before a
// switchable pump comes off. Fans are judged by how they are driven. With a healthy circuit in
// the bay the air side, the pump's belt drive and a logged road test come last. Thresholds marked
// "common practice" are Heatpath's working figures from trade practice, not published limits; a
// maker's figure always overrides them.
import { pressureHoldRule } from '@heatpath/coolant';
import type { Caution, TreeDefinitionInput } from '../schema/tree-schema.js';
import { cautions } from './cautions.js';
import { followUps } from './follow-ups.js';

const R = pressureHoldRule;
const overRating = 1 + R.maxOverRatingFraction;

const temperatureRange = { min: -40, max: 150 };

/** How far a cap may open from its rating before it fails, either way (common practice). */
const CAP_OPENING_TOLERANCE_BAR = 0.15;
/** How much a cap may settle in the minute after it opens (common practice). */
const CAP_SETTLE_BAR = 0.1;
/** Live data and a contact probe further apart than this mean a wrong reading (common practice). */
const PROBE_GAP_K = 8;
/** At or above this live-data temperature a conventional thermostat is surely open (common practice). */
const HOT_ENGINE_C = 95;
/** A radiator inlet this much cooler than the engine means almost no flow (common practice). */
const INLET_LAG_K = 25;
/** A road-test episode: past the 100–110 °C band map-controlled engines run at (common practice). */
const EPISODE_C = 110;
/** The fan should have run by this coolant temperature (common practice; the maker's point overrides). */
const FAN_LATE_C = 108;
/** A thermostat beginning to open more than this above its stamp is late (common practice). */
const THERMOSTAT_LATE_K = 5;

// Local cautions, to be moved into cautions.ts when the trees' cautions are consolidated.
const localCautions = {
  /** Looking at, or working on, the auxiliary belt that drives the coolant pump. */
  auxiliaryBeltDrive: {
    hazard: 'belt-drive',
    text: 'Inspect the auxiliary belt drive with the engine off and the key out of reach: a turning belt traps fingers, sleeves and tools. Fit a belt and tensioner to the maker’s routing and tension figures, and follow the vehicle maker’s procedure.',
  },
} as const satisfies Record<string, Caution>;

// Local follow-up, to be moved into follow-ups.ts when the trees' follow-ups are consolidated.
const localFollowUps = {
  stillHotNewCase:
    'This finding does not itself make the engine run hot: if it still does after the repair, open a new case and continue from the pressure test.',
} as const;

export const overheatsIntermittentDefinition = {
  format: 'heatpath.tree',
  formatVersion: 1,
  id: 'overheats-intermittent-no-codes',
  title: 'Overheats now and then, no fault codes stored',
  symptom:
    'The temperature gauge or warning climbs from time to time, and the engine computer has no stored fault code.',
  summary:
    'Works from the cheap, cold checks towards the hot checks with live data and only then to taking parts off. A fault that began after the system was drained or refilled is bled first. Hose temperatures are judged at the same moment as live data and only while the thermostat is known to be open; the switchable pump is suspected only on evidence and its control valve, wiring and actuation are checked before it comes off; a block test counts only when repeated on a bled system.',
  applicability: [
    'Liquid-cooled petrol and diesel engines with an expansion tank and electric radiator fan(s).',
    'Steps about a switchable coolant pump, a map-controlled thermostat or an electrically pumped low-temperature loop apply only where the engine has one; the tree asks.',
    'Engines with an electric main coolant pump are outside this tree: follow the maker’s tests for the pump.',
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
      name: 'retestFall',
      label: 'Pressure lost during the repeated hold',
      formula: 'retestPressure - retestAfterHold',
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
      name: 'probeGap',
      label: 'Live data minus the contact probe (positive: live data reads high)',
      formula: 'liveDataAtProbe - probeTemp',
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
      label: 'How much cooler the radiator inlet hose is than the engine, at the same moment',
      formula: 'engineTempAtHoses - radiatorInletTemp',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'thermostatLate',
      label: 'Thermostat beginning to open above its stamped temperature',
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
    {
      name: 'roadInletLag',
      label: 'How much cooler the radiator inlet hose was than the engine, road test',
      formula: 'roadPeakTemp - roadInletTemp',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'roadRadiatorDrop',
      label: 'Temperature drop across the radiator, road test',
      formula: 'temperatureDrop(roadInletTemp, roadOutletTemp)',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
  ],
  nodes: {
    'interview-pattern': {
      kind: 'question',
      title: 'When does it run hot?',
      prompt:
        'Ask the driver, or read the log of an earlier drive: when does the temperature climb? Also note whether the A/C was on, whether it happens more in wet weather, whether coolant has been topped up lately, and any recent work on the cooling system.',
      notes:
        'A fault that began right after the system was drained or refilled is most often air left in it, so that answer goes to bleeding first (common practice). Every other pattern runs the same cheap checks first; the answer is kept with the case so the workshop can see which patterns end in which findings.',
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
          hint: 'Trapped air is the first suspect: the system is bled before anything else.',
          to: 'bleed-first',
        },
        { id: 'no-pattern', label: 'No clear pattern', to: 'level-cold' },
      ],
    },
    'bleed-first': {
      kind: 'procedure',
      title: 'Bleed the system first',
      instruction:
        'The trouble began after the cooling system was drained, refilled or repaired, so air left in it is the first suspect. With the engine cold, check the level, top it up with the coolant the maker specifies and bleed the main loop — and the low-temperature loop where the engine has one — exactly as the maker describes (bleed screws, vacuum filler or the scan tool’s bleed routine). Then drive at full operating temperature for ten minutes or more in the conditions the customer described, let the engine cool, recheck the level and top it up.',
      tools: ['Vacuum filler (if used by the maker)', 'Scan tool'],
      estimatedMinutes: 60,
      notes:
        'Purging air after a refill: drive or run to full operating temperature for ten minutes or more, let it cool, recheck and top up — the level drops a little as trapped air leaves. Air locks in auxiliary loops can survive vacuum filling (common practice).',
      hazards: ['hot-pressurised-coolant', 'glycol', 'fan', 'road-test'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.fan, cautions.roadTest],
      done: 'bleed-first-result',
      couldNotDo: 'level-cold',
    },
    'bleed-first-result': {
      kind: 'question',
      title: 'Did bleeding cure it?',
      prompt:
        'After bleeding and the drive in the customer’s conditions: does the temperature now stay in its normal band? Where did the air come out?',
      estimatedMinutes: 5,
      choices: [
        {
          id: 'cured-main-loop',
          label: 'Cured; the air came out of the main loop, or you cannot tell which loop',
          to: 'main-loop-air-lock',
        },
        {
          id: 'cured-low-temperature-loop',
          label: 'Cured; the low-temperature loop held the air (its pump gurgled or its tank fell)',
          to: 'auxiliary-loop-air-lock',
        },
        {
          id: 'not-cured',
          label: 'No, it still runs hot',
          hint: 'The usual checks follow, from the cold level onwards.',
          to: 'level-cold',
        },
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
      notes:
        'Recorded for the case: a large top-up means coolant is being lost, which the leak and pressure checks that follow look for. A top-up also lets air into the system: bubbles in a block test soon after it can be that air leaving (common practice).',
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
        'Look over the hoses and clamps, radiator and its end tanks, the expansion tank and its seams, the pump’s weep hole and the heater hose joints, from above and from under the vehicle. Wet patches, drips, or dried crusty residue in the coolant’s colour all count.',
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
        'On the cold system, fit the pressure tester to the expansion tank and pump it to the pressure stamped on the cap, never above it. Watch the suspect area for fresh coolant. Let the pressure off slowly through the tester’s valve when done.',
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
      estimatedMinutes: 2,
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
      estimatedMinutes: 3,
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
        'Coolant concentrates are meant to be used at 40–60 vol % (ASTM D3306). Heatpath flags protection weaker than about −24 °C, which is close to 40 vol % (freezing points from the ASHRAE table of aqueous ethylene glycol), and anything above 60 %.',
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
        'Take the cap off the cold system and fit it to the tester with the right adapter. Pump slowly and note the pressure at which it opens; if it has not opened by 0.3 bar above its rating, stop and enter the pressure you stopped at. Then let it settle and note the pressure it still holds after one minute. Enter the rating stamped on the cap or given by the maker.',
      tools: ['Cooling-system pressure tester', 'Cap adapter'],
      hazards: ['hot-pressurised-coolant'],
      cautions: [cautions.coldSystemOnly],
      estimatedMinutes: 10,
      notes: `A good cap opens at its rating and holds it for at least a minute (published service practice). A cap fails by opening too low (the coolant boils sooner and is pushed out), too high (pressure builds beyond what hoses and tanks are made for) or by not holding. Heatpath allows ${CAP_OPENING_TOLERANCE_BAR} bar either side of the rating and a ${CAP_SETTLE_BAR} bar settle (common practice; the maker’s tolerance overrides). Ratings of 1.4–1.6 bar are common on modern cars, 0.9–1.2 bar on older ones (common practice).`,
      inputs: [
        {
          name: 'capRating',
          label: 'Cap rating',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0.3, max: 2.5 },
          hint: 'As stamped on the cap or given by the maker: 1.4–1.6 bar (20–23 psi) is common on modern cars, 0.9–1.2 bar (13–17 psi) on older ones.',
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
          when: `capOpening < capRating - ${CAP_OPENING_TOLERANCE_BAR}`,
          to: 'cap-not-holding',
          label: 'Opens well below its rating',
        },
        {
          when: `capOpening > capRating + ${CAP_OPENING_TOLERANCE_BAR}`,
          to: 'cap-opens-too-high',
          label: 'Opens well above its rating',
        },
        {
          when: `capHeldAfterMinute < capOpening - ${CAP_SETTLE_BAR}`,
          to: 'cap-not-holding',
          label: 'Does not hold pressure',
        },
      ],
      fallback: { to: 'cap-vacuum-valve', label: 'Opens and holds at its rating' },
    },
    'cap-vacuum-valve': {
      kind: 'question',
      title: 'Cap vacuum valve',
      prompt:
        'The small valve in the middle of the cap’s seal lets air (or coolant from the tank) back in as the system cools. With the cap still off the car, pull it open with a fingernail: it should open with light force, spring back and seat flat. Think back too: were the hoses flat or the tank pulled in when the engine was cold, before you released the cap?',
      estimatedMinutes: 3,
      notes:
        'A cap is tested all three ways it fails: opening too low, too high, and a vacuum valve that sticks and leaves the hoses collapsed after cool-down (common practice).',
      choices: [
        {
          id: 'vacuum-valve-ok',
          label: 'It moves freely and seats; no sign of vacuum',
          to: 'pressure-test',
        },
        {
          id: 'vacuum-valve-stuck',
          label: 'Stuck, sticky or not seating; or the hoses were collapsed',
          to: 'cap-vacuum-valve-faulty',
        },
      ],
    },
    'pressure-test': {
      kind: 'measurement',
      title: 'System pressure test (cold)',
      prompt:
        'Refit the tester to the cold system and pump it to the cap rating, never above. Hold for at least ten minutes without pumping, then enter the starting pressure, the pressure at the end and how long you held it. Let the pressure off slowly through the tester’s valve.',
      tools: ['Cooling-system pressure tester and adapters'],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      estimatedMinutes: 30,
      notes: `Hold the cold, stopped system at the cap rating for 10–30 minutes; the gauge should not fall (common practice; no allowable drop is published). Heatpath’s pressure-hold rule, shared with the pressure-test calculator: a change within ${R.noChangeBar} bar is no change (gauge resolution); a start more than ${R.maxOverRatingFraction * 100} % above the rating, or below ${R.minStartFractionOfRating * 100} % of it, is not a valid test (pumping past the rating can burst a hose or crack a tank and proves nothing); a rise on a cold, stopped engine means the system was still warming — a stopped engine makes no combustion gas. Each of those is repeated.`,
      inputs: [
        {
          name: 'testPressure',
          label: 'Pressure at the start',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0.1, max: 3.5 },
        },
        {
          name: 'pressureAfterHold',
          label: 'Pressure at the end',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0, max: 3.5 },
        },
        {
          name: 'holdMinutes',
          label: 'Time held',
          quantity: 'time',
          unit: 'min',
          range: { min: R.minimumMinutes, max: 120 },
          hint: 'At least ten minutes; a shorter hold proves nothing.',
        },
      ],
      branches: [
        {
          when: `testPressure > capRating * ${overRating}`,
          to: 'pressure-retest',
          label: 'Pumped above the cap rating: not a valid test',
        },
        {
          when: `testPressure < capRating * ${R.minStartFractionOfRating}`,
          to: 'pressure-retest',
          label: 'Started well below the cap rating',
        },
        {
          when: `pressureFall < -${R.noChangeBar}`,
          to: 'pressure-retest',
          label: 'Pressure rose: the system was still warming',
        },
        {
          when: `pressureFall > ${R.noChangeBar}`,
          to: 'find-leak-under-pressure',
          label: 'Pressure falls',
        },
      ],
      fallback: { to: 'block-test', label: 'Holds pressure' },
    },
    'pressure-retest': {
      kind: 'measurement',
      title: 'Repeat the pressure test',
      prompt:
        'The first test does not count: it was pumped above the cap rating or started well below it, or the pressure rose because the system was still warming. Let the pressure off slowly through the tester’s valve. If it was pumped above the rating, look over the hoses, the tank seams and the radiator’s end tanks for damage. Let the engine cool to workshop temperature, then pump the cold system to the cap rating — not above — and hold it again for at least ten minutes.',
      tools: ['Cooling-system pressure tester and adapters'],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      estimatedMinutes: 30,
      notes: `The same pressure-hold rule as the first test (common practice for the hold; Heatpath’s own ${R.noChangeBar} bar no-change band and ${R.maxOverRatingFraction * 100} % limit above the rating). A second test that is again off the rating or rising is not used to judge the system, and the walk carries on with the block test.`,
      inputs: [
        {
          name: 'retestPressure',
          label: 'Pressure at the start',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0.1, max: 3.5 },
        },
        {
          name: 'retestAfterHold',
          label: 'Pressure at the end',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0, max: 3.5 },
        },
        {
          name: 'retestMinutes',
          label: 'Time held',
          quantity: 'time',
          unit: 'min',
          range: { min: R.minimumMinutes, max: 120 },
        },
      ],
      branches: [
        {
          when: `retestPressure > capRating * ${overRating} or retestPressure < capRating * ${R.minStartFractionOfRating} or retestFall < -${R.noChangeBar}`,
          to: 'block-test',
          label: 'Still not a valid test: carry on without it',
        },
        {
          when: `retestFall > ${R.noChangeBar}`,
          to: 'find-leak-under-pressure',
          label: 'Pressure falls',
        },
      ],
      fallback: { to: 'block-test', label: 'Holds pressure' },
    },
    'find-leak-under-pressure': {
      kind: 'procedure',
      title: 'Find where the pressure goes',
      instruction:
        'Keep the cold system under test pressure, at the cap rating and not above, and search for the leak: hoses and clamps, radiator tanks and core, pump weep hole, heater joints at the bulkhead, tank seams, from above and from under the vehicle. Where the maker allows, add UV dye and search with the UV lamp. Check the passenger footwell for damp carpet.',
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
      estimatedMinutes: 2,
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
        'Start with the engine cold. Remove the cap of the cold system, lower the level a little if the tester needs room, fill the tester with fresh test fluid and fit it to the tank neck. Start the engine and draw air from above the coolant through the fluid while the engine warms, with a few blips of the throttle. Stop the engine well before the coolant gets hot or can reach the tester, then take the tester off and refit the cap.',
      tools: ['Combustion-gas tester with fresh fluid'],
      estimatedMinutes: 15,
      notes:
        'Done while the engine warms from cold, because that is the only time the cap may be off with the engine running. If coolant was topped up or the system refilled shortly before, bubbles can be trapped air leaving rather than gas: a positive result is therefore repeated on a bled system before it counts (common practice). Combustion gas often shows only under load.',
      hazards: ['hot-pressurised-coolant', 'fan', 'glycol'],
      cautions: [cautions.openNeckRunning, cautions.fan, cautions.glycol],
      done: 'block-test-result',
      couldNotDo: 'warm-up-live-data',
    },
    'block-test-result': {
      kind: 'question',
      title: 'Block test result',
      prompt:
        'Did the test fluid change colour the way the kit says it does for combustion gas, or did a steady stream of bubbles keep rising in the tank?',
      estimatedMinutes: 2,
      evidence: [{ kind: 'photo', label: 'Photo of the test fluid', required: true }],
      choices: [
        {
          id: 'gas-or-bubbles',
          label: 'Yes: the fluid changed colour, or bubbles kept rising',
          hint: 'Not yet a finding: air leaving a freshly topped-up system looks the same. The test is repeated on a bled system.',
          to: 'block-test-repeat',
        },
        { id: 'no-gas', label: 'No change', to: 'warm-up-live-data' },
      ],
    },
    'block-test-repeat': {
      kind: 'procedure',
      title: 'Bleed, then repeat the block test',
      instruction:
        'Before blaming combustion gas, repeat the test on a bled system. With the engine cold, bleed the main loop as the maker describes, then drive at full operating temperature for ten minutes or more so trapped air can leave. Let the engine cool fully and top up the level. Then repeat the block test from cold with fresh fluid, as before; a helper holding the engine at a higher speed for a minute shows a leak that appears only under load more clearly.',
      tools: ['Combustion-gas tester with fresh fluid', 'Scan tool'],
      estimatedMinutes: 75,
      notes:
        'Bubbles right after topping up a cold system can be air leaving; a repeat on a bled system tells the two apart (common practice).',
      hazards: ['hot-pressurised-coolant', 'fan', 'glycol', 'road-test'],
      cautions: [cautions.openNeckRunning, cautions.fan, cautions.glycol, cautions.roadTest],
      done: 'block-test-repeat-result',
      couldNotDo: 'warm-up-live-data',
    },
    'block-test-repeat-result': {
      kind: 'question',
      title: 'Repeated block test result',
      prompt:
        'On the bled system, did the fresh test fluid change colour again, or did a steady stream of bubbles rise again?',
      estimatedMinutes: 2,
      evidence: [{ kind: 'photo', label: 'Photo of the test fluid', required: true }],
      choices: [
        {
          id: 'gas-again',
          label: 'Yes, again on the bled system: combustion gas',
          to: 'combustion-gas-in-coolant',
        },
        {
          id: 'clean-now',
          label: 'No change now: the first result was air leaving',
          to: 'warm-up-live-data',
        },
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
        'IR thermometers read surfaces and shiny metal reads low, so compare on a painted or dull part of the housing. A gap of more than 10 K either way is worth confirming with a contact probe (common practice). Engines with a map-controlled thermostat run 100–110 °C at part load as normal. If the fault does not show in the bay, log a road test and enter its highest reading with an IR reading taken as soon as you stop.',
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
        'Hold a contact thermometer probe firmly on a clean, dull spot of the sensor housing. Enter its reading and the coolant temperature live data shows at that same moment.',
      tools: ['Contact thermometer', 'Scan tool'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 10,
      notes: `A sensor can be wrong either way, and the two mean opposite things (common practice). Live data more than ${PROBE_GAP_K} K ABOVE the probe: the sensor reads high, the engine is cooler than shown. Live data more than ${PROBE_GAP_K} K BELOW the probe: the sensor reads low, the engine is hotter than shown and the fan may be commanded late or never, so it can really overheat. Heatpath’s ${PROBE_GAP_K} K is common practice.`,
      inputs: [
        {
          name: 'probeTemp',
          label: 'Contact probe reading',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'liveDataAtProbe',
          label: 'Live data at the same moment',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
      ],
      branches: [
        {
          when: `probeGap > ${PROBE_GAP_K}`,
          to: 'temperature-reading-wrong',
          label: 'Live data reads high: the engine is cooler than shown',
        },
        {
          when: `probeGap < -${PROBE_GAP_K}`,
          to: 'temperature-reads-low',
          label: 'Live data reads low: the engine is hotter than shown',
        },
      ],
      fallback: { to: 'hose-temps', label: 'Live data is right; the IR reading was off' },
    },
    'hose-temps': {
      kind: 'measurement',
      title: 'Radiator hose temperatures',
      prompt:
        'Take these readings at a moment the thermostat is known to be open, all at the same moment. A conventional thermostat is open once live data is 10 K or more above its opening temperature (usually 95 °C or more). A map-controlled thermostat (a heater element the engine computer drives) is held shut at part load, where 100–110 °C with a cool radiator inlet hose is normal: read while the computer has it open — under sustained load on a road test (stop and read at once), during the scan tool’s thermostat output test where there is one, or once live data passes about 110 °C. Read the radiator inlet and outlet hoses near the radiator with the IR thermometer, on dull rubber, not on clamps, and enter the live data shown at that moment. Note the ambient temperature, engine speed and A/C state on the case.',
      tools: ['IR thermometer', 'Scan tool'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface', 'road-test'],
      cautions: [
        cautions.keepClosedWhenHot,
        cautions.fan,
        cautions.hotSurface,
        cautions.scanToolActuation,
        cautions.roadTest,
      ],
      estimatedMinutes: 15,
      notes: `With good flow the coolant loses around 5–6 K across the radiator; much more points to weak flow, much less to an air-side problem (trade rule of thumb). An inlet hose more than ${INLET_LAG_K} K cooler than an engine at ${HOT_ENGINE_C} °C or more, read at the same moment with the thermostat known to be open, means almost nothing flows through the radiator (common practice). Readings from different moments (a road-test peak against hoses read later) must not be compared. Map-controlled thermostats let the engine run 100–110 °C at part load and drop towards 90 °C under full load (common practice): judge them only while open. The live-data reading starts at 80 °C because below that no thermostat is open.`,
      inputs: [
        {
          name: 'engineTempAtHoses',
          label: 'Live data at the moment of the hose readings',
          quantity: 'temperature',
          unit: 'degC',
          range: { min: 80, max: 150 },
          hint: 'Read with the thermostat known to be open; below 80 °C no thermostat is.',
        },
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
          when: `engineTempAtHoses >= ${HOT_ENGINE_C} and inletLag > ${INLET_LAG_K}`,
          to: 'circulation-check',
          label: 'Engine hot, radiator inlet hose cool with the thermostat open',
        },
        { when: 'radiatorDrop > 20', to: 'core-scan', label: 'Large drop across the radiator' },
        {
          when: 'radiatorDrop < 3',
          to: 'fan-switch',
          label: 'Very small drop: the radiator sheds little heat (fan or air side)',
        },
      ],
      fallback: { to: 'fan-switch', label: 'Flow through the radiator looks normal' },
    },
    'circulation-check': {
      kind: 'question',
      title: 'Does coolant move through the engine?',
      prompt:
        'The engine is hot and the radiator gets little coolant although the thermostat should be open. With the engine still hot and the cap on, judge whether coolant moves through the engine at all: read both heater hoses at the bulkhead and the thermostat housing with the IR thermometer, and feel the cabin heat with the heater at full. Coolant moving through the engine keeps both heater hoses hot and the cabin heat good, with the housing hot on the engine side and cool only on the radiator side. A pump that moves little leaves the heater hoses lukewarm or one of them cool, the cabin heat weak or fading, and live data jumping.',
      tools: ['IR thermometer'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 10,
      notes:
        'The heater loop is fed by the main pump whether or not the thermostat is open, so hot heater hoses with a cool radiator inlet point at the thermostat, and lukewarm heater hoses point at circulation: the pump or air (common practice). Where the heater loop has its own electric pump, its flow says nothing about the main pump.',
      choices: [
        {
          id: 'circulates',
          label: 'It moves: heater hoses hot, good cabin heat, only the radiator side cool',
          to: 'thermostat-test',
        },
        {
          id: 'little-circulation',
          label:
            'Little movement: heater hoses lukewarm or one cool, weak or fading heat, gurgling',
          to: 'main-loop-bleed',
        },
        {
          id: 'cannot-tell',
          label: 'Cannot tell (the heater loop has its own pump, or the signs are mixed)',
          hint: 'The thermostat is quicker and cheaper to check than the pump, so it comes first.',
          to: 'thermostat-test',
        },
      ],
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
        'Let the engine cool completely. Drain enough coolant to get below the thermostat, remove it and note the temperature stamped on it. Hang it on a wire in a pan of water with a thermometer beside it, neither touching the pan, and heat the water slowly. Watch for the moment it begins to open and whether it goes on to open fully. A thermostat with a heater element (map-controlled), or one stamped too high to open fully below the boil, is tested as the maker describes instead.',
      tools: ['Drain tray', 'Pan and heat source', 'Thermometer', 'Tongs or wire'],
      estimatedMinutes: 60,
      hazards: ['hot-pressurised-coolant', 'glycol', 'hot-surface'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.boilingWater],
      evidence: [{ kind: 'photo', label: 'Photo of the thermostat in the test', required: false }],
      done: 'thermostat-opened',
      couldNotDo: 'no-cause-found',
    },
    'thermostat-opened': {
      kind: 'question',
      title: 'Did the thermostat open?',
      prompt: 'In the pan, did the thermostat begin to open before the water boiled?',
      estimatedMinutes: 5,
      hazards: ['hot-surface'],
      cautions: [cautions.boilingWater],
      notes:
        'Asked plainly first, because a thermostat that never opened has no opening temperature to enter. Water boils at about 100 °C in an open pan, so a thermostat stamped above about 92 °C cannot be seen to open fully there (common practice).',
      choices: [
        {
          id: 'never-opened',
          label: 'No, it stayed shut with the water near the boil',
          hint: 'For a thermostat stamped at about 92 °C or less; one stamped higher, or with a heater element, takes the maker’s test.',
          to: 'thermostat-stuck-closed',
        },
        { id: 'opened', label: 'Yes, it began to open', to: 'thermostat-opening' },
        {
          id: 'needs-maker-test',
          label: 'It has a heater element, or its stamp is too high to test in the pan',
          to: 'thermostat-maker-test',
        },
      ],
    },
    'thermostat-opening': {
      kind: 'measurement',
      title: 'Thermostat opening temperature',
      prompt:
        'Enter the temperature stamped on the thermostat and the water temperature at which it began to open.',
      estimatedMinutes: 2,
      hazards: ['hot-surface'],
      cautions: [cautions.boilingWater],
      notes: `Thermostats usually open at 82–91 °C (trade textbook). A good one begins to open within a few kelvin of its stamp; Heatpath treats beginning more than ${THERMOSTAT_LATE_K} K above the stamp as late (common practice). Opening on time is not enough: the next step asks whether it opened fully.`,
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
          when: `thermostatLate > ${THERMOSTAT_LATE_K}`,
          to: 'thermostat-stuck-closed',
          label: 'Began to open late',
        },
      ],
      fallback: { to: 'thermostat-full-lift', label: 'Began to open on time' },
    },
    'thermostat-full-lift': {
      kind: 'question',
      title: 'Did it open fully?',
      prompt:
        'Keep heating. Some 10–15 K above the temperature at which it began to open, a good thermostat is fully open, to the travel the maker gives (often around 8 mm or more). Did it open fully?',
      estimatedMinutes: 5,
      hazards: ['hot-surface'],
      cautions: [cautions.boilingWater],
      notes:
        'A thermostat that only lifts partly passes too little coolant under load and is as much a fault as one that opens late (common practice; the maker’s lift figure overrides).',
      choices: [
        { id: 'fully', label: 'Yes, it opened fully', to: 'main-loop-bleed' },
        { id: 'partly', label: 'No, it only opened partly', to: 'thermostat-stuck-closed' },
        {
          id: 'boiled-first',
          label: 'The water boiled before it could open fully',
          to: 'thermostat-maker-test',
        },
      ],
    },
    'thermostat-maker-test': {
      kind: 'question',
      title: 'Thermostat test to the maker’s method',
      prompt:
        'Test the thermostat as the maker describes: for one with a heater element, the element’s resistance and whether the thermostat opens fully when the element is powered; for one stamped too high for the pan, the maker’s bench test. Did it pass?',
      tools: ['Multimeter', 'Fused test leads'],
      estimatedMinutes: 30,
      hazards: ['hot-surface'],
      cautions: [cautions.boilingWater],
      choices: [
        { id: 'passed', label: 'It opens on time and fully', to: 'main-loop-bleed' },
        {
          id: 'failed',
          label: 'It opens late, only partly or not at all, or its element is open',
          to: 'thermostat-stuck-closed',
        },
        {
          id: 'cannot-test',
          label: 'No way to test it here',
          hint: 'The thermostat stays unproven: the lead decides with the maker’s information rather than the walk moving on to the pump.',
          to: 'no-cause-found',
        },
      ],
    },
    'main-loop-bleed': {
      kind: 'procedure',
      title: 'Refill and bleed the main loop',
      instruction:
        'With the engine cold, refit the thermostat if it was out (with a new seal), top up and bleed the main loop exactly as the maker describes (bleed screws, vacuum filler or scan-tool routine). Then drive or run the engine at full operating temperature for ten minutes or more, and watch the radiator inlet hose and live data.',
      tools: ['Vacuum filler (if used by the maker)', 'Scan tool'],
      estimatedMinutes: 45,
      hazards: ['hot-pressurised-coolant', 'glycol', 'fan', 'road-test'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.fan, cautions.roadTest],
      done: 'main-loop-retest',
      couldNotDo: 'no-cause-found',
    },
    'main-loop-retest': {
      kind: 'question',
      title: 'Does coolant flow now?',
      prompt:
        'After bleeding and the run at operating temperature, at a moment the thermostat is known to be open (as at the hose check): does the radiator inlet hose now get hot, with live data staying in its normal band?',
      tools: ['IR thermometer', 'Scan tool'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 10,
      choices: [
        { id: 'flows-now', label: 'Yes, it flows and stays normal', to: 'main-loop-air-lock' },
        {
          id: 'still-no-flow',
          label: 'No: the engine gets hot and the inlet hose still stays cool',
          hint: 'Bled, with the thermostat open: the evidence now points at the pump.',
          to: 'pump-type',
        },
      ],
    },
    'pump-type': {
      kind: 'question',
      title: 'Which coolant pump?',
      prompt:
        'How is this engine’s main coolant pump built and driven? Check the maker’s information.',
      estimatedMinutes: 5,
      choices: [
        {
          id: 'switchable',
          label: 'Switchable: a shroud over the impeller, worked by a control valve',
          to: 'pump-valve-check',
        },
        {
          id: 'conventional-auxiliary-belt',
          label: 'Conventional, driven by the auxiliary (ribbed) belt',
          to: 'pump-belt-check',
        },
        {
          id: 'conventional-timing-drive',
          label: 'Conventional, driven by the timing belt or chain, or a gear',
          to: 'conventional-pump-removal',
        },
      ],
    },
    'pump-valve-check': {
      kind: 'question',
      title: 'Switchable pump: control valve and wiring',
      prompt:
        'Before the pump comes off, check what moves its shroud. With the engine warm and the cap on, read in live data whether the engine computer is commanding the pump’s control valve; on most of these pumps a powered valve means no flow, so with the engine warm it should be off (the maker’s information says which way yours works). Then with the ignition off unplug the valve: look for corrosion, water or pushed-back pins in the connector and chafed wiring, measure the valve’s winding against the maker’s figure, and check that its control wire is not shorted to ground, which would keep it powered all the time. With the ignition on, check its supply.',
      tools: ['Scan tool', 'Multimeter', 'Wiring diagram'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 30,
      notes:
        'A solenoid valve worked by the engine computer holds the shroud out over the impeller while the engine warms; with the valve released, a spring pulls it back. A valve that is never powered gives a pump that never covers (a slower warm-up, no overheating); a valve held powered, or a shroud stuck out, gives overheating. The valve, its wiring and its actuation are checked before a pump that often sits behind the timing belt is taken off (common practice).',
      choices: [
        {
          id: 'held-powered',
          label: 'The valve stays powered with the engine warm (commanded, or wire shorted)',
          to: 'pump-valve-circuit-fault',
        },
        {
          id: 'circuit-good',
          label: 'Supply, wiring, connector and winding as the maker gives; not held powered',
          to: 'pump-actuation-test',
        },
        {
          id: 'never-powered',
          label: 'Open circuit or no supply: the valve can never be powered',
          hint: 'With its valve never powered the shroud should stay back and the pump should flow, so no flow points at the pump itself. Repair the circuit as well.',
          to: 'pump-removal',
        },
      ],
    },
    'pump-actuation-test': {
      kind: 'question',
      title: 'Switchable pump: command it from the scan tool',
      prompt:
        'Where the scan tool can command the switchable pump (an output test of its control valve), run it with the engine warm, live data above the thermostat’s opening temperature, the cap on and the radiator inlet hose in view of the IR thermometer. Command the pump to flow, then to stop, for a minute or two each, and watch live data and the inlet hose. A working pump answers: told to flow, the radiator inlet warms and the coolant temperature steadies or falls; told to stop, it climbs again. A shroud stuck out does not answer: nothing changes whatever you command.',
      tools: ['Scan tool with output tests', 'IR thermometer'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.scanToolActuation, cautions.keepClosedWhenHot, cautions.hotSurface],
      estimatedMinutes: 20,
      evidence: [{ kind: 'log', label: 'Scan-tool log of the actuation', required: false }],
      choices: [
        {
          id: 'no-response',
          label: 'Nothing changes whatever the command: the inlet stays cool, the engine climbs',
          to: 'pump-removal',
        },
        {
          id: 'responds',
          label: 'The pump answers: the inlet warms when it is told to flow',
          hint: 'It works now; a shroud that sticks only now and then needs the next episode logged before the pump comes off.',
          to: 'no-cause-found',
        },
        {
          id: 'not-available',
          label: 'The scan tool cannot command this pump',
          hint: 'The evidence so far stands: hot engine, cool inlet with the thermostat open, bleeding did not help, the valve circuit is sound.',
          to: 'pump-removal',
        },
      ],
    },
    'pump-removal': {
      kind: 'procedure',
      title: 'Remove the coolant pump for inspection',
      instruction:
        'With the engine cold, drain the coolant and remove the switchable coolant pump as the maker describes. On many engines the pump is driven by the timing belt, so this is a timing-belt job; where an engine mount has to come off, support the engine first.',
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
      estimatedMinutes: 10,
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
    'pump-belt-check': {
      kind: 'question',
      title: 'Pump belt drive',
      prompt:
        'With the engine off and the key out, check the auxiliary belt that drives the pump: glazing, cracks, missing ribs, oil or coolant on it, its tension, the tensioner’s movement and the pulleys. Is the drive sound?',
      tools: ['Inspection lamp', 'Belt tension gauge'],
      hazards: ['belt-drive', 'fan'],
      cautions: [localCautions.auxiliaryBeltDrive, cautions.fan],
      estimatedMinutes: 10,
      choices: [
        {
          id: 'belt-slips',
          label: 'Glazed, contaminated, loose or slipping',
          to: 'pump-drive-slipping',
        },
        { id: 'belt-sound', label: 'The belt drive is sound', to: 'conventional-pump-removal' },
      ],
    },
    'conventional-pump-removal': {
      kind: 'procedure',
      title: 'Remove the conventional coolant pump for inspection',
      instruction:
        'With the engine cold, drain the coolant and remove the main coolant pump as the maker describes. Where it is driven by the timing belt this is a timing-belt job; where an engine mount has to come off, support the engine first.',
      tools: ['Drain tray', 'Engine support bar', 'Timing locking tools for this engine'],
      estimatedMinutes: 150,
      hazards: ['hot-pressurised-coolant', 'glycol', 'belt-drive', 'lifting'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.beltDrive, cautions.lifting],
      evidence: [{ kind: 'photo', label: 'Photos of the pump, impeller side', required: true }],
      done: 'impeller-inspection',
      couldNotDo: 'no-cause-found',
    },
    'impeller-inspection': {
      kind: 'question',
      title: 'Inspect the impeller',
      prompt: 'Is the impeller damaged, eroded, or slipping on its shaft?',
      estimatedMinutes: 10,
      choices: [
        { id: 'damaged', label: 'Yes, damaged or slipping', to: 'pump-impeller-not-circulating' },
        { id: 'looks-good', label: 'No, it looks good', to: 'no-cause-found' },
      ],
    },
    'fan-switch': {
      kind: 'measurement',
      title: 'Fan switch-on temperature',
      prompt: `At idle with the A/C off, watch live data and the radiator fan. Enter the coolant temperature at which the fan first ran (its first stage, or a variable-speed fan’s first run). If it had not run by 112 °C, switch off and enter the highest temperature reached.`,
      tools: ['Scan tool'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 15,
      notes: `Most engines bring the fan in by about 100–105 °C, and engines with a map-controlled thermostat, which run 100–110 °C at part load, by about ${FAN_LATE_C} °C; Heatpath treats a fan not running by ${FAN_LATE_C} °C as late (common practice; the maker’s switch point overrides).`,
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
          when: `fanOnTemp > ${FAN_LATE_C}`,
          to: 'fan-stage-not-switching',
          label: 'Fan comes on late or not at all',
        },
      ],
      fallback: { to: 'fan-drive-type', label: 'Fan comes on in time' },
    },
    'fan-drive-type': {
      kind: 'question',
      title: 'How is the fan driven?',
      prompt:
        'How does this car’s radiator fan run? Check the maker’s information, or the fan’s connector and control module.',
      estimatedMinutes: 5,
      notes:
        'Many fans are variable-speed (duty-cycle commanded) or are also commanded from the refrigerant pressure; “does it switch to its higher stage” applies only to staged fans, so the fan is judged by how it is driven (common practice).',
      choices: [
        {
          id: 'staged',
          label: 'Staged: one or two fixed speeds (relays or a resistor), or a second fan',
          to: 'fan-ac-stage',
        },
        {
          id: 'variable-speed',
          label: 'Variable speed: a control module commanded by a duty cycle',
          to: 'fan-duty-check',
        },
        {
          id: 'refrigerant-pressure',
          label: 'Also commanded from the A/C refrigerant pressure',
          to: 'fan-ac-pressure-check',
        },
        {
          id: 'not-sure',
          label: 'Not sure',
          hint: 'Most recent fans are variable speed: compare the fan with its command in live data.',
          to: 'fan-duty-check',
        },
      ],
    },
    'fan-ac-stage': {
      kind: 'question',
      title: 'Fan with the A/C on',
      prompt:
        'This fan is staged. Switch the A/C on at maximum. Within a minute, does the fan run at its higher speed (or the second fan start)?',
      hazards: ['fan'],
      cautions: [cautions.fan],
      estimatedMinutes: 5,
      choices: [
        { id: 'higher-stage-runs', label: 'Yes', to: 'aux-loop-present' },
        { id: 'no-higher-stage', label: 'No', to: 'fan-stage-not-switching' },
      ],
    },
    'fan-duty-check': {
      kind: 'question',
      title: 'Fan speed against its command',
      prompt:
        'With the engine warm, watch the fan’s commanded duty (or speed request) in live data as the temperature rises and with the A/C on at maximum, and watch and listen to the fan. A variable-speed fan runs slowly at a low command and faster as the command rises; it need not jump to a higher stage. Does the fan follow its command?',
      tools: ['Scan tool'],
      hazards: ['hot-pressurised-coolant', 'fan'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan],
      estimatedMinutes: 10,
      choices: [
        { id: 'follows', label: 'Yes, the fan speed follows the command', to: 'aux-loop-present' },
        {
          id: 'does-not-follow',
          label: 'No: the command rises but the fan stays slow or stopped',
          to: 'fan-stage-not-switching',
        },
        {
          id: 'not-commanded',
          label: 'The command stays low although the engine is hot',
          to: 'fan-stage-not-switching',
        },
      ],
    },
    'fan-ac-pressure-check': {
      kind: 'question',
      title: 'Fan against the refrigerant pressure',
      prompt:
        'With the engine warm and the A/C on at maximum, read the refrigerant high-side pressure in live data and watch the fan. Does the fan come on, or speed up, as the pressure passes the maker’s switch point?',
      tools: ['Scan tool'],
      hazards: ['hot-pressurised-coolant', 'fan'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan],
      estimatedMinutes: 10,
      choices: [
        { id: 'responds', label: 'Yes, the fan answers the pressure', to: 'aux-loop-present' },
        {
          id: 'no-response',
          label: 'No: the pressure passes the switch point and the fan does not answer',
          to: 'fan-stage-not-switching',
        },
        {
          id: 'pressure-stays-low',
          label: 'The pressure never reaches the switch point',
          hint: 'The fan is not being asked to run: an A/C matter (charge, compressor) to note for the advisor, not the cause of the overheating.',
          to: 'aux-loop-present',
        },
      ],
    },
    'aux-loop-present': {
      kind: 'question',
      title: 'Low-temperature loop?',
      prompt:
        'Does this engine have a separate low-temperature coolant loop with an electric auxiliary pump (for example for a water-cooled charge-air cooler)? Check the maker’s information.',
      estimatedMinutes: 3,
      choices: [
        { id: 'has-loop', label: 'Yes', to: 'aux-pump-check' },
        { id: 'no-loop', label: 'No', to: 'air-side-check' },
      ],
    },
    'aux-pump-check': {
      kind: 'question',
      title: 'Auxiliary pump running?',
      prompt:
        'With the ignition on, or using the scan tool’s output test, feel and listen to the auxiliary pump and watch its tank. What do you find?',
      tools: ['Scan tool'],
      hazards: ['fan'],
      cautions: [cautions.scanToolActuation],
      estimatedMinutes: 10,
      choices: [
        { id: 'runs-quietly', label: 'It runs quietly', to: 'charge-air-log' },
        {
          id: 'runs-with-air',
          label: 'It runs but gurgles, or the flow in its tank is weak and bubbly',
          to: 'aux-bleed',
        },
        { id: 'not-running', label: 'It does not run', to: 'aux-pump-circuit' },
      ],
    },
    'aux-pump-circuit': {
      kind: 'question',
      title: 'Auxiliary pump supply and command',
      prompt:
        'With the pump commanded on (ignition on, or the scan tool’s output test), check at its connector: the supply, the ground and, on pumps that need one, the command signal — many auxiliary pumps run only when told to by a signal or a data line. What do you find?',
      tools: ['Scan tool', 'Multimeter', 'Wiring diagram'],
      hazards: ['fan'],
      cautions: [cautions.scanToolActuation],
      estimatedMinutes: 20,
      notes:
        'An auxiliary pump is blamed only when it gets everything it needs and still does not run (common practice).',
      choices: [
        {
          id: 'all-present',
          label: 'Supply, ground and command are all there, but the pump does not run',
          to: 'auxiliary-pump-not-running',
        },
        {
          id: 'something-missing',
          label: 'The supply, the ground or the command signal is missing',
          to: 'aux-pump-circuit-fault',
        },
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
      fallback: { to: 'air-side-check', label: 'Charge-air temperature normal' },
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
      couldNotDo: 'air-side-check',
    },
    'aux-bleed-result': {
      kind: 'question',
      title: 'Did bleeding cure it?',
      prompt:
        'After bleeding and the drive: is the pump quiet, the charge-air temperature normal, and does a repeat of the customer’s conditions stay cool?',
      estimatedMinutes: 5,
      choices: [
        { id: 'cured', label: 'Yes', to: 'auxiliary-loop-air-lock' },
        { id: 'not-cured', label: 'No', to: 'air-side-check' },
      ],
    },
    'air-side-check': {
      kind: 'question',
      title: 'Look through the radiator',
      prompt:
        'With the engine off, look through the radiator pack with a strong lamp, from the front and from the engine side: leaves, insects, plastic or road dirt packed between the condenser and the radiator, fins bent flat or corroded away, and, where fitted, grille shutters that stay closed. Is the air path clear?',
      tools: ['Strong inspection lamp'],
      hazards: ['fan'],
      cautions: [cautions.fan],
      estimatedMinutes: 10,
      notes:
        'Debris between condenser and radiator, bent fins or shutters stuck closed give overheating under load or in traffic while the cooling circuit itself is healthy (common practice).',
      choices: [
        {
          id: 'blocked',
          label: 'No: debris, flattened or corroded fins, or shutters stuck closed',
          to: 'radiator-air-side-blocked',
        },
        { id: 'clear', label: 'Yes, air can pass freely', to: 'pump-drive-check' },
      ],
    },
    'pump-drive-check': {
      kind: 'question',
      title: 'Coolant pump drive',
      prompt:
        'With the engine off and the key out, see how the main coolant pump is driven. If the auxiliary (ribbed) belt drives it, check the belt for glazing, cracks, missing ribs and oil or coolant on it, its tension and the tensioner’s movement: a worn or contaminated belt can slip on the pump pulley when wet or under load while everything looks normal in the bay.',
      tools: ['Inspection lamp', 'Belt tension gauge'],
      hazards: ['belt-drive', 'fan'],
      cautions: [localCautions.auxiliaryBeltDrive, cautions.fan],
      estimatedMinutes: 10,
      notes:
        'A slipping pump drive gives overheating under load or after rain with a healthy cooling circuit (common practice).',
      choices: [
        {
          id: 'belt-slips',
          label: 'The belt is glazed, contaminated, loose or slips',
          to: 'pump-drive-slipping',
        },
        { id: 'belt-sound', label: 'The belt drive is sound', to: 'road-test-flow-log' },
        {
          id: 'not-on-auxiliary-belt',
          label: 'The pump is not on the auxiliary belt (timing belt or chain, gear)',
          to: 'road-test-flow-log',
        },
      ],
    },
    'road-test-flow-log': {
      kind: 'measurement',
      title: 'Catch an episode on a road test',
      prompt: `Everything looked right in the bay, so reproduce the customer’s conditions on a road test with live data logged (coolant temperature, fan command, speed, load and charge-air temperature). If the temperature climbs past about ${EPISODE_C} °C, stop safely at once, leave the engine idling with the cap on, and straight away read the radiator inlet and outlet hoses with the IR thermometer. Enter the live data at that moment and the two hose readings. If it never climbed, enter the highest live data reached and hose readings taken when you stopped.`,
      tools: ['Scan tool with logging', 'IR thermometer'],
      hazards: ['road-test', 'hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.roadTest, cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 45,
      evidence: [{ kind: 'log', label: 'Road-test log', required: true }],
      notes: `An episode is live data past ${EPISODE_C} °C, above the 100–110 °C band map-controlled engines run at, so any thermostat is open by then; the hoses are read at that moment, not later (common practice). An inlet more than ${INLET_LAG_K} K cooler than the engine then means no flow to the radiator; a drop of more than 20 K across the radiator means weak flow through the core (trade rule of thumb).`,
      inputs: [
        {
          name: 'roadPeakTemp',
          label: 'Live data when you stopped',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'roadInletTemp',
          label: 'Radiator inlet hose at that moment',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'roadOutletTemp',
          label: 'Radiator outlet hose at that moment',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
      ],
      branches: [
        {
          when: `roadPeakTemp > ${EPISODE_C} and roadInletLag > ${INLET_LAG_K}`,
          to: 'circulation-check',
          label: 'Hot engine, cool radiator inlet during the episode',
        },
        {
          when: `roadPeakTemp > ${EPISODE_C} and roadRadiatorDrop > 20`,
          to: 'core-scan',
          label: 'Hot engine, large drop across the radiator',
        },
      ],
      fallback: {
        to: 'no-cause-found',
        label: 'No episode, or flow and drop normal during it',
      },
    },

    'pump-shroud-stuck': {
      kind: 'outcome',
      title: 'Switchable pump shroud stuck over the impeller',
      rootCause:
        'The shroud of the switchable coolant pump stays out over the impeller, so the pump turns but moves almost no coolant once the engine is warm. The engine overheats while the radiator stays cool, and no fault code is set.',
      correction:
        'Replace the coolant pump (with its control valve where the maker supplies them together), refill with the specified coolant and bleed as the maker describes. Repair any fault found in the valve’s circuit on the way.',
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
      notes:
        'Reached only after the evidence pointed at the pump (engine hot, radiator inlet cool with the thermostat open, bleeding did not help) and the control valve, its wiring and, where possible, its actuation were checked; confirmed by inspecting the pump once it is out.',
      hazards: ['hot-pressurised-coolant', 'glycol', 'belt-drive', 'lifting', 'road-test'],
      cautions: [
        cautions.drainAndRefill,
        cautions.glycol,
        cautions.beltDrive,
        cautions.lifting,
        cautions.roadTest,
      ],
    },
    'pump-valve-circuit-fault': {
      kind: 'outcome',
      title: 'Switchable pump held shut by its control circuit',
      rootCause:
        'The control valve of the switchable pump is powered when it should not be — its control wire is shorted to ground, or the engine computer keeps commanding it — so the shroud stays over the impeller and the coolant barely moves once the engine is warm. The pump itself may be sound.',
      correction:
        'Repair the short or the wiring as found. If the engine computer commands the valve wrongly, check the inputs it uses (the coolant temperature sensor first) and any software update the maker issues. Where the valve is sold separately and has failed, replace it on a cold system and top up the level. Then confirm with the scan tool that the pump answers its command, and road-test.',
      parts: [{ description: 'Wiring repair parts or control valve, as found', quantity: 1 }],
      labour: [{ operation: 'Diagnose and repair switchable-pump valve circuit', hours: 1.2 }],
      followUps: [followUps.roadTestConfirm, followUps.purgeAndRecheck, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol', 'road-test'],
      cautions: [cautions.drainAndRefill, cautions.glycol, cautions.roadTest],
    },
    'auxiliary-loop-air-lock': {
      kind: 'outcome',
      title: 'Air trapped in the low-temperature loop',
      rootCause:
        'An air lock in the electrically pumped low-temperature loop stopped it circulating, so the charge-air cooler (and the engine under load) ran hot.',
      correction:
        'Bleed the low-temperature loop with the maker’s routine and drive to full operating temperature to purge the remaining air; top up once cold. If the system had been drained or refilled, check it was done as the maker describes.',
      parts: [{ description: 'Coolant to the maker’s specification (litres)', quantity: 1 }],
      labour: [{ operation: 'Bleed low-temperature loop and road test', hours: 0.8 }],
      followUps: [followUps.purgeAndRecheck, followUps.roadTestConfirm, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol', 'road-test'],
      cautions: [cautions.drainAndRefill, cautions.glycol, cautions.roadTest],
    },
    'thermostat-stuck-closed': {
      kind: 'outcome',
      title: 'Thermostat sticking closed',
      rootCause:
        'The thermostat opens late, only partly or not at all, so coolant does not reach the radiator when the engine needs it.',
      correction:
        'Fit a new thermostat (and seal) of the maker’s specification, refill and bleed as the maker describes.',
      parts: [
        { description: 'Thermostat with seal', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 2 },
      ],
      labour: [{ operation: 'Replace thermostat, refill and bleed', hours: 1.2 }],
      followUps: [followUps.purgeAndRecheck, followUps.leakCheckAfterDrive, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.drainAndRefill, cautions.glycol],
    },
    'fan-stage-not-switching': {
      kind: 'outcome',
      title: 'Radiator fan not running when needed',
      rootCause:
        'The radiator fan does not come on, or does not reach the speed it is asked for, when it should, so the engine overheats at low speed and in traffic where there is no ram air.',
      correction:
        'Check in live data whether the engine computer commands the fan (stage or duty). If it does, test the fan motor, its fuse, relay or control module and the wiring; if it does not, check the inputs that request it (coolant temperature, refrigerant pressure) as the maker describes. Repair what is at fault.',
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
      correction:
        'Fit a new cap of the rating the maker specifies and top up the level on the cold system.',
      parts: [{ description: 'Pressure cap of the specified rating', quantity: 1 }],
      labour: [{ operation: 'Test and replace pressure cap', hours: 0.3 }],
      followUps: [followUps.purgeAndRecheck, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
    },
    'cap-opens-too-high': {
      kind: 'outcome',
      title: 'Pressure cap opens too high',
      rootCause:
        'The cap’s pressure valve opens well above its rating, so pressure builds beyond what the hoses, the radiator and the tank are made for. It does not itself make the engine run hot, but it can burst a hose or split a tank, and the coolant loss that follows does.',
      correction:
        'Fit a new cap of the rating the maker specifies. Look over the hoses, the radiator’s end tanks and the expansion tank’s seams for swelling or splits the extra pressure may have caused, and top up the level on the cold system.',
      parts: [{ description: 'Pressure cap of the specified rating', quantity: 1 }],
      labour: [{ operation: 'Test and replace pressure cap, inspect hoses and tanks', hours: 0.5 }],
      followUps: [
        localFollowUps.stillHotNewCase,
        followUps.leakCheckAfterDrive,
        followUps.tellAdvisor,
      ],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
    },
    'cap-vacuum-valve-faulty': {
      kind: 'outcome',
      title: 'Pressure cap vacuum valve sticking',
      rootCause:
        'The cap’s vacuum valve sticks. Stuck shut, the system pulls a vacuum as it cools and the hoses collapse; a flattened lower hose can choke the flow to the pump when the engine next runs. Stuck open or not seating, coolant is pushed out to the tank and not drawn back, so the level in the engine falls.',
      correction:
        'Fit a new cap of the specified rating. Check that the hoses have recovered their shape and replace any that stay flattened or soft, then top up the level on the cold system.',
      parts: [{ description: 'Pressure cap of the specified rating', quantity: 1 }],
      labour: [{ operation: 'Replace pressure cap and check hoses', hours: 0.4 }],
      followUps: [followUps.purgeAndRecheck, localFollowUps.stillHotNewCase, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
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
      notes:
        'Reached only when the block test shows gas again on a bled system, so air leaving after a top-up is not mistaken for gas.',
      hazards: ['hot-pressurised-coolant'],
      cautions: [cautions.coldSystemOnly],
    },
    'external-leak-low-coolant': {
      kind: 'outcome',
      title: 'Low coolant from an external leak',
      rootCause:
        'Coolant escapes through an external leak, the level falls and the engine overheats when it runs low.',
      correction:
        'Repair the leaking part (hose, clamp, radiator, tank or pump), refill with the specified coolant and bleed as the maker describes.',
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
      hazards: ['hot-pressurised-coolant', 'glycol', 'lifting'],
      cautions: [cautions.drainAndRefill, cautions.glycol, cautions.lifting],
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
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.drainAndRefill, cautions.glycol],
    },
    'temperature-reading-wrong': {
      kind: 'outcome',
      title: 'Temperature sensor reads high',
      rootCause:
        'The engine is not as hot as the gauge or live data says: the coolant temperature sensor, its wiring or connector reads higher than the coolant really is.',
      correction:
        'Check the sensor’s reading with the engine cold against the ambient temperature and its resistance against the maker’s table, check its wiring and connector as the maker describes, and replace the sensor on a cold system if it reads wrong; top up the little coolant lost.',
      parts: [{ description: 'Coolant temperature sensor and seal', quantity: 1 }],
      labour: [{ operation: 'Test and replace coolant temperature sensor', hours: 0.6 }],
      followUps: [followUps.purgeAndRecheck, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
    },
    'temperature-reads-low': {
      kind: 'outcome',
      title: 'Temperature sensor reads low: engine hotter than shown',
      rootCause:
        'The coolant temperature sensor, its wiring or connector reads lower than the coolant really is. The engine computer thinks the engine is cooler than it is, so it commands the fan late or never (and may hold a switchable pump or a map-controlled thermostat in its warm-up state): the engine can really overheat while the gauge and live data look almost normal.',
      correction:
        'Check the sensor’s reading with the engine cold against the ambient temperature and its resistance against the maker’s table; check the connector and wiring for corrosion or high resistance. Repair the wiring or replace the sensor on a cold system and top up the little coolant lost. Because the engine may really have overheated, confirm afterwards that the fan comes on at its switch temperature, and look for the after-effects of overheating: coolant loss, a cap that no longer holds, and gas in the coolant if the level keeps falling.',
      parts: [
        { description: 'Coolant temperature sensor and seal, or wiring repair', quantity: 1 },
      ],
      labour: [{ operation: 'Test and repair sensor circuit or replace sensor', hours: 0.8 }],
      followUps: [
        followUps.purgeAndRecheck,
        'Watch live data and the fan on the next warm-up: the fan must come on at the maker’s switch temperature.',
        followUps.roadTestConfirm,
        followUps.tellAdvisor,
      ],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
    },
    'radiator-core-restricted': {
      kind: 'outcome',
      title: 'Radiator core partly blocked',
      rootCause:
        'Part of the radiator core is blocked inside, so coolant only flows through some of it: the drop across the radiator is large and the core shows cold bands.',
      correction:
        'Replace the radiator. Check the condition of the coolant; if it is contaminated, flush the system before refilling, and bleed as the maker describes.',
      parts: [
        { description: 'Radiator', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 6 },
      ],
      labour: [{ operation: 'Replace radiator, refill and bleed', hours: 1.8 }],
      followUps: [followUps.purgeAndRecheck, followUps.leakCheckAfterDrive, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol', 'lifting'],
      cautions: [cautions.drainAndRefill, cautions.glycol, cautions.lifting],
    },
    'radiator-air-side-blocked': {
      kind: 'outcome',
      title: 'Radiator blocked on the air side',
      rootCause:
        'Debris packed between the condenser and the radiator, fins bent flat or corroded away, or grille shutters stuck closed stop air passing through the radiator, so it sheds too little heat in traffic or under load although the coolant circuit is healthy.',
      correction:
        'Clean the debris out from between the condenser and the radiator (separating them, or taking the bumper off where the maker requires), with low-pressure air or water from the engine side, never a pressure washer close up. Straighten bent fins, and free or repair the grille shutters. Replace a radiator or condenser whose fins have corroded away.',
      labour: [{ operation: 'Clean radiator pack, repair shutters as found', hours: 1 }],
      followUps: [followUps.roadTestConfirm, followUps.tellAdvisor],
      hazards: ['fan'],
      cautions: [cautions.fan],
    },
    'auxiliary-pump-not-running': {
      kind: 'outcome',
      title: 'Auxiliary coolant pump not running',
      rootCause:
        'The electric auxiliary pump of the low-temperature loop gets its supply, ground and command but does not run, so that loop does not circulate.',
      correction:
        'Replace the auxiliary pump on a cold system as the maker describes, catching the coolant that runs out; top up and bleed the low-temperature loop with the maker’s routine.',
      parts: [
        { description: 'Auxiliary coolant pump', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 1 },
      ],
      labour: [{ operation: 'Replace auxiliary pump, bleed low-temperature loop', hours: 1.2 }],
      followUps: [followUps.purgeAndRecheck, followUps.roadTestConfirm, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol', 'lifting'],
      cautions: [cautions.drainAndRefill, cautions.glycol, cautions.lifting],
    },
    'aux-pump-circuit-fault': {
      kind: 'outcome',
      title: 'Auxiliary pump circuit fault',
      rootCause:
        'The auxiliary pump of the low-temperature loop gets no supply, no ground or no command signal, so that loop does not circulate. The pump itself may be sound.',
      correction:
        'Trace and repair the fault (fuse, relay, wiring, connector, or the command from its control unit) as the maker describes, then confirm with the scan tool that the pump runs when commanded.',
      parts: [{ description: 'Fuse, relay or wiring parts as found', quantity: 1 }],
      labour: [{ operation: 'Diagnose and repair auxiliary pump circuit', hours: 1 }],
      followUps: [followUps.roadTestConfirm, followUps.tellAdvisor],
    },
    'pump-impeller-not-circulating': {
      kind: 'outcome',
      title: 'Coolant pump impeller not circulating',
      rootCause:
        'The pump’s impeller is damaged or slipping on its shaft, so it turns without moving enough coolant.',
      correction:
        'Replace the coolant pump, refill with the specified coolant and bleed as the maker describes.',
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
      hazards: ['hot-pressurised-coolant', 'glycol', 'belt-drive', 'lifting'],
      cautions: [cautions.drainAndRefill, cautions.glycol, cautions.beltDrive, cautions.lifting],
    },
    'pump-drive-slipping': {
      kind: 'outcome',
      title: 'Pump drive belt slipping',
      rootCause:
        'The auxiliary belt that drives the coolant pump slips on the pump pulley — worn, glazed, contaminated or loose, or its tensioner is weak — so the pump turns too slowly under load or when the belt gets wet, and the engine runs hot although the cooling circuit itself is healthy.',
      correction:
        'Renew the auxiliary belt, and the tensioner and idlers if worn, to the maker’s routing and tension. If oil or coolant reached the belt, repair that leak first.',
      parts: [
        { description: 'Auxiliary drive belt', quantity: 1 },
        { description: 'Belt tensioner, where worn', quantity: 1 },
      ],
      labour: [{ operation: 'Renew auxiliary drive belt and tensioner', hours: 0.8 }],
      followUps: [followUps.roadTestConfirm, followUps.tellAdvisor],
      hazards: ['belt-drive', 'fan'],
      cautions: [localCautions.auxiliaryBeltDrive, cautions.fan],
    },
    'main-loop-air-lock': {
      kind: 'outcome',
      title: 'Air trapped in the main loop',
      rootCause:
        'An air pocket in the main loop stopped the coolant circulating through the radiator; bleeding restored the flow.',
      correction:
        'Bleed done. If the system had been drained, refilled or worked on, check the refill was done as the maker describes.',
      parts: [{ description: 'Coolant to the maker’s specification (litres)', quantity: 1 }],
      labour: [{ operation: 'Bleed main loop and road test', hours: 0.8 }],
      followUps: [followUps.purgeAndRecheck, followUps.roadTestConfirm, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol', 'road-test'],
      cautions: [cautions.drainAndRefill, cautions.glycol, cautions.roadTest],
    },
    'no-cause-found': {
      kind: 'outcome',
      title: 'No cause found with these checks',
      rootCause:
        'The checks in this tree did not show a fault, or a check that decides between causes could not be done.',
      correction:
        'Log a road test that reproduces the customer’s conditions (coolant temperature, fan command, speed, load, charge-air temperature) and ask the workshop lead to review the case and the maker’s information. Remember that engines with a map-controlled thermostat run 100–110 °C at part load as normal, and that a switchable pump whose shroud sticks only now and then may need the next episode caught before it is condemned.',
      labour: [{ operation: 'Diagnosis time', hours: 1 }],
      followUps: [followUps.tellAdvisor],
      hazards: ['road-test'],
      cautions: [cautions.roadTest],
    },
  },
} satisfies TreeDefinitionInput;
