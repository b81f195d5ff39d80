import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { compile } from "@tailwindcss/node";
import ts from "typescript";
import { beforeAll, describe, expect, it } from "vitest";

/**
 * Tailwind drops a class it does not know without a word, so a misspelt utility or a house class
 * never defined in app/globals.css (`btn-secondary` once left two buttons looking like plain text)
 * shows only on screen. Every class a screen names in `className` must produce CSS, or be one of
 * the plain classes app/globals.css itself styles, or a marker Tailwind reads from elsewhere.
 */
const root = path.resolve(import.meta.dirname, "../..");
/** Markers that style other elements (`group-hover:`…), not themselves. */
const MARKER = /^(group|peer)(\/[a-z]+)?$/;

function tsxFiles(dir: string): string[] {
  return readdirSync(path.join(root, dir), { withFileTypes: true }).flatMap((e) => {
    const rel = `${dir}/${e.name}`;
    if (e.isDirectory()) return tsxFiles(rel);
    return e.name.endsWith(".tsx") ? [rel] : [];
  });
}

/** The text a className expression can produce: its strings and templates' fixed parts. */
function classTexts(node: ts.Node, out: string[]): void {
  if (ts.isStringLiteral(node) || ts.isNoSubstitutionTemplateLiteral(node)) out.push(node.text);
  else if (ts.isTemplateExpression(node)) {
    out.push(node.head.text);
    for (const span of node.templateSpans) {
      classTexts(span.expression, out);
      out.push(span.literal.text);
    }
  } else if (
    ts.isBinaryExpression(node) &&
    [ts.SyntaxKind.EqualsEqualsEqualsToken, ts.SyntaxKind.ExclamationEqualsEqualsToken].includes(
      node.operatorToken.kind,
    )
  ) {
    // `tone === "danger" ? … : …`: the compared value is not a class.
    classTexts(node.left, out);
  } else ts.forEachChild(node, (child) => classTexts(child, out));
}

/** Every class token written in a `className` of app/ and components/, with a file that uses it. */
function classNames(): Map<string, string> {
  const found = new Map<string, string>();
  for (const file of ["app", "components"].flatMap(tsxFiles)) {
    const text = readFileSync(path.join(root, file), "utf8");
    const source = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, true, ts.ScriptKind.TSX);
    const visit = (node: ts.Node) => {
      if (ts.isJsxAttribute(node) && node.name.getText(source) === "className" && node.initializer) {
        const texts: string[] = [];
        classTexts(node.initializer, texts);
        for (const token of texts.join(" ").split(/\s+/))
          if (token && !found.has(token)) found.set(token, file);
      }
      ts.forEachChild(node, visit);
    };
    visit(source);
  }
  return found;
}

describe("class names", () => {
  const css = readFileSync(path.join(root, "app/globals.css"), "utf8");
  /** Plain classes the stylesheet styles itself (`.no-print` in print). */
  const plain = new Set([...css.matchAll(/\.([a-z][a-z0-9-]*)\b/g)].map((m) => m[1]));
  const used = classNames();
  const unknown: string[] = [];

  beforeAll(async () => {
    const compiler = await compile(css, { base: path.join(root, "app"), onDependency: () => undefined });
    // build() adds to what it has made; a class that adds nothing is one Tailwind does not know.
    let size = compiler.build([]).length;
    for (const [token, file] of used) {
      const next = compiler.build([token]).length;
      if (next === size && !plain.has(token) && !MARKER.test(token)) unknown.push(`${token} (${file})`);
      size = next;
    }
  });

  it("finds the classes the screens use (the scan itself works)", () => {
    expect(used.size).toBeGreaterThan(300);
    for (const token of ["btn-primary", "field-input", "md:grid-cols-2", "print:hidden"])
      expect(used.has(token), token).toBe(true);
  });

  it("every class a screen names is one Tailwind or app/globals.css defines", () => {
    expect(unknown).toEqual([]);
  });
});
