import type { Config } from "tailwindcss";

// Benchwright's own palette: sawdust paper, walnut ink, a safety amber for cautions, a pine green
// for passing checks, and a brick red for conflicts.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./scene/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f7f2e8", deep: "#ece3d0" },
        walnut: { 50: "#f4efe9", 100: "#e2d6c8", 300: "#b89c80", 500: "#7a5a3e", 700: "#4b3423", 900: "#2a1c12" },
        pine: { 100: "#dcefe2", 500: "#2f7d4f", 700: "#1f5636" },
        amberline: { 100: "#fdf0cf", 500: "#d99a1e", 700: "#8a5f0c" },
        brick: { 100: "#f8dcd5", 500: "#b5432c", 700: "#7c2a1a" },
        steel: { 100: "#e5e9ee", 500: "#5b6b7d", 700: "#36414e" },
      },
      fontFamily: { sans: ["var(--font-inter)", "system-ui", "sans-serif"] },
    },
  },
};
export default config;
