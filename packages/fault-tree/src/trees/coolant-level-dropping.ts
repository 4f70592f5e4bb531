// Shipped tree: the coolant level keeps dropping. Sorts out an overfilled tank, an external leak,
// the heater core, the pressure cap and an internal leak (combustion gas, or coolant into the
// oil), using the rate of loss, cold pressure tests and a block test.
import type { TreeDefinitionInput } from '../schema/tree-schema.js';
import { cautions } from './cautions.js';
import { followUps } from './follow-ups.js';

export const coolantLevelDroppingDefinition = {
  format: 'heatpath.tree',
  formatVersion: 1,
  id: 'coolant-level-dropping',
  title: 'Coolant level keeps dropping',
  symptom: 'The coolant has to be topped up again and again, with or without a visible leak.',
  summary:
    'Measures how fast coolant is lost, then works from overfilling and visible leaks to pressure tests and the signs of an internal leak.',
  applicability: [
    'Liquid-cooled engines with an expansion tank and pressure cap.',
    'Figures marked common practice are working guides; the vehicle maker’s figures and procedures always take precedence.',
  ],
  start: 'loss-amount',
  computed: [
    {
      name: 'lossPer1000km',
      label: 'Coolant lost per 1,000 km',
      formula: 'topUpLitres / distanceSinceFull * 1000',
      quantity: 'volume',
      unit: 'L',
    },
    {
      name: 'pressureFall',
      label: 'Pressure lost during the hold',
      formula: 'testPressure - pressureAfterHold',
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
    'loss-amount': {
      kind: 'measurement',
      title: 'How much is lost?',
      prompt:
        'With the engine cold, top the expansion tank up to MAX with the specified coolant. Enter how much it took and how far the car has been driven since it was last at MAX (from the customer or the service record).',
      tools: ['Measuring jug'],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      estimatedMinutes: 10,
      notes:
        'Heatpath treats half a litre or more per 1,000 km as a clear loss worth chasing straight away (common practice); smaller losses start with the overfill check.',
      inputs: [
        {
          name: 'topUpLitres',
          label: 'Coolant added to reach MAX',
          quantity: 'volume',
          unit: 'L',
          range: { min: 0, max: 20 },
        },
        {
          name: 'distanceSinceFull',
          label: 'Distance driven since it was last at MAX (km)',
          quantity: 'number',
          unit: 'none',
          range: { min: 50, max: 50000 },
        },
      ],
      branches: [{ when: 'lossPer1000km >= 0.5', to: 'visual-leaks', label: 'Clear loss' }],
      fallback: { to: 'overflow-check', label: 'Small loss' },
    },
    'overflow-check': {
      kind: 'question',
      title: 'Overfilled or overflowing?',
      prompt:
        'Was the tank filled well above MAX before, or is there coolant residue around the tank’s vent or overflow pipe (a tank pushes surplus out as it warms)?',
      choices: [
        { id: 'overfilled', label: 'Yes', to: 'overfilled-expansion-tank' },
        { id: 'not-overfilled', label: 'No', to: 'visual-leaks' },
      ],
    },
    'visual-leaks': {
      kind: 'question',
      title: 'Look for leaks',
      prompt:
        'Look over the hoses and clamps, radiator and its end tanks, the expansion tank and its seams, the pump’s weep hole and the heater hose joints, from above and below. Wet patches, drips or dried residue in the coolant’s colour all count.',
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
        'Is the carpet damp in the front footwells, does the windscreen mist with a sweet smell, or is there a greasy film on the inside of the glass?',
      choices: [
        { id: 'cabin-signs-found', label: 'Yes', to: 'heater-core-leak' },
        { id: 'cabin-dry', label: 'No', to: 'pressure-test-cold' },
      ],
    },
    'pressure-test-cold': {
      kind: 'measurement',
      title: 'System pressure test (cold)',
      prompt:
        'Fit the pressure tester to the cold system and pump it to the cap rating. Hold for at least ten minutes without pumping, then enter the starting pressure, the pressure at the end and how long you held it.',
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
        },
      ],
      branches: [{ when: 'pressureFall > 0.1', to: 'find-leak', label: 'Pressure falls' }],
      fallback: { to: 'cap-test', label: 'Holds pressure' },
    },
    'find-leak': {
      kind: 'procedure',
      title: 'Find the leak under pressure',
      instruction:
        'Keep the cold system under test pressure and search for the leak. Where the maker allows, add UV dye and search with the UV lamp; look under the vehicle as well as from above.',
      tools: ['Pressure tester', 'UV lamp and dye', 'Inspection lamp'],
      estimatedMinutes: 30,
      hazards: ['hot-pressurised-coolant', 'glycol', 'lifting'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.lifting],
      evidence: [{ kind: 'photo', label: 'Photo of the leak', required: false }],
      done: 'leak-location',
      couldNotDo: 'cap-test',
    },
    'leak-location': {
      kind: 'question',
      title: 'Where does it leak?',
      prompt: 'Where did coolant come out under pressure?',
      choices: [
        { id: 'hose-or-clamp', label: 'A hose or clamp', to: 'hose-or-clamp-leak' },
        {
          id: 'pump',
          label: 'The coolant pump (weep hole or gasket)',
          to: 'coolant-pump-seal-leak',
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
        },
        {
          id: 'nowhere-outside',
          label: 'Pressure falls but nothing shows outside',
          to: 'cold-start-pressure',
        },
      ],
    },
    'cap-test': {
      kind: 'measurement',
      title: 'Pressure cap test',
      prompt:
        'Take the cap off the cold system and fit it to the tester. Pump slowly and note where it opens, then the pressure it still holds after one minute. Enter the rating stamped on the cap or given by the maker.',
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
      fallback: { to: 'cold-start-pressure', label: 'Cap good' },
    },
    'cold-start-pressure': {
      kind: 'measurement',
      title: 'Pressure build-up on a cold start',
      prompt:
        'Fit the pressure tester to the cold system without pumping it up. Start the engine and watch the gauge for two minutes, before the coolant has had time to warm. Enter how far the pressure rose.',
      tools: ['Cooling-system pressure tester'],
      hazards: ['hot-pressurised-coolant', 'fan'],
      cautions: [cautions.coldSystemOnly, cautions.fan],
      estimatedMinutes: 10,
      notes:
        'Cold coolant hardly expands in two minutes; a quick rise of more than about 0.2 bar means gas is being pushed in (common practice).',
      inputs: [
        {
          name: 'coldStartRise',
          label: 'Pressure rise in two minutes',
          quantity: 'pressure',
          unit: 'bar',
          range: { min: 0, max: 3 },
        },
      ],
      branches: [
        { when: 'coldStartRise > 0.2', to: 'block-test', label: 'Pressure builds quickly' },
      ],
      fallback: { to: 'hot-leak-check', label: 'No quick build-up' },
    },
    'block-test': {
      kind: 'procedure',
      title: 'Block test for combustion gas',
      instruction:
        'With the engine cold, remove the cap, lower the level a little if the tester needs room, fill the tester with fresh fluid and fit it to the tank neck. Start the engine and draw air from above the coolant through the fluid while the engine warms. Stop well before the coolant gets hot or can reach the tester, remove the tester and refit the cap.',
      tools: ['Combustion-gas tester with fresh fluid'],
      estimatedMinutes: 15,
      hazards: ['hot-pressurised-coolant', 'fan', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.fan, cautions.glycol],
      done: 'block-test-result',
      couldNotDo: 'hot-leak-check',
    },
    'block-test-result': {
      kind: 'question',
      title: 'Block test result',
      prompt: 'Did the test fluid change colour the way the kit says it does for combustion gas?',
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
        'After a drive at full operating temperature, switch off and, without opening anything, look again for drips, steam or wet spots. Then check the engine oil on the dipstick and under the filler cap.',
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 20,
      choices: [
        {
          id: 'leaks-when-hot',
          label: 'A leak shows only when hot (hose or clamp)',
          to: 'hose-or-clamp-leak',
        },
        { id: 'milky-oil', label: 'The oil looks milky or creamy', to: 'coolant-into-oil' },
        { id: 'nothing-found', label: 'Nothing found', to: 'no-loss-found' },
      ],
    },

    'overfilled-expansion-tank': {
      kind: 'outcome',
      title: 'Expansion tank overfilled',
      rootCause:
        'The tank was filled above MAX, so the surplus is pushed out through the vent as the coolant warms: the level falls to where it belongs, then stays.',
      correction:
        'Set the level to MAX on a cold engine and clean off the residue so a real leak would show.',
      labour: [{ operation: 'Set coolant level and clean residue', hours: 0.2 }],
      followUps: [
        'Mark the level on the tank and recheck it cold after 500 km; if it keeps dropping, open a new case on this tree.',
        followUps.tellAdvisor,
      ],
    },
    'heater-core-leak': {
      kind: 'outcome',
      title: 'Heater core leaking',
      rootCause:
        'The heater core or its joints leak inside the cabin: damp carpet, misted glass and a sweet smell.',
      correction:
        'Replace the heater core (or repair its joints) and dry the carpet and insulation; refill and bleed.',
      parts: [
        { description: 'Heater core and seals', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 2 },
      ],
      labour: [{ operation: 'Replace heater core, refill and bleed', hours: 4 }],
      followUps: [followUps.purgeAndRecheck, followUps.leakCheckAfterDrive, followUps.tellAdvisor],
      hazards: ['glycol'],
      cautions: [cautions.glycol],
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
    },
    'coolant-pump-seal-leak': {
      kind: 'outcome',
      title: 'Coolant pump leaking',
      rootCause: 'The coolant pump leaks from its weep hole (worn shaft seal) or its gasket.',
      correction: 'Replace the coolant pump with a new gasket or seal, refill and bleed.',
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
    'radiator-or-tank-leak': {
      kind: 'outcome',
      title: 'Radiator or expansion tank leaking',
      rootCause: 'The radiator (core or end tanks) or the expansion tank leaks.',
      correction: 'Replace the leaking radiator or tank, refill and bleed.',
      parts: [
        { description: 'Radiator or expansion tank, as found', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 6 },
      ],
      labour: [{ operation: 'Replace radiator or expansion tank, refill and bleed', hours: 1.8 }],
      followUps: [followUps.purgeAndRecheck, followUps.leakCheckAfterDrive, followUps.tellAdvisor],
      hazards: ['lifting'],
      cautions: [cautions.lifting],
    },
    'cap-not-holding': {
      kind: 'outcome',
      title: 'Pressure cap not holding',
      rootCause:
        'The pressure cap opens too early or leaks, so coolant is pushed out of the tank when the engine is hot.',
      correction: 'Fit a new cap of the rating the maker specifies and top up the level.',
      parts: [{ description: 'Pressure cap of the specified rating', quantity: 1 }],
      labour: [{ operation: 'Test and replace pressure cap', hours: 0.3 }],
      followUps: [followUps.purgeAndRecheck, followUps.tellAdvisor],
    },
    'combustion-gas-in-coolant': {
      kind: 'outcome',
      title: 'Combustion gas in the coolant',
      rootCause:
        'Combustion gas is being pushed into the coolant, usually past the cylinder head gasket or, on diesels, through a leaking exhaust-gas recirculation cooler, and it drives coolant out of the tank.',
      correction:
        'Find the path before quoting: on diesels pressure-test the exhaust-gas recirculation cooler; check compression or cylinder leak-down to find the cylinder. Repair as found.',
      labour: [{ operation: 'Locate combustion leak (cooler test, leak-down)', hours: 1.5 }],
      followUps: [followUps.tellAdvisor],
    },
    'coolant-into-oil': {
      kind: 'outcome',
      title: 'Coolant getting into the oil',
      rootCause:
        'Coolant leaks into the engine oil, through the head gasket, a cracked part or an oil cooler.',
      correction:
        'Stop the car being driven. Find the path (oil cooler pressure test, head gasket and head check) and repair as found; change the oil and filter after the repair.',
      labour: [{ operation: 'Locate internal coolant leak', hours: 2 }],
      followUps: [
        'Advise the customer not to drive the car until it is repaired: coolant in the oil damages bearings.',
        followUps.tellAdvisor,
      ],
    },
    'no-loss-found': {
      kind: 'outcome',
      title: 'No cause found yet',
      rootCause: 'No leak, faulty cap or internal leak was found with these checks.',
      correction:
        'Mark the level on the tank, add UV dye where the maker allows, and ask the customer back after 500–1,000 km to look again.',
      labour: [{ operation: 'Diagnosis time', hours: 1 }],
      followUps: [followUps.tellAdvisor],
    },
  },
} satisfies TreeDefinitionInput;
