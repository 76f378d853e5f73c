// Fitframe's look: a calm instrument. Light studio pages, a dark review stage, one warm accent.
/** @type {import('tailwindcss').Config} */
const config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: "#0E1A24", 800: "#1A2833", 700: "#26363F", 600: "#3A4B55" },
        chalk: { DEFAULT: "#F6F4EF", 200: "#ECE9E1", 300: "#DDD8CC" },
        slate: {
          100: "#EEF1F3", 200: "#DCE2E6", 300: "#BCC6CD", 400: "#8E9BA5", 500: "#667480", 600: "#4B5863", 700: "#36424C",
        },
        signal: { DEFAULT: "#FF5A36", dark: "#C23A1C", light: "#FFE3DB" },
        band: "#D9E7F5",
        role: {
          face: "#F5A524", target: "#22B8CF", path: "#A78BFA", shaft: "#E2E8F0", sole: "#FB7185",
          ground: "#94A3B8", ball: "#FFFFFF", clubhead: "#FFFFFF", marker: "#34D399",
        },
      },
      fontFamily: { sans: ["var(--font-inter)", "system-ui", "sans-serif"] },
      fontSize: {
        // A tight scale: readouts large, labels small.
        label: ["0.75rem", { lineHeight: "1rem", letterSpacing: "0.02em" }],
        body: ["0.9375rem", { lineHeight: "1.4rem" }],
        title: ["1.375rem", { lineHeight: "1.8rem", fontWeight: "600" }],
        readout: ["1.75rem", { lineHeight: "2rem", fontWeight: "600" }],
      },
      spacing: { rail: "3.5rem", panel: "20rem", touch: "2.75rem" },
      borderRadius: { card: "0.625rem" },
    },
  },
};

export default config;
