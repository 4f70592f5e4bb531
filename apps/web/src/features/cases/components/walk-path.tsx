// The path so far: each step passed, with the answer given and the readings taken, in order.
// Steps undone by "Step back" are not on the path; they stay in the case's history.
import type { WalkSummary } from '@heatpath/fault-tree';
import { Disclosure } from '../../../components/ui/disclosure';

export function WalkPath({ walk }: { walk: WalkSummary }) {
  const count = walk.path.length;
  return (
    <Disclosure
      title="Path so far"
      summary={count === 0 ? 'No steps answered yet' : `${count} ${count === 1 ? 'step' : 'steps'}`}
      defaultOpen
    >
      {count === 0 ? (
        <p className="text-ink-muted">The first answer will appear here.</p>
      ) : (
        <ol className="flex flex-col gap-3">
          {walk.path.map((entry, index) => (
            <li key={`${index}:${entry.nodeId}`} className="grid grid-cols-[2rem_1fr] gap-2">
              <span aria-hidden="true" className="font-bold text-ink-muted">
                {index + 1}.
              </span>
              <div className="flex flex-col">
                <span className="font-semibold">{entry.title}</span>
                {entry.answer.kind === 'measurement' ? (
                  <>
                    <ul>
                      {entry.answer.readings.map((reading) => (
                        <li key={reading.name}>
                          {reading.label}: <span className="font-semibold">{reading.display}</span>
                        </li>
                      ))}
                    </ul>
                    <span className="text-sm text-ink-muted">→ {entry.routeLabel}</span>
                  </>
                ) : (
                  <span>
                    <span aria-hidden="true">→ </span>
                    <span className="sr-only">Answer: </span>
                    {entry.routeLabel}
                  </span>
                )}
              </div>
            </li>
          ))}
        </ol>
      )}
    </Disclosure>
  );
}
