/**
 * Side and top views of the driveline, drawn from the numbers: angles to scale (or openly
 * exaggerated, with the factor printed on the drawing), the two working angles marked.
 */
const RAD = Math.PI / 180;

interface ViewProps {
  view: "side" | "top";
  lengthMm: number;
  /** Projected angles in this view, deg: transmission, driveshaft, pinion. */
  transmissionDeg: number;
  driveshaftDeg: number;
  pinionDeg: number;
  /** True (3-D) working angles from the report, deg. */
  frontWorkingDeg: number;
  rearWorkingDeg: number;
  /** Multiply every angle by this for the drawing (1 = to scale). */
  exaggeration: number;
}

type Pt = { x: number; y: number };
const at = (p: Pt, deg: number, len: number): Pt => ({
  x: p.x + len * Math.cos(deg * RAD),
  y: p.y + len * Math.sin(deg * RAD),
});
const fmtDeg = (d: number) => `${d.toFixed(1)}°`;

function arcPath(c: Pt, r: number, fromDeg: number, toDeg: number): string {
  const a = at(c, fromDeg, r);
  const b = at(c, toDeg, r);
  const sweep = toDeg > fromDeg ? 1 : 0;
  const large = Math.abs(toDeg - fromDeg) > 180 ? 1 : 0;
  return `M ${a.x} ${a.y} A ${r} ${r} 0 ${large} ${sweep} ${b.x} ${b.y}`;
}

/** One view of the driveline as an accessible SVG. */
export function DrivelineView(props: ViewProps) {
  const { view, lengthMm: L, exaggeration: k } = props;
  const t = props.transmissionDeg * k;
  const d = props.driveshaftDeg * k;
  const p = props.pinionDeg * k;
  const stub = L * 0.3;
  const j1: Pt = { x: 0, y: 0 };
  const tStart = at(j1, t + 180, stub);
  const j2 = at(j1, d, L);
  const pEnd = at(j2, p, stub);
  const pts = [tStart, j1, j2, pEnd];
  const pad = L * 0.12;
  const minX = Math.min(...pts.map((q) => q.x)) - pad;
  const maxX = Math.max(...pts.map((q) => q.x)) + pad;
  const minY = Math.min(...pts.map((q) => q.y)) - pad * 1.3;
  const maxY = Math.max(...pts.map((q) => q.y)) + pad * 1.5;
  const w = maxX - minX;
  const h = maxY - minY;
  const fs = w / 40;
  const r = L * 0.16;
  const sideWord = view === "side" ? "down" : "right";
  const summary =
    `${view === "side" ? "Side" : "Top"} view of the driveline${k !== 1 ? `, angles drawn ${k} times larger than measured` : ", angles to scale"}: ` +
    `transmission ${fmtDeg(props.transmissionDeg)}, driveshaft ${fmtDeg(props.driveshaftDeg)}, pinion ${fmtDeg(props.pinionDeg)} ` +
    `(positive ${sideWord} going rearward); front working angle ${props.frontWorkingDeg.toFixed(2)}°, rear working angle ${props.rearWorkingDeg.toFixed(2)}° (true 3-D angles).`;

  return (
    <svg
      viewBox={`${minX} ${minY} ${w} ${h}`}
      role="img"
      aria-label={summary}
      className="h-auto w-full text-ink"
      data-testid={`diagram-${view}`}
    >
      <title>{summary}</title>
      {/* level references through each joint */}
      {[j1, j2].map((j, i) => (
        <line
          key={i}
          x1={j.x - L * 0.25}
          y1={j.y}
          x2={j.x + L * 0.25}
          y2={j.y}
          stroke="currentColor"
          strokeOpacity={0.35}
          strokeDasharray="6 5"
          vectorEffect="non-scaling-stroke"
        />
      ))}
      {/* transmission body and output */}
      <g transform={`rotate(${t} ${tStart.x} ${tStart.y})`}>
        <rect
          x={tStart.x - stub * 0.2}
          y={tStart.y - L * 0.05}
          width={stub * 0.8}
          height={L * 0.1}
          rx={L * 0.012}
          className="fill-steel-100 stroke-steel-700"
          vectorEffect="non-scaling-stroke"
          strokeWidth={1.5}
        />
      </g>
      <line
        x1={tStart.x}
        y1={tStart.y}
        x2={j1.x}
        y2={j1.y}
        className="stroke-steel-700"
        strokeWidth={3}
        vectorEffect="non-scaling-stroke"
      />
      {/* shaft */}
      <line
        x1={j1.x}
        y1={j1.y}
        x2={j2.x}
        y2={j2.y}
        className="stroke-steel-500"
        strokeWidth={9}
        strokeLinecap="round"
        vectorEffect="non-scaling-stroke"
      />
      {/* pinion and axle */}
      <line
        x1={j2.x}
        y1={j2.y}
        x2={pEnd.x}
        y2={pEnd.y}
        className="stroke-steel-700"
        strokeWidth={3}
        vectorEffect="non-scaling-stroke"
      />
      <circle
        cx={pEnd.x}
        cy={pEnd.y}
        r={L * 0.06}
        className="fill-steel-100 stroke-steel-700"
        strokeWidth={1.5}
        vectorEffect="non-scaling-stroke"
      />
      {/* joints */}
      {[j1, j2].map((j, i) => (
        <circle
          key={i}
          cx={j.x}
          cy={j.y}
          r={L * 0.014}
          className="fill-paper-raised stroke-ink"
          strokeWidth={2}
          vectorEffect="non-scaling-stroke"
        />
      ))}
      {/* working angles */}
      <path
        d={arcPath(j1, r, t, d)}
        className="stroke-brass-600"
        fill="none"
        strokeWidth={2}
        vectorEffect="non-scaling-stroke"
      />
      <path
        d={arcPath(j2, r, d, p)}
        className="stroke-brass-600"
        fill="none"
        strokeWidth={2}
        vectorEffect="non-scaling-stroke"
      />
      <g fontSize={fs} fill="currentColor">
        <text x={j1.x + r * 0.3} y={j1.y - fs * 1.6} className="fill-brass-700" fontWeight={600}>
          front joint {props.frontWorkingDeg.toFixed(2)}°
        </text>
        <text x={j2.x - r * 1.8} y={j2.y - fs * 1.6} className="fill-brass-700" fontWeight={600}>
          rear joint {props.rearWorkingDeg.toFixed(2)}°
        </text>
        <text x={tStart.x} y={tStart.y + L * 0.05 + fs * 1.8}>
          transmission {fmtDeg(props.transmissionDeg)}
        </text>
        <text x={(j1.x + j2.x) / 2 - fs * 4} y={(j1.y + j2.y) / 2 + fs * 2}>
          driveshaft {fmtDeg(props.driveshaftDeg)}
        </text>
        <text x={pEnd.x - fs * 6} y={pEnd.y + L * 0.06 + fs * 1.6}>
          pinion {fmtDeg(props.pinionDeg)}
        </text>
        <text x={minX + fs * 0.5} y={minY + fs * 1.2} fillOpacity={0.7}>
          {view === "side" ? "Side view · front at left" : "Top view · front at left, right side down"}
          {k !== 1 ? ` · angles drawn ×${k}` : " · angles to scale"}
        </text>
      </g>
    </svg>
  );
}
