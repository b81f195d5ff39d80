"use client";

import { useState } from "react";
import dynamic from "next/dynamic";
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
  | "tube"
  | "no-shaft"
  | "weld-to-weld"
  | "ride-height"
  | "wrap"
  | "slip"
  | "spline"
  | "caps"
  | "flange"
  | "engine"
  | "traction";

/** Each guide's title, shown in its closed summary ("How to measure: installed length"). */
const TITLE: Record<GuideTopic, string> = {
  length: "Installed length",
  transmission: "Transmission angle",
  driveshaft: "Driveshaft angle",
  pinion: "Pinion angle",
  offset: "Sideways offset",
  torque: "Torque and gearing",
  speed: "Top speed",
  tire: "Tire diameter",
  rpm: "Maximum shaft speed",
  ends: "End fittings",
  tube: "Tube",
  "no-shaft": "Length with no shaft yet",
  "weld-to-weld": "Weld to weld (re-tube)",
  "ride-height": "Loaded ride height",
  wrap: "Leaf springs wrap under load",
  slip: "Slip collapsed length and travel",
  spline: "Output spline",
  caps: "Cap diameter and span",
  flange: "Companion flange",
  engine: "Engine-speed path",
  traction: "Axle load and loaded radius",
};

const loadContent = () => import("./measuring-guide-content");

/** The drawing and words, fetched when a guide is first opened; a quiet placeholder meanwhile. */
const MeasuringGuideContent = dynamic(() => loadContent().then((m) => m.MeasuringGuideContent), {
  ssr: false,
  loading: () => (
    <div className="grid gap-3 px-3 pb-3 sm:grid-cols-[10rem_1fr]" aria-busy="true">
      <div className="aspect-[240/96] w-full max-w-[12rem] animate-pulse rounded bg-line/60" />
      <p className="text-ink-muted">Loading the guide…</p>
    </div>
  ),
});

/**
 * A collapsible "How to measure" aside for one field group. Its drawing and words load on the
 * first opening (started already on hover or focus), not with the builder.
 */
export function MeasuringGuide({ topic }: { topic: GuideTopic }) {
  const [opened, setOpened] = useState(false);
  return (
    <details
      className="group mt-2 rounded-md border border-line bg-paper-sunk/50 text-sm"
      onToggle={(e) => {
        if (e.currentTarget.open) setOpened(true);
      }}
    >
      <summary
        className="flex cursor-pointer items-center gap-2 px-3 py-2 font-medium text-steel-700 marker:content-none"
        onPointerEnter={() => void loadContent()}
        onFocus={() => void loadContent()}
      >
        <Ruler className="size-4" aria-hidden="true" />
        How to measure: {TITLE[topic].toLowerCase()}
      </summary>
      {opened && <MeasuringGuideContent topic={topic} />}
    </details>
  );
}
