// The values worked out from the readings so far, in the person's units with the stored figure
// beside it. Values still waiting for readings are not listed.
import type { UnitPreferences } from '@heatpath/contracts';
import type { WalkSummary } from '@heatpath/fault-tree';
import { computedDisplay } from '../../lib/reading-units';

export function ComputedValues({
  walk,
  preferences,
}: {
  walk: WalkSummary;
  preferences: UnitPreferences;
}) {
  const known = walk.computed.filter((view) => view.value !== null);
  return (
    <section
      aria-labelledby="computed-heading"
      className="rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <h2 id="computed-heading" className="mb-3 text-lg font-bold">
        Worked out so far
      </h2>
      {known.length === 0 ? (
        <p className="text-ink-muted">Values appear here once the readings they need are in.</p>
      ) : (
        <dl className="flex flex-col gap-3">
          {known.map((view) => (
            <div key={view.name}>
              <dt className="text-sm text-ink-muted">{view.label}</dt>
              <dd className="text-lg font-bold">{computedDisplay(view, preferences)}</dd>
            </div>
          ))}
        </dl>
      )}
      <p className="mt-3 text-sm text-ink-muted">An aid, not the maker’s data.</p>
    </section>
  );
}
