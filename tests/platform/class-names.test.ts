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

function sourceFiles(dir: string): string[] {
  return readdirSync(path.join(root, dir), { withFileTypes: true }).flatMap((e) => {
    const rel = `${dir}/${e.name}`;
    if (e.isDirectory()) return sourceFiles(rel);
    return /\.tsx?$/.test(e.name) ? [rel] : [];
  });
}

/** A file's `const NAME = …` initializers, by name. */
function constants(source: ts.SourceFile): Map<string, ts.Expression> {
  const found = new Map<string, ts.Expression>();
  const visit = (node: ts.Node) => {
    if (ts.isVariableDeclaration(node) && ts.isIdentifier(node.name) && node.initializer)
      found.set(node.name.text, node.initializer);
    ts.forEachChild(node, visit);
  };
  visit(source);
  return found;
}

/**
 * What an expression stands for, through the same file's constants: `CELL` is its string,
 * `TONE[state]` every value of TONE, `STEP[s].badge` every value's `badge`. Calls stay unread.
 */
function resolve(node: ts.Expression, consts: Map<string, ts.Expression>, depth = 0): ts.Expression[] {
  if (depth > 8) return [];
  if (ts.isParenthesizedExpression(node) || ts.isAsExpression(node) || ts.isSatisfiesExpression(node))
    return resolve(node.expression, consts, depth + 1);
  if (ts.isIdentifier(node)) {
    const value = consts.get(node.text);
    return value ? resolve(value, consts, depth + 1) : [];
  }
  if (ts.isElementAccessExpression(node))
    return resolve(node.expression, consts, depth + 1).flatMap((target) =>
      ts.isObjectLiteralExpression(target)
        ? target.properties.flatMap((p) =>
            ts.isPropertyAssignment(p) ? resolve(p.initializer, consts, depth + 1) : [],
          )
        : ts.isArrayLiteralExpression(target)
          ? target.elements.flatMap((e) => resolve(e, consts, depth + 1))
          : [],
    );
  if (ts.isPropertyAccessExpression(node))
    return resolve(node.expression, consts, depth + 1).flatMap((target) =>
      ts.isObjectLiteralExpression(target)
        ? target.properties.flatMap((p) =>
            ts.isPropertyAssignment(p) && p.name.getText() === node.name.text
              ? resolve(p.initializer, consts, depth + 1)
              : [],
          )
        : [],
    );
  return [node];
}

/** The text a className expression can produce: its strings and templates' fixed parts. */
function classTexts(node: ts.Node, out: string[], consts: Map<string, ts.Expression>): void {
  if (ts.isIdentifier(node) || ts.isPropertyAccessExpression(node) || ts.isElementAccessExpression(node)) {
    for (const value of resolve(node, consts)) if (value !== node) classTexts(value, out, consts);
  } else if (ts.isConditionalExpression(node)) {
    // `a ? "x" : "y"`: the condition is not a class.
    classTexts(node.whenTrue, out, consts);
    classTexts(node.whenFalse, out, consts);
  } else if (
    ts.isBinaryExpression(node) &&
    node.operatorToken.kind === ts.SyntaxKind.AmpersandAmpersandToken
  ) {
    classTexts(node.right, out, consts);
  } else if (ts.isCallExpression(node) || ts.isObjectLiteralExpression(node)) {
    // A helper's result or a whole record: not read.
  } else if (ts.isStringLiteral(node) || ts.isNoSubstitutionTemplateLiteral(node)) out.push(node.text);
  else if (ts.isTemplateExpression(node)) {
    out.push(node.head.text);
    for (const span of node.templateSpans) {
      classTexts(span.expression, out, consts);
      out.push(span.literal.text);
    }
  } else if (
    ts.isBinaryExpression(node) &&
    [ts.SyntaxKind.EqualsEqualsEqualsToken, ts.SyntaxKind.ExclamationEqualsEqualsToken].includes(
      node.operatorToken.kind,
    )
  ) {
    // `tone === "danger"`: the compared value is not a class.
  } else ts.forEachChild(node, (child) => classTexts(child, out, consts));
}

/** Every class token written in a `className` of app/ and components/, with a file that uses it. */
function classNames(): Map<string, string> {
  const sources = ["app", "components"]
    .flatMap(sourceFiles)
    .map((file) =>
      ts.createSourceFile(file, readFileSync(path.join(root, file), "utf8"), ts.ScriptTarget.Latest, true),
    );
  // Class lists one file exports and another imports (`CELL`), by name; a file's own come first.
  const exported = new Map<string, ts.Expression>();
  for (const source of sources)
    for (const statement of source.statements)
      if (
        ts.isVariableStatement(statement) &&
        statement.modifiers?.some((m) => m.kind === ts.SyntaxKind.ExportKeyword)
      )
        for (const d of statement.declarationList.declarations)
          if (ts.isIdentifier(d.name) && d.initializer) exported.set(d.name.text, d.initializer);
  const found = new Map<string, string>();
  for (const source of sources) {
    const consts = new Map([...exported, ...constants(source)]);
    const visit = (node: ts.Node) => {
      if (ts.isJsxAttribute(node) && node.name.getText(source) === "className" && node.initializer) {
        const texts: string[] = [];
        classTexts(node.initializer, texts, consts);
        for (const token of texts.join(" ").split(/\s+/))
          if (token && !found.has(token)) found.set(token, source.fileName);
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
