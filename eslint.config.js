import js from "@eslint/js";
import tseslint from "typescript-eslint";
import reactHooks from "eslint-plugin-react-hooks";

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
  {
    // One way to a database handle: createDb() retries deadlocked transactions (decision 010).
    files: ["apps/**/*.{ts,tsx}", "packages/**/*.ts"],
    ignores: ["packages/db/src/client.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        { paths: [{ name: "drizzle-orm/mysql2", importNames: ["drizzle"], message: "Use createDb() from @takeup/db: it retries transactions InnoDB gives up on (decision 010)." }] },
      ],
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
