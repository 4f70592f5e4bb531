// What the analysis found in the log, one card per result: the figure (or why there is none), when
// in the log it happened, and how it was found and how far to trust it, as the temperature-log
// package words it. None of these is a maker's figure.
import type { ResultBasis, SwingEpisode, TemperatureLogDetail } from '@heatpath/contracts';
import type { ReactNode } from 'react';
import { openingDetail, shroudReleaseCard } from '../analysis-words';
import { atMoment, formatClock, formatDuration, type TemperatureDisplay } from '../log-format';

const swingWords: Record<SwingEpisode['suggestion'], string> = {
  'fan-cycling': 'Suggests the fan cycling',
  'thermostat-hunting': 'Suggests the thermostat hunting',
  'fan-or-thermostat': 'Fan cycling or thermostat hunting',
};

function Basis({ basis }: { basis: ResultBasis }) {
  return (
    <div className="flex flex-col gap-1 border-t-2 border-line pt-2 text-sm text-ink-muted">
      <p>
        <span className="font-semibold">How: </span>
        {basis.method}
      </p>
      <p>
        <span className="font-semibold">Standing: </span>
        {basis.status}
      </p>
    </div>
  );
}

interface ResultCardProps {
  title: string;
  figure: ReactNode;
  detail?: ReactNode;
  basis: ResultBasis;
  /** A "not found": the figure is the reason, in muted text. */
  missing?: boolean;
}

function ResultCard({ title, figure, detail, basis, missing = false }: ResultCardProps) {
  return (
    <li className="flex flex-col gap-2 rounded-panel border-2 border-line bg-surface p-4">
      <h3 className="font-semibold">{title}</h3>
      {missing ? (
        <p className="text-ink-muted">
          <span className="font-semibold text-ink">Not found: </span>
          {figure}
        </p>
      ) : (
        <p className="text-xl font-bold tabular-nums">{figure}</p>
      )}
      {detail ? <div className="text-ink">{detail}</div> : null}
      <Basis basis={basis} />
    </li>
  );
}

