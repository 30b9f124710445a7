import next from "eslint-config-next/core-web-vitals";
import nextTypescript from "eslint-config-next/typescript";

const config = [
  ...next,
  ...nextTypescript,
  { ignores: ["lib/generated/**", ".next/**", ".data/**", "node_modules/**", "tmp/**", "next-env.d.ts"] },
  {
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
      // Apostrophes in running text are fine in JSX.
      "react/no-unescaped-entities": "off",
    },
  },
  {
    // Printed documents are whole HTML pages rendered to static markup for Chromium, never Next.js pages, so
    // a plain <head> is right there. The rule is switched off here by path pattern rather than by an inline
    // directive: it decides by the file's absolute path (it stays silent anywhere under a folder named
    // "app"), so a directive would be reported as unused in a clone that lives in such a folder.
    files: ["components/documents/**/*.tsx"],
    rules: { "@next/next/no-head-element": "off" },
  },
  {
    // lib/ outside lib/server is pure: no framework, database or browser code (see DEVELOPERS.md).
    files: ["lib/**/*.ts"],
    ignores: ["lib/server/**", "lib/generated/**"],
    rules: {
      "no-restricted-imports": ["error", { patterns: ["next", "next/*", "react", "react-dom", "@prisma/*", "*/generated/*", "@/lib/server/*", "pg", "node:*"] }],
    },
  },
];

export default config;
