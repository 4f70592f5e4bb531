// Shipped tree: the coolant level keeps dropping. Version 2 (version 1 is kept in
// history/coolant-level-dropping.1.json for the cases pinned to it).
//
// The walk goes from the cheapest checks to the most invasive: what was done to the car lately
// (air leaving after a refill), how fast coolant is lost (km or miles), overfilling, a look for
// leaks, the cabin, a cold pressure test held at — never above — the cap's rating, the cap's
// pressure and vacuum valves, gas pushed in on a cold start with a chemical block test, checks
// after a hot drive, then the signs of coolant going inside the engine: into the oil (confirmed by
// a rising oil level or oil analysis, not by condensation under the filler cap) or into a
// cylinder (borescope, then a cylinder leak-down). No expensive finding (pump, heater core, head
// gasket) is reached on one observation, and a check that could not be done leads to the next
// sensible check or to an honest "further checks needed", never to an expensive finding.
import { CAP_RATING_BAND, pressureHoldRule } from '@heatpath/coolant';
import type { Caution, TreeDefinitionInput } from '../schema/tree-schema.js';
import { cautions } from './cautions.js';
import { followUps } from './follow-ups.js';

const R = pressureHoldRule;

/** Heatpath's line between a small loss and a clear one, litres per 1,000 km (common practice). */
const CLEAR_LOSS_L_PER_1000_KM = 0.5;
/** One statute mile in kilometres (exact by definition). */
const KM_PER_MILE = 1.609344;
/** How far a cap may open from its rating before it fails, either way (common practice). */
const CAP_OPENING_TOLERANCE_BAR = 0.15;
/** How much a cap may settle in the minute after it opens (common practice). */
const CAP_SETTLE_BAR = 0.1;
/** Rise in two minutes from a cold start that points to gas being pushed in (common practice). */
const COLD_START_RISE_BAR = 0.2;

const overRating = 1 + R.maxOverRatingFraction;

// Local cautions, to be moved into cautions.ts when the trees' cautions are consolidated.
const localCautions = {
  /** The tester replaces the cap while the engine runs: nothing relieves the pressure but you. */
  testerOnRunningEngine: {
    hazard: 'hot-pressurised-coolant',
    text: 'The tester takes the place of the cap, so nothing lets pressure off while the engine runs but you. Fit it only on a cold system and keep your eyes on the gauge: stop the engine at once if the needle nears the cap’s rating, and in any case within two minutes. Then let the pressure off slowly through the tester’s release valve, under a cloth, as the tester’s and the vehicle maker’s instructions describe; never pull the tester off the neck under pressure.',
  },
  /** Air let into a cylinder turns the crankshaft if the piston is off top dead centre. */
  leakDownCrankMoves: {
    hazard: 'belt-drive',
    text: 'Air let into a cylinder that is not exactly at top dead centre turns the crankshaft, the pulleys and the belts with force. Hold the crank as the maker describes, keep hands and tools clear of the belt drive and the fan, and follow the vehicle maker’s procedure and the tester’s instructions.',
  },
} as const satisfies Record<string, Caution>;

// Local follow-ups, to be moved into follow-ups.ts when the trees' follow-ups are consolidated.
const localFollowUps = {
  markAndRecheck:
    'Mark the level on the tank with the engine cold and recheck it cold after 500 km; if it keeps dropping, open a new case on this tree.',
  hotLeakCheckAfterCap:
    'A cap that opened too high lets the system run above its design pressure: after the new cap, check the hoses, the radiator’s end tanks and the expansion tank’s seams for fresh weeps after a hot drive.',
} as const;

