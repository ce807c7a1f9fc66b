import type { Config } from "tailwindcss";

// Comova's palette: night-sky ink with a warm "redshift" accent.
export default {
  content: ["./app/**/*.{ts,tsx}"],
  theme: {
    extend: {
      fontFamily: { sans: ["Fira Sans", "system-ui", "sans-serif"] },
      colors: {
        ink: { 50: "#f4f6fb", 100: "#e6eaf4", 300: "#a5b0cc", 500: "#5b6a92", 700: "#2c3659", 900: "#121833" },
        // shift-700 is the text red: 5.8:1 on its own tint, above WCAG 2.x AA (4.5:1) for small text.
        shift: { 400: "#f0875a", 500: "#e4663a", 700: "#9e3a17" },
      },
    },
  },
} satisfies Config;
