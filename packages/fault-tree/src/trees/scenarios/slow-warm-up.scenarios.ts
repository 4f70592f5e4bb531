// Scenario bank for the shipped tree "slow-warm-up-little-heat": each scenario is a car a technician could meet,
// with one true fault (or a healthy part that must not be blamed) and the answers given at each
// step. scenario-bank.test.ts walks every one through the compiled tree.
//
// The small helpers below only spell the answers of the steps most walks share (the cold checks,
// the warm-up log, the hose readings); each scenario lists its steps in the order the walk asks.
// All cars, makes and readings are invented; the readings are what such a car would give.
import type { ScenarioAnswer, ScenarioReading } from './scenario.js';
import { scenarioBank } from './scenario.js';

type Answers = Record<string, ScenarioAnswer>;

const degC = (value: number): ScenarioReading => [value, 'degC'];

/** No coolant work lately; the level was about right (litres added to reach MAX). */
const quietStart = (topUpLitres = 0.1): Answers => ({
  'interview-recent-work': 'no-recent-work',
  'level-cold': { topUpLitres: [topUpLitres, 'L'] },
});

/** Engine cold after standing: live data at key-on and the air where the car stood. */
const coldCheck = (keyOnLive: number, air: number): Answers => ({
  'cold-sensor-check': { keyOnLiveTemp: degC(keyOnLive), standingAirTemp: degC(air) },
});

/** The warm-up log: minutes to 80 °C (60 if never), settled temperature, ambient. */
const warmUp = (minutesTo80: number, settled: number, ambient: number): Answers => ({
  'warm-up-log': {
    minutesTo80: [minutesTo80, 'min'],
    settledTemp: degC(settled),
    ambientTemp: degC(ambient),
  },
});

/** Live data and a contact probe on the sensor housing, same moment, 60–75 °C on live data. */
const sensorCheck = (live: number, housing: number): Answers => ({
  'sensor-plausibility': {
    plausibilityLiveTemp: degC(live),
    plausibilityHousingTemp: degC(housing),
  },
});

/** The radiator inlet hose at that same moment. */
const inletHose = (inlet: number): Answers => ({
  'thermostat-early-flow': { warmupInletTemp: degC(inlet) },
});

/** Release test readings: hold start, three minutes later, three minutes after the release. */
const releaseTest = (start: number, held: number, released: number): Answers => ({
  'shroud-actuation-test': 'done',
  'shroud-actuation-result': {
    heldStartTemp: degC(start),
    heldEndTemp: degC(held),
    releasedEndTemp: degC(released),
  },
});

/** IR on the engine outlet hose and both heater hoses, same moment, engine fully warm. */
const heaterHoses = (outlet: number, feed: number, ret: number): Answers => ({
  'heater-hoses': {
    engineOutletTemp: degC(outlet),
    heaterFeedTemp: degC(feed),
    heaterReturnTemp: degC(ret),
  },
});

const valveTemps = (engineSide: number, heaterSide: number): Answers => ({
  'heater-valve-temps': {
    valveEngineSideTemp: degC(engineSide),
    valveHeaterSideTemp: degC(heaterSide),
  },
});

/** Bleed the heater loop, then the same three hoses again. */
const bleedAndRetest = (outlet: number, feed: number, ret: number): Answers => ({
  'heater-loop-bleed': 'done',
  'heater-retest': {
    retestOutletTemp: degC(outlet),
    retestFeedTemp: degC(feed),
    retestReturnTemp: degC(ret),
  },
});

/** Flow test: litres in one minute through the core and through the hose alone. */
const flowTest = (core: number, hose: number): Answers => ({
  'heater-flow-test': 'done',
  'heater-flow-result': { coreFlowLitres: [core, 'L'], hoseFlowLitres: [hose, 'L'] },
});

/** A car that warms up normally in mild weather, sensor right when cold. */
const warmsNormally = (settled = 90): Answers => ({
  ...quietStart(),
  ...coldCheck(11, 10),
  ...warmUp(12, settled, 12),
});

