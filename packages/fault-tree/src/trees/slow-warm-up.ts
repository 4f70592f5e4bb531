// Shipped tree: the engine warms up slowly or the cabin gets little heat. Starts from what the
// driver noticed (recent coolant work sends to bleeding first), the cold level and a cold check of
// the temperature sensor, then a warm-up log. A slow warm-up is checked in this order: is the
// sensor telling the truth (live data against a probe on its housing), does the radiator warm
// before the thermostat should open (and, on a map-controlled thermostat, is its heating element
// powered when it should not be), and only then the switchable pump: its control valve and
// wiring, then a scan-tool or unplug release test that tells a shroud that holds from one that
// never does. Little cabin heat follows the heat from the engine to the heater core: the heater
// valve, the electric heater pump (supply, ground, command, then the pump), bleeding, and a flow
// test before a heater core is blamed. Thresholds marked "common practice" or "rule of thumb"
// are Heatpath's working figures from trade practice, not published limits; a maker's figure
// always overrides them.
import type { TreeDefinitionInput } from '../schema/tree-schema.js';
import { cautions } from './cautions.js';
import { followUps } from './follow-ups.js';

const temperatureRange = { min: -40, max: 150 };

// Local follow-up (to be consolidated into follow-ups.ts later): a slow warm-up that does not
// overheat is not urgent, and the customer should hear that.
const notUrgent =
  'Tell the customer this fault costs warm-up time, fuel and cabin heat but does not make the engine overheat, so the repair can be planned.';

