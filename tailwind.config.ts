import type { Config } from "tailwindcss";

// Ohmstead's own palette: warm paper, ink, a copper accent. Green, amber and
// red are reserved for review results (pass, warn, fail) and nothing else.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f7f3ea", deep: "#efe8d9", edge: "#ddd3bf" },
        ink: { DEFAULT: "#1f1c17", soft: "#4a443a", faint: "#675f53" },
        copper: { DEFAULT: "#a35a24", dark: "#8f4c1c", light: "#f1dcc8" },
        result: { pass: "#286b3f", warn: "#865710", fail: "#b3261e" },
      },
      fontFamily: {
        sans: ["var(--font-text)", "system-ui", "sans-serif"],
        mono: ["var(--font-measure)", "ui-monospace", "monospace"],
      },
    },
  },
  plugins: [],
};

export default config;