export const slowWarmUpScenarios = scenarioBank({
  treeId: 'slow-warm-up-little-heat',
  confirmations: {
    // A heater core is blamed only after a flow test through it.
    'heater-core-restricted': ['heater-flow-result'],
    // A switchable pump (or its valve) only after the valve circuit is known good or could not
    // be read, and a release test has shown the shroud never holds.
    'shroud-never-deploys': ['shroud-actuation-result'],
  },
  scenarios: [
    // ── Coolant level too low ─────────────────────────────────────────────────────────────────
    {
      name: 'Heater cold at idle, 1.6 L missing',
      story:
        'A 2014 Corvane 1.4 petrol estate; the driver says the heater goes cold at traffic lights. Nobody has touched the coolant. Cold, the tank takes 1.6 L to reach MAX: the heater core, high up, runs dry.',
      expect: 'low-coolant-level',
      mustNotReach: ['heater-core-restricted', 'heater-pump-failed'],
      answers: { ...quietStart(1.6) },
    },
    {
      name: 'Two quarts low from a weeping hose clamp',
      story:
        'A 2011 Haldor 2.0 diesel saloon with lukewarm heat for a month. The tank takes two US quarts cold; a crusty clamp at the heater return hose is the loss.',
      expect: 'low-coolant-level',
      answers: {
        'interview-recent-work': 'no-recent-work',
        'level-cold': { topUpLitres: [2, 'qt'] },
      },
    },
    {
      name: 'After a radiator swap, no bleeding possible, 1.5 L missing',
      story:
        'A 2017 Mirel 1.2 turbo hatchback; cold heater since another garage fitted a radiator. The workshop has no vacuum filler for it, so the bleed is skipped; cold, the tank takes 1.5 L: the refill was never finished.',
      expect: 'low-coolant-level',
      answers: {
        'interview-recent-work': 'after-coolant-work',
        'refill-bleed': 'could-not-do',
        'level-cold': { topUpLitres: [1.5, 'L'] },
      },
    },

    // ── Air in the heater loop ────────────────────────────────────────────────────────────────
    {
      name: 'Cold heater since a thermostat change: bleeding cures it',
      story:
        'A 2013 Teskar 1.6 petrol MPV had its thermostat replaced last week elsewhere; since then the heater blows cold at idle. Bled as the maker describes and driven to full temperature, the heat is back.',
      expect: 'air-in-heater-loop',
      mustNotReach: ['heater-core-restricted', 'thermostat-stuck-open'],
      answers: {
        'interview-recent-work': 'after-coolant-work',
        'refill-bleed': 'done',
        'refill-bleed-result': 'now-normal',
      },
    },
    {
      name: 'Lukewarm heat after a timing-belt and pump job',
      story:
        'A 2012 Bravik 2.0 diesel estate had its timing belt and coolant pump renewed; the heater is lukewarm since. The vacuum-filled system held an air pocket at the heater; after bleeding and a drive the heat is normal.',
      expect: 'air-in-heater-loop',
      mustNotReach: ['heater-core-restricted'],
      answers: {
        'interview-recent-work': 'after-coolant-work',
        'refill-bleed': 'done',
        'refill-bleed-result': 'now-normal',
      },
    },
    {
      name: 'Second-hand car, no history: large drop across the core that bleeding cures',
      story:
        'A 2010 Olvana 1.8 petrol saloon bought a month ago with no history; the heater is weak. It warms normally; the feed hose is hot but the return 30 K cooler. No electric heater pump. Bleeding the heater loop restores the flow.',
      expect: 'air-in-heater-loop',
      mustNotReach: ['heater-core-restricted'],
      answers: {
        ...warmsNormally(),
        ...heaterHoses(92, 88, 58),
        'heater-pump-check': 'no-electric-pump',
        ...bleedAndRetest(92, 89, 80),
      },
    },
    {
      name: 'Electric heater pump runs but the loop is air-bound',
      story:
        'A 2016 Quenby 1.5 petrol hatchback with an electric heater pump; heat only when driving. The pump runs; the heater hoses show a 27 K drop. Bled with the scan tool’s pump routine, the drop falls to 8 K.',
      expect: 'air-in-heater-loop',
      mustNotReach: ['heater-core-restricted', 'heater-pump-failed'],
      answers: {
        ...warmsNormally(),
        ...heaterHoses(95, 90, 63),
        'heater-pump-check': 'runs',
        ...bleedAndRetest(95, 91, 83),
      },
    },

    // ── Temperature sensor reads low ─────────────────────────────────────────────────────────
    {
      name: 'Issue 13 item 9: live data 65 °C with the inlet hose at 85 °C',
      story:
        'A 2015 Corvane 1.6 diesel estate; the gauge sits low and live data never passes 71 °C, but the heater is hot. The inlet hose reads 85 °C when live data says 65 °C: that is a sensor reading low, not a thermostat stuck open. The contact probe on the housing reads 88 °C.',
      expect: 'sensor-reads-low',
      mustNotReach: ['thermostat-stuck-open'],
      answers: {
        ...quietStart(),
        ...coldCheck(8, 9),
        ...warmUp(60, 71, 8),
        ...sensorCheck(65, 88),
      },
    },
    {
      name: 'Corroded sensor connector reads low cold and warm',
      story:
        'A 2009 Haldor 1.4 petrol hatchback that runs rich and shows a slow gauge. Cold it reads −2 °C in a 6 °C yard; warm, 70 °C in live data against 76 °C on the probe. Green corrosion in the sensor connector adds resistance.',
      expect: 'sensor-reads-low',
      mustNotReach: ['thermostat-stuck-open', 'shroud-never-deploys'],
      answers: {
        ...quietStart(),
        ...coldCheck(-2, 6),
        ...warmUp(34, 83, 6),
        ...sensorCheck(70, 76),
      },
    },
    {
      name: 'Drifted sensor makes a normal warm-up look slow',
      story:
        'A 2018 Mirel 1.0 turbo hatchback; the customer says the gauge takes half an hour to move. Live data takes 35 minutes to 80 °C and settles at 82 °C, yet the probe on the housing reads 74 °C when live data shows 62 °C. The sensor has drifted; the thermostat is fine.',
      expect: 'sensor-reads-low',
      mustNotReach: ['thermostat-stuck-open', 'shroud-never-deploys'],
      answers: {
        ...quietStart(),
        ...coldCheck(12, 13),
        ...warmUp(35, 82, 13),
        ...sensorCheck(62, 74),
      },
    },

    // ── Thermostat stuck open ─────────────────────────────────────────────────────────────────
    {
      name: 'Plain thermostat stuck open, engine settles at 72 °C',
      story:
        'A 2008 Teskar 1.9 diesel van; the heater is lukewarm and fuel use is up. It never passes 72 °C on the road. Sensor and probe agree at 65–66 °C, and the radiator inlet hose is already 58 °C: coolant goes through the radiator from cold.',
      expect: 'thermostat-stuck-open',
      mustNotReach: ['sensor-reads-low'],
      answers: {
        ...quietStart(),
        ...coldCheck(9, 10),
        ...warmUp(60, 72, 10),
        ...sensorCheck(65, 66),
        ...inletHose(58),
        'thermostat-kind': 'conventional',
      },
    },
    {
      name: 'Wrong thermostat fitted: opens at about 71 °C',
      story:
        'A 2012 Bravik 1.6 petrol saloon had a cheap thermostat fitted last year; it warms slowly and settles at 78 °C. At 74 °C on live data (75 °C probe) the inlet hose is 66 °C: it opens far too early.',
      expect: 'thermostat-stuck-open',
      answers: {
        ...quietStart(),
        ...coldCheck(14, 14),
        ...warmUp(60, 78, 14),
        ...sensorCheck(74, 75),
        ...inletHose(66),
        'thermostat-kind': 'conventional',
      },
    },
    {
      name: 'Map-controlled thermostat stuck open mechanically',
      story:
        'A 2016 Olvana 2.0 petrol estate with a map-controlled thermostat; 32 minutes to 80 °C and it settles at 84 °C instead of 100–105 °C. The inlet hose is already 62 °C with the engine at 71 °C; the heating element is not powered while cold. The wax element itself is stuck open.',
      expect: 'thermostat-stuck-open',
      mustNotReach: ['thermostat-heater-always-on'],
      answers: {
        ...quietStart(),
        ...coldCheck(11, 10),
        ...warmUp(32, 84, 10),
        ...sensorCheck(70, 71),
        ...inletHose(62),
        'thermostat-kind': 'map-controlled',
        'thermostat-heater-command': 'not-powered',
      },
    },
    {
      name: 'Map-controlled thermostat open early, element circuit not checkable',
      story:
        'A 2014 Quenby 1.8 petrol saloon with a map-controlled thermostat settles at 79 °C. The radiator warms with the engine; the technician has no wiring diagram for the element today. The finding tells him to check the element’s circuit when the new thermostat goes in.',
      expect: 'thermostat-stuck-open',
      answers: {
        ...quietStart(),
        ...coldCheck(15, 16),
        ...warmUp(60, 79, 16),
        ...sensorCheck(68, 70),
        ...inletHose(61),
        'thermostat-kind': 'map-controlled',
        'thermostat-heater-command': 'not-checked',
      },
    },

    // ── Thermostat heating element powered while cold ─────────────────────────────────────────
    {
      name: 'Chafed loom feeds the thermostat element all the time',
      story:
        'A 2015 Corvane 2.0 petrol estate with a map-controlled thermostat warms slowly and settles at 82 °C. The element has 12 V whenever the ignition is on: its control wire has chafed against a bracket and shorts to a supply. The thermostat is good.',
      expect: 'thermostat-heater-always-on',
      mustNotReach: ['thermostat-stuck-open'],
      answers: {
        ...quietStart(),
        ...coldCheck(7, 8),
        ...warmUp(38, 82, 8),
        ...sensorCheck(68, 69),
        ...inletHose(60),
        'thermostat-kind': 'map-controlled',
        'thermostat-heater-command': 'powered-cold',
      },
    },
    {
      name: 'Element powered cold after front-end repair',
      story:
        'A 2017 Haldor 1.8 petrol saloon, slow to warm since crash repairs at the front. Two connectors were swapped on refitting, so the thermostat element is fed with a permanent supply.',
      expect: 'thermostat-heater-always-on',
      mustNotReach: ['thermostat-stuck-open'],
      answers: {
        ...quietStart(),
        ...coldCheck(12, 12),
        ...warmUp(29, 85, 12),
        ...sensorCheck(71, 72),
        ...inletHose(64),
        'thermostat-kind': 'map-controlled',
        'thermostat-heater-command': 'powered-cold',
      },
    },
    {
      name: 'Engine computer holds the thermostat element on',
      story:
        'A 2016 Teskar 2.0 diesel estate never reaches its usual 100 °C and settles at 78 °C. Live data shows the thermostat element commanded on at idle with the engine cold; a stored code and a maker’s software update explain it.',
      expect: 'thermostat-heater-always-on',
      answers: {
        ...quietStart(),
        ...coldCheck(4, 5),
        ...warmUp(60, 78, 5),
        ...sensorCheck(66, 67),
        ...inletHose(57),
        'thermostat-kind': 'map-controlled',
        'thermostat-heater-command': 'powered-cold',
      },
    },

    // ── Switchable pump: control valve not energised ──────────────────────────────────────────
    {
      name: 'Blown fuse: the pump’s control valve never energised',
      story:
        'A 2018 Mirel 1.4 turbo estate with a switchable pump takes 28 minutes to warm in mild weather but never overheats. The engine computer commands the valve, but its fuse has blown: no supply at the connector.',
      expect: 'shroud-valve-circuit-fault',
      mustNotReach: ['shroud-never-deploys'],
      answers: {
        ...quietStart(),
        ...coldCheck(13, 12),
        ...warmUp(28, 90, 12),
        ...sensorCheck(66, 67),
        ...inletHose(30),
        'pump-has-shroud': 'switchable',
        'shroud-valve-check': 'commanded-not-reaching',
      },
    },
    {
      name: 'Corroded valve connector after an engine wash',
      story:
        'A 2017 Corvane 1.4 petrol hatchback, slow to warm since an engine bay wash. The valve is commanded but the switched ground never reaches it through a corroded connector pin.',
      expect: 'shroud-valve-circuit-fault',
      mustNotReach: ['shroud-never-deploys'],
      answers: {
        ...quietStart(),
        ...coldCheck(9, 9),
        ...warmUp(26, 89, 9),
        ...sensorCheck(63, 64),
        ...inletHose(27),
        'pump-has-shroud': 'switchable',
        'shroud-valve-check': 'commanded-not-reaching',
      },
    },
    {
      name: 'Gnawed wire to the pump’s control valve',
      story:
        'A 2019 Bravik 1.5 petrol saloon parked near fields; a marten has bitten through the valve’s supply wire. Slow warm-up, no overheating, no other symptom.',
      expect: 'shroud-valve-circuit-fault',
      answers: {
        ...quietStart(),
        ...coldCheck(6, 7),
        ...warmUp(31, 88, 7),
        ...sensorCheck(67, 68),
        ...inletHose(26),
        'pump-has-shroud': 'switchable',
        'shroud-valve-check': 'commanded-not-reaching',
      },
    },

    // ── Switchable pump shroud never closes ───────────────────────────────────────────────────
    {
      name: 'Shroud stuck back: warms 13 K in five minutes yet never holds',
      story:
        'A 2016 Olvana 1.4 turbo estate with a switchable pump; slow warm-up, never hot. The old test (“well over 10 K in five minutes”) would have passed it: it rises 8 K in three minutes while “held”, and another 8 K after the release. Valve commanded and supplied; the shroud is stuck back.',
      expect: 'shroud-never-deploys',
      answers: {
        ...quietStart(),
        ...coldCheck(10, 10),
        ...warmUp(27, 90, 10),
        ...sensorCheck(65, 66),
        ...inletHose(28),
        'pump-has-shroud': 'switchable',
        'shroud-valve-check': 'commanded-and-powered',
        ...releaseTest(30, 38, 46),
      },
    },
    {
      name: 'Leaking valve seat: powered and clicking, but the pressure bleeds away',
      story:
        'A 2015 Quenby 1.2 turbo hatchback with a switchable pump; 30 minutes to warm in mild weather. The valve is commanded, supplied and clicks, but its seat leaks so the shroud is never pushed out: the release test shows the same 5 K per three minutes before and after.',
      expect: 'shroud-never-deploys',
      mustNotReach: ['shroud-valve-circuit-fault'],
      answers: {
        ...quietStart(),
        ...coldCheck(8, 8),
        ...warmUp(30, 89, 8),
        ...sensorCheck(64, 65),
        ...inletHose(25),
        'pump-has-shroud': 'switchable',
        'shroud-valve-check': 'commanded-and-powered',
        ...releaseTest(34, 39, 44),
      },
    },
    {
      name: 'Valve coil open: powered but never switches',
      story:
        'A 2017 Corvane 1.4 turbo saloon; supply and switched ground reach the valve, but its coil is open inside. The release test shows no change; the finding tests the valve before the pump, and the valve is what gets replaced.',
      expect: 'shroud-never-deploys',
      answers: {
        ...quietStart(),
        ...coldCheck(12, 11),
        ...warmUp(25, 91, 11),
        ...sensorCheck(66, 66),
        ...inletHose(29),
        'pump-has-shroud': 'switchable',
        'shroud-valve-check': 'commanded-and-powered',
        ...releaseTest(36, 42, 47),
      },
    },

    // ── Heater valve stuck closed ─────────────────────────────────────────────────────────────
    {
      name: 'Heater valve stuck shut: engine warm, cabin cold',
      story:
        'A 2014 Haldor 2.0 diesel saloon; the gauge is normal in 12 minutes but the heater blows cold. The feed hose is hot up to the heater valve and 48 K cooler beyond it; commanded open, it stays shut. The heater core is fine.',
      expect: 'heater-valve-stuck-closed',
      mustNotReach: ['heater-core-restricted'],
      answers: {
        ...warmsNormally(),
        ...heaterHoses(91, 45, 40),
        'heater-valve-present': 'has-valve',
        ...valveTemps(90, 42),
        'heater-valve-check': 'stays-closed',
      },
    },
    {
      name: 'Map-controlled engine at 104 °C, heater valve seized',
      story:
        'A 2018 Teskar 2.0 petrol estate runs at 104 °C at part load as its map-controlled thermostat intends; the cabin stays cold. The valve, normally open, stays shut even unplugged: scale has seized it.',
      expect: 'heater-valve-stuck-closed',
      mustNotReach: ['heater-core-restricted', 'thermostat-stuck-open'],
      answers: {
        ...warmsNormally(104),
        ...heaterHoses(103, 50, 44),
        'heater-valve-present': 'has-valve',
        ...valveTemps(102, 48),
        'heater-valve-check': 'stays-closed',
      },
    },
    {
      name: 'Winter morning: valve stuck, warm-up long but normal for −5 °C',
      story:
        'A 2013 Bravik 1.6 diesel estate in a −5 °C week takes 24 minutes to reach 80 °C, which is normal in that cold; the heater never warms. The heater valve stays closed on command.',
      expect: 'heater-valve-stuck-closed',
      mustNotReach: ['thermostat-stuck-open', 'heater-core-restricted'],
      answers: {
        ...quietStart(),
        ...coldCheck(-6, -5),
        ...warmUp(24, 88, -5),
        ...heaterHoses(88, 30, 25),
        'heater-valve-present': 'has-valve',
        ...valveTemps(87, 28),
        'heater-valve-check': 'stays-closed',
      },
    },

    // ── Heater valve held closed by its control ───────────────────────────────────────────────
    {
      name: 'Climate panel keeps the heater valve shut',
      story:
        'A 2015 Mirel 1.6 petrol MPV; cold cabin, normal engine. The valve opens at once when unplugged, so it works: the climate control panel keeps it powered shut.',
      expect: 'heater-valve-control-fault',
      mustNotReach: ['heater-valve-stuck-closed', 'heater-core-restricted'],
      answers: {
        ...warmsNormally(),
        ...heaterHoses(90, 40, 36),
        'heater-valve-present': 'has-valve',
        ...valveTemps(89, 38),
        'heater-valve-check': 'opens-on-test',
      },
    },
    {
      name: 'Valve wire shorted to ground in the loom',
      story:
        'A 2012 Olvana 2.2 diesel saloon; a loom under the battery tray has a chafed wire that grounds the heater valve’s control, so the valve is held closed. On test it opens and shuts cleanly.',
      expect: 'heater-valve-control-fault',
      mustNotReach: ['heater-valve-stuck-closed'],
      answers: {
        ...warmsNormally(),
        ...heaterHoses(92, 52, 47),
        'heater-valve-present': 'has-valve',
        ...valveTemps(91, 50),
        'heater-valve-check': 'opens-on-test',
      },
    },
    {
      name: 'Climate control lost its settings after a battery change',
      story:
        'A 2019 Quenby 1.5 petrol hatchback; since a new battery the cabin stays cold. The climate control needs its learning run and commands the valve shut meanwhile; the valve opens on the output test.',
      expect: 'heater-valve-control-fault',
      answers: {
        ...warmsNormally(),
        ...heaterHoses(91, 47, 43),
        'heater-valve-present': 'has-valve',
        ...valveTemps(90, 44),
        'heater-valve-check': 'opens-on-test',
      },
    },

    // ── Heater pump failed ────────────────────────────────────────────────────────────────────
    {
      name: 'Heater pump seized with supply, ground and command present',
      story:
        'A 2016 Corvane 2.0 diesel estate with an electric heater pump and no heater valve; lukewarm cabin. The pump is silent on the output test although supply, ground and its command signal are all at the connector.',
      expect: 'heater-pump-failed',
      answers: {
        ...warmsNormally(),
        ...heaterHoses(92, 60, 52),
        'heater-valve-present': 'no-valve',
        'heater-pump-check': 'does-not-run',
        'heater-pump-supply': 'supply-present',
        'heater-pump-command': 'command-present',
      },
    },
    {
      name: 'Two-wire heater pump with worn brushes',
      story:
        'A 2011 Teskar 1.6 petrol van with a relay-switched two-wire heater pump. Supply and ground are there under load, the pump does not turn: worn brushes.',
      expect: 'heater-pump-failed',
      answers: {
        ...warmsNormally(),
        ...heaterHoses(89, 58, 50),
        'heater-valve-present': 'no-valve',
        'heater-pump-check': 'does-not-run',
        'heater-pump-supply': 'supply-present',
        'heater-pump-command': 'two-wire-pump',
      },
    },
    {
      name: 'Heater pump jammed by debris, large drop across the core',
      story:
        'A 2014 Haldor 1.8 petrol saloon; the feed hose is warm but the return 25 K cooler, and the electric pump does not run. Supply, ground and command are present; the impeller is jammed by debris.',
      expect: 'heater-pump-failed',
      answers: {
        ...warmsNormally(),
        ...heaterHoses(91, 76, 51),
        'heater-pump-check': 'does-not-run',
        'heater-pump-supply': 'supply-present',
        'heater-pump-command': 'command-present',
      },
    },

    // ── Heater pump not supplied or not commanded ─────────────────────────────────────────────
    {
      name: 'Heater pump fuse blown',
      story:
        'A 2017 Bravik 2.0 diesel estate; cold cabin at idle. The electric heater pump does not run and has no supply: its fuse has blown.',
      expect: 'heater-pump-circuit-fault',
      mustNotReach: ['heater-pump-failed'],
      answers: {
        ...warmsNormally(),
        ...heaterHoses(90, 57, 50),
        'heater-valve-present': 'no-valve',
        'heater-pump-check': 'does-not-run',
        'heater-pump-supply': 'supply-missing',
      },
    },
    {
      name: 'Issue 13: supply and ground present, but no command signal',
      story:
        'A 2018 Olvana 2.0 petrol estate whose heater pump needs a pulsed command from the engine computer. Supply and ground are there, so the old tree called the pump failed; the command wire is broken at a connector, and the pump runs once it is repaired.',
      expect: 'heater-pump-circuit-fault',
      mustNotReach: ['heater-pump-failed'],
      answers: {
        ...warmsNormally(),
        ...heaterHoses(93, 61, 54),
        'heater-valve-present': 'no-valve',
        'heater-pump-check': 'does-not-run',
        'heater-pump-supply': 'supply-present',
        'heater-pump-command': 'no-command',
      },
    },
    {
      name: 'Heater pump relay never closes',
      story:
        'A 2013 Mirel 1.6 diesel MPV; the heater pump relay clicks but its contacts are burnt, so no supply reaches the pump.',
      expect: 'heater-pump-circuit-fault',
      mustNotReach: ['heater-pump-failed'],
      answers: {
        ...warmsNormally(),
        ...heaterHoses(88, 55, 49),
        'heater-valve-present': 'no-valve',
        'heater-pump-check': 'does-not-run',
        'heater-pump-supply': 'supply-missing',
      },
    },

    // ── Heater core restricted ────────────────────────────────────────────────────────────────
    {
      name: 'Sludged heater core on a neglected car',
      story:
        'A 2007 Teskar 2.0 petrol saloon whose coolant was never changed; brown sludge in the tank. Feed hot, return 34 K cooler, and bleeding changes nothing. Through the core the tap gives 3 L a minute against 12 L through the hose alone.',
      expect: 'heater-core-restricted',
      answers: {
        ...warmsNormally(),
        ...heaterHoses(90, 86, 52),
        'heater-pump-check': 'no-electric-pump',
        ...bleedAndRetest(90, 87, 55),
        ...flowTest(3, 12),
      },
    },
    {
      name: 'Stop-leak additive blocked the heater core',
      story:
        'A 2010 Quenby 1.4 petrol hatchback; a previous owner poured in a stop-leak. The electric pump runs, bleeding does not help, and the core passes 2.5 L a minute against 13 L.',
      expect: 'heater-core-restricted',
      answers: {
        ...warmsNormally(),
        ...heaterHoses(91, 85, 55),
        'heater-pump-check': 'runs',
        ...bleedAndRetest(91, 86, 57),
        ...flowTest(2.5, 13),
      },
    },
    {
      name: 'Mixed coolants gelled in the heater core',
      story:
        'A 2012 Corvane 1.6 diesel estate topped up with an incompatible coolant for years. Little hot coolant even reaches the heater; no valve, the pump runs, bleeding does not help, and the flow test gives 4 L against 14 L.',
      expect: 'heater-core-restricted',
      answers: {
        ...warmsNormally(),
        ...heaterHoses(92, 62, 50),
        'heater-valve-present': 'no-valve',
        'heater-pump-check': 'runs',
        ...bleedAndRetest(92, 64, 52),
        ...flowTest(4, 14),
      },
    },

    // ── Heat reaches the heater: the air side ─────────────────────────────────────────────────
    {
      name: 'Broken blend-flap actuator',
      story:
        'A 2015 Haldor 1.6 petrol hatchback; the cabin gets only cool air. Engine and heater hoses are hot with a normal 8 K drop; the blend-flap actuator has a stripped gear.',
      expect: 'heat-reaches-core',
      mustNotReach: ['heater-core-restricted', 'thermostat-stuck-open'],
      answers: { ...warmsNormally(), ...heaterHoses(92, 88, 80) },
    },
    {
      name: 'Healthy map-controlled engine at 106 °C, cool radiator inlet is normal',
      story:
        'A 2019 Teskar 2.0 petrol estate with a map-controlled thermostat runs at 106 °C at part load; the customer thinks the heat is weak. Warm-up is quick, the heater hoses are hot with a 9 K drop: the cooling system is fine; the cabin filter is clogged.',
      expect: 'heat-reaches-core',
      mustNotReach: ['thermostat-stuck-open', 'sensor-reads-low', 'heater-core-restricted'],
      answers: {
        ...quietStart(),
        ...coldCheck(15, 14),
        ...warmUp(9, 106, 14),
        ...heaterHoses(105, 99, 90),
      },
    },
    {
      name: 'Working switchable pump on short winter trips',
      story:
        'A 2017 Mirel 1.4 turbo estate used for 3 km school runs at 3 °C; the owner says it is slow to warm. Sensor true, thermostat shut while warming, the valve commanded and supplied, and the release test shows the rise stalling when released: the shroud works. Heater hoses are normal: the slow warm-up is the driving, not a fault.',
      expect: 'heat-reaches-core',
      mustNotReach: ['shroud-never-deploys', 'shroud-valve-circuit-fault', 'thermostat-stuck-open'],
      answers: {
        ...quietStart(),
        ...coldCheck(3, 3),
        ...warmUp(24, 90, 3),
        ...sensorCheck(67, 68),
        ...inletHose(32),
        'pump-has-shroud': 'switchable',
        'shroud-valve-check': 'commanded-and-powered',
        ...releaseTest(35, 49, 47),
        ...heaterHoses(91, 87, 80),
      },
    },
    {
      name: 'Idling diesel in cold weather: healthy thermostat and sensor',
      story:
        'A 2014 Bravik 1.6 diesel van that idles for long spells on deliveries at 2 °C; slow to warm. The sensor agrees with the probe, the radiator inlet stays at 24 °C while the engine is at 68 °C, and the heater hoses are normal.',
      expect: 'heat-reaches-core',
      mustNotReach: ['thermostat-stuck-open', 'sensor-reads-low'],
      answers: {
        ...quietStart(),
        ...coldCheck(2, 2),
        ...warmUp(26, 86, 2),
        ...sensorCheck(68, 67),
        ...inletHose(24),
        'pump-has-shroud': 'conventional',
        ...heaterHoses(86, 81, 73),
      },
    },

    // ── Needs further checks ──────────────────────────────────────────────────────────────────
    {
      name: 'Issue 13: heater loop could not be bled — no heater core on no evidence',
      story:
        'A 2016 Olvana 1.6 petrol MPV with a large drop across the heater core. The maker’s bleed needs a scan-tool pump routine the workshop lacks, so the bleed could not be done. Nothing yet shows a restricted core.',
      expect: 'needs-further-checks',
      mustNotReach: ['heater-core-restricted'],
      answers: {
        ...warmsNormally(),
        ...heaterHoses(92, 87, 60),
        'heater-pump-check': 'runs',
        'heater-loop-bleed': 'could-not-do',
      },
    },
    {
      name: 'Switchable pump valve never commanded by the engine computer',
      story:
        'A 2018 Quenby 1.4 turbo saloon; slow warm-up. The engine computer never commands the pump’s valve during a cold warm-up; the enabling conditions and software need the maker’s information before any part is replaced.',
      expect: 'needs-further-checks',
      mustNotReach: ['shroud-never-deploys', 'shroud-valve-circuit-fault'],
      answers: {
        ...quietStart(),
        ...coldCheck(10, 11),
        ...warmUp(29, 90, 11),
        ...sensorCheck(64, 65),
        ...inletHose(27),
        'pump-has-shroud': 'switchable',
        'shroud-valve-check': 'not-commanded',
      },
    },
    {
      name: 'Valve circuit could not be checked: no release test, no pump',
      story:
        'A 2016 Corvane 1.4 turbo estate with a switchable pump, slow to warm. The scan tool shows no valve command and there is no wiring diagram for the valve today. A release test now could not tell a stuck shroud from a valve never switched, so the walk stops short of the pump.',
      expect: 'needs-further-checks',
      mustNotReach: ['shroud-never-deploys'],
      answers: {
        ...quietStart(),
        ...coldCheck(11, 10),
        ...warmUp(28, 90, 10),
        ...sensorCheck(66, 67),
        ...inletHose(27),
        'pump-has-shroud': 'switchable',
        'shroud-valve-check': 'could-not-check',
      },
    },
    {
      name: 'Release test not possible: no pump removal on a guess',
      story:
        'A 2015 Corvane 1.4 turbo hatchback with a switchable pump; slow warm-up. The valve is commanded and supplied, but the car cannot be left to cool for the release test today. No pump job on that evidence.',
      expect: 'needs-further-checks',
      mustNotReach: ['shroud-never-deploys'],
      answers: {
        ...quietStart(),
        ...coldCheck(9, 9),
        ...warmUp(27, 89, 9),
        ...sensorCheck(65, 65),
        ...inletHose(26),
        'pump-has-shroud': 'switchable',
        'shroud-valve-check': 'commanded-and-powered',
        'shroud-actuation-test': 'could-not-do',
      },
    },
    {
      name: 'Heater pump command could not be checked',
      story:
        'A 2019 Haldor 2.0 diesel estate; the heater pump has supply and ground but does not run, and the workshop has no diagram for its bus-commanded control. Not yet a failed pump.',
      expect: 'needs-further-checks',
      mustNotReach: ['heater-pump-failed'],
      answers: {
        ...warmsNormally(),
        ...heaterHoses(90, 58, 51),
        'heater-valve-present': 'no-valve',
        'heater-pump-check': 'does-not-run',
        'heater-pump-supply': 'supply-present',
        'heater-pump-command': 'could-not-check',
      },
    },
    {
      name: 'Heater core flows freely on the flow test',
      story:
        'A 2013 Teskar 1.4 petrol hatchback; large drop across the core even after bleeding, but the core passes 11 L a minute against 12 L through the hose. The core is clear; the cause lies elsewhere (a kinked hose, a weak main pump) and needs more checks.',
      expect: 'needs-further-checks',
      mustNotReach: ['heater-core-restricted'],
      answers: {
        ...warmsNormally(),
        ...heaterHoses(90, 84, 60),
        'heater-pump-check': 'no-electric-pump',
        ...bleedAndRetest(90, 85, 62),
        ...flowTest(11, 12),
      },
    },
    {
      name: 'Inlet hose read hotter than the engine: readings do not fit',
      story:
        'A 2012 Bravik 1.6 petrol saloon; the inlet hose was read just after a hot run through a heated wash bay and shows 20 K more than the probe on the engine. The readings cannot both be right; the walk does not guess.',
      expect: 'needs-further-checks',
      mustNotReach: ['thermostat-stuck-open'],
      answers: {
        ...quietStart(),
        ...coldCheck(12, 12),
        ...warmUp(60, 76, 12),
        ...sensorCheck(66, 67),
        ...inletHose(87),
      },
    },
  ],
});
