import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

const SERVER_ONLY_IMPORT =
  /^(@mikro-orm\/|pg($|\/)|@\/lib\/db($|\/)|@\/entities($|\/)|(\.\.?\/)+entities($|\/))/;

/**
 * Reports a database, ORM or entity import — `import type` included — in a client component ("use
 * client"), anywhere under components/, or in a route's own app/…/_components/: they get plain view
 * models (e.g. lib/orders/views.ts), never entities or an entity manager.
 */
const clientBoundary = {
  meta: {
    type: "problem",
    messages: {
      server:
        "{{source}}: client components, components/ and _components/ get plain view models, never the database, the ORM or entities.",
    },
    schema: [],
  },
  create(context) {
    const file = context.filename.split("\\").join("/");
    // View-model modules (lib/<area>/views.ts) are what those components import: same rule.
    let client = /\/_?components\//.test(file) || /\/lib\/.+\/views\.ts$/.test(file);
    const check = (node, source) => {
      if (client && source && SERVER_ONLY_IMPORT.test(String(source.value)))
        context.report({ node, messageId: "server", data: { source: String(source.value) } });
    };
    return {
      Program(node) {
        for (const statement of node.body) {
          if (statement.type !== "ExpressionStatement" || typeof statement.directive !== "string") break;
          if (statement.directive === "use client") client = true;
        }
      },
      ImportDeclaration: (node) => check(node, node.source),
      ExportNamedDeclaration: (node) => check(node, node.source),
      ExportAllDeclaration: (node) => check(node, node.source),
      ImportExpression: (node) => check(node, node.source.type === "Literal" ? node.source : null),
    };
  },
};

/** Next's recommended rules (React, hooks, accessibility, imports) plus its TypeScript rules. */
const config = [
  ...nextVitals,
  ...nextTs,
  {
    rules: {
      // A leading underscore marks a value left out on purpose (e.g. when destructuring to omit).
      "@typescript-eslint/no-unused-vars": [
        "warn",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", destructuredArrayIgnorePattern: "^_" },
      ],
    },
  },
  // The engineering core is pure: no I/O, no framework, nothing from the app around it
  // (DEVELOPERS.md "Layout"; the browser, the server and the CLI all import it).
  {
    files: ["lib/driveline/**/*.{ts,tsx}"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            {
              regex:
                "^(node:|next($|/)|react($|/|-dom)|@mikro-orm/|pg($|/)|pg-boss|stripe|resend|nodemailer|server-only)",
              message: "lib/driveline is pure TypeScript: no I/O, no framework, no database.",
            },
            {
              regex: "^@/(?!lib/driveline(/|$))",
              message: "lib/driveline imports only from lib/driveline (no app modules, no entities).",
            },
            {
              regex: "^(fs|path|http|https|net|child_process|crypto|os|url|stream|zlib|worker_threads)$",
              message: "lib/driveline does no I/O: Node's modules stay outside the core.",
            },
          ],
        },
      ],
    },
  },
  // Client components ("use client" files, and everything in components/) never reach the database,
  // the ORM or entities: they get plain view models.
  {
    files: ["**/*.{ts,tsx}"],
    plugins: { yokeline: { rules: { "client-boundary": clientBoundary } } },
    rules: { "yokeline/client-boundary": "error" },
  },
  {
    ignores: [
      ".next/**",
      ".data/**",
      "node_modules/**",
      "next-env.d.ts",
      "test-results/**",
      "playwright-report/**",
    ],
  },
];

export default config;
