import type { CurveSet } from "@/lib/driveline";

const W = 640;
const H = 280;
const M = { left: 64, right: 16, top: 16, bottom: 44 };

interface Series {
  label: string;
  values: readonly number[];
  className: string;
  dash?: string;
  width: number;
}

/**
 * Speed ratio ω(out)/ω(in) over one turn of the transmission, for each joint and for the
 * output (pinion over transmission). Lines differ by dash as well as colour.
 */
export function SpeedRatioPlot({
  curves,
  phaseIndexDeg,
  outputVariationPct,
}: {
  curves: CurveSet;
  phaseIndexDeg: number;
  outputVariationPct: number;
}) {
  const front = curves.joints[0];
  const rear = curves.joints[curves.joints.length - 1];
  const series: Series[] = [
    ...(front
      ? [
          {
            label: "Front joint",
            values: front.speedRatio,
            className: "stroke-brass-500",
            dash: "8 5",
            width: 2,
          },
        ]
      : []),
    ...(rear
      ? [
          {
            label: "Rear joint",
            values: rear.speedRatio,
            className: "stroke-steel-500",
            dash: "2 4",
            width: 2.5,
          },
        ]
      : []),
    { label: "Output (pinion ÷ transmission)", values: curves.output, className: "stroke-ink", width: 3 },
  ];
  const all = series.flatMap((s) => s.values);
  let lo = Math.min(...all);
  let hi = Math.max(...all);
  const span = Math.max(hi - lo, 0.002);
  lo = (lo + hi) / 2 - span * 0.6;
  hi = lo + span * 1.2;
  const x = (deg: number) => M.left + (deg / 360) * (W - M.left - M.right);
  const y = (v: number) => M.top + ((hi - v) / (hi - lo)) * (H - M.top - M.bottom);
  const path = (vals: readonly number[]) =>
    vals
      .map((v, i) => `${i ? "L" : "M"} ${x(curves.angleDeg[i] ?? 0).toFixed(1)} ${y(v).toFixed(1)}`)
      .join(" ");
  const yTicks = Array.from({ length: 5 }, (_, i) => lo + ((hi - lo) * (i + 0.5)) / 5);
  const digits = span < 0.01 ? 4 : 3;
  const ext = (vals: readonly number[]) =>
    `${Math.min(...vals).toFixed(4)} to ${Math.max(...vals).toFixed(4)}`;
  const summary =
    `Speed ratio over one turn, 0 to 360 degrees. ` +
    series.map((s) => `${s.label}: ${ext(s.values)}`).join("; ") +
    `. With the rear yoke indexed ${phaseIndexDeg.toFixed(1)}° the output varies by ${outputVariationPct.toFixed(3)}%.`;

  return (
    <figure>
      <svg
        viewBox={`0 0 ${W} ${H}`}
        role="img"
        aria-label={summary}
        className="h-auto w-full text-ink"
        data-testid="speed-ratio-plot"
      >
        <title>{summary}</title>
        <rect
          x={M.left}
          y={M.top}
          width={W - M.left - M.right}
          height={H - M.top - M.bottom}
          className="fill-paper-raised stroke-line"
        />
        {[0, 90, 180, 270, 360].map((deg) => (
          <g key={deg}>
            <line x1={x(deg)} x2={x(deg)} y1={M.top} y2={H - M.bottom} className="stroke-line" />
            <text x={x(deg)} y={H - M.bottom + 16} textAnchor="middle" fontSize={12} fill="currentColor">
              {deg}°
            </text>
          </g>
        ))}
        {yTicks.map((v) => (
          <g key={v}>
            <line
              x1={M.left}
              x2={W - M.right}
              y1={y(v)}
              y2={y(v)}
              className="stroke-line"
              strokeDasharray="2 3"
            />
            <text x={M.left - 6} y={y(v) + 4} textAnchor="end" fontSize={11} fill="currentColor">
              {v.toFixed(digits)}
            </text>
          </g>
        ))}
        {lo < 1 && hi > 1 && (
          <line
            x1={M.left}
            x2={W - M.right}
            y1={y(1)}
            y2={y(1)}
            className="stroke-ink-muted"
            strokeWidth={1}
          />
        )}
        {series.map((s) => (
          <path
            key={s.label}
            d={path(s.values)}
            fill="none"
            className={s.className}
            strokeWidth={s.width}
            strokeDasharray={s.dash}
            strokeLinejoin="round"
          />
        ))}
        <text x={(M.left + W - M.right) / 2} y={H - 6} textAnchor="middle" fontSize={12} fill="currentColor">
          Transmission rotation (degrees)
        </text>
        <text
          x={14}
          y={(M.top + H - M.bottom) / 2}
          textAnchor="middle"
          fontSize={12}
          fill="currentColor"
          transform={`rotate(-90 14 ${(M.top + H - M.bottom) / 2})`}
        >
          Speed ratio ω out / ω in
        </text>
      </svg>
      <figcaption className="mt-2 flex flex-wrap gap-x-5 gap-y-1 text-sm text-ink-soft">
        {series.map((s) => (
          <span key={s.label} className="inline-flex items-center gap-2">
            <svg width="32" height="10" aria-hidden="true">
              <line
                x1="0"
                x2="32"
                y1="5"
                y2="5"
                className={s.className}
                strokeWidth={s.width}
                strokeDasharray={s.dash}
              />
            </svg>
            {s.label}
          </span>
        ))}
      </figcaption>
    </figure>
  );
}
