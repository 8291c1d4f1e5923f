import js from "@eslint/js";
import tseslint from "typescript-eslint";
import reactHooks from "eslint-plugin-react-hooks";
import checkFile from "eslint-plugin-check-file";

// Who may import whom (docs/architecture.md): domain → db → api → web, nothing imports upward.
// Rule options do not merge across config objects, so each layer lists its whole set here.
const useCreateDb = {
  name: "drizzle-orm/mysql2",
  importNames: ["drizzle"],
  message: "Use createDb() from @takeup/db: it retries transactions InnoDB gives up on (decision 010).",
};
const upward = (layer, ...names) => names.map((name) => ({ group: [name, `${name}/**`], message: `${layer} must not import ${name}: imports go domain → db → api → web, never back.` }));
const layers = {
  domain: upward("packages/domain", "@takeup/db", "@takeup/api", "@takeup/web", "drizzle-orm", "mysql2", "express", "react", "**/packages/db/**", "**/apps/**"),
  db: upward("packages/db", "@takeup/api", "@takeup/web", "express", "react", "**/apps/**"),
  api: upward("apps/api", "@takeup/web", "react", "**/apps/web/**"),
  web: upward("apps/web", "@takeup/db", "@takeup/api", "drizzle-orm", "mysql2", "express", "**/packages/db/**", "**/apps/api/**"),
};
// A feature reaches another feature only through its query keys (features/<f>/api/<f>-keys.ts).
const otherFeature = {
  regex: "^\\.\\./\\.\\./(?!\\.\\.)[^/]+/(?!api/[a-z-]+-keys\\.ts$)",
  message: "Features do not import each other (only another feature's *-keys.ts); compose them in app/routes.",
};

export default tseslint.config(
  { ignores: ["**/node_modules/**", "**/dist/**", ".data/**", ".tmp/**", "packages/db/src/migrations/**", "coverage/**"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_", destructuredArrayIgnorePattern: "^_" }],
      "@typescript-eslint/no-explicit-any": "error",
      "@typescript-eslint/ban-ts-comment": "error",
    },
  },
  { files: ["packages/domain/**/*.ts"], rules: { "no-restricted-imports": ["error", { patterns: layers.domain }] } },
  {
    files: ["packages/db/**/*.ts"],
    ignores: ["packages/db/src/client.ts"],
    rules: { "no-restricted-imports": ["error", { paths: [useCreateDb], patterns: layers.db }] },
  },
  { files: ["apps/api/**/*.ts", "apps/mail-catcher/**/*.ts"], rules: { "no-restricted-imports": ["error", { paths: [useCreateDb], patterns: layers.api }] } },
  { files: ["apps/web/**/*.{ts,tsx}"], rules: { "no-restricted-imports": ["error", { paths: [useCreateDb], patterns: layers.web }] } },
  {
    files: ["apps/web/src/features/**/*.{ts,tsx}"],
    rules: { "no-restricted-imports": ["error", { paths: [useCreateDb], patterns: [...layers.web, otherFeature] }] },
  },
  {
    // File and folder names are kebab-case (dotted parts allowed: quote.room-time.test.ts).
    files: ["apps/**/*.{ts,tsx}", "packages/**/*.ts", "tests/**/*.ts", "bench/**/*.ts", "scripts/**/*.{ts,mjs}"],
    plugins: { "check-file": checkFile },
    rules: {
      "check-file/filename-naming-convention": ["error", { "**/*.{ts,tsx,mjs}": "KEBAB_CASE" }, { ignoreMiddleExtensions: true }],
      "check-file/folder-naming-convention": ["error", { "**/": "KEBAB_CASE" }],
    },
  },
  {
    // Every export writes its rows through lib/spreadsheet.ts, which neutralises formulas (OWASP CSV injection).
    files: ["apps/api/src/**/*.ts"],
    ignores: ["**/*.test.ts"],
    rules: {
      "no-restricted-syntax": [
        "error",
        { selector: "CallExpression[callee.property.name='addRow']", message: "Use addSafeRow() from lib/spreadsheet.ts: it keeps names from becoming formulas." },
        { selector: "CallExpression[callee.property.name='addRows']", message: "Use addSafeRow() from lib/spreadsheet.ts: it keeps names from becoming formulas." },
      ],
    },
  },
  {
    files: ["scripts/**/*.mjs"],
    languageOptions: { globals: { process: "readonly", console: "readonly", URL: "readonly", fetch: "readonly", setTimeout: "readonly" } },
  },
  {
    files: ["apps/web/**/*.{ts,tsx}"],
    plugins: { "react-hooks": reactHooks },
    rules: { "react-hooks/rules-of-hooks": "error", "react-hooks/exhaustive-deps": "warn" },
  },
);
