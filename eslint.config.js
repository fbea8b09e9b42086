// @ts-check
import { dirname, relative, resolve } from 'node:path';
import eslint from '@eslint/js';
import angular from 'angular-eslint';
import { defineConfig, globalIgnores } from 'eslint/config';
import tseslint from 'typescript-eslint';

const root = import.meta.dirname;

/** Packages that mean I/O, a web framework or a database: never in the pure layers. */
const FRAMEWORK_PACKAGES = [
  /^@angular\//,
  /^express(-|$)/,
  /^drizzle-/,
  /^@electric-sql\/pglite/,
  /^pg$/,
];

/**
 * Who may import whom, by top-level folder. `shared` ← `engine` ← `server` and `src`; the server
 * and the web app never import each other.
 */
const LAYERS = {
  engine: { folders: ['server', 'src'], packages: FRAMEWORK_PACKAGES },
  shared: { folders: ['engine', 'server', 'src'], packages: FRAMEWORK_PACKAGES },
  server: { folders: ['src'], packages: [] },
  src: { folders: ['server'], packages: [] },
};

/** The one module through which code outside engine/ may use the engine. */
const ENGINE_ENTRY = /^engine(\/index(\.[cm]?[jt]s)?)?$/;

/** @param {string} file @param {string} specifier */
function checkImport(file, specifier) {
  const fromPath = relative(root, file).split('\\').join('/');
  const layer = /** @type {keyof typeof LAYERS | undefined} */ (fromPath.split('/')[0]);
  const isRelative = specifier.startsWith('.');
  const target = isRelative
    ? relative(root, resolve(dirname(file), specifier))
        .split('\\')
        .join('/')
    : null;
  const targetFolder = target?.split('/')[0];
  const rules = layer && Object.hasOwn(LAYERS, layer) ? LAYERS[layer] : null;
  if (rules && targetFolder && rules.folders.includes(targetFolder)) {
    return `${layer}/ may not import ${targetFolder}/ ("${specifier}"). Move what both need into shared/ (or engine/), or pass it in from the caller.`;
  }
  if (rules && !isRelative && rules.packages.some((pattern) => pattern.test(specifier))) {
    return `${layer}/ must stay free of frameworks and I/O, so it may not import "${specifier}". Do that work in server/ or src/ and hand ${layer}/ plain data.`;
  }
  if (layer !== 'engine' && target?.startsWith('engine/') && !ENGINE_ENTRY.test(target)) {
    return `Import the engine only through engine/index.ts, not "${specifier}". Export what you need from engine/index.ts.`;
  }
  return null;
}

/** The layer rule as a local plugin, so it resolves relative paths instead of guessing. */
const layersPlugin = {
  rules: {
    boundaries: {
      meta: {
        type: 'problem',
        docs: { description: 'Keeps shared/, engine/, server/ and src/ in their layers.' },
        schema: [],
      },
      /** @param {import('eslint').Rule.RuleContext} context */
      create(context) {
        /** @param {any} node */
        const check = (node) => {
          const source = node.source;
          if (!source || source.type !== 'Literal' || typeof source.value !== 'string') return;
          const message = checkImport(context.filename, source.value);
          if (message) context.report({ node: source, message });
        };
        return {
          ImportDeclaration: check,
          ExportNamedDeclaration: check,
          ExportAllDeclaration: check,
          ImportExpression: check,
        };
      },
    },
  },
};

export default defineConfig([
  globalIgnores([
    'dist/',
    '.angular/',
    'node_modules/',
    'drizzle/',
    'coverage/',
    'data/',
    '.tmp/',
    'test-results/',
    'playwright-report/',
    'tests/e2e/artifacts/',
  ]),
  {
    files: ['**/*.{ts,js,mjs}'],
    extends: [eslint.configs.recommended, tseslint.configs.recommended],
    plugins: { layers: layersPlugin },
    languageOptions: {
      ecmaVersion: 2022,
      sourceType: 'module',
      globals: { console: 'readonly', process: 'readonly' },
    },
    rules: {
      'layers/boundaries': 'error',
      // Typings for untyped CommonJS packages (`path`) and the worker's lib (`lib`) use references.
      '@typescript-eslint/triple-slash-reference': [
        'error',
        { path: 'always', types: 'prefer-import', lib: 'always' },
      ],
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' },
      ],
    },
  },
  {
    // TypeScript itself reports undefined names in .ts files, with better messages.
    files: ['**/*.ts'],
    rules: { 'no-undef': 'off' },
  },
  {
    files: ['src/**/*.ts'],
    extends: [angular.configs.tsRecommended],
    processor: angular.processInlineTemplates,
    rules: {
      '@angular-eslint/component-selector': [
        'error',
        { type: 'element', prefix: 'tw', style: 'kebab-case' },
      ],
      '@angular-eslint/directive-selector': [
        'error',
        { type: 'attribute', prefix: 'tw', style: 'camelCase' },
      ],
      '@angular-eslint/prefer-on-push-component-change-detection': 'error',
      '@angular-eslint/prefer-signals': 'error',
    },
  },
  {
    files: ['src/**/*.html'],
    extends: [angular.configs.templateRecommended, angular.configs.templateAccessibility],
    rules: {
      '@angular-eslint/template/prefer-control-flow': 'error',
      '@angular-eslint/template/prefer-self-closing-tags': 'error',
    },
  },
]);
