// Scenario bank for the shipped tree "overheats-intermittent-no-codes": each scenario is a car a
// technician could meet, with one true fault (or a healthy part that must not be blamed) and the
// answers given at each step. scenario-bank.test.ts walks every one through the compiled tree.
//
// Makes and models are invented. Readings are the ones a real car of that kind gives: caps of
// 1.4–1.6 bar on modern cars and 0.9–1.2 bar on older ones, a few hundredths of a bar of gauge
// wander on a sound system, 5–6 K across a radiator with good flow, map-controlled engines at
// 100–110 °C at part load, and hose readings taken at the same moment as live data.
import type { ScenarioAnswer, ScenarioReading } from './scenario.js';
import { scenarioBank } from './scenario.js';

type Answers = Record<string, ScenarioAnswer>;

const c = (value: number): ScenarioReading => [value, 'degC'];
const f = (value: number): ScenarioReading => [value, 'degF'];
const bar = (value: number): ScenarioReading => [value, 'bar'];
const psi = (value: number): ScenarioReading => [value, 'psi'];
const litres = (value: number): ScenarioReading => [value, 'L'];
const minutes = (value: number): ScenarioReading => [value, 'min'];
const percent = (value: number): ScenarioReading => [value, '%'];

/** The driver's pattern and the cold level check with what was added. */
const interview = (pattern: string, topUp = 0.2): Answers => ({
  'interview-pattern': pattern,
  'level-cold': { topUpLitres: litres(topUp) },
});

const noLeakSeen: Answers = { 'visual-leaks': 'none-seen' };

/** Ethylene glycol coolant at the given strength. */
const ethylene = (strength = 50): Answers => ({
  'glycol-type': 'ethylene',
  'concentration-eg': { egPercent: percent(strength) },
});

/** A sound cap: opens at its rating, settles a little, vacuum valve free. */
const capSound = (rating: number): Answers => ({
  'cap-test': {
    capRating: bar(rating),
    capOpening: bar(rating - 0.03),
    capHeldAfterMinute: bar(rating - 0.07),
  },
  'cap-vacuum-valve': 'vacuum-valve-ok',
});

/** A cold pressure test at the cap rating that holds within the gauge's wander. */
const pressureHolds = (rating: number): Answers => ({
  'pressure-test': {
    testPressure: bar(rating),
    pressureAfterHold: bar(rating - 0.02),
    holdMinutes: minutes(15),
  },
});

const blockTestClean: Answers = { 'block-test': 'done', 'block-test-result': 'no-gas' };

/** Every cold check passes: no leak, 50 % glycol, a sound cap, a tight system, no gas. */
const coldChecksPass = (pattern: string, rating = 1.4, topUp = 0.2): Answers => ({
  ...interview(pattern, topUp),
  ...noLeakSeen,
  ...ethylene(),
  ...capSound(rating),
  ...pressureHolds(rating),
  ...blockTestClean,
});

/** The warm-up: highest live data and the IR reading at the sensor housing at that moment. */
const warmUp = (liveData: number, housing: number): Answers => ({
  'warm-up-live-data': { liveDataTemp: c(liveData), sensorHousingIr: c(housing) },
});

/** Hose readings and the live data at the same moment, with the thermostat known to be open. */
const hoses = (engine: number, inlet: number, outlet: number): Answers => ({
  'hose-temps': {
    engineTempAtHoses: c(engine),
    radiatorInletTemp: c(inlet),
    radiatorOutletTemp: c(outlet),
  },
});

/** Good flow through the radiator: about 6 K across it. */
const hosesNormal = hoses(96, 93, 87);

/** A fan that comes on in time and works as it is driven. */
const fanWorks = (
  drive: 'staged' | 'variable-speed' | 'refrigerant-pressure',
  on = 99,
): Answers => {
  const check: Answers =
    drive === 'staged'
      ? { 'fan-ac-stage': 'higher-stage-runs' }
      : drive === 'variable-speed'
        ? { 'fan-duty-check': 'follows' }
        : { 'fan-ac-pressure-check': 'responds' };
  return { 'fan-switch': { fanOnTemp: c(on) }, 'fan-drive-type': drive, ...check };
};

const noLowTemperatureLoop: Answers = { 'aux-loop-present': 'no-loop' };

/** Nothing wrong in the bay: hot checks, fan, no low-temperature loop, air side and belt fine. */
const healthyInTheBay = (pattern: string, rating = 1.4): Answers => ({
  ...coldChecksPass(pattern, rating),
  ...warmUp(99, 96),
  ...hosesNormal,
  ...fanWorks('variable-speed'),
  ...noLowTemperatureLoop,
  'air-side-check': 'clear',
  'pump-drive-check': 'belt-sound',
});

/** The road test with live data and the hoses read as soon as the car stopped. */
const roadTest = (engine: number, inlet: number, outlet: number): Answers => ({
  'road-test-flow-log': {
    roadPeakTemp: c(engine),
    roadInletTemp: c(inlet),
    roadOutletTemp: c(outlet),
  },
});

/** Bled with the thermostat open, and still no flow: on to the pump. */
const stillNoFlowAfterBleed = (pump: string): Answers => ({
  'main-loop-bleed': 'done',
  'main-loop-retest': 'still-no-flow',
  'pump-type': pump,
});

/** A thermostat that passes the pan test: opens on time and fully. */
const thermostatGood = (stamped: number, opened: number): Answers => ({
  'thermostat-test': 'done',
  'thermostat-opened': 'opened',
  'thermostat-opening': { thermostatRated: c(stamped), thermostatOpenedAt: c(opened) },
  'thermostat-full-lift': 'fully',
});

const fans: Answers = { ...fanWorks('staged') };

