import type { Config } from "tailwindcss";

// Scarpline's own palette: warm paper and ink for the page, clay for actions.
// Result colours live in lib/runs/view/colour-scale.ts and lib/runs/view/circle-styles.ts, chosen for
// colour-blind readers.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f6f4ef", raised: "#fffdf8", sunk: "#ece8df" },
        ink: { DEFAULT: "#1f1d1a", soft: "#4a4640", faint: "#66605a" },
        rule: "#d9d3c7",
        clay: { 50: "#fbf1ea", 100: "#f4dccb", 500: "#b5562b", 600: "#9c4722", 700: "#7d391b" },
        moss: { 50: "#eef5ee", 600: "#2f6b3a", 700: "#24532d" },
        alarm: { 50: "#fbeeee", 600: "#a3282c", 700: "#861f23" },
      },
      fontFamily: { sans: ["var(--font-inter)", "system-ui", "sans-serif"] },
    },
  },
  plugins: [],
};

export default config;
