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
} as const satisfies Record<string, Caution>;
