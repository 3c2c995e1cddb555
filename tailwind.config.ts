import type { Config } from "tailwindcss";

// Heatsplit's palette: warm paper and ink neutrals, a copper accent (heat
// leaving a part), verdigris for "inside its limit", amber for "close",
// alarm red for "over". Semantic names, so screens say what a colour means.
//
// Contrast (WCAG 2.x, checked with the relative-luminance formula):
// ink.faint on paper.sunk 4.6:1, copper.700 behind white text 7.0:1,
// paper.edge (form-control borders) on paper.raised 3.5:1. Text on a status
// colour uses the 700 step on its 50 tint (all above 5:1).
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: {
          DEFAULT: "#f7f5f0",
          raised: "#fffdf8",
          sunk: "#ece8df",
          line: "#d9d3c7",
          edge: "#8f8676",
        },
        ink: { DEFAULT: "#1f2a30", soft: "#46545c", faint: "#5c6970", inverse: "#f7f5f0", deep: "#162026" },
        copper: {
          50: "#fbf1ea",
          100: "#f3dccb",
          300: "#dc9a6c",
          500: "#b8652f",
          600: "#a0582a",
          700: "#8a4720",
          900: "#54290f",
        },
        verdigris: { 50: "#e9f4f1", 100: "#cfe7e0", 300: "#7fbfae", 500: "#2f8a75", 700: "#1f5f51" },
        amber: { 50: "#fdf5e2", 100: "#f8e6b8", 300: "#e9c46a", 500: "#c48a12", 700: "#8a600b" },
        alarm: { 50: "#fbeceb", 100: "#f5d3d0", 300: "#e39a94", 500: "#c0392b", 700: "#8e2a20" },
        slateblue: { 50: "#eef1f7", 100: "#dbe1ee", 300: "#9aa8c8", 500: "#4f6396", 700: "#36456b" },
      },
      fontFamily: {
        // The Greek face comes second so θ (RθJA) and Ω fall to Plex, not
        // to a system font; the Latin files carry no Greek glyphs.
        sans: ["var(--font-plex-sans)", "var(--font-plex-greek)", "system-ui", "sans-serif"],
        mono: ["var(--font-plex-mono)", "var(--font-plex-greek)", "ui-monospace", "monospace"],
      },
      borderRadius: { panel: "10px" },
      boxShadow: {
        panel: "0 1px 0 rgba(31,42,48,0.06), 0 1px 3px rgba(31,42,48,0.08)",
        lift: "0 2px 4px rgba(31,42,48,0.08), 0 8px 24px rgba(31,42,48,0.12)",
      },
    },
  },
};
export default config;
