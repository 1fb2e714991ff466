import type { Config } from "tailwindcss";

// Plumbline's own palette: an asphalt-to-paper neutral ramp, one accent for actions, and three
// state colours (always shown with a word and an icon, never alone). Text pairs aim at 7:1.
export default {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        asphalt: {
          950: "#101214",
          900: "#1a1d21",
          800: "#2b2f35",
          700: "#3f444c",
          600: "#555b64",
          500: "#6f7680",
          400: "#9aa0a8",
          300: "#c4c8cd",
          200: "#dfe1e3",
          100: "#eeeeec",
          50: "#f7f6f2",
        },
        accent: { DEFAULT: "#1c3f9e", strong: "#132d75", soft: "#e5ebfa" },
        cleared: { DEFAULT: "#0b5a43", soft: "#e2f3ec", line: "#5fae92" },
        attention: { DEFAULT: "#6e4700", soft: "#fdf1d2", line: "#d5a23a" },
        stopped: { DEFAULT: "#8e1233", soft: "#fbe7ec", line: "#d86a86" },
      },
      fontFamily: {
        sans: ["Barlow", "system-ui", "sans-serif"],
        narrow: ["'Barlow Semi Condensed'", "Barlow", "sans-serif"],
      },
      minHeight: { touch: "3rem" },
      minWidth: { touch: "3rem" },
    },
  },
} satisfies Config;
