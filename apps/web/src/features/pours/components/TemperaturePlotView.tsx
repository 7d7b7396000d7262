import { useId } from 'react';
import { formatDateTime } from '../../../lib/format';
import type { TemperaturePlot } from '../utils/temperature-plot';

/**
 * Logged temperatures over time, as the cure sum counts them: straight between readings, a reading held for a
 * short while around it, and dashed, shaded stretches where no reading is near (a gap in the log, or nothing logged
 * yet) at the temperature they were counted at. The product's minimum working temperature is a line of its own.
 */
export function TemperaturePlotView({ plot, minimumLabel, forecastLabel }: { plot: TemperaturePlot; minimumLabel: string; forecastLabel?: string }) {
  const titleId = useId();
  const descId = useId();
  const { frame } = plot;
  const readingSpans = plot.spans.filter((s) => s.source === 'logged' || s.source === 'carried');
  const assumedSpans = plot.spans.filter((s) => s.source === 'gap' || s.source === 'assumed');
  const from = new Date(plot.fromMs).toISOString();
  const to = new Date(plot.toMs).toISOString();
  const t = (v: number) => `${v.toFixed(0)} ${plot.unit}`;
  const coolest = plot.forecast.length > 0 ? Math.min(...plot.forecast.map((f) => f.temp)) : null;
  const warmest = plot.forecast.length > 0 ? Math.max(...plot.forecast.map((f) => f.temp)) : null;
  return (
    <figure className="flex flex-col gap-2">
      <svg
        role="img"
        aria-labelledby={titleId}
        aria-describedby={descId}
        viewBox={`0 0 ${frame.width} ${frame.height}`}
        className="h-auto w-full rounded-lg border border-line bg-white"
      >
        <title id={titleId}>Temperature log</title>
        <desc id={descId}>
          {`${plot.dots.length} readings from ${formatDateTime(from)} to ${formatDateTime(to)}; ${plot.spans.filter((s) => s.source === 'gap').length} gaps in the log; ${plot.spans.filter((s) => s.source === 'assumed').length} stretches with nothing logged; minimum working temperature ${t(plot.minimum.temp)}.`}
          {coolest !== null && warmest !== null ? ` Forecast ahead between ${t(coolest)} and ${t(warmest)}.` : ''}
        </desc>
        {plot.yTicks.map((tick) => (
          <g key={tick.value}>
            <line x1={frame.left} x2={frame.width - frame.right} y1={tick.y} y2={tick.y} className="stroke-line" strokeWidth={1} />
            <text x={frame.left - 6} y={tick.y + 4} textAnchor="end" className="fill-ink-soft text-[11px]">
              {t(tick.value)}
            </text>
          </g>
        ))}
        <line
          x1={frame.left}
          x2={frame.width - frame.right}
          y1={plot.minimum.y}
          y2={plot.minimum.y}
          className="stroke-ember-600"
          strokeWidth={2}
          strokeDasharray="2 3"
        />
        <text x={frame.width - frame.right} y={plot.minimum.y - 5} textAnchor="end" className="fill-ember-700 text-[11px] font-semibold">
          {minimumLabel}
        </text>
        {assumedSpans.map((span) => (
          <g key={`a-${span.from}`}>
            <rect
              x={span.x1}
              y={frame.top}
              width={Math.max(0, span.x2 - span.x1)}
              height={frame.height - frame.top - frame.bottom}
              className="fill-paper-deep"
              opacity={0.7}
            />
            <line x1={span.x1} x2={span.x2} y1={span.y1} y2={span.y2} className="stroke-walnut-500" strokeWidth={3} strokeDasharray="8 6" />
            {span.x2 - span.x1 > 48 ? (
              <text x={(span.x1 + span.x2) / 2} y={span.y1 - 7} textAnchor="middle" className="fill-walnut-700 text-[11px] font-semibold">
                {span.source === 'gap' ? 'gap in the log' : 'nothing logged'}
              </text>
            ) : null}
          </g>
        ))}
        {readingSpans.map((span) => (
          <line
            key={`r-${span.from}`}
            x1={span.x1}
            x2={span.x2}
            y1={span.y1}
            y2={span.y2}
            className={span.belowMinimum ? 'stroke-ember-600' : 'stroke-resin-600'}
            strokeWidth={3}
          />
        ))}
        {plot.forecast.map((f, i) => {
          const next = plot.forecast[i + 1];
          return (
            <g key={`f-${f.from}`}>
              <line x1={f.x1} x2={f.x2} y1={f.y} y2={f.y} className="stroke-resin-500" strokeWidth={3} strokeDasharray="1 5" strokeLinecap="round" />
              {next ? <line x1={f.x2} x2={f.x2} y1={f.y} y2={next.y} className="stroke-resin-500" strokeWidth={1.5} strokeDasharray="1 4" /> : null}
            </g>
          );
        })}
        {plot.nowX !== null ? (
          <g>
            <line
              x1={plot.nowX}
              x2={plot.nowX}
              y1={frame.top}
              y2={frame.height - frame.bottom}
              className="stroke-ink-soft"
              strokeWidth={1}
              strokeDasharray="4 3"
            />
            <text x={plot.nowX + 4} y={frame.height - frame.bottom - 6} className="fill-ink-soft text-[11px]">
              now
            </text>
          </g>
        ) : null}
        {plot.pouredX !== null ? (
          <g>
            <line x1={plot.pouredX} x2={plot.pouredX} y1={frame.top} y2={frame.height - frame.bottom} className="stroke-walnut-800" strokeWidth={1.5} />
            <text
              x={plot.pouredX > frame.width - frame.right - 60 ? plot.pouredX - 4 : plot.pouredX + 4}
              y={frame.top + 10}
              textAnchor={plot.pouredX > frame.width - frame.right - 60 ? 'end' : 'start'}
              className="fill-walnut-800 text-[11px] font-semibold"
            >
              poured
            </text>
          </g>
        ) : null}
        {plot.dots.map((dot) => (
          <circle key={dot.at} cx={dot.x} cy={dot.y} r={4} className="fill-walnut-900" />
        ))}
        <text x={frame.left} y={frame.height - 10} className="fill-ink-soft text-[11px]">
          {formatDateTime(from)}
        </text>
        <text x={frame.width - frame.right} y={frame.height - 10} textAnchor="end" className="fill-ink-soft text-[11px]">
          {formatDateTime(to)}
        </text>
      </svg>
      <figcaption className="flex flex-wrap gap-x-5 gap-y-1 text-sm text-ink-soft">
        <span className="flex items-center gap-1.5">
          <svg aria-hidden="true" viewBox="0 0 24 8" className="h-2 w-6">
            <line x1="0" x2="24" y1="4" y2="4" className="stroke-resin-600" strokeWidth="3" />
          </svg>
          logged: straight between readings
        </span>
        <span className="flex items-center gap-1.5">
          <svg aria-hidden="true" viewBox="0 0 24 8" className="h-2 w-6">
            <line x1="0" x2="24" y1="4" y2="4" className="stroke-walnut-500" strokeWidth="3" strokeDasharray="6 4" />
          </svg>
          no reading near: counted at the lower temperature
        </span>
        <span className="flex items-center gap-1.5">
          <svg aria-hidden="true" viewBox="0 0 24 8" className="h-2 w-6">
            <line x1="0" x2="24" y1="4" y2="4" className="stroke-ember-600" strokeWidth="2" strokeDasharray="2 3" />
          </svg>
          {minimumLabel}
        </span>
        {plot.forecast.length > 0 ? (
          <span className="flex items-center gap-1.5">
            <svg aria-hidden="true" viewBox="0 0 24 8" className="h-2 w-6">
              <line x1="1" x2="23" y1="4" y2="4" className="stroke-resin-500" strokeWidth="3" strokeDasharray="1 5" strokeLinecap="round" />
            </svg>
            {forecastLabel ?? 'forecast ahead'}
          </span>
        ) : null}
      </figcaption>
    </figure>
  );
}
