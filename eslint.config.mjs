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
    // One fact, one place: unit conversion and geometry live in lib/engine; views draw what it computes.
    files: ["components/**/*.{ts,tsx}", "scene/**/*.{ts,tsx}", "app/**/*.{ts,tsx}"],
    rules: {
      "no-restricted-syntax": [
        "error",
        { selector: "ExportAllDeclaration", message: "Use named exports, not export *." },
        { selector: "Literal[value=25.4], Literal[value=304.8], Literal[value=0.03937007874015748]", message: "Convert lengths with lib/engine/units (parseLength, formatLength, inches, toInches), not a conversion factor here." },
        {
          selector: "CallExpression[callee.object.name='Math'][callee.property.name=/^(sin|cos|tan|atan2|asin|acos)$/]",
          message: "Geometry belongs in lib/engine (room/wall-frame.ts, drawings/): a view that computes its own copy disagrees with the others.",
        },
      ],
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
