import type { Config } from "tailwindcss";

// Glassgrade's own palette: ink blues for structure, a teal accent, and verdict colours chosen
// for contrast on white rather than borrowed from any instrument.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      fontFamily: { sans: ["var(--font-inter)", "ui-sans-serif", "system-ui", "sans-serif"] },
      colors: {
        ink: { 50: "#f4f6f9", 100: "#e6eaf0", 200: "#c9d1dd", 400: "#7b8aa1", 600: "#3f4e66", 800: "#1c2638", 900: "#111827" },
        lumen: { 50: "#ecfbf8", 100: "#cdf3ec", 500: "#139a86", 600: "#0d7c6c", 700: "#0b6257" },
        verdict: { pass: "#1d7a46", marginal: "#a15c00", fail: "#b42318" },
      },
    },
  },
  plugins: [],
};
export default config;
