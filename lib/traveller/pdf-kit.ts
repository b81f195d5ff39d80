/**
 * Drawing kit shared by the traveller and the customer's papers: the embedded fonts (parsed once
 * per process), a text writer that wraps and swaps characters the subset lacks, and Code 128 / QR
 * codes drawn as vector bars from bwip-js's encoding. Server only (reads lib/traveller/fonts).
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import bwipjs from "bwip-js/node";
import fontkit from "@pdf-lib/fontkit";
import { rgb, type PDFDocument, type PDFFont, type PDFPage } from "pdf-lib";

type Fontkit = Parameters<PDFDocument["registerFontkit"]>[0];

export const PAGE = { letter: [612, 792], a4: [595.28, 841.89] } as const;
export const BLACK = rgb(0, 0, 0);
export const GREY = rgb(0.35, 0.35, 0.35);
export const MARGIN = 28;
/** Code 128 narrowest bar: 0.25 mm (about 10 mil), which keyboard-wedge scanners read easily. */
export const MODULE_PT = (0.25 / 25.4) * 72;

const FONT_DIR = path.join(process.cwd(), "lib", "traveller", "fonts");
let fontBytes: { regular: Buffer; bold: Buffer; mono: Buffer } | null = null;
function fonts() {
  fontBytes ??= {
    regular: readFileSync(path.join(FONT_DIR, "inter-latin-400-normal.ttf")),
    bold: readFileSync(path.join(FONT_DIR, "inter-latin-700-normal.ttf")),
    mono: readFileSync(path.join(FONT_DIR, "JetBrainsMono-Bold.ttf")),
  };
  return fontBytes;
}

/**
 * fontkit with each font parsed once per process and a plain character → glyph mapping instead of
 * full OpenType shaping: pdf-lib only uses the glyph ids (it ignores kerning), and shaping was
 * most of the page's time. The travellers use no ligatures or complex scripts.
 */
const parsedFonts = new Map<Uint8Array, ReturnType<Fontkit["create"]>>();
const fastFontkit: Fontkit = {
  create(data, postscriptName) {
    let font = parsedFonts.get(data);
    if (!font) {
      const parsed = fontkit.create(data, postscriptName);
      const glyphs = new Map<number, ReturnType<typeof parsed.glyphForCodePoint>>();
      const glyphFor = (cp: number) => {
        let g = glyphs.get(cp);
        if (!g) glyphs.set(cp, (g = parsed.glyphForCodePoint(cp)));
        return g;
      };
      parsed.layout = ((text: string) => ({
        glyphs: Array.from(text, (ch) => glyphFor(ch.codePointAt(0)!)),
        positions: [],
      })) as unknown as typeof parsed.layout;
      parsedFonts.set(data, (font = parsed));
    }
    return font;
  },
};

export interface Fonts {
  regular: PDFFont;
  bold: PDFFont;
  mono: PDFFont;
}

/** Replaces characters the embedded subset lacks (the core's messages use a few maths signs). */
const charsets = new WeakMap<PDFFont, Set<number>>();
export function printable(text: string, font: PDFFont): string {
  let has = charsets.get(font);
  if (!has) charsets.set(font, (has = new Set(font.getCharacterSet())));
  const swaps: Record<string, string> = { "≥": ">=", "≤": "<=", "√": "sqrt ", β: "b", ω: "w", "²": "2" };
  let out = "";
  for (const ch of text) {
    const cp = ch.codePointAt(0)!;
    out += has.has(cp) ? ch : (swaps[ch] ?? "?");
  }
  return out;
}

export class Writer {
  constructor(
    readonly page: PDFPage,
    readonly f: Fonts,
  ) {}

  text(
    text: string,
    x: number,
    y: number,
    size: number,
    font: PDFFont = this.f.regular,
    color = BLACK,
  ): number {
    const t = printable(text, font);
    this.page.drawText(t, { x, y, size, font, color });
    return font.widthOfTextAtSize(t, size);
  }

  /** Word-wrapped text from the top line's baseline down; returns the y below the last line. */
  wrap(
    text: string,
    x: number,
    y: number,
    width: number,
    size: number,
    font: PDFFont = this.f.regular,
    maxLines = 99,
  ): number {
    const words = printable(text, font).split(/\s+/);
    let line = "";
    let lines = 0;
    const lead = size * 1.25;
    for (const word of words) {
      const next = line ? `${line} ${word}` : word;
      if (font.widthOfTextAtSize(next, size) > width && line) {
        if (++lines >= maxLines) {
          this.page.drawText(`${line} …`, { x, y, size, font, color: BLACK });
          return y - lead;
        }
        this.page.drawText(line, { x, y, size, font, color: BLACK });
        y -= lead;
        line = word;
      } else line = next;
    }
    if (line) {
      this.page.drawText(line, { x, y, size, font, color: BLACK });
      y -= lead;
    }
    return y;
  }

  rule(x1: number, y: number, x2: number, thickness = 0.6): void {
    this.page.drawLine({ start: { x: x1, y }, end: { x: x2, y }, thickness, color: BLACK });
  }
}

/** Code 128 as vector bars, bottom-left at (x, y). Returns the drawn width. */
export function drawCode128(
  page: PDFPage,
  text: string,
  x: number,
  y: number,
  heightPt: number,
  maxWidthPt: number,
): number {
  const [enc] = bwipjs.raw({ bcid: "code128", text }) as Array<{ sbs: number[] }>;
  const sbs = enc!.sbs;
  const modules = sbs.reduce((a, b) => a + b, 0);
  const m = Math.min(MODULE_PT, maxWidthPt / modules);
  let cx = x;
  sbs.forEach((w, i) => {
    if (i % 2 === 0) page.drawRectangle({ x: cx, y, width: w * m, height: heightPt, color: BLACK });
    cx += w * m;
  });
  return modules * m;
}

/** QR code (error correction M) as vector modules, bottom-left at (x, y), `sizePt` square. */
export function drawQr(page: PDFPage, text: string, x: number, y: number, sizePt: number): void {
  const [enc] = bwipjs.raw("qrcode", text, "eclevel=M") as Array<{
    pixs: number[];
    pixx: number;
    pixy: number;
  }>;
  const { pixs, pixx, pixy } = enc!;
  const m = sizePt / pixx;
  for (let row = 0; row < pixy; row++) {
    let start = -1;
    for (let col = 0; col <= pixx; col++) {
      const dark = col < pixx && pixs[row * pixx + col] === 1;
      if (dark && start < 0) start = col;
      if (!dark && start >= 0) {
        // Rows run top to bottom in the encoding; PDF y runs upward.
        page.drawRectangle({
          x: x + start * m,
          y: y + sizePt - (row + 1) * m,
          width: (col - start) * m,
          height: m,
          color: BLACK,
        });
        start = -1;
      }
    }
  }
}

export async function embedFonts(doc: PDFDocument): Promise<Fonts> {
  doc.registerFontkit(fastFontkit);
  const b = fonts();
  const [regular, bold, mono] = await Promise.all([
    doc.embedFont(b.regular, { subset: true }),
    doc.embedFont(b.bold, { subset: true }),
    doc.embedFont(b.mono, { subset: true }),
  ]);
  return { regular, bold, mono };
}