export const slowWarmUpDefinition = {
  format: 'heatpath.tree',
  formatVersion: 1,
  id: 'slow-warm-up-little-heat',
  title: 'Slow warm-up or little cabin heat',
  symptom: 'The engine takes a long time to warm up, or the heater blows lukewarm air.',
  summary:
    'Bleeds first when the trouble began after coolant work; checks the level and the temperature sensor, logs a warm-up from cold, then checks the thermostat and the switchable pump’s control before any part comes off. For little cabin heat it follows the heat from the engine to the heater core: heater valve, heater pump (supply, ground, command), bleeding, and a flow test before the core is blamed.',
  applicability: [
    'Liquid-cooled engines with a wax-element thermostat, with or without a heating element (map-controlled thermostat); steps about a switchable pump, a heater valve or an electric heater pump apply only where the car has one, and the tree asks.',
    'Figures marked common practice or rule of thumb are working guides; the vehicle maker’s figures and procedures always take precedence.',
  ],
  start: 'interview-recent-work',
  computed: [
    {
      name: 'keyOnOffset',
      label: 'Live data minus air temperature, engine cold',
      formula: 'keyOnLiveTemp - standingAirTemp',
      quantity: 'temperatureDelta',
      unit: 'K',
      hint: 'After six hours or more standing, a few kelvin either way is normal.',
    },
    {
      name: 'sensorWarmGap',
      label: 'Probe at the sensor housing minus live data',
      formula: 'plausibilityHousingTemp - plausibilityLiveTemp',
      quantity: 'temperatureDelta',
      unit: 'K',
      hint: 'Positive: live data reads lower than the engine really is.',
    },
    {
      name: 'earlyFlowGap',
      label: 'Engine minus radiator inlet hose during warm-up',
      formula: 'plausibilityHousingTemp - warmupInletTemp',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'heldRise',
      label: 'Rise while the shroud holds the coolant still',
      formula: 'heldEndTemp - heldStartTemp',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'releasedRise',
      label: 'Rise after the shroud is released',
      formula: 'releasedEndTemp - heldEndTemp',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'heaterFeedLag',
      label: 'Engine outlet minus heater feed hose',
      formula: 'engineOutletTemp - heaterFeedTemp',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'heaterDrop',
      label: 'Temperature drop across the heater core',
      formula: 'temperatureDrop(heaterFeedTemp, heaterReturnTemp)',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'valveDrop',
      label: 'Drop across the heater valve',
      formula: 'valveEngineSideTemp - valveHeaterSideTemp',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'retestFeedLag',
      label: 'Engine outlet minus heater feed hose after bleeding',
      formula: 'retestOutletTemp - retestFeedTemp',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'retestDrop',
      label: 'Drop across the heater core after bleeding',
      formula: 'temperatureDrop(retestFeedTemp, retestReturnTemp)',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
  ],
  nodes: {
    'interview-recent-work': {
      kind: 'question',
      title: 'When did it start?',
      prompt:
        'Ask the driver: did the slow warm-up or the weak heater start after the cooling system was drained, refilled or opened for a repair (a hose, the pump, the thermostat, the radiator, a head job)?',
      estimatedMinutes: 5,
      notes:
        'Air left in the system after a refill is the commonest cause of poor cabin heat after coolant work, and bleeding is cheap: it comes before any other check (common practice).',
      choices: [
        {
          id: 'after-coolant-work',
          label: 'Only since the coolant was drained, refilled or the system opened',
          to: 'refill-bleed',
        },
        {
          id: 'no-recent-work',
          label: 'No coolant work lately, or not known',
          to: 'level-cold',
        },
      ],
    },
    'refill-bleed': {
      kind: 'procedure',
      title: 'Bleed the system after the coolant work',
      instruction:
        'With the engine cold, top up to the MAX mark with the coolant the maker specifies and bleed the whole system as the maker describes (bleed screws, vacuum filler or the scan tool’s pump routine). Then drive or run the engine to full operating temperature for ten minutes or more with the heater at full heat, let it cool right down, and recheck the level.',
      tools: ['Scan tool', 'Vacuum filler (if the maker uses one)', 'Measuring jug'],
      estimatedMinutes: 60,
      hazards: ['hot-pressurised-coolant', 'glycol', 'fan', 'road-test'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.fan, cautions.roadTest],
      notes:
        'Driving to full operating temperature, cooling and rechecking is how trapped air is purged (common practice; trade-facts “purging air after a refill”).',
      done: 'refill-bleed-result',
      couldNotDo: 'level-cold',
    },
    'refill-bleed-result': {
      kind: 'question',
      title: 'Heat after bleeding',
      prompt:
        'On the drive after bleeding: did the engine reach its normal temperature in the usual time, and does the heater now blow hot at idle?',
      estimatedMinutes: 5,
      choices: [
        { id: 'now-normal', label: 'Yes, both are normal now', to: 'air-in-heater-loop' },
        { id: 'still-poor', label: 'No, still slow or still little heat', to: 'level-cold' },
      ],
    },
    'level-cold': {
      kind: 'measurement',
      title: 'Coolant level, engine cold',
      prompt:
        'With the engine cold, top the expansion tank up to the MAX mark with the coolant the maker specifies and enter how much you added (0 if none).',
      tools: ['Measuring jug'],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      estimatedMinutes: 5,
      notes:
        'The heater core is often the highest point of the system; when the level is low it is the first part to run dry. Heatpath treats a litre or more missing as too low to keep it fed (common practice).',
      inputs: [
        {
          name: 'topUpLitres',
          label: 'Coolant added to reach MAX',
          quantity: 'volume',
          unit: 'L',
          range: { min: 0, max: 20 },
        },
      ],
      branches: [
        { when: 'topUpLitres >= 1', to: 'low-coolant-level', label: 'A litre or more was missing' },
      ],
      fallback: { to: 'cold-sensor-check', label: 'Level about right' },
    },
    'cold-sensor-check': {
      kind: 'measurement',
      title: 'Temperature sensor, engine cold',
      prompt:
        'Before the warm-up drive, with the car stood six hours or more and not yet started: switch the ignition on and read the coolant temperature in live data, and read the air temperature where the car stood. Enter both.',
      tools: ['Scan tool', 'Thermometer'],
      estimatedMinutes: 5,
      notes:
        'After six hours or more standing, a cold engine is within a few kelvin of the air around it; a sensor that reads more than 5 K below the air already reads low (common practice). This step only records the readings; they are weighed at the sensor check on the warm engine, because a sensor or a connector with added resistance often reads right cold and low when warm.',
      inputs: [
        {
          name: 'keyOnLiveTemp',
          label: 'Coolant temperature in live data, engine cold',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'standingAirTemp',
          label: 'Air temperature where the car stood',
          quantity: 'temperature',
          unit: 'degC',
          range: { min: -40, max: 55 },
        },
      ],
      fallback: { to: 'warm-up-log', label: 'Readings recorded' },
    },
    'warm-up-log': {
      kind: 'measurement',
      title: 'Warm-up from cold',
      prompt:
        'From that cold start, drive the car normally with the scan tool logging coolant temperature. Enter the minutes it took live data to reach 80 °C (60 if it never did), the temperature it settled at during ten minutes or more of steady driving, and the ambient temperature.',
      tools: ['Scan tool with logging'],
      hazards: ['road-test'],
      cautions: [cautions.roadTest],
      estimatedMinutes: 30,
      evidence: [{ kind: 'log', label: 'Warm-up log', required: true }],
      notes:
        'In mild weather most engines reach about 80 °C within 10–15 minutes of driving and settle near 90 °C, or at 100–110 °C at part load with a map-controlled thermostat; Heatpath calls it slow beyond 20 minutes above 0 °C ambient and low when it settles below 80 °C (common practice). Both are judged on live data, so the next step checks the sensor before anything else.',
      inputs: [
        {
          name: 'minutesTo80',
          label: 'Time to reach 80 °C',
          quantity: 'time',
          unit: 'min',
          range: { min: 1, max: 60 },
        },
        {
          name: 'settledTemp',
          label: 'Settled coolant temperature',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'ambientTemp',
          label: 'Ambient temperature',
          quantity: 'temperature',
          unit: 'degC',
          range: { min: -40, max: 55 },
        },
      ],
      branches: [
        {
          when: 'settledTemp < 80',
          to: 'sensor-plausibility',
          label: 'Never reaches normal temperature',
        },
        {
          when: 'minutesTo80 > 20 and ambientTemp > 0',
          to: 'sensor-plausibility',
          label: 'Gets there, but slowly',
        },
      ],
      fallback: { to: 'heater-hoses', label: 'Warms up normally' },
    },
    'sensor-plausibility': {
      kind: 'measurement',
      title: 'Is the temperature sensor telling the truth?',
      prompt:
        'Start from cold (the next morning, or once the engine has cooled well below 60 °C) and idle with the scan tool connected. When live data shows 60–75 °C (or the highest it gets after 20 minutes), read the sensor’s housing (thermostat housing or head outlet, next to the sensor) with a contact probe, at the same moment as the live-data figure. Enter both.',
      tools: ['Scan tool', 'Contact thermometer (or IR thermometer on a dull, painted spot)'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 20,
      notes:
        'Once warm, a contact probe on the housing reads within a few kelvin of the coolant beside the sensor; IR on bare shiny metal reads LOW, so a probe reading well ABOVE live data is strong evidence that the sensor or its wiring reads low. Heatpath calls more than 8 K a disagreement, or more than 4 K when the sensor also read over 5 K below the air temperature cold (common practice). Judging the thermostat on a sensor that reads low sends a good thermostat to the bin.',
      inputs: [
        {
          name: 'plausibilityLiveTemp',
          label: 'Coolant temperature in live data',
          quantity: 'temperature',
          unit: 'degC',
          range: { min: -40, max: 80 },
          hint: 'Take the readings before live data passes 75 °C.',
        },
        {
          name: 'plausibilityHousingTemp',
          label: 'Sensor housing, contact probe',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
      ],
      branches: [
        {
          when: 'sensorWarmGap > 8',
          to: 'sensor-reads-low',
          label: 'The engine is hotter than live data shows',
        },
        {
          when: 'keyOnOffset < -5 and sensorWarmGap > 4',
          to: 'sensor-reads-low',
          label: 'Reads low cold and warm',
        },
      ],
      fallback: { to: 'thermostat-early-flow', label: 'Sensor agrees with the probe' },
    },
    'thermostat-early-flow': {
      kind: 'measurement',
      title: 'Radiator hose during warm-up',
      prompt:
        'Straight after the sensor readings, before the engine warms further, take an IR reading on the radiator inlet hose near the radiator and enter it.',
      tools: ['IR thermometer'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 5,
      notes:
        'Below its opening temperature (usually 82–91 °C, trade textbook) the thermostat keeps the radiator inlet hose much cooler than the engine. A hose within 15 K of the probe reading at 60–75 °C means coolant already flows through the radiator (common practice). The hose cannot be much hotter than the engine it comes from: more than 10 K hotter means the readings do not fit together (common practice).',
      inputs: [
        {
          name: 'warmupInletTemp',
          label: 'Radiator inlet hose',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
      ],
      branches: [
        {
          when: 'warmupInletTemp > plausibilityHousingTemp + 10 K',
          to: 'needs-further-checks',
          label: 'Hose hotter than the engine: readings do not fit',
        },
        {
          when: 'earlyFlowGap < 15',
          to: 'thermostat-kind',
          label: 'Radiator warms before the thermostat should open',
        },
      ],
      fallback: { to: 'pump-has-shroud', label: 'Radiator stays cool while warming' },
    },
    'thermostat-kind': {
      kind: 'question',
      title: 'Map-controlled thermostat?',
      prompt:
        'Does this engine have a map-controlled thermostat, one with a heating element the engine computer switches (a two-wire connector on the thermostat housing)? Check the maker’s information.',
      estimatedMinutes: 5,
      choices: [
        { id: 'conventional', label: 'No, a plain wax thermostat', to: 'thermostat-stuck-open' },
        {
          id: 'map-controlled',
          label: 'Yes, it has a heating element',
          to: 'thermostat-heater-command',
        },
      ],
    },
    'thermostat-heater-command': {
      kind: 'question',
      title: 'Thermostat heating element during warm-up',
      prompt:
        'With the engine below 80 °C at idle and no load, read the thermostat heating element’s command in live data and back-probe its connector (plugged in) as the maker’s wiring diagram shows. Is the element powered?',
      tools: ['Scan tool', 'Multimeter', 'Wiring diagram'],
      hazards: ['fan', 'hot-surface'],
      cautions: [cautions.scanToolActuation, cautions.hotSurface],
      estimatedMinutes: 15,
      notes:
        'The engine computer normally leaves the element off while the engine warms at part load, and powers it to open the thermostat early under full load or high temperature (common practice). An element powered all the time (wiring short to supply, a control fault) holds a good thermostat open, and a new thermostat would be held open too.',
      choices: [
        {
          id: 'not-powered',
          label: 'No: not commanded and no voltage, as it should be',
          to: 'thermostat-stuck-open',
        },
        {
          id: 'powered-cold',
          label: 'Yes: powered while the engine is still cold',
          to: 'thermostat-heater-always-on',
        },
        {
          id: 'not-checked',
          label: 'Could not check it',
          to: 'thermostat-stuck-open',
          hint: 'The finding then asks you to check the element’s circuit when the new thermostat goes in.',
        },
      ],
    },
    'pump-has-shroud': {
      kind: 'question',
      title: 'Switchable coolant pump?',
      prompt:
        'Does this engine have a switchable main coolant pump, whose shroud holds the coolant still while the engine warms? Check the maker’s information.',
      estimatedMinutes: 5,
      choices: [
        { id: 'switchable', label: 'Yes', to: 'shroud-valve-check' },
        { id: 'conventional', label: 'No', to: 'heater-hoses' },
      ],
    },
    'shroud-valve-check': {
      kind: 'question',
      title: 'Pump control valve and its wiring',
      prompt:
        'From a cold start at idle, read in live data whether the engine computer commands the pump’s control valve to hold the coolant still, and back-probe the valve’s connector (plugged in) for supply and the switched ground, as the maker’s wiring diagram shows. What do you find?',
      tools: ['Scan tool', 'Multimeter or test lamp', 'Wiring diagram'],
      hazards: ['fan', 'hot-surface'],
      cautions: [cautions.scanToolActuation, cautions.hotSurface],
      estimatedMinutes: 20,
      notes:
        'The shroud is pushed over the impeller only while the valve is energised; a valve that is never energised gives a pump that never covers: a slower warm-up, no overheating (cooling-diagnosis brief, common practice). Check the command and the circuit before the release test, which depends on them, and long before a belt-drive job: if they cannot be checked, the walk stops at “needs further checks” rather than guess at the pump.',
      choices: [
        {
          id: 'commanded-and-powered',
          label: 'Commanded, and supply and switched ground reach the valve',
          to: 'shroud-actuation-test',
        },
        {
          id: 'commanded-not-reaching',
          label: 'Commanded, but supply or switched ground is missing at the valve',
          to: 'shroud-valve-circuit-fault',
        },
        {
          id: 'not-commanded',
          label: 'The engine computer does not command it during a cold warm-up',
          to: 'needs-further-checks',
        },
        {
          id: 'could-not-check',
          label: 'Could not check the command or the circuit',
          to: 'needs-further-checks',
          hint: 'Without knowing the valve is energised, a release test cannot tell a stuck shroud from a valve that is never switched.',
        },
      ],
    },
    'shroud-actuation-test': {
      kind: 'procedure',
      title: 'Release test of the pump shroud',
      instruction:
        'Start from cold and let it idle with the heater off and the scan tool logging coolant temperature, the shroud held by the engine computer (or commanded closed from the scan tool). When live data reaches about 35 °C, note it; note it again three minutes later. At once release the shroud (command it open from the scan tool or, where the scan tool cannot, unplug the valve’s connector: the shroud releases when the valve loses power) and note the temperature three minutes after that. Plug the valve back in and clear any code the unplugging stored.',
      tools: ['Scan tool with logging'],
      hazards: ['fan', 'hot-surface'],
      cautions: [cautions.scanToolActuation, cautions.hotSurface],
      estimatedMinutes: 25,
      notes:
        'A shroud that holds the coolant still lets the head outlet warm quickly; when it is released, cooler coolant from the block reaches the sensor and the rise stalls or the reading dips. A shroud that never closes shows the same steady rise before and after the release. Comparing the two halves of one warm-up tells them apart on any engine, where a fixed “so many kelvin in five minutes” does not (rule of thumb; compare with a known-good engine of the same type where you can).',
      done: 'shroud-actuation-result',
      couldNotDo: 'needs-further-checks',
    },
    'shroud-actuation-result': {
      kind: 'measurement',
      title: 'Release test readings',
      prompt:
        'Enter the three live-data readings: when the hold began, three minutes later, and three minutes after the release.',
      estimatedMinutes: 2,
      notes:
        'Heatpath takes the shroud as holding when the rise after the release is half or less of the rise while held; a held rise under 2 K in three minutes is too small to judge (rule of thumb).',
      inputs: [
        {
          name: 'heldStartTemp',
          label: 'At the start of the hold',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'heldEndTemp',
          label: 'Three minutes into the hold (moment of release)',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'releasedEndTemp',
          label: 'Three minutes after the release',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
      ],
      branches: [
        {
          when: 'heldRise < 2',
          to: 'needs-further-checks',
          label: 'The engine barely warmed: the test cannot judge',
        },
        {
          when: 'releasedRise <= heldRise / 2',
          to: 'heater-hoses',
          label: 'The rise stalls on release: the shroud holds',
        },
      ],
      fallback: {
        to: 'shroud-never-deploys',
        label: 'Same rise before and after: the shroud never held',
      },
    },
    'heater-hoses': {
      kind: 'measurement',
      title: 'Heater hose temperatures',
      prompt:
        'At full operating temperature, with the heater at full heat and the blower on medium, take IR readings on the engine’s outlet hose next to the thermostat housing, and on both heater hoses at the bulkhead, at the same moment. Enter all three.',
      tools: ['IR thermometer'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 10,
      notes:
        'Hose against hose, read at the same moment, so live data does not have to be trusted. The feed hose should be within about 20 K of the engine outlet, and the drop across the heater core modest; more than 15 K across the core means weak flow or trapped air (common practice). On a map-controlled engine running 100–110 °C the same differences apply.',
      inputs: [
        {
          name: 'engineOutletTemp',
          label: 'Engine outlet hose',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'heaterFeedTemp',
          label: 'Heater feed hose',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'heaterReturnTemp',
          label: 'Heater return hose',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
      ],
      branches: [
        {
          when: 'heaterFeedLag > 20',
          to: 'heater-valve-present',
          label: 'Little hot coolant reaches the heater',
        },
        {
          when: 'heaterDrop > 15',
          to: 'heater-pump-check',
          label: 'Large drop across the heater core',
        },
      ],
      fallback: { to: 'heat-reaches-core', label: 'Hot coolant flows through the heater' },
    },
    'heater-valve-present': {
      kind: 'question',
      title: 'Heater valve?',
      prompt:
        'Does this car have a heater shut-off or control valve in the heater hoses, worked by the engine computer or the climate control? Check the maker’s information.',
      estimatedMinutes: 5,
      choices: [
        { id: 'has-valve', label: 'Yes', to: 'heater-valve-temps' },
        { id: 'no-valve', label: 'No', to: 'heater-pump-check' },
      ],
    },
    'heater-valve-temps': {
      kind: 'measurement',
      title: 'Hose on each side of the heater valve',
      prompt:
        'At full operating temperature with full heat requested, take IR readings on the hose a hand’s width before the heater valve (engine side) and a hand’s width after it (heater side). Enter both.',
      tools: ['IR thermometer'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 10,
      notes:
        'With full heat requested the valve should pass coolant and both sides read alike; more than 20 K cooler beyond the valve means the valve is where the flow stops (common practice). A valve that stays closed leaves the cabin cold while the engine warms normally: it is not the heater core.',
      inputs: [
        {
          name: 'valveEngineSideTemp',
          label: 'Hose before the valve (engine side)',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'valveHeaterSideTemp',
          label: 'Hose after the valve (heater side)',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
      ],
      branches: [
        {
          when: 'valveDrop > 20',
          to: 'heater-valve-check',
          label: 'The flow stops at the valve',
        },
      ],
      fallback: { to: 'heater-pump-check', label: 'The valve passes hot coolant' },
    },
    'heater-valve-check': {
      kind: 'question',
      title: 'Does the heater valve open when told to?',
      prompt:
        'With full heat requested, check the valve as the maker describes: its command (live data or the climate control’s output test) and the supply at its connector. Then command it open from the scan tool or, for a valve that is open when unpowered, unplug it, and feel whether the hose beyond it warms within two minutes. What do you find?',
      tools: ['Scan tool', 'Multimeter', 'Wiring diagram', 'IR thermometer'],
      hazards: ['fan', 'hot-surface'],
      cautions: [cautions.scanToolActuation, cautions.hotSurface],
      estimatedMinutes: 20,
      notes:
        'Separates a valve that sticks from one that is told to stay shut: only the first needs a new valve (common practice).',
      choices: [
        {
          id: 'stays-closed',
          label: 'It stays closed when commanded open (or unplugged)',
          to: 'heater-valve-stuck-closed',
        },
        {
          id: 'opens-on-test',
          label: 'It opens on the test, but is commanded or powered closed in normal use',
          to: 'heater-valve-control-fault',
        },
        {
          id: 'not-checked',
          label: 'Could not test it, or the results do not fit together',
          to: 'needs-further-checks',
        },
      ],
    },
    'heater-pump-check': {
      kind: 'question',
      title: 'Heater pump running?',
      prompt:
        'With the ignition on and full heat requested, or the pump switched on from the scan tool’s output test, does the heater loop’s electric pump run? Feel and listen to it, and feel for pulses in its hoses.',
      tools: ['Scan tool'],
      hazards: ['fan'],
      cautions: [cautions.scanToolActuation],
      estimatedMinutes: 10,
      choices: [
        { id: 'runs', label: 'Yes, it runs', to: 'heater-loop-bleed' },
        { id: 'does-not-run', label: 'No, it does not run', to: 'heater-pump-supply' },
        {
          id: 'no-electric-pump',
          label: 'This car has no electric heater pump',
          to: 'heater-loop-bleed',
        },
      ],
    },
    'heater-pump-supply': {
      kind: 'question',
      title: 'Supply at the heater pump',
      prompt:
        'With the pump requested on, back-probe its connector (plugged in) or use a test lamp: are the supply voltage and a good ground there, as the maker’s wiring diagram shows?',
      tools: ['Multimeter or test lamp', 'Wiring diagram'],
      estimatedMinutes: 15,
      notes:
        'Measured under load (plugged in, or with a test lamp), so a corroded pin that shows full voltage open-circuit still shows up. Supply and ground alone do not prove a failed pump: many of these pumps also need a command signal.',
      choices: [
        {
          id: 'supply-present',
          label: 'Yes, supply and ground are there',
          to: 'heater-pump-command',
        },
        { id: 'supply-missing', label: 'No', to: 'heater-pump-circuit-fault' },
      ],
    },
    'heater-pump-command': {
      kind: 'question',
      title: 'Command signal to the heater pump',
      prompt:
        'Many electric heater pumps run only when a control unit sends them a command (an on/off or pulsed signal on a third wire, or a bus message). With the pump switched on from the scan tool’s output test, is the command signal at its connector, as the maker’s wiring diagram shows?',
      tools: ['Scan tool', 'Multimeter or oscilloscope', 'Wiring diagram'],
      hazards: ['fan'],
      cautions: [cautions.scanToolActuation],
      estimatedMinutes: 20,
      notes:
        'Supply, ground and command all present and the pump still does not run is what proves the pump itself (common practice).',
      choices: [
        {
          id: 'command-present',
          label: 'Yes: supply, ground and command are there, and it still does not run',
          to: 'heater-pump-failed',
        },
        {
          id: 'two-wire-pump',
          label: 'It is a two-wire pump (switched supply only), and it still does not run',
          to: 'heater-pump-failed',
        },
        {
          id: 'no-command',
          label: 'No command signal reaches it',
          to: 'heater-pump-circuit-fault',
        },
        {
          id: 'could-not-check',
          label: 'Could not check the command',
          to: 'needs-further-checks',
        },
      ],
    },
    'heater-loop-bleed': {
      kind: 'procedure',
      title: 'Bleed the heater loop',
      instruction:
        'With the engine cold, top up and bleed the heater loop as the maker describes (bleed screw, vacuum filler or the scan tool’s pump routine). Then run the engine to full operating temperature with the heater at full heat.',
      tools: ['Scan tool', 'Vacuum filler (if the maker uses one)'],
      estimatedMinutes: 40,
      hazards: ['hot-pressurised-coolant', 'glycol', 'fan'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.fan],
      notes:
        'If bleeding cannot be done, nothing yet points at the heater core: the walk ends at “needs further checks”, not at a core replacement.',
      done: 'heater-retest',
      couldNotDo: 'needs-further-checks',
    },
    'heater-retest': {
      kind: 'measurement',
      title: 'Heater hoses after bleeding',
      prompt:
        'At full operating temperature, heater at full heat, take IR readings again on the engine outlet hose and on both heater hoses, at the same moment.',
      notes:
        'Flow counts as restored when the feed hose is within 20 K of the engine outlet and the drop across the core is 15 K or less (common practice).',
      tools: ['IR thermometer'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 10,
      inputs: [
        {
          name: 'retestOutletTemp',
          label: 'Engine outlet hose',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'retestFeedTemp',
          label: 'Heater feed hose',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'retestReturnTemp',
          label: 'Heater return hose',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
      ],
      branches: [
        {
          when: 'retestDrop <= 15 and retestFeedLag <= 20',
          to: 'air-in-heater-loop',
          label: 'Bleeding restored the flow',
        },
      ],
      fallback: { to: 'heater-flow-test', label: 'Still little flow through the core' },
    },
    'heater-flow-test': {
      kind: 'procedure',
      title: 'Flow test of the heater core',
      instruction:
        'With the engine cold, catch the coolant and disconnect both heater hoses at the bulkhead. Run mains water through the heater core in its normal direction of flow for one minute into a measuring container, then the same tap through the hose alone for one minute. Do not back-flush yet: this measures the flow as it is.',
      tools: ['Drain tray', 'Garden hose with adapters', 'Measuring container', 'Timer'],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
      estimatedMinutes: 45,
      done: 'heater-flow-result',
      couldNotDo: 'needs-further-checks',
    },
    'heater-flow-result': {
      kind: 'measurement',
      title: 'Flow test readings',
      prompt:
        'Enter the litres collected in one minute through the heater core and through the hose alone.',
      estimatedMinutes: 5,
      notes:
        'A clear heater core passes most of what the hose alone passes; less than half means the core is restricted (rule of thumb: compare with a new core of the same type where you can).',
      inputs: [
        {
          name: 'coreFlowLitres',
          label: 'Through the heater core, in one minute',
          quantity: 'volume',
          unit: 'L',
          range: { min: 0, max: 100 },
        },
        {
          name: 'hoseFlowLitres',
          label: 'Through the hose alone, in one minute',
          quantity: 'volume',
          unit: 'L',
          range: { min: 1, max: 100 },
        },
      ],
      branches: [
        {
          when: 'coreFlowLitres < hoseFlowLitres / 2',
          to: 'heater-core-restricted',
          label: 'Less than half the flow: the core is restricted',
        },
      ],
      fallback: { to: 'needs-further-checks', label: 'The core flows freely' },
    },

    'low-coolant-level': {
      kind: 'outcome',
      title: 'Coolant level too low to feed the heater',
      rootCause:
        'So much coolant was missing that the heater core, high in the system, was not kept full.',
      correction:
        'Top up with the specified coolant and bleed; then find out where the coolant went.',
      parts: [{ description: 'Coolant to the maker’s specification (litres)', quantity: 2 }],
      labour: [{ operation: 'Top up and bleed', hours: 0.5 }],
      followUps: [
        followUps.purgeAndRecheck,
        'Open a case on the “Coolant level keeps dropping” tree to find the loss.',
        followUps.tellAdvisor,
      ],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
    },
    'sensor-reads-low': {
      kind: 'outcome',
      title: 'Coolant temperature sensor reads low',
      rootCause:
        'The coolant temperature sensor, its connector or its wiring reads lower than the engine really is, so the gauge and live data show a slow warm-up that the engine does not have. The engine computer may also run the fan late and the mixture rich.',
      correction:
        'Check the connector and the wiring for corrosion and added resistance; compare the sensor’s resistance with the maker’s table at the temperature the probe read. Repair the wiring, or replace the sensor (a little coolant is lost: top up and bleed as the maker describes).',
      parts: [
        {
          description: 'Coolant temperature sensor and seal, if the sensor is at fault',
          quantity: 1,
        },
      ],
      labour: [
        { operation: 'Test and replace coolant temperature sensor, top up and bleed', hours: 0.8 },
      ],
      followUps: [
        'After the repair, compare live data with the contact probe again on a warm engine: they should agree within a few kelvin.',
        followUps.purgeAndRecheck,
        followUps.tellAdvisor,
      ],
      notes:
        'Not the thermostat: the thermostat was judged against a probe reading, not against the sensor.',
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.drainAndRefill, cautions.glycol],
    },
    'thermostat-stuck-open': {
      kind: 'outcome',
      title: 'Thermostat stuck open',
      rootCause:
        'The thermostat lets coolant through the radiator before the engine is warm, so the engine warms slowly, may never reach its normal temperature, and the heater stays lukewarm.',
      correction:
        'Fit a new thermostat (and seal) of the maker’s specification, refill and bleed. On a map-controlled thermostat, first make sure its heating element is not powered while the engine is cold, or the new one will be held open too.',
      parts: [
        { description: 'Thermostat with seal', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 2 },
      ],
      labour: [{ operation: 'Replace thermostat, refill and bleed', hours: 1.2 }],
      followUps: [followUps.purgeAndRecheck, followUps.leakCheckAfterDrive, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.drainAndRefill, cautions.glycol],
    },
    'thermostat-heater-always-on': {
      kind: 'outcome',
      title: 'Thermostat heating element powered while cold',
      rootCause:
        'The map-controlled thermostat’s heating element is powered while the engine is still cold (a wiring fault to supply, or the control holding it on), so a good thermostat is opened early and the engine warms slowly.',
      correction:
        'Trace the element’s circuit with the maker’s wiring diagram: a short to supply, a chafed loom, or a control output stuck on. Check the engine computer’s stored codes and the maker’s updates before replacing any control unit. The thermostat itself need not be replaced.',
      labour: [{ operation: 'Diagnose and repair thermostat heating circuit', hours: 1 }],
      followUps: [
        'After the repair, repeat the warm-up from cold: the radiator inlet hose should stay cool until the thermostat’s opening temperature.',
        followUps.tellAdvisor,
      ],
    },
    'shroud-valve-circuit-fault': {
      kind: 'outcome',
      title: 'Pump control valve not energised',
      rootCause:
        'The engine computer commands the switchable pump’s control valve, but its supply or switched ground does not reach it, so the shroud never covers the impeller and the engine warms slowly. It does not cause overheating.',
      correction:
        'Trace the valve’s supply, fuse, connector and wiring to the engine computer with the maker’s wiring diagram and repair the fault. The pump itself is not indicated.',
      labour: [{ operation: 'Diagnose and repair pump control valve circuit', hours: 1 }],
      followUps: [
        'After the repair, repeat the release test from cold: the rise should stall when the shroud is released.',
        notUrgent,
        followUps.tellAdvisor,
      ],
    },
    'shroud-never-deploys': {
      kind: 'outcome',
      title: 'Switchable pump shroud never closes',
      rootCause:
        'The control valve is commanded and supplied, but the switchable pump’s shroud never holds the coolant still: the release test shows the same rise before and after. The valve sticks or leaks, or the shroud is stuck back inside the pump, so coolant circulates from the start and the engine warms more slowly. It does not overheat the engine.',
      correction:
        'First test the control valve off the engine as the maker describes (coil resistance, clicks when energised, holds pressure) and replace it if it fails. Only if the valve is good, replace the switchable coolant pump; where it sits behind the timing belt this is a timing belt job, and on many transverse engines the engine must be supported and a mount removed. Drain, refill and bleed as the maker describes.',
      parts: [
        {
          description: 'Pump control valve, or switchable coolant pump if the valve is good',
          quantity: 1,
        },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 4 },
      ],
      labour: [
        {
          operation: 'Test control valve; replace valve or pump as found, refill and bleed',
          hours: 1.5,
        },
      ],
      followUps: [
        followUps.purgeAndRecheck,
        followUps.labelTimingCover,
        notUrgent,
        followUps.tellAdvisor,
      ],
      hazards: ['hot-pressurised-coolant', 'glycol', 'belt-drive', 'lifting'],
      cautions: [cautions.drainAndRefill, cautions.glycol, cautions.beltDrive, cautions.lifting],
    },
    'heater-valve-stuck-closed': {
      kind: 'outcome',
      title: 'Heater valve stuck closed',
      rootCause:
        'The heater shut-off valve stays closed even when it is commanded open, so hot coolant stops at the valve: the engine warms normally but the cabin stays cool. The heater core is not at fault.',
      correction:
        'Replace the heater valve; catch the coolant lost, then top up and bleed the heater loop as the maker describes.',
      parts: [
        { description: 'Heater valve', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 1 },
      ],
      labour: [{ operation: 'Replace heater valve, top up and bleed', hours: 1 }],
      followUps: [followUps.purgeAndRecheck, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.drainAndRefill, cautions.glycol],
    },
    'heater-valve-control-fault': {
      kind: 'outcome',
      title: 'Heater valve held closed by its control',
      rootCause:
        'The heater valve itself works (it opens on test), but in normal use it is commanded or powered closed, so the cabin stays cool while the engine warms normally.',
      correction:
        'Trace the valve’s supply and command with the maker’s wiring diagram (a wire shorted to supply or ground, a connector), and check the climate control’s request, its settings and stored codes. Repair the circuit or the control as found; the valve and the heater core are not at fault.',
      labour: [{ operation: 'Diagnose and repair heater valve control', hours: 1 }],
      followUps: [followUps.tellAdvisor],
    },
    'heater-pump-failed': {
      kind: 'outcome',
      title: 'Heater pump failed',
      rootCause:
        'The heater loop’s electric pump gets its supply, ground and command but does not run, so little hot coolant reaches the heater core.',
      correction: 'Replace the heater pump, refill and bleed the heater loop.',
      parts: [
        { description: 'Electric heater pump', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 1 },
      ],
      labour: [{ operation: 'Replace heater pump and bleed', hours: 1 }],
      followUps: [followUps.purgeAndRecheck, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.drainAndRefill, cautions.glycol],
    },
    'heater-pump-circuit-fault': {
      kind: 'outcome',
      title: 'Heater pump not supplied or not commanded',
      rootCause:
        'The heater loop’s electric pump does not get its supply, its ground or its command signal when it should run, so it never runs. The pump itself is not indicated.',
      correction:
        'Trace the supply, ground and command of the pump with the maker’s wiring diagram and repair the fault (fuse, relay, connector, wiring or the control unit’s output).',
      labour: [{ operation: 'Diagnose and repair heater pump circuit', hours: 1 }],
      followUps: [followUps.tellAdvisor],
    },
    'air-in-heater-loop': {
      kind: 'outcome',
      title: 'Air trapped in the heater loop',
      rootCause:
        'An air pocket in the heater loop stopped coolant flowing through the heater core; bleeding restored it.',
      correction:
        'Bleeding is done; check the refill procedure was followed and the level after the engine has cooled.',
      parts: [{ description: 'Coolant to the maker’s specification (litres)', quantity: 1 }],
      labour: [{ operation: 'Bleed heater loop', hours: 0.6 }],
      followUps: [followUps.purgeAndRecheck, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.coldSystemOnly, cautions.glycol],
    },
    'heater-core-restricted': {
      kind: 'outcome',
      title: 'Heater core restricted',
      rootCause:
        'Hot coolant reaches the heater, the loop is bled and the pump or valve passes it, but the core itself passes less than half the flow of a free hose: it is partly blocked.',
      correction:
        'Back-flush the heater core where the maker allows and repeat the flow test; replace the core only if the flow does not come back. Check the coolant’s condition and flush the whole system if it is contaminated, then refill and bleed as the maker describes.',
      parts: [{ description: 'Heater core, if back-flushing does not restore flow', quantity: 1 }],
      labour: [{ operation: 'Back-flush heater core, or replace it; refill and bleed', hours: 2 }],
      followUps: [followUps.purgeAndRecheck, followUps.leakCheckAfterDrive, followUps.tellAdvisor],
      hazards: ['hot-pressurised-coolant', 'glycol'],
      cautions: [cautions.drainAndRefill, cautions.glycol],
    },
    'heat-reaches-core': {
      kind: 'outcome',
      title: 'Heat reaches the heater: look at the air side',
      rootCause:
        'The engine gets hot and hot coolant flows through the heater core, so the cooling system delivers the heat. If the cabin is still cool, the loss is on the air side (blend flap, its actuator, the climate controls, a blocked cabin filter). Where the complaint was a slow warm-up, the sensor reads true and the thermostat holds: compare with the maker’s figures for the weather and the driving (short trips and idling diesels warm slowly).',
      correction:
        'Check the blend flap, its actuator, the cabin filter and the climate control as the maker describes.',
      labour: [{ operation: 'Diagnose heater air distribution', hours: 1 }],
      followUps: [followUps.tellAdvisor],
    },
    'needs-further-checks': {
      kind: 'outcome',
      title: 'Needs further checks before any part is replaced',
      rootCause:
        'The checks so far do not point to one cause with enough evidence to replace a part: a check could not be done, or the readings do not fit together.',
      correction:
        'Record the readings and what could not be done. Repeat the check that could not be done when the tools or the maker’s information are available, look for the maker’s technical notes on this engine, or refer the car to a specialist. Do not replace a pump or a heater core on the evidence so far.',
      labour: [{ operation: 'Further diagnosis as the maker describes', hours: 1 }],
      followUps: [followUps.tellAdvisor],
    },
  },
} satisfies TreeDefinitionInput;
