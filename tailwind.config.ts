import type { Config } from "tailwindcss";

// Joulebook's theme tokens. Every colour on screen comes from here; one accent per energy path
// (fuel, electric, loss) so that the same hue means the same thing in tables, charts and badges.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./lib/client/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f6f1e7", raised: "#fcfaf5", sunk: "#ece5d6" },
        ink: { DEFAULT: "#1e1b16", soft: "#3a352d" },
        muted: "#6a6254",
        rule: { DEFAULT: "#d9cfbd", strong: "#b9ad97" },
        fuel: { DEFAULT: "#a8501a", soft: "#f3dfcc" },
        electric: { DEFAULT: "#1b6a80", soft: "#d5e8ec" },
        loss: { DEFAULT: "#8a3a5c", soft: "#f0dbe3" },
        ok: { DEFAULT: "#2e6b45", soft: "#dcebdf" },
        warn: { DEFAULT: "#8a6200", soft: "#f4e7c2" },
        danger: { DEFAULT: "#a5281b", soft: "#f6dcd6" },
        focus: "#1b6a80",
      },
      fontFamily: {
        sans: ["var(--font-inter)", "ui-sans-serif", "system-ui", "sans-serif"],
        mono: ["var(--font-jetbrains-mono)", "ui-monospace", "monospace"],
      },
      spacing: {
        gutter: "1.5rem",
        section: "2.5rem",
        cell: "0.875rem",
      },
      borderRadius: {
        card: "0.625rem",
        control: "0.375rem",
      },
      maxWidth: {
        page: "72rem",
        form: "26rem",
      },
      boxShadow: {
        card: "0 1px 0 rgb(30 27 22 / 0.04), 0 1px 3px rgb(30 27 22 / 0.06)",
      },
    },
  },
};

export default config;
