import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import type { ReactNode } from "react";
import "./globals.css";

// Fonts ship with the app (IBM Plex, SIL OFL 1.1, from @fontsource): no
// font service is reachable from here, and the CSP allows font-src 'self'.
// adjustFontFallback is off so the CSS variables hold only the Plex family
// and the Greek face stays next in line for θ and Ω (see tailwind.config.ts).
const plexSans = localFont({
  src: [
    { path: "./fonts/ibm-plex-sans-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "./fonts/ibm-plex-sans-latin-500-normal.woff2", weight: "500", style: "normal" },
    { path: "./fonts/ibm-plex-sans-latin-600-normal.woff2", weight: "600", style: "normal" },
    { path: "./fonts/ibm-plex-sans-latin-700-normal.woff2", weight: "700", style: "normal" },
  ],
  variable: "--font-plex-sans",
  display: "swap",
  adjustFontFallback: false,
});

const plexGreek = localFont({
  src: [
    { path: "./fonts/ibm-plex-sans-greek-400-normal.woff2", weight: "400", style: "normal" },
    { path: "./fonts/ibm-plex-sans-greek-600-normal.woff2", weight: "600", style: "normal" },
  ],
  variable: "--font-plex-greek",
  display: "swap",
  preload: false,
  adjustFontFallback: false,
  declarations: [{ prop: "unicode-range", value: "U+0370-03FF, U+2126" }],
});

const plexMono = localFont({
  src: [
    { path: "./fonts/ibm-plex-mono-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "./fonts/ibm-plex-mono-latin-500-normal.woff2", weight: "500", style: "normal" },
  ],
  variable: "--font-plex-mono",
  display: "swap",
  adjustFontFallback: false,
});

export const metadata: Metadata = {
  title: { default: "Heatsplit", template: "%s · Heatsplit" },
  description:
    "Gate-drive loss and thermal budget for power supply teams: where the drive power of every MOSFET gate is burnt, " +
    "how hot each junction runs at every operating corner, and which drive option to sign off.",
  applicationName: "Heatsplit",
};

export const viewport: Viewport = { themeColor: "#1f2a30" };

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${plexSans.variable} ${plexGreek.variable} ${plexMono.variable}`}>
      <body className="min-h-screen">{children}</body>
    </html>
  );
}
