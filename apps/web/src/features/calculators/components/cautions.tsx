// The safety notes shown beside calculator results. Worded once here so every screen says the
// same thing the same way.
import { SafetyNote } from '../../../components/ui/alert';

export function HotSystemCaution() {
  return (
    <SafetyNote>
      <p>
        Never open the cap or a bleed screw on a hot system: it is under pressure and the coolant
        can flash to steam and scald. Let the engine cool first, then open it slowly with a cloth
        over the cap.
      </p>
    </SafetyNote>
  );
}

export function GlycolCaution() {
  return (
    <SafetyNote>
      <p>
        Glycol is poisonous, and it tastes sweet to children and animals. Catch what you drain, keep
        it in a labelled container, wipe up spills, and dispose of it as local rules require — never
        down a drain.
      </p>
    </SafetyNote>
  );
}

export function RunningEngineCaution() {
  return (
    <SafetyNote>
      <p>
        Readings on a running engine: keep hands, sleeves and probe leads clear of the belt and the
        fan — an electric fan can start without warning, even with the ignition off.
      </p>
    </SafetyNote>
  );
}

export function PressureTesterCaution() {
  return (
    <SafetyNote>
      <p>
        Pressure-test a cold system only, and do not pump past the cap’s rating. Release the
        pressure with the tester’s valve before you take the tester off the filler neck.
      </p>
    </SafetyNote>
  );
}
