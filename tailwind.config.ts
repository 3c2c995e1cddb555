import type { Config } from "tailwindcss";

// Heatsplit's palette: warm paper and ink neutrals, a copper accent (heat
// leaving a part), verdigris for "inside its limit", amber for "close",
// alarm red for "over". Semantic names, so screens say what a colour means.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f7f5f0", raised: "#fffdf8", sunk: "#ece8df", line: "#d9d3c7" },
        ink: { DEFAULT: "#1f2a30", soft: "#46545c", faint: "#7a868c", inverse: "#f7f5f0" },
        copper: { 50: "#fbf1ea", 100: "#f3dccb", 300: "#dc9a6c", 500: "#b8652f", 700: "#8a4720", 900: "#54290f" },
        verdigris: { 50: "#e9f4f1", 100: "#cfe7e0", 300: "#7fbfae", 500: "#2f8a75", 700: "#1f5f51" },
        amber: { 50: "#fdf5e2", 300: "#e9c46a", 500: "#c48a12", 700: "#8a600b" },
        alarm: { 50: "#fbeceb", 300: "#e39a94", 500: "#c0392b", 700: "#8e2a20" },
        slateblue: { 50: "#eef1f7", 300: "#9aa8c8", 500: "#4f6396", 700: "#36456b" },
      },
      fontFamily: {
        sans: ["var(--font-plex-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-plex-mono)", "ui-monospace", "monospace"],
      },
      borderRadius: { panel: "10px" },
      boxShadow: { panel: "0 1px 0 rgba(31,42,48,0.06), 0 1px 3px rgba(31,42,48,0.08)" },
    },
  },
};
export default config;
