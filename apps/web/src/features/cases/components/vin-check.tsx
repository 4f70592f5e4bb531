// The VIN's live check as it is typed: its form (ISO 3779) and, for a vehicle built for North
// America, the check digit (49 CFR 565). A mismatch is a warning, never a refusal, because
// vehicles built for other markets often carry no check digit.
import { checkVin, normaliseVin } from '@heatpath/contracts';
import { Alert } from '../../../components/ui/alert';

export function VinCheck({ id, vin }: { id: string; vin: string }) {
  const typed = normaliseVin(vin);
  if (typed.length === 0) return null;
  if (typed.length < 17) {
    return (
      <p id={id} className="text-sm text-ink-muted">
        {typed.length} of 17 characters
      </p>
    );
  }
  const check = checkVin(typed);
  if (check.problem) return null; // The form shows the problem as the field's error.
  if (check.warning) {
    return (
      <div id={id}>
        <Alert tone="caution" title="Check this VIN">
          <p>{check.warning}</p>
        </Alert>
      </div>
    );
  }
  return (
    <p id={id} className="flex items-center gap-2 font-semibold text-ok-ink">
      <span aria-hidden="true">✓</span> 17 characters; the check digit matches.
    </p>
  );
}

/**
 * What is wrong with the VIN typed so far, shown under the box before anyone presses Save: a
 * letter a VIN never has (I, O, Q) at once, everything else once all 17 characters are there.
 */
export function vinProblem(vin: string): string | undefined {
  const typed = normaliseVin(vin);
  if (typed.length === 0) return undefined;
  // Padded so the length rule does not hide the letter rule while the VIN is still being typed.
  if (typed.length < 17 && /[IOQ]/.test(typed)) {
    return checkVin(typed.padEnd(17, '0')).problem ?? undefined;
  }
  return typed.length >= 17 ? (checkVin(typed).problem ?? undefined) : undefined;
}
