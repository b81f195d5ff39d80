/**
 * The measuring guides' drawings and words, loaded only when a guide is first opened (or about to
 * be: hover or focus on its summary), so the builder's first load does not carry them.
 */
import type { GuideTopic } from "./measuring-guide";

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
  "no-shaft": (
    <>
      <Ground />
      <rect x="10" y="34" width="54" height="26" rx="3" {...STROKE} />
      <rect x="64" y="41" width="10" height="12" {...STROKE} />
      <line x1="74" y1="40" x2="74" y2="54" {...STROKE} strokeWidth={3} className="text-brass-600" />
      <circle cx="192" cy="58" r="5" {...STROKE} />
      <circle cx="212" cy="60" r="16" {...STROKE} />
      <line x1="74" y1="47" x2="192" y2="58" {...STROKE} strokeWidth={1} strokeDasharray="4 3" />
      <g className="text-brass-600">
        <line x1="74" y1="22" x2="192" y2="22" {...STROKE} />
        <line x1="192" y1="16" x2="192" y2="52" {...STROKE} strokeWidth={1} />
        <path d="M80 18 L74 22 L80 26 M186 18 L192 22 L186 26" {...STROKE} />
      </g>
      <text x="30" y="80" fontSize="10" fill="currentColor">
        seal face
      </text>
      <text x="150" y="80" fontSize="10" fill="currentColor">
        pinion joint centre
      </text>
    </>
  ),
  "weld-to-weld": (
    <>
      <line x1="40" y1="48" x2="200" y2="48" {...STROKE} strokeWidth={14} className="text-steel-500" />
      <path d="M40 36 L22 36 L14 28 M40 60 L22 60 L14 68" {...STROKE} />
      <path d="M200 36 L218 36 L226 28 M200 60 L218 60 L226 68" {...STROKE} />
      <g className="text-brass-600">
        <line x1="40" y1="30" x2="40" y2="66" {...STROKE} strokeWidth={3} />
        <line x1="200" y1="30" x2="200" y2="66" {...STROKE} strokeWidth={3} />
        <line x1="40" y1="80" x2="200" y2="80" {...STROKE} />
        <path d="M46 76 L40 80 L46 84 M194 76 L200 80 L194 84" {...STROKE} />
      </g>
      <text x="92" y="20" fontSize="10" fill="currentColor">
        weld to weld
      </text>
    </>
  ),
  "ride-height": (
    <>
      <Ground />
      <path d="M30 40 L60 20 L180 20 L214 40 Z" {...STROKE} />
      <circle cx="60" cy="68" r="18" {...STROKE} />
      <circle cx="186" cy="68" r="18" {...STROKE} />
      <rect x="100" y="44" width="40" height="10" {...STROKE} className="text-brass-600" />
      <path d="M120 30 L120 42 M114 36 L120 42 L126 36" {...STROKE} className="text-brass-600" />
      <text x="96" y="70" fontSize="10" fill="currentColor">
        load in
      </text>
    </>
  ),
  wrap: (
    <>
      <Ground />
      <path d="M40 40 Q120 56 200 40" {...STROKE} />
      <path d="M40 46 Q120 30 200 50" {...STROKE} strokeDasharray="4 3" className="text-brass-600" />
      <circle cx="120" cy="62" r="16" {...STROKE} />
      <line x1="120" y1="62" x2="84" y2="50" {...STROKE} strokeWidth={4} />
      <line
        x1="120"
        y1="62"
        x2="82"
        y2="66"
        {...STROKE}
        strokeWidth={2}
        strokeDasharray="3 2"
        className="text-brass-600"
      />
      <path d="M150 30 A 30 30 0 0 0 140 64" {...STROKE} className="text-brass-600" />
      <path d="M136 58 L140 64 L146 59" {...STROKE} className="text-brass-600" />
    </>
  ),
  slip: (
    <>
      <rect x="14" y="34" width="50" height="28" rx="3" {...STROKE} />
      <rect x="64" y="40" width="60" height="16" rx="2" {...STROKE} className="text-steel-500" />
      <line x1="100" y1="48" x2="226" y2="48" {...STROKE} strokeWidth={10} className="text-steel-500" />
      <g className="text-brass-600">
        <line x1="64" y1="24" x2="124" y2="24" {...STROKE} />
        <path d="M70 20 L64 24 L70 28 M118 20 L124 24 L118 28" {...STROKE} />
        <line x1="64" y1="72" x2="92" y2="72" {...STROKE} strokeWidth={1} />
        <path d="M86 68 L92 72 L86 76" {...STROKE} strokeWidth={1} />
      </g>
      <text x="68" y="18" fontSize="10" fill="currentColor">
        travel
      </text>
      <text x="96" y="76" fontSize="10" fill="currentColor">
        out at ride height
      </text>
    </>
  ),
  spline: (
    <>
      <circle cx="70" cy="48" r="32" {...STROKE} />
      <circle cx="70" cy="48" r="25" {...STROKE} strokeDasharray="3 3" />
      <circle cx="70" cy="48" r="8" {...STROKE} strokeWidth={1} />
      <g className="text-brass-600">
        <line x1="38" y1="90" x2="102" y2="90" {...STROKE} strokeWidth={1} />
        <line x1="38" y1="84" x2="38" y2="94" {...STROKE} strokeWidth={1} />
        <line x1="102" y1="84" x2="102" y2="94" {...STROKE} strokeWidth={1} />
      </g>
      <text x="120" y="40" fontSize="10" fill="currentColor">
        count the teeth;
      </text>
      <text x="120" y="54" fontSize="10" fill="currentColor">
        calliper over the tops
      </text>
    </>
  ),
  caps: (
    <>
      <path d="M40 20 L40 76 M200 20 L200 76" {...STROKE} strokeWidth={6} />
      <rect x="50" y="36" width="26" height="24" rx="4" {...STROKE} />
      <rect x="164" y="36" width="26" height="24" rx="4" {...STROKE} />
      <line x1="76" y1="48" x2="164" y2="48" {...STROKE} strokeWidth={6} className="text-steel-500" />
      <g className="text-brass-600">
        <line x1="50" y1="86" x2="190" y2="86" {...STROKE} />
        <path d="M56 82 L50 86 L56 90 M184 82 L190 86 L184 90" {...STROKE} />
        <line x1="44" y1="36" x2="44" y2="60" {...STROKE} strokeWidth={1} />
      </g>
      <text x="98" y="80" fontSize="10" fill="currentColor">
        span
      </text>
      <text x="4" y="14" fontSize="10" fill="currentColor">
        cap diameter
      </text>
    </>
  ),
  flange: (
    <>
      <circle cx="80" cy="48" r="40" {...STROKE} />
      <circle cx="80" cy="48" r="14" {...STROKE} />
      <circle
        cx="80"
        cy="48"
        r="28"
        {...STROKE}
        strokeWidth={1}
        strokeDasharray="3 3"
        className="text-brass-600"
      />
      <circle cx="108" cy="48" r="4" {...STROKE} />
      <circle cx="52" cy="48" r="4" {...STROKE} />
      <circle cx="80" cy="20" r="4" {...STROKE} />
      <circle cx="80" cy="76" r="4" {...STROKE} />
      <text x="134" y="40" fontSize="10" fill="currentColor">
        bolt circle: centre
      </text>
      <text x="134" y="54" fontSize="10" fill="currentColor">
        to opposite centre
      </text>
      <text x="134" y="68" fontSize="10" fill="currentColor">
        pilot: the spigot
      </text>
    </>
  ),
  engine: (
    <>
      <rect x="14" y="28" width="60" height="40" rx="4" {...STROKE} />
      <rect x="84" y="34" width="56" height="28" rx="3" {...STROKE} />
      <line x1="74" y1="48" x2="84" y2="48" {...STROKE} />
      <line x1="140" y1="48" x2="226" y2="48" {...STROKE} strokeWidth={4} className="text-steel-500" />
      <circle cx="112" cy="48" r="6" {...STROKE} />
      <circle cx="112" cy="48" r="11" {...STROKE} strokeWidth={1} />
      <text x="18" y="84" fontSize="10" fill="currentColor">
        engine rpm
      </text>
      <text x="150" y="84" fontSize="10" fill="currentColor">
        ÷ top gear
      </text>
    </>
  ),
  traction: (
    <>
      <Ground />
      <circle cx="120" cy="54" r="30" {...STROKE} />
      <circle cx="120" cy="54" r="3" {...STROKE} />
      <g className="text-brass-600">
        <line x1="120" y1="54" x2="120" y2="84" {...STROKE} />
        <path d="M120 6 L120 22 M114 16 L120 22 L126 16" {...STROKE} />
        <path d="M84 86 L60 86 M66 82 L60 86 L66 90" {...STROKE} />
      </g>
      <text x="128" y="74" fontSize="10" fill="currentColor">
        loaded radius
      </text>
      <text x="130" y="14" fontSize="10" fill="currentColor">
        axle load
      </text>
    </>
  ),
};

