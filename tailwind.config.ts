import type { Config } from "tailwindcss";

// Loaded by app/globals.css through `@config`. Tailwind 4 reads the content
// from the project's files itself (it follows .gitignore, so .data/ is skipped).
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        hull: { 50: "#f3f6f9", 100: "#e3eaf1", 600: "#2f5573", 700: "#244560", 800: "#1b3549", 900: "#12253a" },
        rating: { good: "#1f7a4d", fair: "#9a6a00", poor: "#b42318" },
      },
      fontFamily: { sans: ["Noto Sans", "system-ui", "sans-serif"] },
    },
  },
};

export default config;
