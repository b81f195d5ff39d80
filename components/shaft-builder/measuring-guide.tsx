import { Ruler } from "lucide-react";

/** What each measurement is and how to take it, with a small line drawing of our own. */
export type GuideTopic =
  | "length"
  | "transmission"
  | "driveshaft"
  | "pinion"
  | "offset"
  | "torque"
  | "speed"
  | "tire"
  | "rpm"
  | "ends"
  | "tube";

const STROKE = {
  stroke: "currentColor",
  strokeWidth: 2,
  fill: "none",
  strokeLinecap: "round",
  strokeLinejoin: "round",
} as const;

/** A vehicle-on-its-wheels outline shared by the drawings (front to the left). */
function Ground() {
  return <line x1="4" y1="86" x2="236" y2="86" {...STROKE} strokeWidth={1} strokeDasharray="4 3" />;
}

function AngleFinder({ x, y, rotate = 0 }: { x: number; y: number; rotate?: number }) {
  return (
    <g transform={`translate(${x} ${y}) rotate(${rotate})`} className="text-brass-600">
      <rect x="-14" y="-9" width="28" height="12" rx="2" {...STROKE} />
      <circle cx="0" cy="-3" r="3" {...STROKE} strokeWidth={1.5} />
    </g>
  );
}

const DRAWINGS: Record<GuideTopic, React.ReactNode> = {
  length: (
    <>
      <Ground />
      <rect x="10" y="36" width="42" height="24" rx="3" {...STROKE} />
      <circle cx="64" cy="50" r="5" {...STROKE} />
      <line x1="69" y1="51" x2="176" y2="59" {...STROKE} strokeWidth={5} className="text-steel-500" />
      <circle cx="181" cy="59" r="5" {...STROKE} />
      <circle cx="206" cy="60" r="16" {...STROKE} />
      <circle cx="40" cy="74" r="11" {...STROKE} />
      <circle cx="206" cy="74" r="11" {...STROKE} strokeDasharray="3 2" />
      <g className="text-brass-600">
        <line x1="64" y1="24" x2="181" y2="24" {...STROKE} />
        <line x1="64" y1="18" x2="64" y2="44" {...STROKE} strokeWidth={1} />
        <line x1="181" y1="18" x2="181" y2="53" {...STROKE} strokeWidth={1} />
        <path d="M70 20 L64 24 L70 28 M175 20 L181 24 L175 28" {...STROKE} />
      </g>
    </>
  ),
  transmission: (
    <>
      <Ground />
      <rect x="20" y="30" width="90" height="30" rx="4" {...STROKE} />
      <line x1="110" y1="48" x2="170" y2="52" {...STROKE} strokeWidth={4} />
      <rect x="150" y="43" width="22" height="16" rx="2" {...STROKE} transform="rotate(4 161 51)" />
      <AngleFinder x={161} y={40} rotate={4} />
      <line x1="120" y1="30" x2="220" y2="30" {...STROKE} strokeWidth={1} strokeDasharray="3 3" />
    </>
  ),
  driveshaft: (
    <>
      <Ground />
      <line x1="30" y1="36" x2="210" y2="60" {...STROKE} strokeWidth={8} className="text-steel-500" />
      <AngleFinder x={120} y={38} rotate={7.6} />
      <line x1="30" y1="30" x2="220" y2="30" {...STROKE} strokeWidth={1} strokeDasharray="3 3" />
    </>
  ),
  pinion: (
    <>
      <Ground />
      <circle cx="170" cy="58" r="22" {...STROKE} />
      <line x1="80" y1="52" x2="148" y2="57" {...STROKE} strokeWidth={4} />
      <rect x="120" y="47" width="24" height="16" rx="2" {...STROKE} transform="rotate(4 132 55)" />
      <AngleFinder x={132} y={44} rotate={4} />
      <line x1="60" y1="30" x2="220" y2="30" {...STROKE} strokeWidth={1} strokeDasharray="3 3" />
    </>
  ),
  offset: (
    <>
      <rect x="14" y="30" width="50" height="30" rx="3" {...STROKE} />
      <line x1="64" y1="45" x2="196" y2="62" {...STROKE} strokeWidth={6} className="text-steel-500" />
      <rect x="196" y="50" width="30" height="24" rx="3" {...STROKE} />
      <line
        x1="4"
        y1="45"
        x2="236"
        y2="45"
        {...STROKE}
        strokeWidth={1}
        strokeDasharray="4 3"
        className="text-brass-600"
      />
      <text x="8" y="18" fontSize="11" fill="currentColor">
        top view, front at left
      </text>
    </>
  ),
  torque: (
    <>
      <rect x="20" y="28" width="70" height="40" rx="4" {...STROKE} />
      <rect x="100" y="34" width="60" height="28" rx="3" {...STROKE} />
      <line x1="90" y1="48" x2="100" y2="48" {...STROKE} />
      <line x1="160" y1="48" x2="220" y2="48" {...STROKE} strokeWidth={4} className="text-steel-500" />
      <path d="M190 30 A 18 18 0 1 1 176 36" {...STROKE} className="text-brass-600" />
      <path d="M176 30 L176 37 L183 37" {...STROKE} className="text-brass-600" />
      <text x="26" y="84" fontSize="11" fill="currentColor">
        engine
      </text>
      <text x="104" y="84" fontSize="11" fill="currentColor">
        gears
      </text>
    </>
  ),
  speed: (
    <>
      <Ground />
      <circle cx="60" cy="66" r="20" {...STROKE} />
      <circle cx="180" cy="66" r="20" {...STROKE} />
      <path d="M30 46 L60 24 L170 24 L210 46 Z" {...STROKE} />
      <path d="M96 10 L136 10 M126 4 L136 10 L126 16" {...STROKE} className="text-brass-600" />
    </>
  ),
  tire: (
    <>
      <Ground />
      <circle cx="120" cy="48" r="38" {...STROKE} />
      <circle cx="120" cy="48" r="16" {...STROKE} strokeWidth={1} />
      <g className="text-brass-600">
        <line x1="170" y1="10" x2="170" y2="86" {...STROKE} />
        <path d="M166 16 L170 10 L174 16 M166 80 L170 86 L174 80" {...STROKE} />
        <line x1="120" y1="10" x2="176" y2="10" {...STROKE} strokeWidth={1} strokeDasharray="3 2" />
      </g>
    </>
  ),
  rpm: (
    <>
      <line x1="20" y1="48" x2="220" y2="48" {...STROKE} strokeWidth={8} className="text-steel-500" />
      <ellipse cx="120" cy="48" rx="10" ry="22" {...STROKE} className="text-brass-600" />
      <path d="M128 28 L132 24 L134 30" {...STROKE} className="text-brass-600" />
    </>
  ),
  ends: (
    <>
      <line x1="90" y1="48" x2="220" y2="48" {...STROKE} strokeWidth={10} className="text-steel-500" />
      <path d="M90 36 L70 36 L62 28 M90 60 L70 60 L62 68" {...STROKE} />
      <circle cx="56" cy="48" r="9" {...STROKE} />
      <line
        x1="56"
        y1="16"
        x2="56"
        y2="80"
        {...STROKE}
        strokeWidth={1}
        strokeDasharray="3 3"
        className="text-brass-600"
      />
    </>
  ),
  tube: (
    <>
      <circle cx="70" cy="48" r="34" {...STROKE} />
      <circle cx="70" cy="48" r="28" {...STROKE} />
      <g className="text-brass-600">
        <line x1="36" y1="90" x2="104" y2="90" {...STROKE} strokeWidth={1} />
        <text x="50" y="86" fontSize="11" fill="currentColor">
          OD
        </text>
        <line x1="98" y1="48" x2="104" y2="48" {...STROKE} />
        <text x="110" y="52" fontSize="11" fill="currentColor">
          wall
        </text>
      </g>
      <line x1="150" y1="48" x2="230" y2="48" {...STROKE} strokeWidth={10} className="text-steel-500" />
    </>
  ),
};

