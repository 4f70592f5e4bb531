// Scenario bank for the shipped tree "coolant-level-dropping": each scenario is a car a technician
// could meet, with one true fault (or a healthy part that must not be blamed) and the answers given
// at each step. scenario-bank.test.ts walks every one through the compiled tree.
//
// Makes and models are invented. Readings are the ones a real car of that kind gives: caps of
// 1.4–1.6 bar on modern cars and 0.9–1.2 bar on older ones, a cold pressure test held at the
// rating, a few hundredths of a bar of gauge wander on a sound system.
import type { ScenarioAnswer, ScenarioReading } from './scenario.js';
import { scenarioBank } from './scenario.js';

type Answers = Record<string, ScenarioAnswer>;

const bar = (value: number): ScenarioReading => [value, 'bar'];
const litres = (value: number): ScenarioReading => [value, 'L'];
const minutes = (value: number): ScenarioReading => [value, 'min'];
const plain = (value: number): ScenarioReading => [value, 'none'];

/** No recent work on the cooling system. */
const noRecentWork: Answers = { 'recent-work': 'no-recent-work' };

/** The loss measured with the distance in kilometres. */
const lossKm = (topUp: number, km: number): Answers => ({
  'distance-unit': 'kilometres',
  'loss-amount': { topUpLitres: litres(topUp), distanceSinceFullKm: plain(km) },
});

/** The loss measured with the distance in miles. */
const lossMiles = (topUp: number, miles: number): Answers => ({
  'distance-unit': 'miles',
  'loss-amount-miles': { topUpLitresMiles: litres(topUp), distanceSinceFullMiles: plain(miles) },
});

/** Nothing visible outside and a dry cabin. */
const dryOutsideAndCabin: Answers = { 'visual-leaks': 'none-seen', 'cabin-signs': 'cabin-dry' };

/** A cold pressure test at the cap rating that holds within the gauge's wander. */
const pressureHolds = (rating: number, minutesHeld = 15): Answers => ({
  'pressure-test-cold': {
    capRating: bar(rating),
    testPressure: bar(rating),
    pressureAfterHold: bar(rating - 0.02),
    holdMinutes: minutes(minutesHeld),
  },
});

/** A cold pressure test at the cap rating that falls by `fall` bar over `held` minutes. */
const pressureFalls = (rating: number, fall: number, held = 15): Answers => ({
  'pressure-test-cold': {
    capRating: bar(rating),
    testPressure: bar(rating),
    pressureAfterHold: bar(rating - fall),
    holdMinutes: minutes(held),
  },
});

/** A sound cap: opens at its rating, settles a little, vacuum valve free. */
const capSound = (rating: number): Answers => ({
  'cap-test': { capOpening: bar(rating - 0.05), capHeldAfterMinute: bar(rating - 0.08) },
  'cap-vacuum-valve': 'vacuum-valve-ok',
});

/** No quick pressure build-up on a cold start. */
const noColdStartRise: Answers = { 'cold-start-pressure': { coldStartRise: bar(0.05) } };

/** Everything outside the engine checks out, up to the hot drive. */
const outsideSound = (rating: number): Answers => ({
  ...dryOutsideAndCabin,
  ...pressureHolds(rating),
  ...capSound(rating),
  ...noColdStartRise,
});

const INTERNAL = ['coolant-into-cylinder', 'coolant-into-oil', 'combustion-gas-in-coolant'];