export const coolantLevelDroppingDefinition = {
  format: 'heatpath.tree',
  formatVersion: 1,
  id: 'coolant-level-dropping',
  title: 'Coolant level keeps dropping',
  symptom: 'The coolant has to be topped up again and again, with or without a visible leak.',
  summary:
    'Starts with what was done to the car lately and how fast coolant is lost, then works from overfilling, visible leaks and the cabin to a cold pressure test at the cap’s rating, the cap’s pressure and vacuum valves, gas pushed in on a cold start, checks after a hot drive, and last the signs of coolant going into the oil or into a cylinder. Expensive findings are confirmed by a second, independent check before anyone quotes them.',
  applicability: [
    'Liquid-cooled engines with an expansion tank and pressure cap.',
    'Figures marked common practice are working guides; the vehicle maker’s figures and procedures always take precedence.',
  ],
  start: 'recent-work',
  computed: [
    {
      name: 'lossPer1000km',
      label: 'Coolant lost per 1,000 km',
      formula: 'topUpLitres / distanceSinceFullKm * 1000',
      quantity: 'volume',
      unit: 'L',
      hint: 'From a distance read in kilometres.',
    },
    {
      name: 'lossPer1000kmFromMiles',
      label: 'Coolant lost per 1,000 km',
      formula: `topUpLitresMiles / (distanceSinceFullMiles * ${KM_PER_MILE}) * 1000`,
      quantity: 'volume',
      unit: 'L',
      hint: 'From a distance read in miles (1 mile = 1.609344 km).',
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
      label: 'Pressure lost during the repeat hold',
      formula: 'retestPressure - retestAfterHold',
      quantity: 'pressure',
      unit: 'bar',
    },
    {
      name: 'boilingAtCapRating',
      label: 'Boiling point of water at the cap rating',
      formula: 'waterBoilingPoint(capRating)',
      quantity: 'temperature',
      unit: 'degC',
    },
  ],
  nodes: {
    'recent-work': {
      kind: 'question',
      title: 'Recent work on the cooling system?',
      prompt:
        'Ask the customer and look at the service history: has the cooling system been drained, refilled or worked on lately (pump, hose, radiator, thermostat, head work, a coolant change), and did the level only start dropping since then?',
      estimatedMinutes: 3,
      notes:
        'After a drain or refill, air trapped in the engine, heater and any auxiliary loop works its way to the tank over the next drives and the level drops as it leaves; it then stays put (common practice). Bleeding and a purge drive come first, before any leak hunt.',
      choices: [
        {
          id: 'since-work',
          label: 'Yes, only since it was drained, refilled or worked on',
          to: 'purge-air',
        },
        {
          id: 'no-recent-work',
          label: 'No recent work, or it was dropping before the work',
          to: 'distance-unit',
        },
      ],
    },
    'purge-air': {
      kind: 'procedure',
      title: 'Bleed and purge the air',
      instruction:
        'With the engine cold, top up and bleed the system exactly as the maker describes (bleed screws, vacuum filler or the scan tool’s bleed routine, and any auxiliary loop). Then drive at full operating temperature for ten minutes or more, with the heater at maximum. Let the engine cool fully, top up to MAX again, note how much it took and mark the level on the tank. Look at every joint disturbed by the earlier work while you are there.',
      tools: ['Coolant to the maker’s specification', 'Bleed tools or vacuum filler', 'Marker'],
      estimatedMinutes: 45,
      hazards: ['hot-pressurised-coolant', 'glycol', 'fan', 'road-test'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.fan, cautions.roadTest],
      notes:
        'Drive or run to full operating temperature for ten minutes or more, let it cool, recheck and top up: the level drops a little as trapped air leaves (common practice). Auxiliary low-temperature loops can hold an air lock that vacuum filling does not clear (common practice).',
      done: 'level-after-purge',
      couldNotDo: 'distance-unit',
    },
    'level-after-purge': {
      kind: 'question',
      title: 'Level after the purge',
      prompt:
        'After the purge and a second drive at operating temperature (or a few days of the customer’s driving), check the level cold against your mark. Has it stayed there?',
      estimatedMinutes: 5,
      notes:
        'A system that has lost its air holds its level from one cold check to the next; a level that keeps falling after the purge is a real loss (common practice).',
      choices: [
        {
          id: 'level-steady',
          label: 'Yes, it stays at the mark',
          to: 'air-purged-after-refill',
        },
        {
          id: 'still-dropping',
          label: 'No, it is still dropping',
          to: 'distance-unit',
          hint: 'Carry on with the loss measurement; the leak may be at a joint the earlier work disturbed.',
        },
      ],
    },
    'distance-unit': {
      kind: 'question',
      title: 'Distance in km or miles?',
      prompt:
        'The next step works out how fast coolant is lost from the distance driven since the tank was last at MAX. Which unit does the odometer or the service record give that distance in?',
      estimatedMinutes: 1,
      notes:
        'Readings of the plain-number kind carry no unit, so the distance is asked in a step of its own for each unit and both give the same loss per 1,000 km (1 mile = 1.609344 km, exact by definition).',
      choices: [
        { id: 'kilometres', label: 'Kilometres', to: 'loss-amount' },
        { id: 'miles', label: 'Miles', to: 'loss-amount-miles' },
        {
          id: 'distance-unknown',
          label: 'The distance is not known',
          to: 'overflow-check',
          hint: 'Top up to MAX on the cold engine anyway and mark the level, so the next visit gives a figure.',
        },
      ],
    },
    'loss-amount': {
      kind: 'measurement',
      title: 'How much is lost? (km)',
      prompt:
        'With the engine cold, top the expansion tank up to MAX with the specified coolant. Enter how much it took and how many kilometres the car has been driven since it was last at MAX (from the customer or the service record).',
      tools: ['Measuring jug'],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      estimatedMinutes: 10,
      notes: `Heatpath treats ${CLEAR_LOSS_L_PER_1000_KM} L or more per 1,000 km as a clear loss worth chasing straight away (common practice); smaller losses start with the overfill check.`,
      inputs: [
        {
          name: 'topUpLitres',
          label: 'Coolant added to reach MAX',
          quantity: 'volume',
          unit: 'L',
          range: { min: 0, max: 20 },
        },
        {
          name: 'distanceSinceFullKm',
          label: 'Distance driven since it was last at MAX (km)',
          quantity: 'number',
          unit: 'none',
          range: { min: 50, max: 50000 },
          hint: 'Kilometres. At least 50 km, or the figure says nothing.',
        },
      ],
      branches: [
        {
          when: `lossPer1000km >= ${CLEAR_LOSS_L_PER_1000_KM}`,
          to: 'visual-leaks',
          label: 'Clear loss',
        },
      ],
      fallback: { to: 'overflow-check', label: 'Small loss' },
    },
    'loss-amount-miles': {
      kind: 'measurement',
      title: 'How much is lost? (miles)',
      prompt:
        'With the engine cold, top the expansion tank up to MAX with the specified coolant. Enter how much it took and how many miles the car has been driven since it was last at MAX (from the customer or the service record).',
      tools: ['Measuring jug'],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      estimatedMinutes: 10,
      notes: `The distance is converted to kilometres (1 mile = 1.609344 km); Heatpath treats ${CLEAR_LOSS_L_PER_1000_KM} L or more per 1,000 km (about 0.8 L per 1,000 miles) as a clear loss worth chasing straight away (common practice); smaller losses start with the overfill check.`,
      inputs: [
        {
          name: 'topUpLitresMiles',
          label: 'Coolant added to reach MAX',
          quantity: 'volume',
          unit: 'L',
          range: { min: 0, max: 20 },
        },
        {
          name: 'distanceSinceFullMiles',
          label: 'Distance driven since it was last at MAX (miles)',
          quantity: 'number',
          unit: 'none',
          range: { min: 30, max: 31000 },
          hint: 'Miles. At least 30 miles, or the figure says nothing.',
        },
      ],
      branches: [
        {
          when: `lossPer1000kmFromMiles >= ${CLEAR_LOSS_L_PER_1000_KM}`,
          to: 'visual-leaks',
          label: 'Clear loss',
        },
      ],
      fallback: { to: 'overflow-check', label: 'Small loss' },
    },
    'overflow-check': {
      kind: 'question',
      title: 'Overfilled?',
      prompt:
        'Was the tank filled well above MAX before (by the customer or at the last service), and has the level now fallen to about MAX and stopped there? A tank filled too high pushes the surplus out of its vent as the coolant warms.',
      estimatedMinutes: 5,
      choices: [
        {
          id: 'overfilled',
          label: 'Yes, it was overfilled and has settled at MAX',
          to: 'overfilled-expansion-tank',
        },
        {
          id: 'not-overfilled',
          label: 'No, or it keeps falling below MAX',
          to: 'visual-leaks',
          hint: 'Residue at the cap or the vent without overfilling is followed up by the pressure and cap tests.',
        },
      ],
    },
    'visual-leaks': {
      kind: 'question',
      title: 'Look for leaks',
      prompt:
        'Look over the hoses and clamps, radiator and its end tanks, the expansion tank and its seams, the pump’s weep hole, the heater hose joints at the bulkhead and any joint disturbed by recent work, from above and from below on a lift. Wet patches, drips or dried residue in the coolant’s colour all count.',
      tools: ['Inspection lamp', 'Mirror'],
      hazards: ['lifting'],
      cautions: [cautions.lifting],
      estimatedMinutes: 15,
      choices: [
        { id: 'leak-seen', label: 'Yes, a leak or fresh residue', to: 'pressure-test-cold' },
        { id: 'none-seen', label: 'Nothing visible', to: 'cabin-signs' },
      ],
    },
    'cabin-signs': {
      kind: 'question',
      title: 'Signs in the cabin',
      prompt:
        'Is the carpet damp in the front footwells, does the windscreen mist up, or is there a greasy film on the inside of the glass?',
      estimatedMinutes: 5,
      choices: [
        { id: 'cabin-signs-found', label: 'Yes', to: 'cabin-wet-check' },
        { id: 'cabin-dry', label: 'No', to: 'pressure-test-cold' },
      ],
    },
    'cabin-wet-check': {
      kind: 'question',
      title: 'Is it coolant in the cabin?',
      prompt:
        'A blocked outlet for the air-conditioning evaporator’s condensate or a leaking scuttle or bulkhead also wets the footwell, with plain water. Turn back the carpet edge and press a white cloth into the underlay, smell it and the air from the vents with the blower on, and check whether the water appears after rain or after A/C use. What is it?',
      tools: ['White cloth', 'Inspection lamp'],
      estimatedMinutes: 10,
      notes:
        'Coolant smells sweet, is coloured and feels slightly sticky or greasy, and leaves a greasy film on the glass; condensate and rain water are clear, odourless and not sticky (common practice). A wet footwell alone is not a heater core.',
      choices: [
        {
          id: 'coolant-signs',
          label: 'Coolant: sweet smell, coloured, sticky, or a greasy film on the glass',
          to: 'heater-leak-watch',
        },
        {
          id: 'water-only',
          label: 'Plain water: clear, no smell, after rain or A/C use',
          to: 'pressure-test-cold',
          hint: 'Note the blocked condensate outlet or scuttle leak for the customer as a separate job, and carry on looking for the coolant loss.',
        },
        {
          id: 'cannot-tell',
          label: 'Cannot tell',
          to: 'heater-leak-watch',
        },
      ],
    },
    'heater-leak-watch': {
      kind: 'procedure',
      title: 'Watch the heater side under pressure',
      instruction:
        'Fit the pressure tester to the cold system and pump it to the cap rating, never above. Set the heater to full hot so its circuit is open, remove the lower trim under the heater housing, and watch the heater core’s pipes and joints, the housing and its drain for fifteen minutes with a lamp. Where the maker allows, add UV dye and look with the UV lamp; smell the air from the vents with the blower on. Let the pressure off slowly through the tester’s valve at the end.',
      tools: [
        'Cooling-system pressure tester and adapters',
        'UV lamp and dye',
        'Inspection lamp',
        'Trim tools',
      ],
      estimatedMinutes: 30,
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      notes:
        'A pressure test with the heater side watched, or UV dye traced to the core, confirms coolant at the heater before a heater-core job (common practice).',
      evidence: [{ kind: 'photo', label: 'Photo of the wet area or the dye', required: false }],
      done: 'heater-leak-result',
      couldNotDo: 'pressure-test-cold',
    },
    'heater-leak-result': {
      kind: 'question',
      title: 'Where is the heater side wet?',
      prompt: 'What did you find at the heater under pressure?',
      estimatedMinutes: 2,
      choices: [
        {
          id: 'heater-core-wet',
          label: 'Coolant at the heater core, its pipes inside the housing or the housing drain',
          to: 'heater-core-leak',
          hint: 'Fresh coolant or glowing dye appearing there under pressure.',
        },
        {
          id: 'heater-hose-joint',
          label: 'At a heater hose or its joint on the engine side of the bulkhead',
          to: 'hose-or-clamp-leak',
        },
        {
          id: 'heater-side-dry',
          label: 'The heater side stays dry',
          to: 'pressure-test-cold',
        },
      ],
    },
    'pressure-test-cold': {
      kind: 'measurement',
      title: 'System pressure test (cold)',
      prompt:
        'Read the rating stamped on the cap (or the maker’s figure). Fit the pressure tester to the cold system in place of the cap and pump it to that rating, never above. Hold for at least ten minutes without pumping, then enter the rating, the starting pressure, the pressure at the end and how long you held it. Let the pressure off slowly through the tester’s valve.',
      tools: ['Cooling-system pressure tester and adapters'],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      estimatedMinutes: 30,
      notes: `Hold the cold, stopped system at the cap rating for 10–30 minutes; the gauge should not fall (common practice; no allowable drop is published). Heatpath’s pressure-hold rule, shared with the pressure-test calculator: a change within ${R.noChangeBar} bar is no change (gauge resolution); a fall of ${R.fastLeakBarPerMinute} bar/min or faster is a fast leak; a start more than ${R.maxOverRatingFraction * 100} % above the rating, or below ${R.minStartFractionOfRating * 100} % of it, is not a valid test (pumping past the rating can burst a hose or crack a tank and proves nothing); a rise on a cold, stopped engine means the system was still warming, not combustion gas. Each of those is repeated. Caps of 1.4–1.6 bar are common on modern cars, 0.9–1.2 bar on older ones (common practice).`,
      inputs: [
        {
          name: 'capRating',
          label: 'Cap rating',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0.3, max: CAP_RATING_BAND.refuseAboveBar },
          hint: 'As stamped on the cap or given by the maker; usually 0.9–1.6 bar (13–23 psi).',
        },
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
        },
      ],
      branches: [
        {
          when: `testPressure > capRating * ${overRating}`,
          to: 'pressure-retest',
          label: 'Started above the cap rating: not a valid test',
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
          when: `pressureFall > ${R.noChangeBar} and pressureFall / holdMinutes >= ${R.fastLeakBarPerMinute}`,
          to: 'find-leak',
          label: 'Falls fast: a clear leak',
        },
        {
          when: `pressureFall > ${R.noChangeBar}`,
          to: 'find-leak',
          label: 'Falls slowly: a slow leak',
        },
      ],
      fallback: { to: 'cap-test', label: 'Holds pressure' },
    },
    'pressure-retest': {
      kind: 'measurement',
      title: 'Repeat the pressure test',
      prompt:
        'The first test does not count: it started above or well below the cap rating, or the pressure rose because the system was still warm. Let the pressure off slowly through the tester’s valve, let the engine cool to workshop temperature, then pump the cold system to the cap rating — not above — and hold it again for at least ten minutes.',
      tools: ['Cooling-system pressure tester and adapters'],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      estimatedMinutes: 25,
      notes: `The same pressure-hold rule as the first test (common practice for the hold; Heatpath’s own ${R.noChangeBar} bar no-change band and ${R.maxOverRatingFraction * 100} % limit above the rating). A second test that is again off the rating or rising is not used to judge the system.`,
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
          to: 'further-checks-needed',
          label: 'Still not a valid test',
        },
        {
          when: `retestFall > ${R.noChangeBar} and retestFall / retestMinutes >= ${R.fastLeakBarPerMinute}`,
          to: 'find-leak',
          label: 'Falls fast: a clear leak',
        },
        {
          when: `retestFall > ${R.noChangeBar}`,
          to: 'find-leak',
          label: 'Falls slowly: a slow leak',
        },
      ],
      fallback: { to: 'cap-test', label: 'Holds pressure' },
    },
    'find-leak': {
      kind: 'procedure',
      title: 'Find the leak under pressure',
      instruction:
        'Keep the cold system under test pressure, at the cap rating and not above, and search for the leak: look and listen at every joint, from above and from under the vehicle on a lift, and at the heater side in the footwell. Where the maker allows, add UV dye and search with the UV lamp. Follow a wet trail upwards to where it starts.',
      tools: ['Pressure tester', 'UV lamp and dye', 'Inspection lamp'],
      estimatedMinutes: 30,
      hazards: ['hot-pressurised-coolant', 'glycol', 'lifting'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.lifting],
      evidence: [{ kind: 'photo', label: 'Photo of the leak', required: false }],
      done: 'leak-location',
      couldNotDo: 'further-checks-needed',
    },
    'leak-location': {
      kind: 'question',
      title: 'Where does it leak?',
      prompt: 'Where did coolant come out under pressure?',
      estimatedMinutes: 2,
      choices: [
        { id: 'hose-or-clamp', label: 'A hose or clamp', to: 'hose-or-clamp-leak' },
        {
          id: 'pump',
          label: 'The coolant pump (weep hole or gasket)',
          to: 'coolant-pump-seal-leak',
          hint: 'Coolant running from the weep hole or the gasket face itself. Trace it upwards first: coolant running down from a hose or the thermostat housing above is not the pump.',
        },
        {
          id: 'radiator-or-tank',
          label: 'The radiator or expansion tank',
          to: 'radiator-or-tank-leak',
        },
        {
          id: 'inside-cabin',
          label: 'Inside the cabin (heater core or its joints)',
          to: 'heater-core-leak',
          hint: 'Coolant or dye seen at the heater under pressure.',
        },
        {
          id: 'nowhere-outside',
          label: 'Pressure falls but nothing shows outside',
          to: 'oil-contamination-check',
          hint: 'The coolant may be going inside the engine: into the oil or a cylinder.',
        },
      ],
    },
    'cap-test': {
      kind: 'measurement',
      title: 'Pressure cap test',
      prompt:
        'Fit the cap from the cold system to the tester with its adapter. Pump slowly and note where it opens; if it has not opened by 0.3 bar above its rating, stop and enter the pressure you stopped at. Then enter the pressure it still holds after one minute.',
      tools: ['Cooling-system pressure tester', 'Cap adapter'],
      hazards: ['hot-pressurised-coolant'],
      cautions: [cautions.coldSystemOnly],
      estimatedMinutes: 10,
      notes: `A good cap opens at its rating and holds it for at least a minute (published service practice). A cap fails by opening too low (boils early, pushes coolant out), too high (overloads hoses and tanks) or by not holding. Heatpath allows ${CAP_OPENING_TOLERANCE_BAR} bar either side of the rating and a ${CAP_SETTLE_BAR} bar settle (common practice).`,
      inputs: [
        {
          name: 'capOpening',
          label: 'Pressure at which the cap opened',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0, max: 3.5 },
        },
        {
          name: 'capHeldAfterMinute',
          label: 'Pressure the cap still holds after one minute',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0, max: 3.5 },
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
        'The small valve in the middle of the cap’s seal lets air (or coolant from the tank) back in as the system cools. Pull it open with a fingernail: it should open with light force, spring back and seat flat. Think back too: when the cap was first released on the cold engine, did air rush IN, or were the hoses flat or the tank pulled in?',
      estimatedMinutes: 5,
      notes:
        'Test all three ways a cap fails: opening too low, too high, and a stuck vacuum valve that leaves the hoses collapsed after cool-down (common practice).',
      choices: [
        {
          id: 'vacuum-valve-stuck',
          label: 'Stuck, sticky or not seating; or hoses collapsed / air rushed in',
          to: 'cap-vacuum-valve-stuck',
        },
        {
          id: 'vacuum-valve-ok',
          label: 'Moves freely and seats; no sign of vacuum',
          to: 'cold-start-pressure',
        },
      ],
    },
    'cold-start-pressure': {
      kind: 'measurement',
      title: 'Pressure build-up on a cold start',
      prompt:
        'On the cold engine, fit the pressure tester in place of the cap without pumping it up. Start the engine, blip the throttle now and then, and watch the gauge for two minutes at most, before the coolant has had time to warm. Stop the engine at once if the needle nears the cap rating. Let the pressure off slowly through the tester’s valve and enter how far it rose.',
      tools: ['Cooling-system pressure tester'],
      hazards: ['hot-pressurised-coolant', 'fan'],
      cautions: [cautions.coldSystemOnly, localCautions.testerOnRunningEngine, cautions.fan],
      estimatedMinutes: 10,
      notes: `Cold coolant hardly expands in two minutes; gas pushed in past a head gasket or a cooler makes the needle climb quickly, often in steps with the revs. Heatpath counts a rise of more than ${COLD_START_RISE_BAR} bar in two minutes as gas being pushed in (common practice). A rise on a cold, STOPPED engine is the system warming, not gas: combustion gas shows with the engine running, often only under load, so a small rise here does not clear the engine: the later checks look for coolant burnt in the cylinders. The engine is stopped before the rise reaches the cap rating, because nothing else relieves the pressure.`,
      inputs: [
        {
          name: 'coldStartRise',
          label: 'Pressure rise in two minutes',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0, max: CAP_RATING_BAND.refuseAboveBar },
        },
      ],
      branches: [
        {
          when: `coldStartRise > ${COLD_START_RISE_BAR}`,
          to: 'block-test',
          label: 'Pressure builds quickly',
        },
      ],
      fallback: { to: 'hot-leak-check', label: 'No quick build-up' },
    },
    'block-test': {
      kind: 'procedure',
      title: 'Block test for combustion gas',
      instruction:
        'With the engine cold, remove the cap, lower the level a little if the tester needs room, fill the tester with fresh fluid and fit it to the tank neck. Start the engine, raise the revs now and then, and draw air from above the coolant through the fluid while the engine warms. Stop well before the thermostat opens or coolant can reach the tester, take the tester off and refit the cap.',
      tools: ['Combustion-gas tester with fresh fluid'],
      estimatedMinutes: 15,
      hazards: ['hot-pressurised-coolant', 'fan', 'glycol'],
      cautions: [cautions.openNeckRunning, cautions.fan, cautions.glycol],
      notes:
        'The fluid changes colour with carbon dioxide from combustion; air leaving the system does not change it. Coolant drawn into the tester spoils the test: keep the level below the neck (test kit instructions; common practice).',
      done: 'block-test-result',
      couldNotDo: 'further-checks-needed',
    },
    'block-test-result': {
      kind: 'question',
      title: 'Block test result',
      prompt: 'Did the test fluid change colour the way the kit says it does for combustion gas?',
      estimatedMinutes: 2,
      evidence: [{ kind: 'photo', label: 'Photo of the test fluid', required: true }],
      choices: [
        { id: 'gas-found', label: 'Yes, combustion gas', to: 'combustion-gas-in-coolant' },
        { id: 'no-gas', label: 'No change', to: 'hot-leak-check' },
      ],
    },
    'hot-leak-check': {
      kind: 'question',
      title: 'Checks after a hot drive',
      prompt:
        'Drive at full operating temperature for twenty minutes, including some hard pulls. Watch the exhaust on the way. Back in the bay, switch off and, without opening anything, look again for drips, steam, fresh wet trails and residue at every joint and at the pump. Then check the engine oil: its level against the mark on the dipstick, the oil on the dipstick, and under the filler cap. What do you find?',
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface', 'road-test'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface, cautions.roadTest],
      estimatedMinutes: 30,
      choices: [
        {
          id: 'leaks-when-hot',
          label: 'A leak shows only when hot, at a hose or clamp',
          to: 'hose-or-clamp-leak',
        },
        {
          id: 'radiator-or-tank-hot',
          label: 'A leak shows only when hot, at the radiator or expansion tank',
          to: 'radiator-or-tank-leak',
        },
        {
          id: 'pump-wet-hot',
          label: 'A fresh wet trail at the coolant pump',
          to: 'trace-pump-leak',
        },
        {
          id: 'white-exhaust',
          label: 'White, sweet-smelling exhaust that stays once the engine is warm',
          to: 'cylinder-check',
          hint: 'White vapour on a cold morning that clears once the engine is warm is condensation.',
        },
        {
          id: 'oil-signs',
          label: 'The oil level is up, or the oil looks milky or creamy',
          to: 'oil-contamination-check',
        },
        {
          id: 'nothing-found',
          label: 'Nothing found',
          to: 'cylinder-check',
          hint: 'Coolant that leaves no trail outside may be burnt in a cylinder, which a catalytic converter can hide: look inside next.',
        },
      ],
    },
    'trace-pump-leak': {
      kind: 'procedure',
      title: 'Trace the leak to the pump',
      instruction:
        'With the engine cold, clean the pump and everything above it dry. Where the maker allows, add UV dye. Run the engine at operating temperature for fifteen minutes, switch off, and with nothing opened follow the wet trail or the glowing dye upwards with the lamp to where it starts: the pump’s weep hole or gasket face, or a hose, pipe or housing above it.',
      tools: ['Degreaser and cloths', 'UV lamp and dye', 'Inspection lamp'],
      estimatedMinutes: 30,
      hazards: ['hot-pressurised-coolant', 'glycol', 'fan', 'hot-surface'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.fan, cautions.hotSurface],
      notes:
        'Many pump shaft seals weep only with the shaft turning and warm, so a cold pressure test can hold while the pump leaks; a leak that runs down onto the pump from above is a common misreading (common practice).',
      evidence: [{ kind: 'photo', label: 'Photo of the trail at its source', required: false }],
      done: 'pump-leak-traced',
      couldNotDo: 'further-checks-needed',
    },
    'pump-leak-traced': {
      kind: 'question',
      title: 'Where does the trail start?',
      prompt: 'Where does the wet trail or the dye start?',
      estimatedMinutes: 2,
      choices: [
        {
          id: 'starts-at-pump',
          label: 'At the pump’s weep hole or gasket',
          to: 'coolant-pump-seal-leak',
        },
        {
          id: 'starts-above',
          label: 'At a hose, clamp or joint above the pump',
          to: 'hose-or-clamp-leak',
        },
        {
          id: 'not-traced',
          label: 'It could not be traced',
          to: 'further-checks-needed',
        },
      ],
    },
    'oil-contamination-check': {
      kind: 'question',
      title: 'Is coolant getting into the oil?',
      prompt:
        'Creamy “mayonnaise” under the filler cap on a car used for short trips is usually condensation. Look for proof instead: has the oil level risen above where it was set at the last oil change while the coolant went down, is the oil on the dipstick itself milky or grey, or has an oil analysis found glycol?',
      tools: ['Oil sample kit for analysis'],
      hazards: ['glycol'],
      cautions: [cautions.glycol],
      estimatedMinutes: 10,
      notes:
        'Coolant in oil is confirmed by a rising oil level, oil analysis or a falling coolant level with no leak; mayonnaise under the filler cap of a short-trip car is usually condensation (common practice).',
      choices: [
        {
          id: 'coolant-in-oil-confirmed',
          label: 'Yes: oil level risen, milky oil on the dipstick, or glycol in the analysis',
          to: 'coolant-into-oil',
        },
        {
          id: 'not-confirmed',
          label: 'No: oil level steady and dipstick oil normal (mayonnaise under the cap only)',
          to: 'cylinder-check',
          hint: 'If in doubt, send an oil sample for analysis and carry on.',
        },
      ],
    },
    'cylinder-check': {
      kind: 'procedure',
      title: 'Look for coolant burnt in the cylinders',
      instruction:
        'With the engine cold, take out the spark plugs (on a diesel, the glow plugs where the maker allows) and keep them in cylinder order. Look at each piston crown and the cylinder wall with a borescope, and compare the plug tips. A cylinder that burns coolant shows a steam-cleaned crown and a clean, white or wet tip unlike its neighbours, sometimes coolant standing on the piston.',
      tools: ['Borescope', 'Plug socket'],
      estimatedMinutes: 40,
      hazards: ['hot-surface'],
      cautions: [cautions.hotSurface],
      evidence: [{ kind: 'photo', label: 'Borescope image of each piston crown', required: false }],
      notes:
        'White, sweet-smelling exhaust that persists when warm, a steam-cleaned piston and an odd plug point to coolant burnt in a cylinder; a leak-down test then confirms the path before any head-gasket finding (common practice).',
      done: 'cylinder-check-result',
      couldNotDo: 'further-checks-needed',
    },
    'cylinder-check-result': {
      kind: 'question',
      title: 'Coolant in a cylinder?',
      prompt: 'What did the borescope and the plugs show?',
      estimatedMinutes: 2,
      choices: [
        {
          id: 'cylinder-signs',
          label: 'One or more cylinders steam-cleaned or wet, unlike the others',
          to: 'leak-down-test',
        },
        {
          id: 'all-alike',
          label: 'All cylinders alike, no sign of coolant',
          to: 'no-loss-found',
        },
      ],
    },
    'leak-down-test': {
      kind: 'procedure',
      title: 'Cylinder leak-down with the tank watched',
      instruction:
        'With the engine cold and the cap removed, bring the suspect cylinder (then each of the others) to top dead centre on its firing stroke, and feed it shop air through a leak-down tester. Watch the coolant in the expansion tank for a stream of bubbles or a rising level, and note the leak-down percentage. Refit the cap when done.',
      tools: ['Cylinder leak-down tester', 'Shop air supply'],
      estimatedMinutes: 60,
      hazards: ['hot-pressurised-coolant', 'belt-drive'],
      cautions: [cautions.coldSystemOnly, localCautions.leakDownCrankMoves],
      notes:
        'Bubbles in the coolant while one cylinder is held under air pressure show the path from that cylinder into the cooling system: head gasket or a crack (common practice). A stream that starts the moment the air goes on is the cylinder, not air left from a top-up.',
      done: 'leak-down-result',
      couldNotDo: 'further-checks-needed',
    },
    'leak-down-result': {
      kind: 'question',
      title: 'Leak-down result',
      prompt: 'With a cylinder under air pressure, did bubbles stream into the coolant?',
      estimatedMinutes: 2,
      evidence: [{ kind: 'log', label: 'Leak-down figures per cylinder', required: false }],
      choices: [
        {
          id: 'bubbles-from-cylinder',
          label: 'Yes, from one cylinder (or a pair side by side)',
          to: 'coolant-into-cylinder',
        },
        {
          id: 'no-path-found',
          label: 'No cylinder leaks into the coolant',
          to: 'further-checks-needed',
          hint: 'On a diesel, coolant reaching all cylinders alike points to the exhaust-gas recirculation cooler.',
        },
      ],
    },

    'air-purged-after-refill': {
      kind: 'outcome',
      title: 'Air leaving after a drain or refill',
      rootCause:
        'Air trapped when the system was drained or refilled worked its way out to the tank over the following drives, so the level fell as the air left. Once the air was purged the level stays at its mark: nothing leaks.',
      correction:
        'Top up to MAX on the cold engine with the specified coolant and mark the level. Nothing to replace.',
      labour: [{ operation: 'Bleed, purge drive and top up', hours: 0.5 }],
      followUps: [localFollowUps.markAndRecheck, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
    },
    'overfilled-expansion-tank': {
      kind: 'outcome',
      title: 'Expansion tank overfilled',
      rootCause:
        'The tank was filled above MAX, so the surplus is pushed out through the vent as the coolant warms: the level falls to where it belongs, then stays.',
      correction:
        'Set the level to MAX on a cold engine and clean off the residue so a real leak would show.',
      labour: [{ operation: 'Set coolant level and clean residue', hours: 0.2 }],
      followUps: [localFollowUps.markAndRecheck, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
    },
    'heater-core-leak': {
      kind: 'outcome',
      title: 'Heater core leaking',
      rootCause:
        'The heater core or its joints inside the housing leak into the cabin, confirmed with the system under pressure (or with UV dye) at the heater: damp carpet, misted glass and a sweet smell follow.',
      correction:
        'Replace the heater core (or repair its joints inside the housing) as the maker describes, dry the carpet and insulation, then refill and bleed.',
      parts: [
        { description: 'Heater core and seals', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 2 },
      ],
      labour: [{ operation: 'Replace heater core, refill and bleed', hours: 4 }],
      followUps: [followUps.purgeAndRecheck, followUps.leakCheckAfterDrive, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.drainAndRefill, cautions.glycol],
    },
    'hose-or-clamp-leak': {
      kind: 'outcome',
      title: 'Leaking hose or clamp',
      rootCause: 'Coolant escapes at a hose or its clamp.',
      correction:
        'Replace the hose and clamps (or the clamp alone where the hose is sound), refill and bleed.',
      parts: [
        { description: 'Coolant hose', quantity: 1 },
        { description: 'Hose clamps', quantity: 2 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 2 },
      ],
      labour: [{ operation: 'Replace coolant hose, refill and bleed', hours: 0.8 }],
      followUps: [followUps.purgeAndRecheck, followUps.leakCheckAfterDrive, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.drainAndRefill, cautions.glycol],
    },
    'coolant-pump-seal-leak': {
      kind: 'outcome',
      title: 'Coolant pump leaking',
      rootCause:
        'The coolant pump leaks from its weep hole (worn shaft seal) or its gasket, traced to the pump itself under pressure or with the engine running.',
      correction:
        'Drain the system, replace the coolant pump with a new gasket or seal (on a pump driven by the timing belt, as part of a timing belt job), refill and bleed.',
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
      hazards: ['hot-pressurised-coolant', 'glycol', 'belt-drive'],
      cautions: [cautions.drainAndRefill, cautions.glycol, cautions.beltDrive],
    },
    'radiator-or-tank-leak': {
      kind: 'outcome',
      title: 'Radiator or expansion tank leaking',
      rootCause: 'The radiator (core or end tanks) or the expansion tank leaks.',
      correction:
        'Drain the system, replace the leaking radiator or tank (on a lift where the radiator comes out from below), refill and bleed.',
      parts: [
        { description: 'Radiator or expansion tank, as found', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 6 },
      ],
      labour: [{ operation: 'Replace radiator or expansion tank, refill and bleed', hours: 1.8 }],
      followUps: [followUps.purgeAndRecheck, followUps.leakCheckAfterDrive, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol', 'lifting'],
      cautions: [cautions.drainAndRefill, cautions.glycol, cautions.lifting],
    },
    'cap-not-holding': {
      kind: 'outcome',
      title: 'Pressure cap opens early or does not hold',
      rootCause:
        'The pressure cap opens well below its rating or leaks, so the coolant boils sooner and is pushed out of the tank when the engine is hot.',
      correction:
        'Fit a new cap of the rating the maker specifies, then top up the level on the cold engine.',
      parts: [{ description: 'Pressure cap of the specified rating', quantity: 1 }],
      labour: [{ operation: 'Test and replace pressure cap', hours: 0.3 }],
      followUps: [followUps.purgeAndRecheck, localFollowUps.markAndRecheck, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
    },
    'cap-opens-too-high': {
      kind: 'outcome',
      title: 'Pressure cap opens far above its rating',
      rootCause:
        'The cap’s pressure valve is stuck or too stiff, so the system runs above its design pressure and coolant is forced out at the weakest seals and seams when hot; hoses and plastic tanks can split.',
      correction:
        'Fit a new cap of the rating the maker specifies, then top up the level on the cold engine. Check the hoses and tanks for damage from the overpressure.',
      parts: [{ description: 'Pressure cap of the specified rating', quantity: 1 }],
      labour: [{ operation: 'Test and replace pressure cap, inspect hoses and tanks', hours: 0.5 }],
      followUps: [
        localFollowUps.hotLeakCheckAfterCap,
        localFollowUps.markAndRecheck,
        followUps.tellAdvisor,
      ],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
    },
    'cap-vacuum-valve-stuck': {
      kind: 'outcome',
      title: 'Pressure cap’s vacuum valve stuck',
      rootCause:
        'The cap’s vacuum valve does not open as the system cools, so a vacuum forms: hoses collapse, coolant pushed out while hot is not drawn back, and air is pulled in past seals.',
      correction:
        'Fit a new cap of the rating the maker specifies, then top up the level on the cold engine and bleed out any air drawn in.',
      parts: [{ description: 'Pressure cap of the specified rating', quantity: 1 }],
      labour: [{ operation: 'Test and replace pressure cap, top up and bleed', hours: 0.4 }],
      followUps: [followUps.purgeAndRecheck, localFollowUps.markAndRecheck, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
    },
    'combustion-gas-in-coolant': {
      kind: 'outcome',
      title: 'Combustion gas in the coolant',
      rootCause:
        'Combustion gas is being pushed into the coolant — pressure builds within two minutes of a cold start and the block test confirms carbon dioxide — usually past the head gasket or, on diesels, through a leaking exhaust-gas recirculation cooler. The gas drives coolant out of the tank.',
      correction:
        'Find the path before quoting a repair: on diesels pressure-test the exhaust-gas recirculation cooler; do a cylinder leak-down with the expansion tank watched to find the cylinder. Repair as found.',
      labour: [{ operation: 'Locate combustion leak (cooler test, leak-down)', hours: 1.5 }],
      hazards: ['hot-pressurised-coolant'],
      cautions: [cautions.coldSystemOnly],
      followUps: [
        'Advise the customer to keep an eye on the temperature gauge and stop if it climbs until the repair.',
        followUps.tellAdvisor,
      ],
    },
    'coolant-into-cylinder': {
      kind: 'outcome',
      title: 'Coolant leaking into a cylinder (head gasket or cylinder head)',
      rootCause:
        'Coolant reaches a cylinder and is burnt: the borescope shows a steam-cleaned or wet piston, and with that cylinder held under air pressure bubbles stream into the coolant. The path is the head gasket or a crack in the cylinder head or block.',
      correction:
        'Drain the system, remove the cylinder head as the maker describes, check the head and block faces for flatness and cracks, and renew the head gasket and bolts (or the head, if cracked); renew the timing belt or chain parts the maker lists, then refill and bleed.',
      parts: [
        { description: 'Cylinder head gasket set', quantity: 1 },
        { description: 'Cylinder head bolts (single use)', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 6 },
      ],
      labour: [
        {
          operation: 'Remove and refit cylinder head, renew gasket, refill and bleed',
          hours: 8,
        },
      ],
      followUps: [
        followUps.purgeAndRecheck,
        followUps.leakCheckAfterDrive,
        'Change the engine oil and filter after the repair.',
        followUps.tellAdvisor,
      ],
      hazards: ['hot-pressurised-coolant', 'glycol', 'belt-drive'],
      cautions: [cautions.drainAndRefill, cautions.glycol, cautions.beltDrive],
    },
    'coolant-into-oil': {
      kind: 'outcome',
      title: 'Coolant getting into the oil',
      rootCause:
        'Coolant leaks into the engine oil — confirmed by a rising oil level, milky oil on the dipstick or glycol in an oil analysis — through an oil cooler, the head gasket or a cracked part.',
      correction:
        'Stop the car being driven. Find the path (pressure-test the oil cooler, then the head gasket and head) and repair as found; change the oil and filter after the repair.',
      labour: [{ operation: 'Locate internal coolant leak', hours: 2 }],
      followUps: [
        'Advise the customer not to drive the car until it is repaired: coolant in the oil damages bearings.',
        followUps.tellAdvisor,
      ],
      hazards: ['hot-pressurised-coolant'],
      cautions: [cautions.coldSystemOnly],
    },
    'no-loss-found': {
      kind: 'outcome',
      title: 'No cause found yet',
      rootCause:
        'No leak, faulty cap or internal leak was found with these checks, inside or outside the engine.',
      correction:
        'Mark the level on the tank, add UV dye where the maker allows, and ask the customer back after 500–1,000 km to look again with the lamp. If the oil was doubtful, send a sample for analysis.',
      labour: [{ operation: 'Diagnosis time', hours: 1 }],
      followUps: [followUps.tellAdvisor],
      hazards: ['glycol'],
      cautions: [cautions.glycol],
    },
    'further-checks-needed': {
      kind: 'outcome',
      title: 'Further checks needed before a repair',
      rootCause:
        'A check that decides between causes could not be done, or could not be done validly, so the loss is not settled yet. Nothing has been confirmed that would justify an expensive repair.',
      correction:
        'Record what was found and what could not be done. Book the car for the missing check (a repeat pressure test at the cap rating, tracing with UV dye, a block test, a borescope, a cylinder leak-down or an exhaust-gas recirculation cooler test as the maker describes), or refer it to a workshop equipped for it. Do not quote a pump, heater core or head repair until it is done.',
      labour: [{ operation: 'Diagnosis time', hours: 1 }],
      followUps: [localFollowUps.markAndRecheck, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant'],
      cautions: [cautions.coldSystemOnly],
    },
  },
} satisfies TreeDefinitionInput;
