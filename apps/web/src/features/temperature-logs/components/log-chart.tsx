// The log drawn over time (recharts): coolant temperature, the other temperature channels and the
// fan when the log has them, over-temperature episodes shaded and labelled, the threshold and the
// thermostat opening drawn as lines. Tapping an episode (on the chart or in the list under it)
// zooms to it; the zoomed window is fetched again at full resolution. Colours come from the
// theme tokens, and every shaded or drawn thing also carries words.
import type { ChartSeries, TemperatureLogDetail } from '@heatpath/contracts';
import { useId, useMemo } from 'react';
import {
  CartesianGrid,
  ComposedChart,
  Legend,
  Line,
  ReferenceArea,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { Button } from '../../../components/ui/button';
import { formatClock, formatDuration, type TemperatureDisplay } from '../log-format';

export interface ChartWindow {
  from: number;
  to: number;
}

interface LogChartProps {
  log: TemperatureLogDetail;
  display: TemperatureDisplay;
  /** The zoomed window, or null for the whole log. */
  zoom: ChartWindow | null;
  onZoom: (window: ChartWindow | null) => void;
  /** True while a new window or threshold is being fetched. */
  updating: boolean;
}

interface Row {
  t: number;
  coolant: number;
  intake?: number | null;
  ambient?: number | null;
  fan?: number | null;
}

const tick = { fontSize: 16, fill: 'var(--color-ink-muted)' };

function rowsOf(series: ChartSeries, display: TemperatureDisplay): Row[] {
  const shown = (v: number | null | undefined) =>
    v === null || v === undefined ? null : Math.round(display.fromC(v) * 100) / 100;
  return series.times.map((t, i) => ({
    t,
    coolant: shown(series.coolantC[i]) ?? 0,
    ...(series.intakeAirC ? { intake: shown(series.intakeAirC[i]) } : {}),
    ...(series.ambientC ? { ambient: shown(series.ambientC[i]) } : {}),
    ...(series.fanDuty ? { fan: series.fanDuty[i] ?? null } : {}),
  }));
}

/** Whole tens of degrees (twenties in °F), or fives (tens) for a narrow zoomed range. */
function tickStep(range: number, unit: TemperatureDisplay['unit']): number {
  const narrow = range < (unit === 'degF' ? 45 : 25);
  return (narrow ? 5 : 10) * (unit === 'degF' ? 2 : 1);
}

/** A window around an episode: the episode in the middle half, at least two minutes either side. */
export function episodeWindow(
  episode: { startSeconds: number; endSeconds: number },
  logEnd: number,
): ChartWindow {
  const pad = Math.max(120, (episode.endSeconds - episode.startSeconds) / 2);
  return {
    from: Math.max(0, episode.startSeconds - pad),
    to: Math.min(logEnd, episode.endSeconds + pad),
  };
}

export function LogChart({ log, display, zoom, onZoom, updating }: LogChartProps) {
  const titleId = useId();
  const { analysis, series } = log;
  const rows = useMemo(() => rowsOf(series, display), [series, display]);
  const threshold = analysis.overTemperature.thresholdC;
  const thresholdShown = display.fromC(threshold);
  const episodes = analysis.overTemperature.episodes;
  const opening = analysis.opening.found ? analysis.opening : null;
  const domain: [number, number] = zoom ? [zoom.from, zoom.to] : [0, log.durationSeconds];

  const yDomain = useMemo((): [number, number] => {
    let low = thresholdShown;
    let high = thresholdShown;
    for (const row of rows) {
      // Zoomed in, the scale follows the coolant: a far-off ambient line would flatten the episode.
      for (const v of zoom ? [row.coolant] : [row.coolant, row.intake, row.ambient]) {
        if (typeof v === 'number') {
          if (v < low) low = v;
          if (v > high) high = v;
        }
      }
    }
    const step = tickStep(high - low, display.unit);
    return [Math.floor(low / step) * step - step / 2, Math.ceil(high / step) * step + step / 2];
  }, [rows, thresholdShown, display.unit, zoom]);
  const yTicks = useMemo(() => {
    const step = tickStep(yDomain[1] - yDomain[0], display.unit);
    const ticks: number[] = [];
    for (let v = Math.ceil(yDomain[0] / step) * step; v <= yDomain[1]; v += step) ticks.push(v);
    // Five or six labels at most, so they stay readable at 16 px on a portrait tablet.
    const every = Math.max(1, Math.ceil(ticks.length / 6));
    return ticks.filter((_, i) => i % every === 0);
  }, [yDomain, display.unit]);

  const fanMax = series.fanDuty ? Math.max(1, ...series.fanDuty.map((v) => v ?? 0)) : 1;
  const fanIsSwitch = fanMax <= 1;
  const span = domain[1] - domain[0];
  const summary =
    `Coolant temperature from ${formatClock(domain[0])} to ${formatClock(domain[1])}` +
    `, peak ${display.format(analysis.peak.valueC)} at ${formatClock(analysis.peak.atSeconds)}; ` +
    (episodes.length === 0
      ? `never over the threshold of ${display.format(threshold, 0)}.`
      : `${episodes.length} ${episodes.length === 1 ? 'stretch' : 'stretches'} over ${display.format(threshold, 0)}, shaded.`);

  return (
    <figure aria-labelledby={titleId} className="flex flex-col gap-3">
      <figcaption id={titleId} className="flex flex-wrap items-baseline justify-between gap-x-4">
        <span className="text-lg font-bold">Coolant temperature over time</span>
        <span className="text-sm text-ink-muted" aria-live="polite">
          {updating
            ? 'Updating…'
            : series.downsampled
              ? `${series.times.length.toLocaleString('en-GB')} of ${series.readingsInWindow.toLocaleString('en-GB')} readings drawn (each stretch’s highest and lowest kept)`
              : `${series.readingsInWindow.toLocaleString('en-GB')} readings`}
        </span>
      </figcaption>
      <p className="sr-only">{summary}</p>
      <div className="h-[22rem] w-full md:h-[26rem]" aria-hidden="true" data-testid="log-chart">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={rows} margin={{ top: 28, right: 12, bottom: 8, left: 0 }}>
            <CartesianGrid stroke="var(--color-line)" strokeDasharray="3 6" />
            <XAxis
              dataKey="t"
              type="number"
              domain={domain}
              allowDataOverflow
              tickFormatter={formatClock}
              tick={tick}
              tickCount={span > 600 ? 7 : 5}
              stroke="var(--color-line-strong)"
            />
            <YAxis
              yAxisId="temperature"
              domain={yDomain}
              ticks={yTicks}
              allowDataOverflow
              tick={tick}
              width={64}
              unit={` ${display.symbol}`}
              stroke="var(--color-line-strong)"
            />
            {series.fanDuty ? (
              <YAxis
                yAxisId="fan"
                orientation="right"
                domain={[0, fanIsSwitch ? 1 : Math.max(100, fanMax)]}
                tick={tick}
                width={fanIsSwitch ? 44 : 56}
                ticks={fanIsSwitch ? [0, 1] : [0, 50, 100]}
                tickFormatter={(v: number) => (fanIsSwitch ? (v ? 'on' : 'off') : `${v}%`)}
                stroke="var(--color-line-strong)"
              />
            ) : null}
            {episodes.map((episode, index) => (
              <ReferenceArea
                key={episode.startSeconds}
                yAxisId="temperature"
                x1={episode.startSeconds}
                x2={episode.endSeconds}
                ifOverflow="hidden"
                fill="var(--color-danger-bg)"
                fillOpacity={0.9}
                stroke="var(--color-danger-line)"
                strokeDasharray="4 3"
                label={{
                  value: `Over ${display.format(threshold, 0)} · ${index + 1}`,
                  position: 'top',
                  fill: 'var(--color-danger-ink)',
                  fontSize: 16,
                  fontWeight: 600,
                }}
                onClick={() => onZoom(episodeWindow(episode, log.durationSeconds))}
                style={{ cursor: 'zoom-in' }}
              />
            ))}
            <ReferenceLine
              yAxisId="temperature"
              y={thresholdShown}
              stroke="var(--color-danger-line)"
              strokeWidth={2}
              strokeDasharray="8 4"
              ifOverflow="extendDomain"
              label={{
                value: `Threshold ${display.format(threshold, 0)}`,
                position: 'insideTopLeft',
                fill: 'var(--color-danger-ink)',
                fontSize: 16,
              }}
            />
            {opening ? (
              <ReferenceLine
                yAxisId="temperature"
                x={opening.atSeconds}
                stroke="var(--color-info-line)"
                strokeWidth={2}
                strokeDasharray="2 4"
                ifOverflow="hidden"
                label={{
                  value: `Opens ≈ ${display.format(opening.temperatureC, 0)}`,
                  position: 'top',
                  fill: 'var(--color-info-ink)',
                  fontSize: 16,
                }}
              />
            ) : null}
            <Tooltip
              labelFormatter={(t) => `At ${formatClock(Number(t))}`}
              formatter={(value, name) =>
                name === 'Fan'
                  ? [fanIsSwitch ? (value ? 'on' : 'off') : `${String(value)} %`, name]
                  : [`${String(value)} ${display.symbol}`, name]
              }
              contentStyle={{
                background: 'var(--color-surface)',
                border: '2px solid var(--color-line-strong)',
                borderRadius: 8,
                fontSize: 16,
                color: 'var(--color-ink)',
              }}
            />
            <Legend wrapperStyle={{ fontSize: 16, color: 'var(--color-ink)' }} />
            <Line
              yAxisId="temperature"
              type="linear"
              dataKey="coolant"
              name="Coolant"
              stroke="var(--color-primary)"
              strokeWidth={3}
              dot={false}
              isAnimationActive={false}
            />
            {series.intakeAirC ? (
              <Line
                yAxisId="temperature"
                dataKey="intake"
                name="Intake air"
                stroke="var(--color-caution-line)"
                strokeWidth={2}
                strokeDasharray="6 3"
                dot={false}
                connectNulls
                isAnimationActive={false}
              />
            ) : null}
            {series.ambientC ? (
              <Line
                yAxisId="temperature"
                dataKey="ambient"
                name="Ambient"
                stroke="var(--color-info-line)"
                strokeWidth={2}
                strokeDasharray="2 3"
                dot={false}
                connectNulls
                isAnimationActive={false}
              />
            ) : null}
            {series.fanDuty ? (
              <Line
                yAxisId="fan"
                type="stepAfter"
                dataKey="fan"
                name="Fan"
                stroke="var(--color-ink-muted)"
                strokeWidth={1.5}
                dot={false}
                connectNulls
                isAnimationActive={false}
              />
            ) : null}
          </ComposedChart>
        </ResponsiveContainer>
      </div>

      <div className="flex flex-col gap-3">
        <div className="flex flex-wrap items-center gap-3">
          {zoom ? (
            <>
              <p className="font-semibold" aria-live="polite">
                Showing {formatClock(zoom.from)} to {formatClock(zoom.to)} (
                {formatDuration(zoom.to - zoom.from)})
              </p>
              <Button variant="secondary" onClick={() => onZoom(null)}>
                Show the whole log
              </Button>
            </>
          ) : episodes.length > 0 ? (
            <p className="text-ink-muted">Tap a shaded stretch, or one below, to zoom to it.</p>
          ) : null}
        </div>
        {episodes.length > 0 ? (
          <ul aria-label="Over-temperature episodes" className="flex flex-wrap gap-2">
            {episodes.map((episode, index) => {
              const active =
                zoom !== null &&
                zoom.from <= episode.startSeconds &&
                zoom.to >= episode.endSeconds &&
                zoom.to - zoom.from < (episode.endSeconds - episode.startSeconds) * 4 + 600;
              return (
                <li key={episode.startSeconds}>
                  <Button
                    variant={active ? 'primary' : 'secondary'}
                    aria-pressed={active}
                    onClick={() => onZoom(episodeWindow(episode, log.durationSeconds))}
                  >
                    <span aria-hidden="true">{active ? '✓' : '⤢'}</span>
                    {`Episode ${index + 1}: ${formatClock(episode.startSeconds)}, ${formatDuration(episode.durationSeconds)}, peak ${display.format(episode.peakC)}`}
                  </Button>
                </li>
              );
            })}
          </ul>
        ) : null}
      </div>
    </figure>
  );
}