export const coolantLevelDroppingScenarios = scenarioBank({
  treeId: 'coolant-level-dropping',
  confirmations: {
    // Coolant seen at the heater under pressure (the heater side watched, or found under
    // pressure in the cabin) before a heater-core job.
    'heater-core-leak': ['heater-leak-result', 'leak-location'],
    // Coolant traced to the pump under cold pressure, or traced upwards with dye after a run.
    'coolant-pump-seal-leak': ['leak-location', 'pump-leak-traced'],
    // Borescope signs confirmed by a leak-down with the tank watched.
    'coolant-into-cylinder': ['leak-down-result'],
    // A rising oil level, milky dipstick oil or oil analysis — not mayonnaise under the cap.
    'coolant-into-oil': ['oil-contamination-check'],
    // A quick cold-start pressure build-up confirmed by the chemical block test.
    'combustion-gas-in-coolant': ['block-test-result'],
  },
  scenarios: [
    // ── Air leaving after a drain or refill ────────────────────────────────────────────────
    {
      name: 'Level fell after a coolant change; air purging, no leak',
      story:
        'A 2016 Corvane 1.4 petrol estate had its coolant changed at the last service. The owner has topped up twice since, about 0.4 L in all, and is worried. Air trapped at the refill is working its way out. After a bleed and a purge drive the level stays at its mark.',
      expect: 'air-purged-after-refill',
      mustNotReach: ['hose-or-clamp-leak', 'heater-core-leak', 'further-checks-needed'],
      answers: {
        'recent-work': 'since-work',
        'purge-air': 'done',
        'level-after-purge': 'level-steady',
      },
    },
    {
      name: 'Level fell after a thermostat change; air in the heater loop',
      story:
        'A 2012 Velmora 2.0 diesel saloon had its thermostat replaced by another garage a fortnight ago. Since then the tank has needed 0.3 L and the heater blows lukewarm at idle. The heater loop held air; bled as the maker describes, the heat comes back and the level holds.',
      expect: 'air-purged-after-refill',
      mustNotReach: ['heater-core-leak', 'coolant-pump-seal-leak'],
      answers: {
        'recent-work': 'since-work',
        'purge-air': 'done',
        'level-after-purge': 'level-steady',
      },
    },
    {
      name: 'Air lock in the low-temperature loop after a radiator change',
      story:
        'A 2019 Ardentis 1.5 turbo petrol hatchback with an indirect charge-air cooler had a new radiator fitted. The level dropped 0.5 L over the first week. Vacuum filling had left an air lock in the auxiliary loop; the scan tool’s bleed routine and a drive to temperature purged it and the level stays put.',
      expect: 'air-purged-after-refill',
      mustNotReach: ['radiator-or-tank-leak', 'hose-or-clamp-leak'],
      answers: {
        'recent-work': 'since-work',
        'purge-air': 'done',
        'level-after-purge': 'level-steady',
      },
    },

    // ── Expansion tank overfilled ──────────────────────────────────────────────────────────
    {
      name: 'Owner filled the tank to the neck',
      story:
        'A 2014 Brisca 1.2 petrol city car: the owner filled the tank to the neck after reading a warning light article, then saw the level fall and pink crust at the vent. It took 0.25 L in 2,000 km to reach MAX again, and it has stopped there.',
      expect: 'overfilled-expansion-tank',
      mustNotReach: ['cap-not-holding', 'no-loss-found'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.25, 2000),
        'overflow-check': 'overfilled',
      },
    },
    {
      name: 'Overfilled at a roadside top-up; distance in miles',
      story:
        'A 2011 Halvard 1.6 petrol estate with a miles odometer was topped up far above MAX at a filling station. Over 1,500 miles it lost 0.2 L, all of it out of the vent in the first few drives, and now sits at MAX.',
      expect: 'overfilled-expansion-tank',
      mustNotReach: ['radiator-or-tank-leak'],
      answers: {
        ...noRecentWork,
        ...lossMiles(0.2, 1500),
        'overflow-check': 'overfilled',
      },
    },
    {
      name: 'Overfilled, distance not known',
      story:
        'A 2017 Tamsen 1.0 petrol hatchback: the customer cannot say how far it has gone since the tank was last full, but admits filling it “to the top” with a jug. The level has fallen to MAX and the vent shows dried residue.',
      expect: 'overfilled-expansion-tank',
      answers: {
        ...noRecentWork,
        'distance-unit': 'distance-unknown',
        'overflow-check': 'overfilled',
      },
    },

    // ── Leaking hose or clamp ──────────────────────────────────────────────────────────────
    {
      name: 'Crusted lower hose clamp, pressure falls fast',
      story:
        'A 2013 Norvik 1.6 diesel van loses about 1.5 L per 1,000 km. Pink crust sits on the lower radiator hose clamp. Held at its 1.4 bar rating, the system falls to 1.1 bar in ten minutes and coolant drips from the clamp.',
      expect: 'hose-or-clamp-leak',
      mustNotReach: ['coolant-pump-seal-leak', 'radiator-or-tank-leak'],
      answers: {
        ...noRecentWork,
        ...lossKm(1.5, 1000),
        'visual-leaks': 'leak-seen',
        ...pressureFalls(1.4, 0.3, 10),
        'find-leak': 'done',
        'leak-location': 'hose-or-clamp',
      },
    },
    {
      name: 'Pumped to 2.5 bar on a 1.0 bar system: the test is repeated at the rating',
      story:
        'A 1998 Peloria 1.8 petrol coupé with a 1.0 bar cap loses about 0.8 L per 1,000 km. The first pressure test was pumped to 2.5 bar and “held” at 2.45 bar, which proves nothing and risks the old hoses. Repeated at 1.0 bar for twenty minutes it falls to 0.85 bar, and a split bypass hose weeps under the inlet manifold.',
      expect: 'hose-or-clamp-leak',
      mustNotReach: ['cap-not-holding', 'no-loss-found', 'cap-opens-too-high'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.8, 1000),
        ...dryOutsideAndCabin,
        'pressure-test-cold': {
          capRating: bar(1.0),
          testPressure: bar(2.5),
          pressureAfterHold: bar(2.45),
          holdMinutes: minutes(15),
        },
        'pressure-retest': {
          retestPressure: bar(1.0),
          retestAfterHold: bar(0.85),
          retestMinutes: minutes(20),
        },
        'find-leak': 'done',
        'leak-location': 'hose-or-clamp',
      },
    },
    {
      name: 'Heater hose clamp weeps only when hot',
      story:
        'A 2015 Quenby 1.4 turbo petrol saloon loses 0.6 L per 1,000 km with no trace when cold. Pressure test and cap are fine. After a hot drive a heater hose spring clamp at the bulkhead drips as the hose expands; cold, it seals again.',
      expect: 'hose-or-clamp-leak',
      mustNotReach: ['heater-core-leak', 'no-loss-found', ...INTERNAL],
      answers: {
        ...noRecentWork,
        ...lossKm(0.6, 1000),
        ...outsideSound(1.4),
        'hot-leak-check': 'leaks-when-hot',
      },
    },
    {
      name: 'Wet footwell from a scuttle leak; the coolant goes out at a hose',
      story:
        'A 2010 Sorrel 1.9 diesel estate has a wet passenger footwell after rain and loses 1 L per 1,000 km. The water is clear and odourless: the scuttle drains are blocked with leaves. The coolant leaks separately from a perished hose under the battery tray, found under pressure.',
      expect: 'hose-or-clamp-leak',
      mustNotReach: ['heater-core-leak'],
      answers: {
        ...noRecentWork,
        ...lossKm(1.0, 1000),
        'visual-leaks': 'none-seen',
        'cabin-signs': 'cabin-signs-found',
        'cabin-wet-check': 'water-only',
        ...pressureFalls(1.4, 0.15, 15),
        'find-leak': 'done',
        'leak-location': 'hose-or-clamp',
      },
    },
    {
      name: 'Wet trail on the pump comes from the thermostat housing hose above',
      story:
        'A 2014 Velmora 1.6 petrol hatchback shows a wet trail down the coolant pump after a hot drive. Cleaned and traced with dye after a run, the trail starts at the top hose clamp on the thermostat housing and runs down over the pump. The pump is sound.',
      expect: 'hose-or-clamp-leak',
      mustNotReach: ['coolant-pump-seal-leak'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.7, 1000),
        ...outsideSound(1.5),
        'hot-leak-check': 'pump-wet-hot',
        'trace-pump-leak': 'done',
        'pump-leak-traced': 'starts-above',
      },
    },
    {
      name: 'Still dropping after a hose job; the new clamp is loose',
      story:
        'A 2018 Corvane 1.0 turbo petrol hatchback had a top hose replaced last month and keeps losing coolant. A purge drive does not stop it: 0.9 L per 1,000 km. The new clamp was left loose and weeps under pressure.',
      expect: 'hose-or-clamp-leak',
      mustNotReach: ['air-purged-after-refill'],
      answers: {
        'recent-work': 'since-work',
        'purge-air': 'done',
        'level-after-purge': 'still-dropping',
        ...lossKm(0.9, 1000),
        'visual-leaks': 'leak-seen',
        ...pressureFalls(1.5, 0.2, 15),
        'find-leak': 'done',
        'leak-location': 'hose-or-clamp',
      },
    },

    // ── Coolant pump leaking ───────────────────────────────────────────────────────────────
    {
      name: 'Weep hole runs under cold pressure',
      story:
        'A 2012 Halvard 2.0 diesel estate with its pump behind the timing belt loses 1.2 L per 1,000 km. Brown crust under the pump; at 1.5 bar the gauge falls 0.2 bar in fifteen minutes and coolant runs from the weep hole itself, nothing above it wet.',
      expect: 'coolant-pump-seal-leak',
      mustNotReach: ['hose-or-clamp-leak'],
      answers: {
        ...noRecentWork,
        ...lossKm(1.2, 1000),
        'visual-leaks': 'leak-seen',
        ...pressureFalls(1.5, 0.2, 15),
        'find-leak': 'done',
        'leak-location': 'pump',
      },
    },
    {
      name: 'Pump seal weeps only with the engine running',
      story:
        'A 2016 Tamsen 1.5 petrol saloon loses 0.6 L per 1,000 km. Cold, everything holds: pressure test, cap, no gas. After a hot drive a fresh trail runs from the pump; cleaned, dyed and run again, the dye starts at the weep hole. The shaft seal leaks only while turning.',
      expect: 'coolant-pump-seal-leak',
      mustNotReach: ['no-loss-found', ...INTERNAL],
      answers: {
        ...noRecentWork,
        ...lossKm(0.6, 1000),
        ...outsideSound(1.4),
        'hot-leak-check': 'pump-wet-hot',
        'trace-pump-leak': 'done',
        'pump-leak-traced': 'starts-at-pump',
      },
    },
    {
      name: 'Crust at the weep hole, cold test holds; miles odometer',
      story:
        'A 2009 Brisca 1.4 petrol van (miles) used 1 L in 900 miles. There is old crust under the weep hole but the cold test holds at 1.2 bar. The cap is sound and no gas builds. After a run the weep hole drips and the dye confirms the pump.',
      expect: 'coolant-pump-seal-leak',
      mustNotReach: ['hose-or-clamp-leak', 'no-loss-found'],
      answers: {
        ...noRecentWork,
        ...lossMiles(1.0, 900),
        'visual-leaks': 'leak-seen',
        ...pressureHolds(1.2, 20),
        ...capSound(1.2),
        ...noColdStartRise,
        'hot-leak-check': 'pump-wet-hot',
        'trace-pump-leak': 'done',
        'pump-leak-traced': 'starts-at-pump',
      },
    },

    // ── Radiator or expansion tank leaking ─────────────────────────────────────────────────
    {
      name: 'Expansion tank seam cracked',
      story:
        'A 2013 Quenby 1.6 petrol estate loses 1 L per 1,000 km. A white crust runs along the expansion tank’s lower seam. At 1.4 bar the gauge falls 0.25 bar in ten minutes and the seam beads with coolant.',
      expect: 'radiator-or-tank-leak',
      mustNotReach: ['hose-or-clamp-leak'],
      answers: {
        ...noRecentWork,
        ...lossKm(1.0, 1000),
        'visual-leaks': 'leak-seen',
        ...pressureFalls(1.4, 0.25, 10),
        'find-leak': 'done',
        'leak-location': 'radiator-or-tank',
      },
    },
    {
      name: 'Radiator end-tank crimp weeps only when hot',
      story:
        'A 2011 Norvik 2.2 diesel pick-up loses 0.7 L per 1,000 km. Cold, the system holds 1.4 bar and the cap is good. After a hot, loaded drive the plastic end tank’s crimp seam on the radiator drips.',
      expect: 'radiator-or-tank-leak',
      mustNotReach: ['no-loss-found', ...INTERNAL],
      answers: {
        ...noRecentWork,
        ...lossKm(0.7, 1000),
        ...outsideSound(1.4),
        'hot-leak-check': 'radiator-or-tank-hot',
      },
    },
    {
      name: 'Stone-chip pinhole in the radiator core, found with dye',
      story:
        'A 2017 Ardentis 2.0 petrol saloon loses 0.6 L per 1,000 km with nothing visible from above. Held at 1.5 bar the gauge creeps down 0.1 bar in twenty minutes; with dye and the UV lamp from below, a pinhole in the core behind the bumper glows.',
      expect: 'radiator-or-tank-leak',
      mustNotReach: ['no-loss-found'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.6, 1000),
        ...dryOutsideAndCabin,
        ...pressureFalls(1.5, 0.1, 20),
        'find-leak': 'done',
        'leak-location': 'radiator-or-tank',
      },
    },

    // ── Heater core leaking ────────────────────────────────────────────────────────────────
    {
      name: 'Sweet smell and greasy glass; coolant at the heater under pressure',
      story:
        'A 2012 Sorrel 1.6 petrol hatchback mists up with a sweet smell and leaves a greasy film on the screen; the passenger carpet is damp and sticky. With the system at 1.4 bar and the lower trim off, coolant beads at the heater core’s pipe flange inside the housing.',
      expect: 'heater-core-leak',
      answers: {
        ...noRecentWork,
        ...lossKm(0.8, 1000),
        'visual-leaks': 'none-seen',
        'cabin-signs': 'cabin-signs-found',
        'cabin-wet-check': 'coolant-signs',
        'heater-leak-watch': 'done',
        'heater-leak-result': 'heater-core-wet',
      },
    },
    {
      name: 'Damp carpet, cannot tell; the dye glows at the heater housing drain',
      story:
        'A 2015 Peloria 2.0 diesel estate has a damp driver’s footwell and loses 0.5 L per 1,000 km. The underlay smells of nothing much. Under pressure with dye, the heater housing’s drain glows under the UV lamp: the core weeps.',
      expect: 'heater-core-leak',
      answers: {
        ...noRecentWork,
        ...lossKm(0.5, 1000),
        'visual-leaks': 'none-seen',
        'cabin-signs': 'cabin-signs-found',
        'cabin-wet-check': 'cannot-tell',
        'heater-leak-watch': 'done',
        'heater-leak-result': 'heater-core-wet',
      },
    },
    {
      name: 'Cabin still dry; the pressure test finds the core',
      story:
        'A 2018 Velmora 1.5 petrol hatchback loses 0.6 L per 1,000 km and the cabin is still dry: the leak runs out of the heater housing onto the floor pan seam. Held at 1.5 bar the gauge falls 0.15 bar in fifteen minutes, and searching under pressure finds coolant inside the housing at the core.',
      expect: 'heater-core-leak',
      answers: {
        ...noRecentWork,
        ...lossKm(0.6, 1000),
        ...dryOutsideAndCabin,
        ...pressureFalls(1.5, 0.15, 15),
        'find-leak': 'done',
        'leak-location': 'inside-cabin',
      },
    },

    // ── Pressure cap opens early or does not hold ──────────────────────────────────────────
    {
      name: 'Modern 1.4 bar cap opens at 0.8 bar',
      story:
        'A 2016 Halvard 1.2 turbo petrol hatchback loses 0.5 L per 1,000 km and the tank vent is crusted, though it was never overfilled. System holds 1.4 bar cold; the cap opens at 0.8 bar and boils coolant out after hard drives.',
      expect: 'cap-not-holding',
      mustNotReach: ['combustion-gas-in-coolant', 'no-loss-found'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.5, 1000),
        ...dryOutsideAndCabin,
        ...pressureHolds(1.4),
        'cap-test': { capOpening: bar(0.8), capHeldAfterMinute: bar(0.75) },
      },
    },
    {
      name: 'Cap opens on time but its seal lets the pressure go',
      story:
        'A 2014 Brisca 1.6 diesel van (1.5 bar cap) loses 0.3 L per 1,500 km. The cap opens at 1.5 bar, but its perished seal lets the pressure fall to 1.2 bar within a minute.',
      expect: 'cap-not-holding',
      mustNotReach: ['overfilled-expansion-tank'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.3, 1500),
        'overflow-check': 'not-overfilled',
        ...dryOutsideAndCabin,
        ...pressureHolds(1.5),
        'cap-test': { capOpening: bar(1.5), capHeldAfterMinute: bar(1.2) },
      },
    },
    {
      name: 'Wet footwell from a blocked A/C condensate outlet; the cap is the loss',
      story:
        'A 2017 Corvane 1.6 diesel estate has a wet front footwell after days with the A/C on, and loses 0.6 L per 1,000 km. The water is clear and odourless: the evaporator’s condensate outlet is blocked. The coolant goes out of the tank because the 1.4 bar cap opens at 0.9 bar. The heater core is sound.',
      expect: 'cap-not-holding',
      mustNotReach: ['heater-core-leak'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.6, 1000),
        'visual-leaks': 'none-seen',
        'cabin-signs': 'cabin-signs-found',
        'cabin-wet-check': 'water-only',
        ...pressureHolds(1.4),
        'cap-test': { capOpening: bar(0.9), capHeldAfterMinute: bar(0.85) },
      },
    },

    // ── Pressure cap opens far above its rating ────────────────────────────────────────────
    {
      name: '1.4 bar cap sticks shut to 2.0 bar',
      story:
        'A 2015 Tamsen 1.4 petrol hatchback loses 0.5 L per 1,000 km and has split a top hose once already. The system holds cold, but the 1.4 bar cap does not open until 2.0 bar: hot, the system runs far above its design pressure and pushes coolant out at weak seals.',
      expect: 'cap-opens-too-high',
      mustNotReach: ['cap-vacuum-valve-stuck', 'no-loss-found'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.5, 1000),
        ...dryOutsideAndCabin,
        ...pressureHolds(1.4),
        'cap-test': { capOpening: bar(2.0), capHeldAfterMinute: bar(1.95) },
      },
    },
    {
      name: 'Old 1.0 bar cap has not opened at 1.3 bar',
      story:
        'A 1999 Norvik 1.6 petrol saloon with a 1.0 bar cap loses 0.6 L per 1,000 km and its tank bulges when hot. The cap had not opened at 1.3 bar when the technician stopped pumping: its spring is seized with scale.',
      expect: 'cap-opens-too-high',
      mustNotReach: ['cap-not-holding'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.6, 1000),
        ...dryOutsideAndCabin,
        ...pressureHolds(1.0),
        'cap-test': { capOpening: bar(1.3), capHeldAfterMinute: bar(1.3) },
      },
    },
    {
      name: 'Wrong cap fitted: 1.6 bar cap on a system the maker rates at 1.0 bar',
      story:
        'A 2003 Sorrel 1.8 petrol estate, maker’s rating 1.0 bar, came in with a 1.6 bar cap from another engine fitted by a previous owner. It loses 0.5 L per 1,000 km at the radiator seams when hot. Tested against the maker’s 1.0 bar, the cap opens at 1.6 bar.',
      expect: 'cap-opens-too-high',
      mustNotReach: ['radiator-or-tank-leak'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.5, 1000),
        ...dryOutsideAndCabin,
        ...pressureHolds(1.0),
        'cap-test': { capOpening: bar(1.6), capHeldAfterMinute: bar(1.55) },
      },
    },

    // ── Pressure cap's vacuum valve stuck ──────────────────────────────────────────────────
    {
      name: 'Top hose flat every morning; vacuum valve corroded shut',
      story:
        'A 2010 Peloria 1.4 petrol hatchback loses 0.5 L per 1,000 km and the owner notices the top hose is flat in the morning. Pressure test and opening pressure are fine, but the cap’s vacuum valve is corroded to its seat and will not lift.',
      expect: 'cap-vacuum-valve-stuck',
      mustNotReach: ['combustion-gas-in-coolant', 'no-loss-found'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.5, 1000),
        ...dryOutsideAndCabin,
        ...pressureHolds(1.4),
        'cap-test': { capOpening: bar(1.38), capHeldAfterMinute: bar(1.35) },
        'cap-vacuum-valve': 'vacuum-valve-stuck',
      },
    },
    {
      name: 'Air rushes in when the cold cap is released',
      story:
        'A 2013 Ardentis 1.6 diesel estate with a 1.5 bar cap: when the cold cap was released a rush of air went IN. The vacuum valve is gummed with old coolant deposits and sticks.',
      expect: 'cap-vacuum-valve-stuck',
      answers: {
        ...noRecentWork,
        ...lossKm(0.4, 800),
        ...dryOutsideAndCabin,
        ...pressureHolds(1.5),
        'cap-test': { capOpening: bar(1.5), capHeldAfterMinute: bar(1.45) },
        'cap-vacuum-valve': 'vacuum-valve-stuck',
      },
    },
    {
      name: 'Pattern cap with a sticky vacuum valve; miles odometer',
      story:
        'A 2008 Quenby 2.0 petrol saloon (miles) used 0.6 L in 600 miles after a cheap pattern cap was fitted. The cap opens on time at 1.2 bar, but its vacuum valve sticks half-way and the expansion tank is pulled in after a cool-down.',
      expect: 'cap-vacuum-valve-stuck',
      answers: {
        ...noRecentWork,
        ...lossMiles(0.6, 600),
        ...dryOutsideAndCabin,
        ...pressureHolds(1.2),
        'cap-test': { capOpening: bar(1.18), capHeldAfterMinute: bar(1.15) },
        'cap-vacuum-valve': 'vacuum-valve-stuck',
      },
    },

    // ── Combustion gas in the coolant ──────────────────────────────────────────────────────
    {
      name: 'Diesel: pressure builds at once on a cold start, block test turns',
      story:
        'A 2012 Halvard 2.0 diesel van loses 1 L per 1,000 km and the tank hisses after motorway runs. Cold, the system holds and the cap is good; on a cold start the gauge climbs 0.6 bar in under two minutes and the block-test fluid turns.',
      expect: 'combustion-gas-in-coolant',
      mustNotReach: ['cap-not-holding'],
      answers: {
        ...noRecentWork,
        ...lossKm(1.0, 1000),
        ...dryOutsideAndCabin,
        ...pressureHolds(1.4),
        ...capSound(1.4),
        'cold-start-pressure': { coldStartRise: bar(0.6) },
        'block-test': 'done',
        'block-test-result': 'gas-found',
      },
    },
    {
      name: 'Turbo petrol: 0.35 bar in two minutes, block test positive',
      story:
        'A 2017 Velmora 1.4 turbo petrol hatchback loses 0.8 L per 1,000 km with no leak and a sound cap. On a cold start the tester climbs 0.35 bar in two minutes with each blip, and the block test confirms combustion gas.',
      expect: 'combustion-gas-in-coolant',
      answers: {
        ...noRecentWork,
        ...lossKm(0.8, 1000),
        ...dryOutsideAndCabin,
        ...pressureHolds(1.5),
        ...capSound(1.5),
        'cold-start-pressure': { coldStartRise: bar(0.35) },
        'block-test': 'done',
        'block-test-result': 'gas-found',
      },
    },
    {
      name: 'Leaking exhaust-gas cooler pushes gas in; miles odometer',
      story:
        'A 2014 Norvik 2.2 diesel pick-up (miles) used 1.2 L in 700 miles, coolant spat out of the tank vent after towing. The cold system holds, the cap is good; the gauge rises 0.3 bar on a cold start and the block test turns. The exhaust-gas recirculation cooler is the likely path, to be located next.',
      expect: 'combustion-gas-in-coolant',
      answers: {
        ...noRecentWork,
        ...lossMiles(1.2, 700),
        ...dryOutsideAndCabin,
        ...pressureHolds(1.4),
        ...capSound(1.4),
        'cold-start-pressure': { coldStartRise: bar(0.3) },
        'block-test': 'done',
        'block-test-result': 'gas-found',
      },
    },

    // ── Coolant leaking into a cylinder ────────────────────────────────────────────────────
    {
      name: 'White, sweet exhaust; a steam-cleaned piston; leak-down bubbles',
      story:
        'A 2011 Brisca 1.6 petrol estate loses 1 L per 1,000 km. Outside everything holds and no gas builds at a cold start. On the drive the exhaust stays white and sweet when warm; the borescope shows number 3 piston steam-cleaned, and with number 3 under air the tank bubbles: a head gasket.',
      expect: 'coolant-into-cylinder',
      mustNotReach: ['no-loss-found'],
      answers: {
        ...noRecentWork,
        ...lossKm(1.0, 1000),
        ...outsideSound(1.4),
        'hot-leak-check': 'white-exhaust',
        'cylinder-check': 'done',
        'cylinder-check-result': 'cylinder-signs',
        'leak-down-test': 'done',
        'leak-down-result': 'bubbles-from-cylinder',
      },
    },
    {
      name: 'No smoke to see (the catalyst hides it), but one piston is clean',
      story:
        'A 2019 Tamsen 1.0 turbo petrol hatchback loses 0.6 L per 1,000 km and nothing shows anywhere, not even smoke. The borescope finds number 2 piston steam-cleaned and the leak-down streams bubbles into the tank from number 2: the head has a crack between the water jacket and the chamber.',
      expect: 'coolant-into-cylinder',
      mustNotReach: ['no-loss-found'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.6, 1000),
        ...outsideSound(1.5),
        'hot-leak-check': 'nothing-found',
        'cylinder-check': 'done',
        'cylinder-check-result': 'cylinder-signs',
        'leak-down-test': 'done',
        'leak-down-result': 'bubbles-from-cylinder',
      },
    },
    {
      name: 'Pressure falls with nothing outside; coolant on a piston',
      story:
        'A 2013 Sorrel 2.0 petrol saloon loses 1.2 L per 1,000 km. Held at 1.4 bar the gauge falls 0.2 bar in fifteen minutes and nothing shows outside or in the cabin. The oil is clean and its level steady. The borescope shows coolant standing on number 4 piston; the leak-down confirms the path into the cooling system.',
      expect: 'coolant-into-cylinder',
      mustNotReach: ['coolant-into-oil'],
      answers: {
        ...noRecentWork,
        ...lossKm(1.2, 1000),
        ...dryOutsideAndCabin,
        ...pressureFalls(1.4, 0.2, 15),
        'find-leak': 'done',
        'leak-location': 'nowhere-outside',
        'oil-contamination-check': 'not-confirmed',
        'cylinder-check': 'done',
        'cylinder-check-result': 'cylinder-signs',
        'leak-down-test': 'done',
        'leak-down-result': 'bubbles-from-cylinder',
      },
    },

    // ── Coolant getting into the oil ───────────────────────────────────────────────────────
    {
      name: 'Oil level rising as the coolant falls',
      story:
        'A 2012 Ardentis 1.9 diesel estate loses 0.9 L per 1,000 km with no leak. After the hot drive the dipstick reads well above the mark set at the last oil change, and the oil looks grey: the oil cooler’s core leaks coolant into the oil.',
      expect: 'coolant-into-oil',
      answers: {
        ...noRecentWork,
        ...lossKm(0.9, 1000),
        ...outsideSound(1.4),
        'hot-leak-check': 'oil-signs',
        'oil-contamination-check': 'coolant-in-oil-confirmed',
      },
    },
    {
      name: 'Pressure falls with nothing outside; oil analysis finds glycol',
      story:
        'A 2015 Quenby 2.0 diesel saloon loses 1 L per 1,000 km. The cold test falls 0.15 bar in twenty minutes with nothing outside. An oil sample sent the previous week came back with glycol; the oil cooler is the likely path.',
      expect: 'coolant-into-oil',
      answers: {
        ...noRecentWork,
        ...lossKm(1.0, 1000),
        ...dryOutsideAndCabin,
        ...pressureFalls(1.5, 0.15, 20),
        'find-leak': 'done',
        'leak-location': 'nowhere-outside',
        'oil-contamination-check': 'coolant-in-oil-confirmed',
      },
    },
    {
      name: 'Milky oil on the dipstick itself; miles odometer',
      story:
        'A 2009 Halvard 1.8 petrol hatchback (miles) used 1 L in 800 miles. Everything outside holds. After the drive the oil on the dipstick itself is milky and the level is up: coolant is getting past the head gasket into the oil.',
      expect: 'coolant-into-oil',
      answers: {
        ...noRecentWork,
        ...lossMiles(1.0, 800),
        ...outsideSound(1.4),
        'hot-leak-check': 'oil-signs',
        'oil-contamination-check': 'coolant-in-oil-confirmed',
      },
    },

    // ── No cause found yet ─────────────────────────────────────────────────────────────────
    {
      name: 'Mayonnaise under the filler cap of a short-trip car is condensation',
      story:
        'A 2016 Corvane 1.2 petrol city car does two-kilometre school runs in winter and has creamy mayonnaise under the oil filler cap. It lost 0.3 L over 1,200 km. The oil level is steady and the dipstick oil clean: condensation, not coolant. Nothing else is found; the small loss is watched with dye.',
      expect: 'no-loss-found',
      mustNotReach: ['coolant-into-oil', 'coolant-into-cylinder'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.3, 1200),
        'overflow-check': 'not-overfilled',
        ...outsideSound(1.4),
        'hot-leak-check': 'oil-signs',
        'oil-contamination-check': 'not-confirmed',
        'cylinder-check': 'done',
        'cylinder-check-result': 'all-alike',
      },
    },
    {
      name: 'Pressure rose during a test on a warm, stopped engine: not gas',
      story:
        'A 2014 Velmora 1.6 diesel estate was tested straight after its drive in: the gauge ROSE from 1.4 to 1.5 bar as the engine soaked. A stopped engine makes no gas; repeated cold, the system holds, the cap is good, nothing builds at a cold start, and nothing is found inside. The 0.5 L per 1,000 km is watched with dye.',
      expect: 'no-loss-found',
      mustNotReach: ['combustion-gas-in-coolant', 'coolant-into-cylinder'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.5, 1000),
        ...dryOutsideAndCabin,
        'pressure-test-cold': {
          capRating: bar(1.4),
          testPressure: bar(1.4),
          pressureAfterHold: bar(1.5),
          holdMinutes: minutes(10),
        },
        'pressure-retest': {
          retestPressure: bar(1.4),
          retestAfterHold: bar(1.38),
          retestMinutes: minutes(15),
        },
        ...capSound(1.4),
        ...noColdStartRise,
        'hot-leak-check': 'nothing-found',
        'cylinder-check': 'done',
        'cylinder-check-result': 'all-alike',
      },
    },
    {
      name: 'White vapour on cold mornings only; engine sound',
      story:
        'A 2018 Peloria 1.5 petrol estate: the owner saw white vapour from the exhaust on frosty mornings and lost 0.2 L over 1,000 km. The vapour clears once warm (condensation). Every check is clean and the borescope shows all pistons alike. The level is marked and the car booked back.',
      expect: 'no-loss-found',
      mustNotReach: ['coolant-into-cylinder', 'combustion-gas-in-coolant'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.2, 1000),
        'overflow-check': 'not-overfilled',
        ...outsideSound(1.5),
        'hot-leak-check': 'nothing-found',
        'cylinder-check': 'done',
        'cylinder-check-result': 'all-alike',
      },
    },

    // ── Further checks needed ──────────────────────────────────────────────────────────────
    {
      name: 'Pressure falls, but no lift or dye to find the leak',
      story:
        'A 2012 Brisca 1.4 petrol van at a mobile mechanic’s job loses 1 L per 1,000 km. Held at 1.4 bar the gauge falls 0.3 bar in ten minutes, but with no lift and no dye the leak cannot be found on the drive. The car is booked into a workshop.',
      expect: 'further-checks-needed',
      mustNotReach: ['coolant-pump-seal-leak', 'heater-core-leak', ...INTERNAL],
      answers: {
        ...noRecentWork,
        ...lossKm(1.0, 1000),
        ...dryOutsideAndCabin,
        ...pressureFalls(1.4, 0.3, 10),
        'find-leak': 'could-not-do',
      },
    },
    {
      name: 'Pressure builds on a cold start, but no block-test fluid',
      story:
        'A 2016 Sorrel 2.0 diesel estate loses 0.9 L per 1,000 km; the cold-start test climbs 0.4 bar in two minutes, but the block-test fluid has run out. Gas is suspected, not confirmed: no head work is quoted until the block test is done.',
      expect: 'further-checks-needed',
      mustNotReach: ['combustion-gas-in-coolant', 'coolant-into-cylinder'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.9, 1000),
        ...dryOutsideAndCabin,
        ...pressureHolds(1.4),
        ...capSound(1.4),
        'cold-start-pressure': { coldStartRise: bar(0.4) },
        'block-test': 'could-not-do',
      },
    },
    {
      name: 'Steam-cleaned piston, but no cylinder leaks into the coolant (diesel cooler)',
      story:
        'A 2013 Norvik 2.2 diesel van blows white, sweet exhaust when warm. Every piston looks equally clean on the borescope and the leak-down shows no path from any cylinder into the coolant: the exhaust-gas recirculation cooler is the suspect, and its own test is booked.',
      expect: 'further-checks-needed',
      mustNotReach: ['coolant-into-cylinder'],
      answers: {
        ...noRecentWork,
        ...lossKm(1.1, 1000),
        ...outsideSound(1.4),
        'hot-leak-check': 'white-exhaust',
        'cylinder-check': 'done',
        'cylinder-check-result': 'cylinder-signs',
        'leak-down-test': 'done',
        'leak-down-result': 'no-path-found',
      },
    },
    {
      name: 'Seized plugs: the borescope check cannot be done',
      story:
        'A 2010 Ardentis 1.8 petrol saloon loses 0.7 L per 1,000 km with nothing found outside. Two spark plugs are seized in the head and the technician will not force them cold. The check is booked with the right tools.',
      expect: 'further-checks-needed',
      mustNotReach: ['coolant-into-cylinder', 'no-loss-found'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.7, 1000),
        ...outsideSound(1.4),
        'hot-leak-check': 'nothing-found',
        'cylinder-check': 'could-not-do',
      },
    },
    {
      name: 'Wet pump area that cannot be traced',
      story:
        'A 2015 Tamsen 1.6 diesel hatchback has a wet area round the pump after a hot drive, but the pump sits deep behind the engine mount and the trail cannot be followed to its start. No pump is quoted until it is traced.',
      expect: 'further-checks-needed',
      mustNotReach: ['coolant-pump-seal-leak'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.6, 1000),
        ...outsideSound(1.5),
        'hot-leak-check': 'pump-wet-hot',
        'trace-pump-leak': 'done',
        'pump-leak-traced': 'not-traced',
      },
    },
    {
      name: 'Pressure test repeated, still pumped past the rating',
      story:
        'A 2011 Quenby 1.4 petrol hatchback with a 0.9 bar cap: the first test was pumped to 1.6 bar, the repeat to 1.3 bar on a tester with a sticking gauge. Neither is a valid test, so no finding is drawn from them; the test is rebooked with a sound tester.',
      expect: 'further-checks-needed',
      mustNotReach: ['cap-not-holding', 'hose-or-clamp-leak', 'no-loss-found'],
      answers: {
        ...noRecentWork,
        ...lossKm(0.6, 1000),
        ...dryOutsideAndCabin,
        'pressure-test-cold': {
          capRating: bar(0.9),
          testPressure: bar(1.6),
          pressureAfterHold: bar(1.55),
          holdMinutes: minutes(10),
        },
        'pressure-retest': {
          retestPressure: bar(1.3),
          retestAfterHold: bar(1.28),
          retestMinutes: minutes(10),
        },
      },
    },
  ],
});
