// Shipped tree: the engine warms up slowly or the cabin gets little heat. Separates a thermostat
// that stays open, a switchable pump shroud that never closes, and heater-loop faults (electric
// pump, trapped air, a restricted heater core) with the level, a warm-up log and hose readings.
import type { TreeDefinitionInput } from '../schema/tree-schema.js';
import { cautions } from './cautions.js';
import { followUps } from './follow-ups.js';

const temperatureRange = { min: -40, max: 150 };

export const slowWarmUpDefinition = {
  format: 'heatpath.tree',
  formatVersion: 1,
  id: 'slow-warm-up-little-heat',
  title: 'Slow warm-up or little cabin heat',
  symptom: 'The engine takes a long time to warm up, or the heater blows lukewarm air.',
  summary:
    'Checks the level, logs a warm-up from cold, then follows the heat from the engine to the heater core to find where it is lost.',
  applicability: [
    'Liquid-cooled engines with a wax-element thermostat; steps about a switchable pump or an electric heater pump apply only where the engine has one.',
    'Figures marked common practice are working guides; the vehicle maker’s figures and procedures always take precedence.',
  ],
  start: 'level-cold',
  computed: [
    {
      name: 'earlyFlowGap',
      label: 'Engine minus radiator inlet hose during warm-up',
      formula: 'warmupEngineTemp - warmupInletTemp',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'standingRise',
      label: 'Temperature rise in the first five minutes',
      formula: 'tempAfterFiveMinutes - tempAtColdStart',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
    {
      name: 'heaterFeedLag',
      label: 'Engine minus heater feed hose',
      formula: 'engineTempHot - heaterFeedTemp',
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
      name: 'retestDrop',
      label: 'Drop across the heater core after bleeding',
      formula: 'temperatureDrop(retestFeedTemp, retestReturnTemp)',
      quantity: 'temperatureDelta',
      unit: 'K',
    },
  ],
  nodes: {
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
      fallback: { to: 'warm-up-log', label: 'Level about right' },
    },
    'warm-up-log': {
      kind: 'measurement',
      title: 'Warm-up from cold',
      prompt:
        'After the car has stood for six hours or more, drive it normally with the scan tool logging coolant temperature. Enter the minutes it took live data to reach 80 °C (60 if it never did), the temperature it settled at during ten minutes or more of steady driving, and the ambient temperature.',
      tools: ['Scan tool with logging'],
      hazards: ['road-test'],
      cautions: [cautions.roadTest],
      estimatedMinutes: 30,
      evidence: [{ kind: 'log', label: 'Warm-up log', required: true }],
      notes:
        'In mild weather most engines reach about 80 °C within 10–15 minutes of driving and settle near 90 °C; Heatpath calls it slow beyond 20 minutes above 0 °C ambient (common practice).',
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
          to: 'thermostat-early-flow',
          label: 'Never reaches normal temperature',
        },
        {
          when: 'minutesTo80 > 20 and ambientTemp > 0',
          to: 'pump-has-shroud',
          label: 'Gets there, but slowly',
        },
      ],
      fallback: { to: 'heater-hoses', label: 'Warms up normally' },
    },
    'thermostat-early-flow': {
      kind: 'measurement',
      title: 'Radiator hose during warm-up',
      prompt:
        'Start from cold and idle with the scan tool connected. When live data shows 60–70 °C, take an IR reading on the radiator inlet hose near the radiator. Enter both.',
      tools: ['Scan tool', 'IR thermometer'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 15,
      notes:
        'Below the opening temperature the radiator inlet hose should stay much cooler than the engine. Within 15 K of the engine means coolant already flows through the radiator (common practice).',
      inputs: [
        {
          name: 'warmupEngineTemp',
          label: 'Coolant temperature in live data',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
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
          when: 'warmupEngineTemp < 80 and earlyFlowGap < 15',
          to: 'thermostat-stuck-open',
          label: 'Radiator warms before the thermostat should open',
        },
      ],
      fallback: { to: 'pump-has-shroud', label: 'Radiator stays cool while warming' },
    },
    'pump-has-shroud': {
      kind: 'question',
      title: 'Switchable coolant pump?',
      prompt:
        'Does this engine have a switchable main coolant pump, whose shroud holds the coolant still while the engine warms? Check the maker’s information.',
      choices: [
        { id: 'switchable', label: 'Yes', to: 'shroud-deploy-test' },
        { id: 'conventional', label: 'No', to: 'heater-hoses' },
      ],
    },
    'shroud-deploy-test': {
      kind: 'measurement',
      title: 'Does the shroud hold the coolant still?',
      prompt:
        'From a cold start, idle for five minutes with live data showing the pump commanded to hold the coolant still. Enter the coolant temperature at the start and after five minutes.',
      tools: ['Scan tool'],
      hazards: ['hot-pressurised-coolant', 'fan'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan],
      estimatedMinutes: 10,
      notes:
        'With the coolant held still, the head outlet usually warms by well over 10 K in the first five minutes at idle. This is a rough guide (common practice, not a published figure): compare with a known-good engine of the same type where you can.',
      inputs: [
        {
          name: 'tempAtColdStart',
          label: 'Coolant temperature at start',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
        {
          name: 'tempAfterFiveMinutes',
          label: 'Coolant temperature after five minutes',
          quantity: 'temperature',
          unit: 'degC',
          range: temperatureRange,
        },
      ],
      branches: [
        {
          when: 'standingRise < 10',
          to: 'shroud-never-deploys',
          label: 'Warms as if the coolant were flowing',
        },
      ],
      fallback: { to: 'heater-hoses', label: 'Warms quickly: the shroud works' },
    },
    'heater-hoses': {
      kind: 'measurement',
      title: 'Heater hose temperatures',
      prompt:
        'At full operating temperature, with the heater at maximum heat and the blower on medium, take IR readings on both heater hoses at the bulkhead. Enter the live-data coolant temperature, the feed hose and the return hose.',
      tools: ['Scan tool', 'IR thermometer'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 10,
      notes:
        'The feed hose should be within about 20 K of the engine, and the drop across the heater core should be modest; a large drop means weak flow or trapped air (common practice).',
      inputs: [
        {
          name: 'engineTempHot',
          label: 'Coolant temperature in live data',
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
          to: 'heater-pump-check',
          label: 'Little hot coolant reaches the heater',
        },
        {
          when: 'heaterDrop > 15',
          to: 'heater-loop-bleed',
          label: 'Large drop across the heater core',
        },
      ],
      fallback: { to: 'heat-reaches-core', label: 'Hot coolant flows through the heater' },
    },
    'heater-pump-check': {
      kind: 'question',
      title: 'Heater pump running?',
      prompt:
        'With the ignition on and full heat requested, does the heater loop’s electric pump run? Feel and listen to it, or use the scan tool’s output test.',
      tools: ['Scan tool'],
      hazards: ['fan'],
      cautions: [cautions.fan],
      estimatedMinutes: 10,
      choices: [
        { id: 'runs', label: 'Yes, it runs', to: 'heater-loop-bleed' },
        { id: 'does-not-run', label: 'No, it does not run', to: 'heater-pump-supply' },
        {
          id: 'no-electric-pump',
          label: 'This engine has no electric heater pump',
          to: 'heater-loop-bleed',
        },
      ],
    },
    'heater-pump-supply': {
      kind: 'question',
      title: 'Supply at the heater pump',
      prompt:
        'With the pump commanded on, is there supply voltage and a good ground at its connector, as the maker’s wiring diagram shows?',
      tools: ['Multimeter', 'Wiring diagram'],
      estimatedMinutes: 15,
      choices: [
        {
          id: 'supply-present',
          label: 'Yes, supply and ground are there',
          to: 'heater-pump-failed',
        },
        { id: 'supply-missing', label: 'No', to: 'heater-pump-circuit-fault' },
      ],
    },
    'heater-loop-bleed': {
      kind: 'procedure',
      title: 'Bleed the heater loop',
      instruction:
        'With the engine cold, top up and bleed the heater loop as the maker describes (bleed screw, vacuum filler or the scan tool’s pump routine). Then run the engine to full operating temperature with the heater at maximum.',
      tools: ['Scan tool', 'Vacuum filler (if used by the maker)'],
      estimatedMinutes: 40,
      hazards: ['hot-pressurised-coolant', 'glycol', 'fan'],
      cautions: [cautions.coldSystemOnly, cautions.glycol, cautions.fan],
      done: 'heater-retest',
      couldNotDo: 'heater-core-restricted',
    },
    'heater-retest': {
      kind: 'measurement',
      title: 'Heater hoses after bleeding',
      prompt:
        'At full operating temperature, heater at maximum, take IR readings on both heater hoses again.',
      notes:
        'Flow counts as restored when the feed hose is within 20 K of the engine and the drop across the core is 15 K or less (common practice).',
      tools: ['IR thermometer'],
      hazards: ['hot-pressurised-coolant', 'fan', 'hot-surface'],
      cautions: [cautions.keepClosedWhenHot, cautions.fan, cautions.hotSurface],
      estimatedMinutes: 10,
      inputs: [
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
          when: 'retestDrop <= 15 and retestFeedTemp >= engineTempHot - 20 K',
          to: 'air-in-heater-loop',
          label: 'Bleeding restored the flow',
        },
      ],
      fallback: { to: 'heater-core-restricted', label: 'Still little flow through the core' },
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
    },
    'thermostat-stuck-open': {
      kind: 'outcome',
      title: 'Thermostat stuck open',
      rootCause:
        'The thermostat lets coolant through the radiator before the engine is warm, so the engine warms slowly, may never reach its normal temperature, and the heater stays lukewarm.',
      correction: 'Fit a new thermostat (and seal) of the maker’s specification, refill and bleed.',
      parts: [
        { description: 'Thermostat with seal', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 2 },
      ],
      labour: [{ operation: 'Replace thermostat, refill and bleed', hours: 1.2 }],
      followUps: [followUps.purgeAndRecheck, followUps.leakCheckAfterDrive, followUps.tellAdvisor],
    },
    'shroud-never-deploys': {
      kind: 'outcome',
      title: 'Switchable pump shroud never closes',
      rootCause:
        'The switchable pump’s shroud stays back, so coolant circulates from the start and the engine warms more slowly. This costs warm-up time and heat but does not overheat the engine.',
      correction:
        'Test the pump’s control valve and its wiring as the maker describes; repair the circuit, or replace the valve or pump as found.',
      parts: [
        { description: 'Pump control valve, or switchable coolant pump, as found', quantity: 1 },
      ],
      labour: [{ operation: 'Test pump control and replace as found', hours: 1.5 }],
      followUps: [followUps.purgeAndRecheck, followUps.labelTimingCover, followUps.tellAdvisor],
      hazards: ['belt-drive'],
      cautions: [cautions.beltDrive],
    },
    'heater-pump-failed': {
      kind: 'outcome',
      title: 'Heater pump failed',
      rootCause:
        'The heater loop’s electric pump gets its supply but does not run, so little hot coolant reaches the heater core.',
      correction: 'Replace the heater pump, refill and bleed the heater loop.',
      parts: [
        { description: 'Electric heater pump', quantity: 1 },
        { description: 'Coolant to the maker’s specification (litres)', quantity: 1 },
      ],
      labour: [{ operation: 'Replace heater pump and bleed', hours: 1 }],
      followUps: [followUps.purgeAndRecheck, followUps.tellAdvisor],
    },
    'heater-pump-circuit-fault': {
      kind: 'outcome',
      title: 'Heater pump not supplied',
      rootCause:
        'The heater loop’s electric pump gets no supply or ground when it is commanded, so it never runs.',
      correction:
        'Trace the supply, ground and control of the pump with the maker’s wiring diagram and repair the fault (fuse, relay, connector, wiring or control).',
      labour: [{ operation: 'Diagnose and repair heater pump circuit', hours: 1 }],
      followUps: [followUps.tellAdvisor],
    },
    'air-in-heater-loop': {
      kind: 'outcome',
      title: 'Air trapped in the heater loop',
      rootCause:
        'An air pocket in the heater loop stopped coolant flowing through the heater core; bleeding restored it.',
      correction: 'Bleeding done; check the refill procedure was followed.',
      parts: [{ description: 'Coolant to the maker’s specification (litres)', quantity: 1 }],
      labour: [{ operation: 'Bleed heater loop', hours: 0.6 }],
      followUps: [followUps.purgeAndRecheck, followUps.tellAdvisor],
    },
    'heater-core-restricted': {
      kind: 'outcome',
      title: 'Heater core restricted',
      rootCause:
        'Hot coolant reaches the heater but cannot flow well through the core, which is partly blocked.',
      correction:
        'Back-flush the heater core where the maker allows, or replace it; check the coolant’s condition and flush the system if it is contaminated.',
      parts: [{ description: 'Heater core, if flushing does not restore flow', quantity: 1 }],
      labour: [{ operation: 'Flush or replace heater core', hours: 2 }],
      followUps: [followUps.purgeAndRecheck, followUps.leakCheckAfterDrive, followUps.tellAdvisor],
    },
    'heat-reaches-core': {
      kind: 'outcome',
      title: 'Hot coolant reaches the heater core',
      rootCause:
        'The engine and the heater core get hot as they should, so the cooling system is not the cause: the lost heat is on the air side (blend flap, its actuator, or the climate controls).',
      correction:
        'Check the blend flap, its actuator and the climate control as the maker describes.',
      labour: [{ operation: 'Diagnose heater air distribution', hours: 1 }],
      followUps: [followUps.tellAdvisor],
    },
  },
} satisfies TreeDefinitionInput;
