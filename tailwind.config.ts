import type { Config } from "tailwindcss";

/**
 * Hatchway's look: a calm field notebook. Warm paper, deep green for actions, amber for
 * cautions, brick red for blocks; Roboto Slab for headings, the system sans for text.
 */
export default {
  content: ["./index.html", "./src/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f7f1e3", deep: "#efe5cf", card: "#fffbf2" },
        // faint #6e6656 stays above 4.5:1 on every paper tone (WCAG 2.1 AA).
        ink: { DEFAULT: "#2a2824", soft: "#5e574a", faint: "#6e6656" },
        rule: "#d8ccb0",
        fern: { DEFAULT: "#2f5d3a", dark: "#234a2c", light: "#e2ecdf", ring: "#6f9a76" },
        // #84510c on the amber wash is 5.8:1 (WCAG 2.1 AA asks 4.5:1 for small text).
        amber: { DEFAULT: "#84510c", bg: "#fbefd6", line: "#e3c27e" },
        brick: { DEFAULT: "#a23b2a", bg: "#f7e2dc", line: "#dba69b" },
        slate: { DEFAULT: "#3d5566", bg: "#e5ecf0" },
      },
      fontFamily: {
        display: ['"Roboto Slab"', "Georgia", "serif"],
        sans: ["system-ui", "-apple-system", '"Segoe UI"', "Roboto", '"Helvetica Neue"', "Arial", "sans-serif"],
      },
      borderRadius: { card: "0.6rem" },
      boxShadow: { card: "0 1px 0 rgba(60, 48, 20, 0.08), 0 1px 3px rgba(60, 48, 20, 0.08)" },
    },
  },
} satisfies Config;
