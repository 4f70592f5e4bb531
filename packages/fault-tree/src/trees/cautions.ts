// The cautions Heatpath's shipped trees show at the steps where someone can be hurt, written once
// so every tree says the same thing the same way. Each defers to the vehicle maker's procedure and
// to local rules: Heatpath guides the job, it does not replace either.
import type { Caution } from '../schema/tree-schema.js';

export const cautions = {
  coldSystemOnly: {
    hazard: 'hot-pressurised-coolant',
    text: 'Open the cap, a bleed screw or a hose only on a cold system. Hot coolant is under pressure and can turn to steam the moment it is released, and it scalds. If the top hose is still firm or warm, wait. Release pressure slowly under a thick cloth. Follow the vehicle maker’s procedure.',
  },
  keepClosedWhenHot: {
    hazard: 'hot-pressurised-coolant',
    text: 'The system is hot and under pressure during this step: do not open the cap, a bleed screw or a hose, and stop before the temperature climbs past the point where the warning comes on. Follow the vehicle maker’s procedure.',
  },
  fan: {
    hazard: 'fan',
    text: 'The electric fan can start without warning, even with the ignition off. Keep hands, hair, sleeves, tools and test leads clear of the fan and the belt drive, and follow the vehicle maker’s advice for working near them.',
  },
  hotSurface: {
    hazard: 'hot-surface',
    text: 'At operating temperature the hoses, radiator, engine and exhaust are hot enough to burn. Take readings with the thermometer held away from you, wear gloves, and follow the vehicle maker’s procedure.',
  },
  glycol: {
    hazard: 'glycol',
    text: 'Coolant is poisonous and tastes sweet to children and animals. Catch it in a clean, labelled container, wipe up spills at once, and dispose of it as local rules require.',
  },
  lifting: {
    hazard: 'lifting',
    text: 'Raise the vehicle only on a lift or on stands rated for it, at the maker’s lifting points; never work under a vehicle held by a jack alone. Support the engine properly before a mount is removed. Follow the vehicle maker’s procedure and the workshop’s lifting rules.',
  },
  beltDrive: {
    hazard: 'belt-drive',
    text: 'Wrong valve timing can wreck the engine. Follow the vehicle maker’s procedure, locking tools and tightening figures for the timing belt, or leave the job to someone qualified for it.',
  },
  roadTest: {
    hazard: 'road-test',
    text: 'On the road test a second person reads the scan tool; the driver watches the road. Keep to traffic law, and stop safely and switch off if the temperature warning comes on.',
  },
  boilingWater: {
    hazard: 'hot-surface',
    text: 'The thermostat is tested in water brought towards the boil: it scalds, and so do the part and the thermometer when they come out. Use a stable heat source, lift the part with tongs or on a wire, wear gloves and eye protection, and follow the vehicle maker’s procedure.',
  },
  openNeckRunning: {
    hazard: 'hot-pressurised-coolant',
    text: 'This test runs the engine with the cap off, so start it only on a cold system and never take the cap off a warm one to begin. As the engine warms, coolant can surge and spit from the open neck: keep your face and hands away, keep the tester’s level below the neck, and stop the engine and let it cool well before the thermostat opens. Follow the vehicle maker’s procedure and the test kit’s instructions.',
  },
  drainAndRefill: {
    hazard: 'hot-pressurised-coolant',
    text: 'This repair drains and refills the cooling system: begin only when the engine is cold, release the pressure slowly under a thick cloth, and never open the cap, a bleed screw or a hose on a hot system. Refill and bleed as the vehicle maker describes.',
  },
  scanToolActuation: {
    hazard: 'fan',
    text: 'Commanding pumps, valves or fans from the scan tool makes parts move and fans start with no warning: keep hands, hair, tools and leads clear of the fan and the belt drive while a test runs, and follow the vehicle maker’s procedure.',
  },
} as const satisfies Record<string, Caution>;
