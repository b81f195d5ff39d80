import type { Config } from "tailwindcss";

/**
 * Yokeline's own look: a dark "blued steel" ink, warm paper, and a brass accent, with plain
 * status colours for checks (pass / warn / fail always carry a word too, never colour alone).
 */
export default {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./lib/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: "#1b2430", soft: "#334155", muted: "#5b6776" },
        paper: { DEFAULT: "#f7f5f0", raised: "#ffffff", sunk: "#ece8df" },
        line: { DEFAULT: "#d8d2c4", strong: "#b4ab98" },
        brass: {
          50: "#fbf5e6",
          100: "#f4e6bf",
          400: "#c9972f",
          500: "#a87a1c",
          600: "#8a6414",
          700: "#6c4e10",
        },
        steel: {
          50: "#eef2f6",
          100: "#dbe3ec",
          500: "#4a6380",
          600: "#3a516c",
          700: "#2b3d52",
          900: "#142030",
        },
        pass: { DEFAULT: "#1f7a4d", soft: "#e3f3ea" },
        warn: { DEFAULT: "#9a5b00", soft: "#fdf0d9" },
        fail: { DEFAULT: "#b3261e", soft: "#fbe4e2" },
      },
      fontFamily: {
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
      borderRadius: { card: "0.75rem" },
      boxShadow: { card: "0 1px 2px rgb(27 36 48 / 0.06), 0 2px 8px rgb(27 36 48 / 0.05)" },
    },
  },
} satisfies Config;
