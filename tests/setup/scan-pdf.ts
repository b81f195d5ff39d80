/**
 * Reads a PDF's barcodes back as a scanner would: each page rendered at 300 dpi by pdftoppm,
 * every symbol decoded by zbarimg (Debian's poppler-utils and zbar-tools; `npm test` installs them).
 * Used by the Vitest traveller tests and the browser tests alike (no test-runner imports here).
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readdirSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";

/**
 * Every symbol on each page, as zbarimg prints it ("CODE-128:…", "QR-Code:…"), sorted per page.
 * Rendered without anti-aliasing: crisp bars as a laser printer makes them, and three times
 * faster than the smoothed render (300 dpi still; at 200 dpi a Code 128 is lost).
 */
export function scanPdf(pdf: Uint8Array): string[][] {
  const work = mkdtempSync(path.join(tmpdir(), "scan-pdf-"));
  try {
    const file = path.join(work, "t.pdf");
    writeFileSync(file, pdf);
    execFileSync("pdftoppm", [
      "-r",
      "300",
      "-gray",
      "-aa",
      "no",
      "-aaVector",
      "no",
      "-png",
      file,
      path.join(work, "p"),
    ]);
    return readdirSync(work)
      .filter((f) => f.endsWith(".png"))
      .sort()
      .map((png) => {
        let out = "";
        try {
          out = execFileSync("zbarimg", ["-q", path.join(work, png)], {
            encoding: "utf8",
            stdio: ["ignore", "pipe", "ignore"],
          });
        } catch (error) {
          out = (error as { stdout?: string }).stdout ?? ""; // zbarimg exits 4 when it finds nothing
        }
        return out.trim().split("\n").filter(Boolean).sort();
      });
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

/** The data of every symbol on every page (the type prefix dropped), in page order. */
export function readCodes(pdf: Uint8Array): string[] {
  return scanPdf(pdf)
    .flat()
    .map((l) => l.replace(/^[^:]+:/, ""));
}