const TEXT: Record<GuideTopic, { alt: string; body: React.ReactNode }> = {
  length: {
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
    alt: "An angle finder on the pinion yoke of the axle, compared with a level line.",
    body: (
      <p>
        Rotate the pinion yoke so its ears point straight up and read the angle across the machined yoke face
        (or the flange face). Positive when the pinion nose points up toward the front.
      </p>
    ),
  },
  offset: {
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
    alt: "A vehicle with an arrow for its speed.",
    body: (
      <p>
        The highest speed the vehicle will really be driven at. The axle ratio is on the axle tag or in the
        build sheet (e.g. 3.73).
      </p>
    ),
  },
  tire: {
    alt: "A tire with its overall height measured from the ground to the top of the tread.",
    body: (
      <p>
        Measure the loaded tire from the ground to the top of the tread, or use the size from the sidewall.
      </p>
    ),
  },
  rpm: {
    alt: "A spinning shaft.",
    body: (
      <p>
        The highest speed the driveshaft will turn, in revolutions per minute (for machines, or when the
        gearing is unusual).
      </p>
    ),
  },
  ends: {
    alt: "A weld yoke on the end of a tube, with the joint centre marked.",
    body: (
      <p>
        The yoke or flange welded to each end. If you are not sure, let the shop choose one that fits the tube
        and the torque.
      </p>
    ),
  },
  tube: {
    alt: "A tube section showing the outside diameter and the wall.",
    body: (
      <p>
        Yokeline picks a tube from the shop&rsquo;s stock that passes every check (the cheapest or the
        lightest, as the shop prefers) and lists the others. Choose one yourself only if you must.
      </p>
    ),
  },
  "no-shaft": {
    alt: "Side view: a tape from the transmission's output seal face to the centre of the pinion joint.",
    body: (
      <>
        <p>
          With the vehicle at loaded ride height, measure from the face of the transmission&rsquo;s output
          seal (where the slip yoke enters it) to the centre of the pinion joint&rsquo;s cross (the centre of
          the caps in the pinion yoke, or the face of a companion flange).
        </p>
        <p>
          Tell the shop that is how you measured: the slip yoke&rsquo;s own length from its joint centre to
          the point where it should sit in the seal is then taken off by the shop, so the slip ends up part
          way out.
        </p>
      </>
    ),
  },
  "weld-to-weld": {
    alt: "A shaft with both end yokes welded to the tube and the tape between the two weld beads.",
    body: (
      <>
        <p>
          For a new tube in an old shaft, measure the old one on the bench from weld bead to weld bead (the
          edge of each bead where it meets the tube), and also joint centre to joint centre.
        </p>
        <p>
          Mark the phasing first: a straight line along the tube through both yokes&rsquo; ears, so the new
          tube goes back with the yokes in the same index.
        </p>
      </>
    ),
  },
  "ride-height": {
    alt: "A vehicle standing on its wheels with its load in.",
    body: (
      <>
        <p>
          Measure with the vehicle standing on its own wheels, with its usual load in (a tow rig hitched, a
          work truck loaded), on level ground. A vehicle on a lift with the axle hanging is at full droop, not
          at ride height: every length and angle is different there.
        </p>
        <p>
          Droop: lift the body until the wheels hang on their stops (or shocks) and measure how much longer
          the joint-to-joint distance gets. Bump: with the springs removed or the axle jacked to the bump
          stops, measure how much shorter it gets.
        </p>
      </>
    ),
  },
  wrap: {
    alt: "A leaf spring bending into an S under torque and the axle rotating its pinion nose upward.",
    body: (
      <>
        <p>
          Under hard acceleration, a leaf-sprung axle tries to turn the opposite way to the wheels: the
          springs bend into a shallow S and the pinion nose climbs. Under braking or on the overrun it drops.
        </p>
        <p>
          So the pinion angle you measure parked is not the one it runs at under load. Common shop practice is
          to set a leaf-sprung pinion a degree or two nose-down from where the working angles would cancel, so
          it comes up into line under torque; more for towing and drag use, and traction bars or ladder bars
          where it wraps a lot. Coil-sprung axles with links move much less.
        </p>
      </>
    ),
  },
  slip: {
    alt: "A slip yoke pushed into the transmission with its travel marked.",
    body: (
      <>
        <p>
          Collapsed length: push the shaft fully into the transmission (or the slip fully together) and
          measure joint centre to joint centre. Travel: the spline length from fully in to the end of the
          spline (the shop can read it off the slip yoke).
        </p>
        <p>
          At ride height the slip should sit part way out (common shop practice: about 3/4 to 1 in out from
          fully in), so it can shorten at full bump and still keep spline engaged at full droop.
        </p>
      </>
    ),
  },
  spline: {
    alt: "An output shaft end: count the teeth and calliper across their tops.",
    body: (
      <p>
        Count the teeth on the transmission (or transfer-case) output shaft, and measure across the tops of
        the teeth with a calliper (the major diameter). With the old slip yoke in hand, count its internal
        splines instead and tell the shop.
      </p>
    ),
  },
  caps: {
    alt: "A cross with its two bearing caps in a yoke: the cap diameter and the span across them.",
    body: (
      <p>
        Cap diameter: across one bearing cap with a calliper. Span: across the outside of the two caps that
        sit in the vehicle&rsquo;s yoke (not the pair in the shaft&rsquo;s own yoke). Note how they are held:
        straps, U-bolts, or round caps clamped in bores.
      </p>
    ),
  },
  flange: {
    alt: "A flange face with four bolt holes on a circle and a centring pilot.",
    body: (
      <p>
        Count the bolt holes. The bolt circle is the diameter through their centres: with an even count,
        measure centre to centre across opposite holes. The pilot is the centring spigot (or the bore that
        takes it): measure its diameter with a calliper.
      </p>
    ),
  },
  engine: {
    alt: "Engine and gearbox, with the shaft turning at engine rpm divided by the top gear.",
    body: (
      <p>
        The highest engine speed the vehicle will really see in top gear (the rev limiter if it can reach it),
        and the top gear ratio from the transmission&rsquo;s build sheet. An overdrive (a ratio below 1) turns
        the shaft faster than the engine: 6000 rpm through 0.70 is about 8600 rpm at the shaft.
      </p>
    ),
  },
  traction: {
    alt: "A tire under load: the axle load pressing down and the loaded radius from the axle to the ground.",
    body: (
      <p>
        The axle load is what the driven axle puts on a scale, loaded as it works (a truck scale, or the
        corner weights added). The loaded radius is from the axle centre to the ground with the vehicle on its
        wheels; it is a little less than half the tire&rsquo;s diameter.
      </p>
    ),
  },
};

/** The drawing and the words of one guide (inside its opened `<details>`). */
export function MeasuringGuideContent({ topic }: { topic: GuideTopic }) {
  const t = TEXT[topic];
  return (
    <div className="grid gap-3 px-3 pb-3 sm:grid-cols-[10rem_1fr]">
      <svg viewBox="0 0 240 96" role="img" aria-label={t.alt} className="w-full max-w-[12rem] text-ink-soft">
        <title>{t.alt}</title>
        {DRAWINGS[topic]}
      </svg>
      <div className="space-y-2 text-ink-soft">{t.body}</div>
    </div>
  );
}
