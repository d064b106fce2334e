import { builtinModules } from "node:module";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

// Layers (DEVELOPERS.md, "Rules the code keeps"): the engine folders are pure TypeScript that runs in the
// browser and on the server alike; only lib/server (and scripts, migrations, tests) reaches the models.

/** The engine: no React, no Next, no database, no file system. lib/catalog/shipped.ts is the one reader of files. */
const PURE_FOLDERS = [
  "lib/auth",
  "lib/bom",
  "lib/catalog",
  "lib/commissioning",
  "lib/csv",
  "lib/compare",
  "lib/format",
  "lib/layout",
  "lib/loop",
  "lib/members",
  "lib/openapi",
  "lib/organisation",
  "lib/plan",
  "lib/resistors",
  "lib/review",
  "lib/schedule",
  "lib/sheet",
  "lib/sites",
  "lib/solver",
  "lib/vocabulary",
];
const pureFiles = [...PURE_FOLDERS.map((d) => `${d}/**/*.{ts,tsx}`), "lib/findings.ts", "lib/findings-grouping.ts", "lib/finding-codes.ts"];
/** Tests and their helpers beside the engine may read fixture files and the shipped catalog. */
const pureTestFiles = PURE_FOLDERS.flatMap((d) => [`${d}/**/*.test.ts`, `${d}/**/testing/**`, `${d}/**/test-support/**`]);

const escape = (s) => s.replace(/[.*+?^${}()|[\]\\/]/g, "\\$&");

const models = {
  regex: "^(@/|(\\.\\.?/)+)models(/|$)",
  message: "Only lib/server (and scripts, migrations, tests) use the models; call a function in lib/server instead.",
};
const server = {
  regex: "^(@/|(\\.\\.?/)+)(lib/)?server(/|$)|^server-only$",
  message: "The engine is pure: no lib/server here. Pass what it needs in as arguments.",
};
const framework = {
  regex: "^(react|react-dom|next|next-auth|swr)(/|$)",
  message: "The engine is pure: no React or Next here; it runs on every drag in the browser and on the server on save.",
};
const database = {
  regex: "^(sequelize|mariadb)(/|$)",
  message: "The engine is pure: no database here; lib/server loads and saves.",
};
const ui = {
  regex: "^@/(app|components|lib/client)(/|$)",
  message: "The engine is pure: it never reaches up into pages, components or browser hooks.",
};
const nodeBuiltins = {
  regex: `^(node:.*|(${[...new Set(builtinModules.map((m) => m.replace(/\/.*$/, "")))].map(escape).join("|")})(/.*)?)$`,
  message: "The engine is pure: no Node built-ins (no files, no network); it also runs in the browser.",
};
const shippedCatalog = {
  regex: "^(@/lib/catalog|\\.|(\\.\\./)+catalog)/shipped$",
  message: "lib/catalog/shipped reads files; the engine takes a catalog as an argument (tests may load the shipped one).",
};

const restrict = (...patterns) => ["error", { patterns }];

const config = [
  ...nextVitals,
  ...nextTs,
  { ignores: [".next*/**", ".data/**", "node_modules/**", "next-env.d.ts", "test-results/**", "playwright-report/**"] },
  {
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
  // Later blocks replace the rule's options for the files they match, so each repeats the patterns it keeps.
  {
    files: ["**/*.{ts,tsx,mjs,js}"],
    ignores: ["lib/server/**", "scripts/**", "migrations/**", "models/**", "tests/**"],
    rules: { "@typescript-eslint/no-restricted-imports": restrict(models) },
  },
  {
    // Browser hooks may name a server function's result type, never run its code.
    files: ["lib/client/**"],
    rules: { "@typescript-eslint/no-restricted-imports": restrict(models, { ...server, allowTypeImports: true }) },
  },
  {
    files: pureFiles,
    ignores: ["lib/catalog/shipped.ts"],
    rules: { "@typescript-eslint/no-restricted-imports": restrict(models, server, framework, database, ui, nodeBuiltins, shippedCatalog) },
  },
  {
    files: pureTestFiles,
    rules: { "@typescript-eslint/no-restricted-imports": restrict(models, server, framework, database, ui) },
  },
];
export default config;
