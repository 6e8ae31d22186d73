/**
 * Lint: Next's own rules, typescript-eslint's recommended set, and the layering as a rule
 * (eslint-plugin-boundaries): models/ is pure and imports nothing of ours but models/; components/
 * never reach storage; app/ reaches storage only for the health check.
 */
import nextPlugin from "@next/eslint-plugin-next";
import boundaries from "eslint-plugin-boundaries";
import tseslint from "typescript-eslint";

const layers = [
  { type: "models", pattern: "models/**", partialMatch: false },
  { type: "db", pattern: "db/**", partialMatch: false },
  { type: "lib", pattern: "lib/**", partialMatch: false },
  { type: "health", pattern: "app/api/health/**", partialMatch: false },
  { type: "app", pattern: "app/**", partialMatch: false },
  { type: "components", pattern: "components/**", partialMatch: false },
];

export default tseslint.config(
  { ignores: [".next/**", ".data/**", "node_modules/**", "test-results/**", "playwright-report/**", "next-env.d.ts"] },
  ...tseslint.configs.recommended,
  nextPlugin.configs["core-web-vitals"],
  {
    rules: {
      // Attachments are served through access-checked routes; the image optimiser would fetch them without
      // the viewer's session, so drawings are plain <img> elements on purpose.
      "@next/next/no-img-element": "off",
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
  {
    files: ["**/*.cjs"],
    languageOptions: {
      sourceType: "commonjs",
      globals: { require: "readonly", module: "writable", __dirname: "readonly" },
    },
    rules: { "@typescript-eslint/no-require-imports": "off" },
  },
  {
    files: ["**/*.{ts,tsx,mts,mjs}"],
    plugins: { boundaries },
    settings: {
      "boundaries/elements": layers,
      "boundaries/include": ["models/**", "db/**", "lib/**", "app/**", "components/**"],
      "import/resolver": { [new URL("./scripts/lint/alias-resolver.cjs", import.meta.url).pathname]: {} },
    },
    rules: {
      "boundaries/dependencies": [
        "error",
        {
          default: "allow",
          policies: [
            {
              from: { element: { type: "models" } },
              disallow: { to: { element: { types: { anyOf: ["db", "lib", "app", "health", "components"] } } } },
              message: "models/ is pure domain logic: it imports nothing of ours but models/",
            },
            {
              from: { element: { type: "components" } },
              disallow: { to: { element: { type: "db" } } },
              message: "components/ never reach storage (db/); go through lib/",
            },
            {
              from: { element: { type: "app" } },
              disallow: { to: { element: { type: "db" } } },
              message: "app/ never reaches storage (db/) except the health check; go through lib/",
            },
          ],
        },
      ],
    },
  },
);