const TEXT: Record<GuideTopic, { title: string; alt: string; body: React.ReactNode }> = {
  length: {
    title: "Installed length",
    alt: "Side view of a driveline: a tape measured from the centre of the front joint to the centre of the rear joint.",
    body: (
      <>
        <p>
          Park on level ground with the vehicle&rsquo;s full weight on its wheels (ride height, not on a lift
          with the axle hanging). Measure from the centre of the front joint&rsquo;s cross to the centre of
          the rear joint&rsquo;s cross.
        </p>
        <p>
          With a slip yoke, push the shaft in fully, then pull it out about 3/4 in (19 mm) before measuring.
        </p>
      </>
    ),
  },
  transmission: {
    title: "Transmission angle",
    alt: "An angle finder resting on the transmission output yoke, compared with a level line.",
    body: (
      <p>
        Rest an angle finder on a machined face of the transmission output yoke (or the slip yoke), square to
        the shaft, and read the side-view slope. Enter it as positive when the transmission tail points down
        toward the rear.
      </p>
    ),
  },
  driveshaft: {
    title: "Driveshaft angle",
    alt: "An angle finder laid along the driveshaft tube, compared with a level line.",
    body: (
      <p>
        Lay the angle finder along the tube, away from weld beads and balance weights. Positive when the shaft
        runs downhill toward the rear. If there is no shaft yet, measure the height of each joint centre and
        the length between them.
      </p>
    ),
  },
  pinion: {
    title: "Pinion angle",
    alt: "An angle finder on the pinion yoke of the axle, compared with a level line.",
    body: (
      <p>
        Rotate the pinion yoke so its ears point straight up and read the angle across the machined yoke face
        (or the flange face). Positive when the pinion nose points up toward the front.
      </p>
    ),
  },
  offset: {
    title: "Sideways offset",
    alt: "Top view: the driveshaft runs at an angle from the transmission to an axle whose pinion sits to one side.",
    body: (
      <p>
        Only for drivelines that run sideways as well, seen from above (offset transfer cases, offset
        pinions). Measure each axis against the vehicle&rsquo;s centre line with a plumb line and a straight
        edge; positive when it turns to the right going rearward.
      </p>
    ),
  },
  torque: {
    title: "Torque and gearing",
    alt: "Engine, gearbox and the shaft leaving it, with an arrow for twist.",
    body: (
      <p>
        The engine&rsquo;s peak torque as it is now (with any tuning), the first-gear ratio, the transfer-case
        low ratio (1 without one), and the converter stall ratio (about 2 for an automatic, 1 for a manual).
        The shaft must carry their product.
      </p>
    ),
  },
  speed: {
    title: "Top speed",
    alt: "A vehicle with an arrow for its speed.",
    body: (
      <p>
        The highest speed the vehicle will really be driven at. The axle ratio is on the axle tag or in the
        build sheet (e.g. 3.73).
      </p>
    ),
  },
  tire: {
    title: "Tire diameter",
    alt: "A tire with its overall height measured from the ground to the top of the tread.",
    body: (
      <p>
        Measure the loaded tire from the ground to the top of the tread, or use the size from the sidewall.
      </p>
    ),
  },
  rpm: {
    title: "Maximum shaft speed",
    alt: "A spinning shaft.",
    body: (
      <p>
        The highest speed the driveshaft will turn, in revolutions per minute (for machines, or when the
        gearing is unusual).
      </p>
    ),
  },
  ends: {
    title: "End fittings",
    alt: "A weld yoke on the end of a tube, with the joint centre marked.",
    body: (
      <p>
        The yoke or flange welded to each end. If you are not sure, let the shop choose one that fits the tube
        and the torque.
      </p>
    ),
  },
  tube: {
    title: "Tube",
    alt: "A tube section showing the outside diameter and the wall.",
    body: (
      <p>
        Yokeline picks a tube from the shop&rsquo;s stock that passes every check (the cheapest or the
        lightest, as the shop prefers) and lists the others. Choose one yourself only if you must.
      </p>
    ),
  },
};

/** A collapsible "How to measure" aside for one field group. */
export function MeasuringGuide({ topic }: { topic: GuideTopic }) {
  const t = TEXT[topic];
  return (
    <details className="group mt-2 rounded-md border border-line bg-paper-sunk/50 text-sm">
      <summary className="flex cursor-pointer items-center gap-2 px-3 py-2 font-medium text-steel-700 marker:content-none">
        <Ruler className="size-4" aria-hidden="true" />
        How to measure: {t.title.toLowerCase()}
      </summary>
      <div className="grid gap-3 px-3 pb-3 sm:grid-cols-[10rem_1fr]">
        <svg
          viewBox="0 0 240 96"
          role="img"
          aria-label={t.alt}
          className="w-full max-w-[12rem] text-ink-soft"
        >
          <title>{t.alt}</title>
          {DRAWINGS[topic]}
        </svg>
        <div className="space-y-2 text-ink-soft">{t.body}</div>
      </div>
    </details>
  );
}
