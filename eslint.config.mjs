// Lint: Next.js's own rules, plus the boundaries between the rooms of the tree (DEVELOPERS.md, "Layout").
// `npm run lint` runs it after the typecheck; `npm test` runs `npm run lint` first.
import { defineConfig, globalIgnores } from "eslint/config";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";
import prettier from "eslint-config-prettier/flat";
import { clientBoundary } from "./scripts/lint/client-boundary.mjs";

const MODELS = ["@/models", "@/models/*"];
const SERVER = ["@/lib/server", "@/lib/server/*", "@/lib/db", "@/lib/db/*", "server-only", ...MODELS];
const FRAMEWORK = [
  "next",
  "next/*",
  "react",
  "react-dom",
  "react/*",
  "sequelize",
  "pg",
  "pg-boss",
  "nodemailer",
  "stripe",
  "@aws-sdk/*",
  "node:*",
  "fs",
  "path",
];

/** `no-restricted-imports` groups; type-only imports stay allowed where `allowTypeImports` is set. */
/** Left out of a group that allows type imports, so that the SERVER group (which does not) is the one that matches. */
const NOT_SERVER = ["!@/lib/server", "!@/lib/db", "!@/models"];
const restrict = (...patterns) => ["error", { patterns }];
const group = (names, message, allowTypeImports = false) => ({ group: names, message, allowTypeImports });

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  prettier,
  globalIgnores([
    "node_modules/**",
    ".next/**",
    ".next-*/**",
    ".data/**",
    "test-results/**",
    "playwright-report/**",
    "coverage/**",
    "next-env.d.ts",
  ]),
  {
    rules: {
      "import/no-cycle": ["error", { ignoreExternal: true }],
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_", caughtErrorsIgnorePattern: "^_" }],
    },
  },
  {
    // PDF text is not HTML: an apostrophe in a layout is just an apostrophe.
    files: ["templates/pdf/**"],
    rules: { "react/no-unescaped-entities": "off" },
  },
  {
    // Tests build malformed and partial inputs on purpose.
    files: ["tests/**"],
    rules: { "@typescript-eslint/no-explicit-any": "off" },
  },
  {
    // Only the data layer (and the database's own plumbing, the seed, migrations, scripts and tests) reads models.
    files: ["**/*.{ts,tsx,mjs}"],
    ignores: ["models/**", "lib/server/data/**", "lib/db/**", "lib/server/db.ts", "lib/seed/**", "migrations/**", "scripts/**", "tests/**"],
    rules: {
      "@typescript-eslint/no-restricted-imports": restrict(
        group(MODELS, "Only lib/server/data reads and writes the database: call a data function instead."),
      ),
    },
  },
  {
    // Models take column types from one shared module of pure types, and nothing else from lib.
    files: ["models/**"],
    rules: {
      "@typescript-eslint/no-restricted-imports": restrict(
        group(
          ["@/lib/*", "!@/lib/domain", "@/lib/domain/*", "!@/lib/domain/stored-values"],
          "Models import only types from lib/domain/stored-values.",
        ),
        group(["@/lib/domain/stored-values"], "Models import only types from lib/domain/stored-values.", true),
      ),
    },
  },
  {
    // The engineering, the domain rules and the single-line layout are pure: no framework, no I/O, no server.
    files: ["lib/engineering/**", "lib/domain/**", "lib/sld/**"],
    rules: {
      "@typescript-eslint/no-restricted-imports": restrict(
        group(
          [
            "@/*",
            "!@/lib",
            "@/lib/*",
            "!@/lib/engineering",
            "!@/lib/engineering/*",
            "!@/lib/domain",
            "!@/lib/domain/*",
            "!@/lib/sld",
            "!@/lib/sld/*",
            ...NOT_SERVER,
          ],
          "Pure code imports only pure code (lib/engineering, lib/domain, lib/sld).",
          true,
        ),
        group(FRAMEWORK, "Pure code has no framework and no I/O."),
        group(SERVER, "Pure code never reaches the server."),
      ),
    },
  },
  {
    // Layouts receive ready values: lib may import templates, never the other way at run time.
    files: ["templates/**"],
    rules: {
      "@typescript-eslint/no-restricted-imports": restrict(
        group(
          ["@/lib/*", "@/app/*", "@/components/*", ...NOT_SERVER],
          "Templates are layout only: compute the value in lib/documents and pass it in.",
          true,
        ),
        group(SERVER, "Templates never reach the server."),
      ),
    },
  },
  {
    // Shared components receive server actions as props; they never reach into a route.
    files: ["components/**"],
    rules: {
      "@typescript-eslint/no-restricted-imports": restrict(
        group(["@/app/*"], "Pass the server action in as a prop."),
        group(SERVER, "Components never reach the server."),
      ),
    },
  },
  {
    files: ["app/**", "components/**", "lib/**"],
    plugins: { ohmstead: { rules: { "client-boundary": clientBoundary } } },
    rules: { "ohmstead/client-boundary": "error" },
  },
]);