export const overheatsIntermittentScenarios = scenarioBank({
  treeId: 'overheats-intermittent-no-codes',
  confirmations: {
    // The pump is blamed only after the control valve, its wiring and (where possible) its
    // actuation were checked, which in turn needs a bled system with no flow.
    'pump-shroud-stuck': ['pump-valve-check'],
    'pump-impeller-not-circulating': ['main-loop-retest'],
    // An auxiliary pump is blamed only when it gets supply, ground and command.
    'auxiliary-pump-not-running': ['aux-pump-circuit'],
    // Gas counts only when the block test shows it again on a bled system.
    'combustion-gas-in-coolant': ['block-test-repeat-result'],
  },
  scenarios: [
    // ── Switchable pump, shroud stuck out ───────────────────────────────────────────────────
    {
      name: 'Shroud stuck out: hot engine, cool inlet, pump ignores the scan tool',
      story:
        'A 2016 Corvane Tessel 1.4 petrol estate with a switchable pump climbs to 115 °C on the motorway. In the bay, with live data at 112 °C, the radiator inlet hose reads 55 °C and the heater hoses are lukewarm. Bleeding changes nothing; the valve circuit is sound and commanding the pump to flow changes nothing. The shroud is found stuck out.',
      expect: 'pump-shroud-stuck',
      mustNotReach: ['thermostat-stuck-closed'],
      answers: {
        ...coldChecksPass('speed-or-load'),
        ...warmUp(112, 108),
        ...hoses(112, 55, 48),
        'circulation-check': 'little-circulation',
        ...stillNoFlowAfterBleed('switchable'),
        'pump-valve-check': 'circuit-good',
        'pump-actuation-test': 'no-response',
        'pump-removal': 'done',
        'shroud-inspection': 'stuck-out',
      },
    },
    {
      name: 'Shroud stuck out, heater loop on its own pump: thermostat proven first',
      story:
        'A 2018 Halden Varro 1.6 petrol whose heater loop has its own electric pump overheats in summer traffic and on hills. The heater hoses stay hot whatever the main pump does, so circulation cannot be judged: the thermostat comes out first and opens on time and fully. After a careful bleed the inlet is still cool; the scan tool cannot command this pump. The shroud is stuck out.',
      expect: 'pump-shroud-stuck',
      answers: {
        ...coldChecksPass('no-pattern', 1.5),
        ...warmUp(114, 111),
        ...hoses(110, 58, 52),
        'circulation-check': 'cannot-tell',
        ...thermostatGood(87, 88),
        ...stillNoFlowAfterBleed('switchable'),
        'pump-valve-check': 'circuit-good',
        'pump-actuation-test': 'not-available',
        'pump-removal': 'done',
        'shroud-inspection': 'stuck-out',
      },
    },
    {
      name: 'Shroud that sticks only now and then: no low-temperature loop, fan works, caught on the road',
      story:
        'A 2017 Corvane Tessel 1.4 petrol hatch (no low-temperature loop) overheats every few days with no code. In the bay everything is normal and the fan works, so the old walk ended at "no cause found". On a logged road test it climbs to 118 °C; stopped at once, the radiator inlet reads 62 °C and the heater hoses are lukewarm. The shroud is found stuck out.',
      expect: 'pump-shroud-stuck',
      mustNotReach: ['no-cause-found'],
      answers: {
        ...healthyInTheBay('no-pattern'),
        ...roadTest(118, 62, 55),
        'circulation-check': 'little-circulation',
        ...stillNoFlowAfterBleed('switchable'),
        'pump-valve-check': 'circuit-good',
        'pump-actuation-test': 'no-response',
        'pump-removal': 'done',
        'shroud-inspection': 'stuck-out',
      },
    },
    {
      name: 'Shroud stuck out although its valve can never be powered',
      story:
        'A 2015 Pellan Orvo 1.4 petrol overheats on long climbs. The hot engine has a cool radiator inlet and weak cabin heat; bleeding does not help. The pump valve’s connector is corroded open, so the valve is never powered and the shroud should stay back — yet there is no flow. The shroud is seized out on its seal.',
      expect: 'pump-shroud-stuck',
      answers: {
        ...coldChecksPass('speed-or-load', 1.4),
        ...warmUp(116, 113),
        ...hoses(113, 60, 53),
        'circulation-check': 'little-circulation',
        ...stillNoFlowAfterBleed('switchable'),
        'pump-valve-check': 'never-powered',
        'pump-removal': 'done',
        'shroud-inspection': 'stuck-out',
      },
    },

    // ── Switchable pump held shut by its circuit ────────────────────────────────────────────
    {
      name: 'Pump valve held powered by a chafed control wire',
      story:
        'A 2017 Corvane Tessel 1.4 petrol overheats after a front-end repair. The control wire of the pump’s valve has chafed through on a bracket and touches ground, so the valve is powered all the time and the shroud never retracts. Found at the valve check, before the pump comes off.',
      expect: 'pump-valve-circuit-fault',
      mustNotReach: ['pump-shroud-stuck'],
      answers: {
        ...coldChecksPass('no-pattern'),
        ...warmUp(113, 110),
        ...hoses(111, 57, 51),
        'circulation-check': 'little-circulation',
        ...stillNoFlowAfterBleed('switchable'),
        'pump-valve-check': 'held-powered',
      },
    },
    {
      name: 'Engine computer keeps commanding the pump shut',
      story:
        'A 2019 Halden Varro 1.6 petrol: live data shows the pump valve commanded on at 110 °C, because of a software fault the maker has a bulletin for. The valve circuit itself is sound; the pump is not.',
      expect: 'pump-valve-circuit-fault',
      mustNotReach: ['pump-shroud-stuck', 'pump-impeller-not-circulating'],
      answers: {
        ...coldChecksPass('speed-or-load', 1.5),
        ...warmUp(115, 112),
        ...hoses(112, 60, 55),
        'circulation-check': 'cannot-tell',
        ...thermostatGood(88, 89),
        ...stillNoFlowAfterBleed('switchable'),
        'pump-valve-check': 'held-powered',
      },
    },
    {
      name: 'Water in the valve connector shorting the control line',
      story:
        'A 2016 Pellan Orvo 1.4 petrol overheats after wet days. Water in the pump valve’s connector shorts its control line to ground, holding the valve powered. Caught in the road test first, then at the valve check.',
      expect: 'pump-valve-circuit-fault',
      answers: {
        ...healthyInTheBay('no-pattern'),
        ...roadTest(116, 58, 52),
        'circulation-check': 'little-circulation',
        ...stillNoFlowAfterBleed('switchable'),
        'pump-valve-check': 'held-powered',
      },
    },

    // ── Pump impeller ───────────────────────────────────────────────────────────────────────
    {
      name: 'Eroded impeller on a timing-belt-driven pump',
      story:
        'A 2009 Brenvik Aster 2.0 diesel with a conventional pump behind the timing belt overheats when towing. Hot engine, radiator inlet 30 K cooler, weak heat; bleeding does not help. The impeller blades are eaten away by cavitation.',
      expect: 'pump-impeller-not-circulating',
      answers: {
        ...coldChecksPass('speed-or-load', 1.2),
        ...warmUp(109, 106),
        ...hoses(106, 72, 64),
        'circulation-check': 'little-circulation',
        ...stillNoFlowAfterBleed('conventional-timing-drive'),
        'conventional-pump-removal': 'done',
        'impeller-inspection': 'damaged',
      },
    },
    {
      name: 'Impeller slipping on its shaft, belt drive sound',
      story:
        'A 2011 Morrow Kelt 1.6 petrol with the pump on the ribbed belt. The belt and tensioner are fine, the thermostat passes the pan test, bleeding does not help. The plastic impeller spins loose on its shaft.',
      expect: 'pump-impeller-not-circulating',
      answers: {
        ...coldChecksPass('no-pattern', 1.0),
        ...warmUp(108, 105),
        ...hoses(105, 70, 62),
        'circulation-check': 'circulates',
        ...thermostatGood(88, 89),
        ...stillNoFlowAfterBleed('conventional-auxiliary-belt'),
        'pump-belt-check': 'belt-sound',
        'conventional-pump-removal': 'done',
        'impeller-inspection': 'damaged',
      },
    },
    {
      name: 'Switchable pump with a free shroud but a broken impeller',
      story:
        'A 2015 Corvane Tessel 1.4 petrol: the switchable pump does not answer the scan tool. Out of the car, the shroud moves freely but two impeller blades are broken off.',
      expect: 'pump-impeller-not-circulating',
      mustNotReach: ['pump-shroud-stuck'],
      answers: {
        ...coldChecksPass('speed-or-load'),
        ...warmUp(111, 108),
        ...hoses(109, 61, 54),
        'circulation-check': 'little-circulation',
        ...stillNoFlowAfterBleed('switchable'),
        'pump-valve-check': 'circuit-good',
        'pump-actuation-test': 'no-response',
        'pump-removal': 'done',
        'shroud-inspection': 'free-or-none',
        'impeller-inspection': 'damaged',
      },
    },

    // ── Low-temperature loop ───────────────────────────────────────────────────────────────
    {
      name: 'Gurgling auxiliary pump cured by bleeding its loop',
      story:
        'A 2018 Tarsel Quent 1.5 turbo petrol with a water-cooled charge-air cooler loses power and runs hot on motorway climbs. Its auxiliary pump gurgles; the maker’s bleed routine and a drive cure it.',
      expect: 'auxiliary-loop-air-lock',
      answers: {
        ...coldChecksPass('speed-or-load', 1.4),
        ...warmUp(98, 95),
        ...hosesNormal,
        ...fanWorks('variable-speed'),
        'aux-loop-present': 'has-loop',
        'aux-pump-check': 'runs-with-air',
        'aux-bleed': 'done',
        'aux-bleed-result': 'cured',
      },
    },
    {
      name: 'Charge air 55 K above ambient, quiet pump, air lock',
      story:
        'A 2019 Tarsel Quent 1.5 turbo petrol: the auxiliary pump runs quietly, but on a logged climb the charge air reaches 167 °F on a 20 °C day. An air lock survived the last vacuum fill; bleeding and a drive cure it.',
      expect: 'auxiliary-loop-air-lock',
      answers: {
        ...coldChecksPass('speed-or-load', 1.4),
        ...warmUp(97, 95),
        ...hosesNormal,
        ...fanWorks('staged'),
        'aux-loop-present': 'has-loop',
        'aux-pump-check': 'runs-quietly',
        'charge-air-log': { chargeAirTempMax: f(167), ambientTemp: c(20) },
        'aux-bleed': 'done',
        'aux-bleed-result': 'cured',
      },
    },
    {
      name: 'After an intercooler-pump replacement: bled first, air was in the low-temperature loop',
      story:
        'A 2020 Quillon Dask 2.0 turbo petrol ran hot under load only since another garage replaced its charge-air pump. The interview answer sends it straight to bleeding; the low-temperature loop gurgles and its tank drops as air leaves, and the fault is gone.',
      expect: 'auxiliary-loop-air-lock',
      answers: {
        'interview-pattern': 'after-cooling-work',
        'bleed-first': 'done',
        'bleed-first-result': 'cured-low-temperature-loop',
      },
    },

    // ── Auxiliary pump circuit and pump ─────────────────────────────────────────────────────
    {
      name: 'Auxiliary pump without its command signal',
      story:
        'A 2019 Tarsel Quent 1.5 turbo petrol: the auxiliary pump does not run. Supply and ground are there, but the control unit sends no command signal because of a broken data wire at the connector.',
      expect: 'aux-pump-circuit-fault',
      mustNotReach: ['auxiliary-pump-not-running'],
      answers: {
        ...coldChecksPass('speed-or-load'),
        ...warmUp(99, 97),
        ...hosesNormal,
        ...fanWorks('variable-speed'),
        'aux-loop-present': 'has-loop',
        'aux-pump-check': 'not-running',
        'aux-pump-circuit': 'something-missing',
      },
    },
    {
      name: 'Auxiliary pump fuse blown',
      story:
        'A 2018 Quillon Dask 2.0 turbo petrol runs hot towing a caravan. The auxiliary pump is silent: its fuse has blown after a chafed wire touched the body.',
      expect: 'aux-pump-circuit-fault',
      answers: {
        ...coldChecksPass('speed-or-load', 1.5),
        ...warmUp(103, 101),
        ...hosesNormal,
        ...fanWorks('staged'),
        'aux-loop-present': 'has-loop',
        'aux-pump-check': 'not-running',
        'aux-pump-circuit': 'something-missing',
      },
    },
    {
      name: 'Auxiliary pump relay not switching',
      story:
        'A 2017 Brenvik Aster 2.0 diesel with a low-temperature loop: the pump relay’s coil has failed, so no supply reaches the pump.',
      expect: 'aux-pump-circuit-fault',
      answers: {
        ...coldChecksPass('no-pattern', 1.4),
        ...warmUp(97, 95),
        ...hosesNormal,
        ...fanWorks('refrigerant-pressure'),
        'aux-loop-present': 'has-loop',
        'aux-pump-check': 'not-running',
        'aux-pump-circuit': 'something-missing',
      },
    },
    {
      name: 'Auxiliary pump seized with everything present',
      story:
        'A 2018 Tarsel Quent 1.5 turbo petrol: the auxiliary pump gets supply, ground and its command and stays silent; its motor has seized.',
      expect: 'auxiliary-pump-not-running',
      answers: {
        ...coldChecksPass('speed-or-load'),
        ...warmUp(100, 97),
        ...hosesNormal,
        ...fanWorks('variable-speed'),
        'aux-loop-present': 'has-loop',
        'aux-pump-check': 'not-running',
        'aux-pump-circuit': 'all-present',
      },
    },
    {
      name: 'Auxiliary pump electronics failed',
      story:
        'A 2020 Quillon Dask 2.0 turbo petrol: the auxiliary pump’s built-in electronics have failed. Supply, ground and command all reach it.',
      expect: 'auxiliary-pump-not-running',
      answers: {
        ...coldChecksPass('no-pattern', 1.5),
        ...warmUp(98, 96),
        ...hosesNormal,
        ...fanWorks('staged'),
        'aux-loop-present': 'has-loop',
        'aux-pump-check': 'not-running',
        'aux-pump-circuit': 'all-present',
      },
    },
    {
      name: 'Auxiliary pump jammed by debris',
      story:
        'A 2017 Brenvik Aster 2.0 diesel: debris from a failed hose lining has jammed the auxiliary pump. It is powered and commanded but does not turn.',
      expect: 'auxiliary-pump-not-running',
      answers: {
        ...coldChecksPass('speed-or-load', 1.4),
        ...warmUp(101, 99),
        ...hosesNormal,
        ...fanWorks('refrigerant-pressure'),
        'aux-loop-present': 'has-loop',
        'aux-pump-check': 'not-running',
        'aux-pump-circuit': 'all-present',
      },
    },

    // ── Thermostat ─────────────────────────────────────────────────────────────────────────
    {
      name: 'Thermostat that never opened (was routed "opens on time")',
      story:
        'A 2014 Morrow Kelt 1.6 petrol overheats in traffic. The thermostat stamped 87 °C stays shut in the pan with the water at 91 °C — within 5 K of its stamp, which the old walk read as "opens on time". Asked plainly, it never opened.',
      expect: 'thermostat-stuck-closed',
      mustNotReach: ['main-loop-air-lock', 'pump-shroud-stuck', 'pump-impeller-not-circulating'],
      answers: {
        ...coldChecksPass('idle-or-traffic', 1.1),
        ...warmUp(112, 109),
        ...hoses(110, 50, 45),
        'circulation-check': 'circulates',
        'thermostat-test': 'done',
        'thermostat-opened': 'never-opened',
      },
    },
    {
      name: 'Thermostat opening 11 K late',
      story:
        'A 2012 Pellan Orvo 1.4 petrol: the thermostat stamped 87 °C only begins to open at 98 °C in the pan.',
      expect: 'thermostat-stuck-closed',
      answers: {
        ...coldChecksPass('no-pattern', 1.2),
        ...warmUp(112, 108),
        ...hoses(108, 52, 46),
        'circulation-check': 'circulates',
        'thermostat-test': 'done',
        'thermostat-opened': 'opened',
        'thermostat-opening': { thermostatRated: c(87), thermostatOpenedAt: c(98) },
      },
    },
    {
      name: 'Thermostat that opens on time but only partly',
      story:
        'A 2013 Morrow Kelt 1.6 petrol overheats on long climbs. The thermostat begins to open at 88 °C, on its stamp, but lifts only a couple of millimetres at 100 °C: a partial lift, which must not pass as "on time".',
      expect: 'thermostat-stuck-closed',
      mustNotReach: ['main-loop-air-lock', 'pump-shroud-stuck'],
      answers: {
        ...coldChecksPass('speed-or-load', 1.1),
        ...warmUp(110, 107),
        ...hoses(107, 64, 57),
        'circulation-check': 'circulates',
        'thermostat-test': 'done',
        'thermostat-opened': 'opened',
        'thermostat-opening': { thermostatRated: c(88), thermostatOpenedAt: c(88) },
        'thermostat-full-lift': 'partly',
      },
    },
    {
      name: 'Map-controlled thermostat with an open heater element',
      story:
        'A 2016 Halden Varro 1.6 petrol with a map-controlled thermostat overheats under load. Read on a long climb, when the computer should have it open, the engine is at 114 °C and the inlet hose at 70 °C. The thermostat’s heater element is open circuit and its wax element alone opens far too late.',
      expect: 'thermostat-stuck-closed',
      answers: {
        ...coldChecksPass('speed-or-load', 1.4),
        ...warmUp(116, 112),
        ...hoses(114, 70, 63),
        'circulation-check': 'circulates',
        'thermostat-test': 'done',
        'thermostat-opened': 'needs-maker-test',
        'thermostat-maker-test': 'failed',
      },
    },
    {
      name: 'High-stamp thermostat: water boiled first, maker’s test fails',
      story:
        'A 2015 Brenvik Aster 2.0 diesel with a thermostat stamped 92 °C: it begins to open at 94 °C but the water boils before it can open fully. The maker’s bench test shows it opens late.',
      expect: 'thermostat-stuck-closed',
      answers: {
        ...coldChecksPass('speed-or-load', 1.4),
        ...warmUp(111, 108),
        ...hoses(109, 66, 59),
        'circulation-check': 'circulates',
        'thermostat-test': 'done',
        'thermostat-opened': 'opened',
        'thermostat-opening': { thermostatRated: c(92), thermostatOpenedAt: c(94) },
        'thermostat-full-lift': 'boiled-first',
        'thermostat-maker-test': 'failed',
      },
    },

    // ── Fan ─────────────────────────────────────────────────────────────────────────────────
    {
      name: 'Fan not running by 112 °C',
      story:
        'A 2013 Pellan Orvo 1.4 petrol overheats in traffic. The fan’s motor has a dead spot and does not start; the engine reaches 112 °C at idle and is switched off.',
      expect: 'fan-stage-not-switching',
      answers: {
        ...coldChecksPass('idle-or-traffic', 1.2),
        ...warmUp(104, 101),
        ...hoses(100, 96, 95),
        'fan-switch': { fanOnTemp: c(112) },
      },
    },
    {
      name: 'Staged fan without its higher stage',
      story:
        'A 2012 Morrow Kelt 1.6 petrol with a two-speed fan runs hot in summer queues with the A/C on. The first stage comes in at 98 °C, but the higher stage never does: its resistor pack is burnt.',
      expect: 'fan-stage-not-switching',
      answers: {
        ...coldChecksPass('idle-or-traffic', 1.1),
        ...warmUp(103, 100),
        ...hosesNormal,
        'fan-switch': { fanOnTemp: c(98) },
        'fan-drive-type': 'staged',
        'fan-ac-stage': 'no-higher-stage',
      },
    },
    {
      name: 'Variable-speed fan that does not follow its command',
      story:
        'A 2018 Halden Varro 1.6 petrol: the fan control module runs the fan at a crawl whatever the command. Live data shows 80 % duty requested; the fan barely turns.',
      expect: 'fan-stage-not-switching',
      answers: {
        ...coldChecksPass('idle-or-traffic', 1.4),
        ...warmUp(106, 104),
        ...hosesNormal,
        'fan-switch': { fanOnTemp: c(101) },
        'fan-drive-type': 'variable-speed',
        'fan-duty-check': 'does-not-follow',
      },
    },
    {
      name: 'Fan that ignores the refrigerant pressure',
      story:
        'A 2014 Brenvik Aster 2.0 diesel: with the A/C on, the high-side pressure climbs past the switch point but the fan does not speed up; the pressure signal wire to the fan module is broken. The engine runs hot in traffic with the A/C on.',
      expect: 'fan-stage-not-switching',
      answers: {
        ...coldChecksPass('idle-or-traffic', 1.4),
        ...warmUp(105, 102),
        ...hosesNormal,
        'fan-switch': { fanOnTemp: c(100) },
        'fan-drive-type': 'refrigerant-pressure',
        'fan-ac-pressure-check': 'no-response',
      },
    },

    // ── Cap ─────────────────────────────────────────────────────────────────────────────────
    {
      name: 'A 16 psi cap opening at 10 psi',
      story: 'A 2008 Morrow Kelt 1.4 petrol boils over in traffic. Its 16 psi cap opens at 10 psi.',
      expect: 'cap-not-holding',
      answers: {
        ...interview('idle-or-traffic', 0.6),
        ...noLeakSeen,
        ...ethylene(),
        'cap-test': {
          capRating: psi(16),
          capOpening: psi(10),
          capHeldAfterMinute: psi(10),
        },
      },
    },
    {
      name: 'A 1.4 bar cap that opens at 1.1 bar',
      story:
        'A 2017 Corvane Tessel 1.4 petrol loses a little coolant and runs hot on hills: the 1.4 bar cap opens at 1.1 bar.',
      expect: 'cap-not-holding',
      answers: {
        ...interview('speed-or-load', 0.4),
        ...noLeakSeen,
        ...ethylene(),
        'cap-test': { capRating: bar(1.4), capOpening: bar(1.1), capHeldAfterMinute: bar(1.05) },
      },
    },
    {
      name: 'Cap that opens at its rating but will not hold',
      story:
        'A 2015 Pellan Orvo 1.4 petrol: its 1.2 bar cap opens on time but the perished seal lets the pressure fall to 0.8 bar within a minute.',
      expect: 'cap-not-holding',
      answers: {
        ...interview('no-pattern', 0.5),
        ...noLeakSeen,
        'glycol-type': 'unknown-or-mixed',
        'cap-test': { capRating: bar(1.2), capOpening: bar(1.2), capHeldAfterMinute: bar(0.8) },
      },
    },
    {
      name: 'A 1.0 bar cap still shut at 1.3 bar',
      story:
        'A 2009 Morrow Kelt 1.4 petrol split a hose last month. Its 1.0 bar cap has not opened when the tester reaches 1.3 bar: it opens far above its rating and must not pass.',
      expect: 'cap-opens-too-high',
      mustNotReach: ['pump-shroud-stuck', 'no-cause-found'],
      answers: {
        ...interview('no-pattern', 0.8),
        ...noLeakSeen,
        ...ethylene(),
        'cap-test': { capRating: bar(1.0), capOpening: bar(1.3), capHeldAfterMinute: bar(1.25) },
      },
    },
    {
      name: 'Aftermarket cap opening at 1.9 bar on a 1.4 bar system',
      story:
        'A 2016 Halden Varro 1.6 petrol has a cheap replacement cap stamped 1.4 bar that opens at 1.9 bar; the expansion tank seam is weeping.',
      expect: 'cap-opens-too-high',
      answers: {
        ...interview('speed-or-load', 0.5),
        ...noLeakSeen,
        ...ethylene(),
        'cap-test': { capRating: bar(1.4), capOpening: bar(1.9), capHeldAfterMinute: bar(1.85) },
      },
    },
    {
      name: 'Corroded cap valve sticking shut',
      story:
        'A 2011 Brenvik Aster 2.0 diesel: the cap’s pressure valve is crusted with dried coolant and opens at 22 psi on a 15 psi rating.',
      expect: 'cap-opens-too-high',
      answers: {
        ...interview('no-pattern', 0.3),
        ...noLeakSeen,
        ...ethylene(),
        'cap-test': { capRating: psi(15), capOpening: psi(22), capHeldAfterMinute: psi(21) },
      },
    },
    {
      name: 'Vacuum valve stuck shut, hoses collapsed overnight',
      story:
        'A 2014 Pellan Orvo 1.4 petrol: in the morning the lower hose is flat. The cap passes its pressure test but its vacuum valve is stuck shut.',
      expect: 'cap-vacuum-valve-faulty',
      answers: {
        ...interview('no-pattern', 0.2),
        ...noLeakSeen,
        ...ethylene(),
        'cap-test': { capRating: bar(1.4), capOpening: bar(1.37), capHeldAfterMinute: bar(1.33) },
        'cap-vacuum-valve': 'vacuum-valve-stuck',
      },
    },
    {
      name: 'Vacuum valve not seating',
      story:
        'A 2016 Corvane Tessel 1.4 petrol keeps losing a little coolant to the tank overflow: the vacuum valve’s seal is torn and does not seat.',
      expect: 'cap-vacuum-valve-faulty',
      answers: {
        ...interview('speed-or-load', 0.4),
        ...noLeakSeen,
        ...ethylene(),
        'cap-test': { capRating: bar(1.5), capOpening: bar(1.48), capHeldAfterMinute: bar(1.44) },
        'cap-vacuum-valve': 'vacuum-valve-stuck',
      },
    },
    {
      name: 'Vacuum valve gummed up with old coolant',
      story:
        'A 2010 Morrow Kelt 1.4 petrol: the vacuum valve needs a hard pull to open and stays open.',
      expect: 'cap-vacuum-valve-faulty',
      answers: {
        ...interview('idle-or-traffic', 0.3),
        ...noLeakSeen,
        'glycol-type': 'propylene',
        'concentration-pg': { pgPercent: percent(48) },
        'cap-test': { capRating: bar(1.1), capOpening: bar(1.1), capHeldAfterMinute: bar(1.05) },
        'cap-vacuum-valve': 'vacuum-valve-stuck',
      },
    },

    // ── Combustion gas ─────────────────────────────────────────────────────────────────────
    {
      name: 'Head gasket: gas again on the bled system',
      story:
        'A 2010 Brenvik Aster 2.0 diesel pushes coolant out of the tank on long climbs. The block test turns the fluid yellow; bled and driven, then retested cold, it changes colour again.',
      expect: 'combustion-gas-in-coolant',
      answers: {
        ...interview('speed-or-load', 0.7),
        ...noLeakSeen,
        ...ethylene(),
        ...capSound(1.4),
        ...pressureHolds(1.4),
        'block-test': 'done',
        'block-test-result': 'gas-or-bubbles',
        'block-test-repeat': 'done',
        'block-test-repeat-result': 'gas-again',
      },
    },
    {
      name: 'Leaking exhaust-gas cooler: pressure falls, nothing outside, gas twice',
      story:
        'A 2013 Brenvik Aster 2.0 diesel: the cold pressure test falls 0.3 bar in 15 minutes with nothing leaking outside. The block test shows gas, and again on a bled system: the exhaust-gas recirculation cooler has cracked.',
      expect: 'combustion-gas-in-coolant',
      answers: {
        ...interview('no-pattern', 1.0),
        ...noLeakSeen,
        ...ethylene(),
        ...capSound(1.4),
        'pressure-test': {
          testPressure: bar(1.4),
          pressureAfterHold: bar(1.1),
          holdMinutes: minutes(15),
        },
        'find-leak-under-pressure': 'done',
        'leak-found-under-pressure': 'nothing-outside',
        'block-test': 'done',
        'block-test-result': 'gas-or-bubbles',
        'block-test-repeat': 'done',
        'block-test-repeat-result': 'gas-again',
      },
    },
    {
      name: 'Gas only under load, seen on the repeat',
      story:
        'A 2012 Pellan Orvo 1.4 turbo petrol: the first block test after a 0.8 L top-up bubbles; on the bled system, with a helper holding the revs, the fluid changes colour again.',
      expect: 'combustion-gas-in-coolant',
      answers: {
        ...coldChecksPass('speed-or-load', 1.2, 0.8),
        'block-test-result': 'gas-or-bubbles',
        'block-test-repeat': 'done',
        'block-test-repeat-result': 'gas-again',
      },
    },
    {
      name: 'Bubbles after a cold top-up were air leaving: head gasket not blamed',
      story:
        'A 2015 Corvane Tessel 1.4 petrol needed 1.2 L at the cold level check. The first block test bubbles steadily — air leaving the freshly topped-up system. On the bled system the fluid stays blue. The real fault is a fan that never reaches its higher stage.',
      expect: 'fan-stage-not-switching',
      mustNotReach: ['combustion-gas-in-coolant'],
      answers: {
        ...coldChecksPass('idle-or-traffic', 1.4, 1.2),
        'block-test-result': 'gas-or-bubbles',
        'block-test-repeat': 'done',
        'block-test-repeat-result': 'clean-now',
        ...warmUp(104, 101),
        ...hosesNormal,
        'fan-switch': { fanOnTemp: c(99) },
        'fan-drive-type': 'staged',
        'fan-ac-stage': 'no-higher-stage',
      },
    },

    // ── External leak ──────────────────────────────────────────────────────────────────────
    {
      name: 'Leak seen at the pump hose and confirmed under pressure',
      story:
        'A 2011 Morrow Kelt 1.6 petrol needs 2 US quarts at the cold check; pink crust on the lower hose clip drips under pressure.',
      expect: 'external-leak-low-coolant',
      answers: {
        'interview-pattern': 'speed-or-load',
        'level-cold': { topUpLitres: [2, 'qt'] },
        'visual-leaks': 'leak-seen',
        'locate-visible-leak': 'done',
        'visible-leak-confirmed': 'confirmed',
      },
    },
    {
      name: 'Pressure falls; radiator end-tank seam found weeping',
      story:
        'A 2014 Pellan Orvo 1.4 petrol: nothing visible at first, but the cold system loses 0.3 bar in 20 minutes and the radiator’s plastic end tank weeps at its seam under pressure.',
      expect: 'external-leak-low-coolant',
      answers: {
        ...interview('no-pattern', 0.9),
        ...noLeakSeen,
        ...ethylene(),
        ...capSound(1.4),
        'pressure-test': {
          testPressure: bar(1.4),
          pressureAfterHold: bar(1.1),
          holdMinutes: minutes(20),
        },
        'find-leak-under-pressure': 'done',
        'leak-found-under-pressure': 'external',
      },
    },
    {
      name: 'Pumped to 2.5 bar on a 1.0 bar system: refused, repeated at the rating, leak found',
      story:
        'A 2008 Morrow Kelt 1.4 petrol with a 1.0 bar cap: the first pressure test was pumped to 2.5 bar and "held" — not a valid test. Repeated at 1.0 bar, it falls 0.15 bar in 15 minutes and a heater hose joint weeps.',
      expect: 'external-leak-low-coolant',
      answers: {
        ...interview('no-pattern', 0.7),
        ...noLeakSeen,
        ...ethylene(),
        ...capSound(1.0),
        'pressure-test': {
          testPressure: bar(2.5),
          pressureAfterHold: bar(2.45),
          holdMinutes: minutes(15),
        },
        'pressure-retest': {
          retestPressure: bar(1.0),
          retestAfterHold: bar(0.85),
          retestMinutes: minutes(15),
        },
        'find-leak-under-pressure': 'done',
        'leak-found-under-pressure': 'external',
      },
    },

    // ── Concentration ──────────────────────────────────────────────────────────────────────
    {
      name: 'Topped up with water for years: 30 % glycol',
      story: 'A 2009 Morrow Kelt 1.4 petrol has been topped up with tap water: 30 % glycol.',
      expect: 'wrong-concentration',
      answers: { ...interview('speed-or-load', 0.5), ...noLeakSeen, ...ethylene(30) },
    },
    {
      name: 'Neat concentrate added: 65 % glycol',
      story:
        'A 2016 Halden Varro 1.6 petrol: the owner topped up with neat concentrate for years; the refractometer reads 65 %.',
      expect: 'wrong-concentration',
      answers: { ...interview('no-pattern', 0.3), ...noLeakSeen, ...ethylene(65) },
    },
    {
      name: 'Propylene glycol system at 35 %',
      story:
        'A 2013 Brenvik Aster 2.0 diesel filled with propylene glycol coolant reads 35 % on the PG scale.',
      expect: 'wrong-concentration',
      answers: {
        ...interview('idle-or-traffic', 0.4),
        ...noLeakSeen,
        'glycol-type': 'propylene',
        'concentration-pg': { pgPercent: percent(35) },
      },
    },

    // ── Temperature sensor ─────────────────────────────────────────────────────────────────
    {
      name: 'Sensor reads high: live data 118 °C, engine 96 °C',
      story:
        'A 2012 Pellan Orvo 1.4 petrol: the gauge alarms but the engine is fine. Live data 118 °C, housing 95 °C by IR, 96 °C by contact probe with live data still at 118 °C.',
      expect: 'temperature-reading-wrong',
      mustNotReach: ['temperature-reads-low'],
      answers: {
        ...coldChecksPass('no-pattern', 1.2),
        ...warmUp(118, 95),
        'confirm-with-contact-probe': { probeTemp: c(96), liveDataAtProbe: c(118) },
      },
    },
    {
      name: 'Sensor connector corroded to a high reading',
      story:
        'A 2015 Corvane Tessel 1.4 petrol: a corroded sensor connector makes live data read 112 °C while the probe reads 93 °C.',
      expect: 'temperature-reading-wrong',
      answers: {
        ...coldChecksPass('no-pattern', 1.4),
        ...warmUp(112, 94),
        'confirm-with-contact-probe': { probeTemp: c(93), liveDataAtProbe: c(112) },
      },
    },
    {
      name: 'Sensor drifted high, entered in °F',
      story:
        'A 2011 Morrow Kelt 1.6 petrol: live data 239 °F, contact probe 203 °F at the same moment.',
      expect: 'temperature-reading-wrong',
      answers: {
        ...coldChecksPass('idle-or-traffic', 1.1),
        'warm-up-live-data': { liveDataTemp: f(239), sensorHousingIr: f(201) },
        'confirm-with-contact-probe': { probeTemp: f(203), liveDataAtProbe: f(239) },
      },
    },
    {
      name: 'Sensor reads LOW: engine really at 110 °C, fan never commanded',
      story:
        'A 2016 Halden Varro 1.6 petrol boils over in traffic with the gauge near normal. Live data says 92 °C while the housing reads 108 °C and the contact probe 109 °C: the sensor reads low and the fan is never asked to run. The old walk called this "engine not as hot as the gauge says".',
      expect: 'temperature-reads-low',
      mustNotReach: ['temperature-reading-wrong'],
      answers: {
        ...coldChecksPass('idle-or-traffic', 1.4),
        ...warmUp(92, 108),
        'confirm-with-contact-probe': { probeTemp: c(109), liveDataAtProbe: c(93) },
      },
    },
    {
      name: 'High resistance in the sensor ground reads low',
      story:
        'A 2014 Brenvik Aster 2.0 diesel: a loose sensor ground makes live data read 15 K low; the fan comes on late and the engine overheats on hot days.',
      expect: 'temperature-reads-low',
      answers: {
        ...coldChecksPass('idle-or-traffic', 1.4),
        ...warmUp(90, 104),
        'confirm-with-contact-probe': { probeTemp: c(105), liveDataAtProbe: c(90) },
      },
    },
    {
      name: 'Wrong sensor fitted reads low',
      story:
        'A 2013 Pellan Orvo 1.4 petrol had a sensor of the wrong type fitted last year: it reads 12 K low.',
      expect: 'temperature-reads-low',
      answers: {
        ...coldChecksPass('no-pattern', 1.2),
        ...warmUp(95, 107),
        'confirm-with-contact-probe': { probeTemp: c(108), liveDataAtProbe: c(96) },
      },
    },

    // ── Radiator core ──────────────────────────────────────────────────────────────────────
    {
      name: 'Radiator core silted: 30 K drop, cold bands',
      story:
        'A 2009 Morrow Kelt 1.4 petrol with neglected coolant runs hot on motorways. The inlet is at 100 °C and the outlet at 70 °C; the IR scan shows cold bands across the lower core.',
      expect: 'radiator-core-restricted',
      answers: {
        ...coldChecksPass('speed-or-load', 1.0),
        ...warmUp(104, 100),
        ...hoses(104, 100, 70),
        'core-scan': 'cold-patches',
      },
    },
    {
      name: 'Half the core blocked by sealant',
      story:
        'A 2012 Brenvik Aster 2.0 diesel had leak sealant poured in: half the core is blocked and shows a cold side.',
      expect: 'radiator-core-restricted',
      answers: {
        ...coldChecksPass('speed-or-load', 1.4),
        ...warmUp(106, 103),
        ...hoses(105, 101, 76),
        'core-scan': 'cold-patches',
      },
    },
    {
      name: 'Core restriction caught on the road test',
      story:
        'A 2014 Corvane Tessel 1.4 petrol is fine in the bay. On a loaded road test it reaches 115 °C with the inlet at 108 °C and the outlet at 80 °C; the core shows cold bands.',
      expect: 'radiator-core-restricted',
      answers: {
        ...healthyInTheBay('speed-or-load'),
        ...roadTest(115, 108, 80),
        'core-scan': 'cold-patches',
      },
    },

    // ── Air side ───────────────────────────────────────────────────────────────────────────
    {
      name: 'Leaves packed between condenser and radiator',
      story:
        'A 2015 Pellan Orvo 1.4 petrol parked under trees runs hot in traffic. Everything in the circuit is healthy and the fan works; a lamp shows a mat of leaves between the condenser and the radiator.',
      expect: 'radiator-air-side-blocked',
      mustNotReach: ['pump-shroud-stuck', 'no-cause-found'],
      answers: {
        ...coldChecksPass('idle-or-traffic', 1.4),
        ...warmUp(103, 100),
        ...hoses(102, 99, 97),
        ...fanWorks('variable-speed'),
        ...noLowTemperatureLoop,
        'air-side-check': 'blocked',
      },
    },
    {
      name: 'Grille shutters stuck closed',
      story:
        'A 2019 Quillon Dask 2.0 turbo petrol runs hot under load: its active grille shutters have seized closed.',
      expect: 'radiator-air-side-blocked',
      answers: {
        ...coldChecksPass('speed-or-load', 1.5),
        ...warmUp(104, 101),
        ...hosesNormal,
        ...fanWorks('variable-speed'),
        'aux-loop-present': 'has-loop',
        'aux-pump-check': 'runs-quietly',
        'charge-air-log': { chargeAirTempMax: c(48), ambientTemp: c(22) },
        'air-side-check': 'blocked',
      },
    },
    {
      name: 'Radiator fins corroded away',
      story:
        'A 2008 Morrow Kelt 1.4 petrol from the coast: the radiator fins crumble at a touch and pass little air.',
      expect: 'radiator-air-side-blocked',
      answers: {
        ...coldChecksPass('speed-or-load', 1.0),
        ...warmUp(102, 99),
        ...hoses(101, 98, 97),
        ...fanWorks('staged'),
        ...noLowTemperatureLoop,
        'air-side-check': 'blocked',
      },
    },

    // ── Pump drive ─────────────────────────────────────────────────────────────────────────
    {
      name: 'Glazed belt slipping on the pump after rain',
      story:
        'A 2010 Morrow Kelt 1.6 petrol with its pump on the ribbed belt overheats only on wet days under load. The circuit is healthy in the bay; the belt is glazed and the tensioner weak.',
      expect: 'pump-drive-slipping',
      mustNotReach: ['pump-impeller-not-circulating', 'no-cause-found'],
      answers: {
        ...coldChecksPass('speed-or-load', 1.1),
        ...warmUp(99, 96),
        ...hosesNormal,
        ...fanWorks('staged'),
        ...noLowTemperatureLoop,
        'air-side-check': 'clear',
        'pump-drive-check': 'belt-slips',
      },
    },
    {
      name: 'Oil-soaked belt slipping when towing',
      story:
        'A 2012 Brenvik Aster 2.0 diesel overheats towing a trailer. A weeping cam cover has soaked the auxiliary belt in oil.',
      expect: 'pump-drive-slipping',
      answers: {
        ...coldChecksPass('speed-or-load', 1.4),
        ...warmUp(100, 97),
        ...hosesNormal,
        ...fanWorks('refrigerant-pressure'),
        'aux-loop-present': 'has-loop',
        'aux-pump-check': 'runs-quietly',
        'charge-air-log': { chargeAirTempMax: c(50), ambientTemp: c(20) },
        'air-side-check': 'clear',
        'pump-drive-check': 'belt-slips',
      },
    },
    {
      name: 'Loose belt found before a pump comes off',
      story:
        'A 2011 Morrow Kelt 1.6 petrol: no flow to the radiator in the bay and weak heat. Bleeding does not help; the pump is on the ribbed belt, and the belt is loose on a seized tensioner — found before the pump comes off.',
      expect: 'pump-drive-slipping',
      mustNotReach: ['pump-impeller-not-circulating'],
      answers: {
        ...coldChecksPass('no-pattern', 1.1),
        ...warmUp(107, 104),
        ...hoses(104, 74, 66),
        'circulation-check': 'little-circulation',
        ...stillNoFlowAfterBleed('conventional-auxiliary-belt'),
        'pump-belt-check': 'belt-slips',
      },
    },

    // ── Air in the main loop ───────────────────────────────────────────────────────────────
    {
      name: 'Overheating since a radiator replacement: bled first',
      story:
        'A 2016 Corvane Tessel 1.4 petrol has run hot since a radiator replacement elsewhere. The interview answer sends it to bleeding first: a big air pocket comes out of the main loop and the fault is gone.',
      expect: 'main-loop-air-lock',
      mustNotReach: ['pump-shroud-stuck'],
      answers: {
        'interview-pattern': 'after-cooling-work',
        'bleed-first': 'done',
        'bleed-first-result': 'cured-main-loop',
      },
    },
    {
      name: 'Air after a leak drew it in: little circulation, cured by bleeding',
      story:
        'A 2013 Pellan Orvo 1.4 petrol ran low on coolant from a hose now repaired; air drawn in sits at the top of the engine. The heater hoses are lukewarm; bleeding cures it.',
      expect: 'main-loop-air-lock',
      answers: {
        ...coldChecksPass('no-pattern', 1.2, 1.5),
        ...warmUp(108, 105),
        ...hoses(106, 70, 64),
        'circulation-check': 'little-circulation',
        'main-loop-bleed': 'done',
        'main-loop-retest': 'flows-now',
      },
    },
    {
      name: 'Large drop, even core: air pocket in the radiator',
      story:
        'A 2015 Halden Varro 1.6 petrol shows a 25 K drop across a radiator that warms evenly. An air pocket at the radiator’s top tank; bleeding cures it.',
      expect: 'main-loop-air-lock',
      answers: {
        ...coldChecksPass('speed-or-load', 1.4),
        ...warmUp(103, 100),
        ...hoses(103, 98, 73),
        'core-scan': 'even',
        'main-loop-bleed': 'done',
        'main-loop-retest': 'flows-now',
      },
    },

    // ── No cause found (honest referrals) ──────────────────────────────────────────────────
    {
      name: 'Map-controlled engine at 106 °C: normal, not a thermostat fault',
      story:
        'A 2018 Halden Varro 1.6 petrol’s owner saw 106 °C on a phone app at part load. The engine has a map-controlled thermostat: read under load on a road test, the engine drops to 94 °C with the inlet at 90 °C. Fan, air side and belt are fine; a loaded road test never passes 108 °C. Nothing is wrong.',
      expect: 'no-cause-found',
      mustNotReach: ['thermostat-stuck-closed', 'pump-shroud-stuck'],
      answers: {
        ...coldChecksPass('no-pattern', 1.4),
        ...warmUp(106, 103),
        ...hoses(94, 90, 84),
        ...fanWorks('variable-speed', 105),
        ...noLowTemperatureLoop,
        'air-side-check': 'clear',
        'pump-drive-check': 'not-on-auxiliary-belt',
        ...roadTest(107, 96, 90),
      },
    },
    {
      name: 'Bleeding could not be done: referred, not sent to pump removal',
      story:
        'A 2017 Corvane Tessel 1.4 petrol: hot engine and cool inlet with lukewarm heater hoses, but the bleed screw is seized and the workshop has no vacuum filler. The old walk went straight to a three-hour pump job; now it is referred with the evidence so far.',
      expect: 'no-cause-found',
      mustNotReach: ['pump-shroud-stuck', 'pump-impeller-not-circulating'],
      answers: {
        ...coldChecksPass('speed-or-load', 1.4),
        ...warmUp(111, 108),
        ...hoses(109, 60, 54),
        'circulation-check': 'little-circulation',
        'main-loop-bleed': 'could-not-do',
      },
    },
    {
      name: 'Switchable pump answers the scan tool: not condemned yet',
      story:
        'A 2016 Corvane Tessel 1.4 petrol showed no flow after bleeding, but commanded from the scan tool the pump flows and the inlet warms within a minute. The shroud may stick only now and then; the next episode is to be logged before the pump comes off.',
      expect: 'no-cause-found',
      mustNotReach: ['pump-shroud-stuck'],
      answers: {
        ...coldChecksPass('no-pattern', 1.4),
        ...warmUp(110, 107),
        ...hoses(108, 62, 55),
        'circulation-check': 'little-circulation',
        ...stillNoFlowAfterBleed('switchable'),
        'pump-valve-check': 'circuit-good',
        'pump-actuation-test': 'responds',
      },
    },
    {
      name: 'Healthy car, variable-speed fan working, no episode: nothing blamed',
      story:
        'A 2019 Quillon Dask 2.0 turbo petrol’s driver saw the needle twitch once. The variable-speed fan runs slowly at first and faster as commanded — it never "switches stage", and it is working. Nothing shows in the bay or on a loaded road test.',
      expect: 'no-cause-found',
      mustNotReach: ['fan-stage-not-switching'],
      answers: {
        ...coldChecksPass('no-pattern', 1.5),
        ...warmUp(98, 95),
        ...hosesNormal,
        ...fanWorks('variable-speed', 102),
        'aux-loop-present': 'has-loop',
        'aux-pump-check': 'runs-quietly',
        'charge-air-log': { chargeAirTempMax: c(45), ambientTemp: c(18) },
        'air-side-check': 'clear',
        'pump-drive-check': 'belt-sound',
        ...roadTest(101, 95, 89),
      },
    },

    // ── Healthy parts that must not be blamed, and the old misroutings ─────────────────────
    {
      name: 'A sound 1.4 bar cap passes; a cold system whose pressure rose is retested, not called gas',
      story:
        'A 2017 Corvane Tessel 1.4 petrol had been driven in just before the test: its sound 1.4 bar cap passes, and during the first hold the pressure rose from 1.4 to 1.5 bar as the block warmed the coolant. A stopped engine makes no gas: the retest on the cooled system holds. The real fault is a staged fan without its higher stage.',
      expect: 'fan-stage-not-switching',
      mustNotReach: ['combustion-gas-in-coolant', 'cap-not-holding', 'cap-opens-too-high'],
      answers: {
        ...interview('idle-or-traffic', 0.2),
        ...noLeakSeen,
        ...ethylene(),
        ...capSound(1.4),
        'pressure-test': {
          testPressure: bar(1.4),
          pressureAfterHold: bar(1.5),
          holdMinutes: minutes(15),
        },
        'pressure-retest': {
          retestPressure: bar(1.4),
          retestAfterHold: bar(1.38),
          retestMinutes: minutes(15),
        },
        ...blockTestClean,
        ...warmUp(103, 100),
        ...hosesNormal,
        'fan-switch': { fanOnTemp: c(98) },
        'fan-drive-type': 'staged',
        'fan-ac-stage': 'no-higher-stage',
      },
    },
    {
      name: 'Road-test peak not compared with hoses read later',
      story:
        'A 2016 Halden Varro 1.6 petrol peaked at 112 °C on the customer’s drive (entered at the warm-up), but the hoses were read later with live data at 97 °C: inlet 93 °C, outlet 87 °C — normal flow. The old walk mixed the two moments and sent it to the thermostat. The real fault is a refrigerant-pressure fan that ignores the pressure.',
      expect: 'fan-stage-not-switching',
      mustNotReach: ['thermostat-stuck-closed', 'pump-shroud-stuck'],
      answers: {
        ...coldChecksPass('idle-or-traffic', 1.4),
        ...warmUp(112, 109),
        ...hoses(97, 93, 87),
        'fan-switch': { fanOnTemp: c(100) },
        'fan-drive-type': 'refrigerant-pressure',
        'fan-ac-pressure-check': 'no-response',
      },
    },
    {
      name: 'Thermostat passes the pan test; air was the problem',
      story:
        'A 2014 Morrow Kelt 1.6 petrol: hot engine and cool inlet, heater hoses hot. The thermostat stamped 88 °C opens at 89 °C and fully; refitted and bled, the radiator gets flow and the fault is gone.',
      expect: 'main-loop-air-lock',
      mustNotReach: ['thermostat-stuck-closed'],
      answers: {
        ...coldChecksPass('no-pattern', 1.1),
        ...warmUp(109, 106),
        ...hoses(107, 66, 60),
        'circulation-check': 'circulates',
        ...thermostatGood(88, 89),
        'main-loop-bleed': 'done',
        'main-loop-retest': 'flows-now',
      },
    },
    {
      name: 'Thermostat that cannot be tested here: referred, not sent on to the pump',
      story:
        'A 2017 Halden Varro 1.6 petrol with a map-controlled thermostat; the workshop has no data for its heater element. The thermostat stays unproven and the case goes to the lead instead of on to the pump.',
      expect: 'no-cause-found',
      mustNotReach: ['pump-shroud-stuck', 'thermostat-stuck-closed'],
      answers: {
        ...coldChecksPass('speed-or-load', 1.4),
        ...warmUp(115, 112),
        ...hoses(113, 70, 64),
        'circulation-check': 'circulates',
        'thermostat-test': 'done',
        'thermostat-opened': 'needs-maker-test',
        'thermostat-maker-test': 'cannot-test',
      },
    },
    {
      name: 'After a hose repair, bleeding does not cure it: full walk finds the fan',
      story:
        'A 2013 Pellan Orvo 1.4 petrol has run hot in traffic since a hose was replaced. Bled first as the interview suggests, it still runs hot; the full checks find the fan motor dead.',
      expect: 'fan-stage-not-switching',
      mustNotReach: ['main-loop-air-lock'],
      answers: {
        'interview-pattern': 'after-cooling-work',
        'bleed-first': 'done',
        'bleed-first-result': 'not-cured',
        'level-cold': { topUpLitres: litres(0) },
        ...noLeakSeen,
        ...ethylene(),
        ...capSound(1.2),
        ...pressureHolds(1.2),
        ...blockTestClean,
        ...warmUp(105, 102),
        ...hoses(100, 97, 96),
        'fan-switch': { fanOnTemp: c(113) },
      },
    },
    {
      name: 'Variable-speed fan working, thermostat fine: the shroud found on the road',
      story:
        'A 2018 Corvane Tessel 1.4 petrol with a variable-speed fan that never "switches stage" yet follows its command: the fan is not blamed. The overheating is caught on the road and traced to a stuck shroud.',
      expect: 'pump-shroud-stuck',
      mustNotReach: ['fan-stage-not-switching'],
      answers: {
        ...coldChecksPass('speed-or-load', 1.4),
        ...warmUp(99, 97),
        ...hosesNormal,
        ...fans,
        ...noLowTemperatureLoop,
        'air-side-check': 'clear',
        'pump-drive-check': 'not-on-auxiliary-belt',
        ...roadTest(117, 64, 57),
        'circulation-check': 'little-circulation',
        ...stillNoFlowAfterBleed('switchable'),
        'pump-valve-check': 'circuit-good',
        'pump-actuation-test': 'no-response',
        'pump-removal': 'done',
        'shroud-inspection': 'stuck-out',
      },
    },
  ],
});
