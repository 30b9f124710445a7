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
    // lib/ outside lib/server is pure: no framework, database or browser code (see DEVELOPERS.md).
    files: ["lib/**/*.ts"],
    ignores: ["lib/server/**", "lib/generated/**"],
    rules: {
      "no-restricted-imports": ["error", { patterns: ["next", "next/*", "react", "react-dom", "@prisma/*", "*/generated/*", "@/lib/server/*", "pg", "node:*"] }],
    },
  },
];

export default config;
