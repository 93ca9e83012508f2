// ESLint: Next.js (core web vitals), React hooks and TypeScript rules, plus import rules that encode the
// architecture in DEVELOPERS.md so a wrong arrow fails `npm run lint` instead of waiting for a review.
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTypescript from "eslint-config-next/typescript";

const knexOnlyInDb = {
  name: "knex",
  message: "Only db/ talks to Knex: add a query in db/queries and call it.",
};
const mysqlOnlyInDb = { name: "mysql2", message: "Only db/ talks to the database driver." };
const knexPatterns = [{ group: ["knex/*", "mysql2/*"], message: "Only db/ talks to Knex and its driver." }];

// A component renders; the data layer and its row types stay on the server side of lib/.
const noDbFromComponents = {
  regex: "^(@/db|(\\.\\./)+db)(/|$)",
  message: "components/ never imports db/ (not even types): use the domain types in lib/<domain>/types.ts.",
};

// Route handlers and pages stay thin: they call lib/ (which may call db/queries) and never build queries.
const thinEdges = {
  regex: "^(@/db|(\\.\\./)+db)(/(index|config|migrations|seeds)(/.*)?)?$",
  message: "app/ stays thin: call a function in lib/ or db/queries/, never the Knex instance itself.",
};

// Anything but zod, the engine's own relative paths and its alias path is refused inside lib/stability.
function enginePure(relative) {
  return {
    regex: `^(?!zod$|zod/|@/lib/stability(/|$)|${relative.join("|")}).*`,
    message: "lib/stability imports only zod and itself (see DEVELOPERS.md: the engine is pure).",
  };
}

const config = [
  ...nextVitals,
  ...nextTypescript,
  {
    ignores: [
      ".next/**",
      ".next-test*/**",
      ".engine/**",
      ".data/**",
      "public/**",
      "coverage/**",
      "test-results/**",
      "next-env.d.ts",
    ],
  },
  {
    rules: {
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", caughtErrors: "none" },
      ],
      "@typescript-eslint/no-explicit-any": "error",
      "@typescript-eslint/no-unused-expressions": "error",
      "no-warning-comments": ["error", { terms: ["todo", "fixme", "xxx"], location: "start" }],
      // Lines under 120 characters; Prettier wraps code, this keeps comments in line (long strings may run on).
      "max-len": [
        "error",
        { code: 120, ignoreStrings: true, ignoreTemplateLiterals: true, ignoreUrls: true, ignoreRegExpLiterals: true },
      ],
      // The build does not run the React Compiler, so its "compilation skipped" notices report nothing wrong.
      "react-hooks/preserve-manual-memoization": "off",
      "react-hooks/incompatible-library": "off",
      "no-restricted-imports": ["error", { paths: [knexOnlyInDb, mysqlOnlyInDb], patterns: knexPatterns }],
    },
  },
  {
    // Only the data layer, the scripts that drive it and the test stack may load Knex.
    files: ["db/**", "scripts/**", "tests/support/**", "knexfile.ts"],
    rules: { "no-restricted-imports": "off" },
  },
  {
    files: ["components/**"],
    rules: {
      "no-restricted-imports": [
        "error",
        { paths: [knexOnlyInDb, mysqlOnlyInDb], patterns: [...knexPatterns, noDbFromComponents] },
      ],
    },
  },
  {
    files: ["app/**"],
    rules: {
      "no-restricted-imports": [
        "error",
        { paths: [knexOnlyInDb, mysqlOnlyInDb], patterns: [...knexPatterns, thinEdges] },
      ],
    },
  },
  {
    // The engine is pure: zod and its own files only, so the browser worker, the server and the CLI share it.
    files: ["lib/stability/**"],
    rules: { "no-restricted-imports": ["error", { patterns: [enginePure(["\\./", "\\.\\./(?!\\.\\.)"])] }] },
  },
  {
    // At the engine's top level "../" already leaves it.
    files: ["lib/stability/*"],
    rules: { "no-restricted-imports": ["error", { patterns: [enginePure(["\\./"])] }] },
  },
];

export default config;