export function LogResults({
  log,
  display,
}: {
  log: TemperatureLogDetail;
  display: TemperatureDisplay;
}) {
  const a = log.analysis;
  const episodes = a.overTemperature.episodes;
  const shroud = shroudReleaseCard(a, display);
  return (
    <section aria-labelledby="log-results-heading" className="flex flex-col gap-4">
      <h2 id="log-results-heading" className="text-xl font-bold">
        What the log shows
      </h2>
      <ul className="grid gap-4 md:grid-cols-2 xl:grid-cols-3">
        {a.warmUp.found ? (
          <ResultCard
            title="Warm-up time"
            figure={formatDuration(a.warmUp.seconds)}
            detail={`From ${display.format(a.warmUp.fromC)} at ${formatClock(a.warmUp.startSeconds)} to the thermostat opening at ${formatClock(a.warmUp.openingSeconds)}.`}
            basis={a.warmUp.basis}
          />
        ) : (
          <ResultCard
            title="Warm-up time"
            figure={a.warmUp.reason}
            basis={a.warmUp.basis}
            missing
          />
        )}
        {a.opening.found ? (
          <ResultCard
            title="Thermostat opening (estimated)"
            figure={display.format(a.opening.temperatureC)}
            detail={openingDetail(a.opening, display)}
            basis={a.opening.basis}
          />
        ) : (
          <ResultCard
            title="Thermostat opening (estimated)"
            figure={a.opening.reason}
            basis={a.opening.basis}
            missing
          />
        )}
        {shroud ? (
          <ResultCard
            title={shroud.title}
            figure={shroud.figure}
            detail={shroud.detail}
            basis={a.shroudRelease.basis}
            missing={shroud.missing}
          />
        ) : null}
        <ResultCard
          title="Peak temperature"
          figure={display.format(a.peak.valueC)}
          detail={`${atMoment(a.peak.atSeconds)}.`}
          basis={a.peak.basis}
        />
        <ResultCard
          title={`Over-temperature above ${display.format(a.overTemperature.thresholdC, 0)}`}
          figure={
            episodes.length === 0
              ? 'None'
              : `${episodes.length} ${episodes.length === 1 ? 'episode' : 'episodes'}`
          }
          detail={
            episodes.length > 0 ? (
              <ol className="flex flex-col gap-1">
                {episodes.map((e, i) => (
                  <li key={e.startSeconds}>
                    <span className="font-semibold">{i + 1}.</span> From{' '}
                    {formatClock(e.startSeconds)} for {formatDuration(e.durationSeconds)}, peak{' '}
                    {display.format(e.peakC)}
                    {e.ongoingAtEnd ? ' (still over when the log ends)' : ''}
                  </li>
                ))}
              </ol>
            ) : (
              `Nothing at or above it for ${formatDuration(a.overTemperature.minEpisodeSeconds)} or longer.`
            )
          }
          basis={a.overTemperature.basis}
        />
        {a.riseRate.found ? (
          <ResultCard
            title="Rate of rise"
            figure={`${display.formatRate(a.riseRate.averageKPerMin)} on average`}
            detail={`Fastest over one minute: ${display.formatRate(a.riseRate.maxKPerMin)}.`}
            basis={a.riseRate.basis}
          />
        ) : (
          <ResultCard
            title="Rate of rise"
            figure={a.riseRate.reason}
            basis={a.riseRate.basis}
            missing
          />
        )}
        {a.timeToTarget.found ? (
          <ResultCard
            title={`Time to ${display.format(a.timeToTarget.targetC, 0)}`}
            figure={formatDuration(a.timeToTarget.seconds)}
            detail="From the first reading, taken as the engine start."
            basis={a.timeToTarget.basis}
          />
        ) : (
          <ResultCard
            title={`Time to ${display.format(a.timeToTarget.targetC, 0)}`}
            figure={a.timeToTarget.reason}
            basis={a.timeToTarget.basis}
            missing
          />
        )}
        {a.settled.found ? (
          <ResultCard
            title="Settled temperature"
            figure={display.format(a.settled.medianC)}
            detail={`Median from ${formatClock(a.settled.fromSeconds)} to ${formatClock(a.settled.toSeconds)}, episodes left out.`}
            basis={a.settled.basis}
          />
        ) : (
          <ResultCard
            title="Settled temperature"
            figure={a.settled.reason}
            basis={a.settled.basis}
            missing
          />
        )}
        <ResultCard
          title="Temperature swings"
          figure={
            a.swings.episodes.length === 0
              ? 'None'
              : `${a.swings.episodes.length} ${a.swings.episodes.length === 1 ? 'stretch' : 'stretches'}`
          }
          detail={
            a.swings.episodes.length > 0 ? (
              <ul className="flex flex-col gap-2">
                {a.swings.episodes.map((s) => (
                  <li key={s.startSeconds}>
                    <span className="font-semibold">{swingWords[s.suggestion]}: </span>
                    {s.cycles} cycles from {formatClock(s.startSeconds)}, about{' '}
                    {display.formatDelta(s.amplitudeK)} peak to trough every{' '}
                    {formatDuration(s.periodSeconds)}. {s.note}
                  </li>
                ))}
              </ul>
            ) : (
              'No repeated rise and fall after the opening.'
            )
          }
          basis={a.swings.basis}
        />
        {a.ambient.found ? (
          <ResultCard
            title="Ambient temperature"
            figure={display.format(a.ambient.medianC)}
            detail="Median of the log’s ambient channel."
            basis={a.ambient.basis}
          />
        ) : null}
      </ul>
      {a.notes.length > 0 ? (
        <div className="rounded-panel border-2 border-l-8 border-caution-line bg-caution-bg p-4 text-caution-ink">
          <p className="font-bold">Check this</p>
          <ul className="list-disc pl-6">
            {a.notes.map((note) => (
              <li key={note}>{note}</li>
            ))}
          </ul>
        </div>
      ) : null}
      <p className="text-sm text-ink-muted">
        An aid, not the maker’s data: the vehicle maker’s figures for the engine always govern.
      </p>
    </section>
  );
}
