import localFont from "next/font/local";

// Shipped in the repository (from the @fontsource-variable packages): nothing is downloaded at build time.
export const bodyFont = localFont({ src: "./fonts/inter-latin-wght.woff2", variable: "--font-body", display: "swap", weight: "100 900" });
export const displayFont = localFont({
  src: "./fonts/archivo-latin-wght.woff2",
  variable: "--font-display",
  display: "swap",
  weight: "100 900",
});
