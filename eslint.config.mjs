import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

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
