import type { Config } from "tailwindcss";

/**
 * Hubface identity: a dark "basalt" ink on warm "dune" paper, a "ember" orange for the
 * planned setup and actions, a cool "steel" blue for the current setup, and three status
 * hues (clear / tight / contact) that stay distinguishable for common colour-vision types
 * because each also differs strongly in lightness.
 */
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./lib/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        basalt: {
          50: "#f4f5f6",
          100: "#e6e8eb",
          200: "#c9ced5",
          300: "#a3acb8",
          400: "#76818f",
          500: "#56616f",
          600: "#434c58",
          700: "#353c46",
          800: "#262b33",
          900: "#181b21",
          950: "#0e1014",
        },
        dune: { 50: "#fbf8f3", 100: "#f5efe4", 200: "#e9dcc6", 300: "#d9c3a0" },
        ember: {
          50: "#fff4ec",
          100: "#ffe4d1",
          200: "#fec39e",
          300: "#fb9a63",
          400: "#f57634",
          500: "#e25b16",
          600: "#bd460f",
          700: "#963711",
          800: "#782f13",
          900: "#622912",
        },
        steel: {
          50: "#eff6fb",
          100: "#d9eaf5",
          200: "#b4d4ea",
          300: "#7fb4d9",
          400: "#4b8fc2",
          500: "#2f72a8",
          600: "#245a88",
          700: "#1f4a6f",
          800: "#1d3f5c",
          900: "#1b354d",
        },
        clear: { 100: "#dcf3e4", 600: "#1f7a44", 800: "#14502d" },
        tight: { 100: "#fdf0c7", 600: "#a86a00", 800: "#6b4400" },
        contact: { 100: "#fde0dd", 600: "#c0261b", 800: "#7d1710" },
      },
      fontFamily: {
        sans: ["var(--font-body)", "system-ui", "sans-serif"],
        display: ["var(--font-display)", "var(--font-body)", "system-ui", "sans-serif"],
      },
      fontSize: {
        // A 1.2 (minor third) scale, tuned so figures stay legible at 375 px.
        xs: ["0.75rem", { lineHeight: "1.1rem" }],
        sm: ["0.875rem", { lineHeight: "1.3rem" }],
        base: ["1rem", { lineHeight: "1.55rem" }],
        lg: ["1.2rem", { lineHeight: "1.75rem" }],
        xl: ["1.44rem", { lineHeight: "2rem" }],
        "2xl": ["1.728rem", { lineHeight: "2.25rem" }],
        "3xl": ["2.074rem", { lineHeight: "2.5rem" }],
        "4xl": ["2.488rem", { lineHeight: "2.9rem" }],
      },
      borderRadius: { card: "0.75rem" },
      boxShadow: { card: "0 1px 2px rgb(14 16 20 / 0.06), 0 4px 16px rgb(14 16 20 / 0.06)" },
    },
  },
  plugins: [],
};

export default config;
