import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

const engineBanned = ["react", "react-dom", "react/*", "three", "three/*", "@react-three/*", "next", "next/*", "next-auth", "next-auth/*", "@mikro-orm/*", "zustand", "zustand/*"];

const config = [
  ...nextVitals,
  ...nextTs,
  {
    ignores: [".next*/**", "node_modules/**", ".data/**", "migrations/**", "next-env.d.ts", "test-results/**", "playwright-report/**", "tests/artifacts/**"],
  },
  {
    rules: {
      "@typescript-eslint/consistent-type-imports": "error",
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
      "react-hooks/exhaustive-deps": "error",
      "no-restricted-syntax": ["error", { selector: "ExportAllDeclaration", message: "Use named exports, not export *." }],
    },
  },
  {
    // Tests read untyped JSON bodies.
    files: ["tests/**/*.ts"],
    rules: { "@typescript-eslint/no-explicit-any": "off" },
  },
  {
    // The engine is pure: geometry and trade math only, no UI, 3D, framework or database.
    files: ["lib/engine/**/*.ts"],
    rules: {
      "no-restricted-imports": ["error", { patterns: [{ group: engineBanned, message: "lib/engine must stay pure (no React, three, Next, ORM or zustand)." }] }],
    },
  },
];

export default config;
