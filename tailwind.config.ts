import type { Config } from "tailwindcss";

// Branchline's design tokens (see DESIGN.md in the shared notes): paper, ink, rules, the two branch colours
// (Okabe–Ito orange and blue), and flag colours that always come with an icon and words.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}", "./canvas/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#fbfaf7", deep: "#f3f1ec" },
        ink: { DEFAULT: "#1c2024", soft: "#4a5058", faint: "#666b73" },
        rule: { DEFAULT: "#d9d6cf", strong: "#b9b5ac" },
        branchA: { DEFAULT: "#E69F00", tint: "#fbecc9" },
        branchB: { DEFAULT: "#0072B2", tint: "#d3e6f2" },
        caution: { DEFAULT: "#8a5a00", bg: "#fdf3dc", line: "#e6c27a" },
        invalid: { DEFAULT: "#a1261b", bg: "#fbe9e6", line: "#e3a59c" },
        focus: "#0072B2",
      },
      fontFamily: {
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
        serif: ["var(--font-serif)", "Georgia", "serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
      borderRadius: { sm: "3px", DEFAULT: "4px" },
      boxShadow: { sheet: "0 1px 2px rgba(28,32,36,0.06), 0 0 0 1px rgba(28,32,36,0.06)" },
    },
  },
};

export default config;
