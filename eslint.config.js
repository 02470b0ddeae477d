// Lint rules, chiefly the import doors between the three rooms (see DEVELOPERS.md, "Architecture").
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import svelte from 'eslint-plugin-svelte';
import globals from 'globals';

const nodeBuiltins = ['node:*', 'fs', 'fs/*', 'path', 'os', 'child_process', 'crypto', 'url', 'util', 'stream', 'http', 'https', 'net', 'worker_threads'];

const engineDoor = {
  patterns: [
    { group: nodeBuiltins, message: 'shared-model is pure: no Node APIs.' },
    { group: ['electron', 'electron/*'], message: 'shared-model is pure: no Electron.' },
    { group: ['svelte', 'svelte/*', '*.svelte'], message: 'shared-model is pure: no Svelte.' },
    { group: ['chart.js', 'chart.js/*', 'chartjs-*'], message: 'shared-model is pure: no Chart.js.' },
    { group: ['**/src-renderer/**', '**/src-main/**', '**/test/**'], message: 'shared-model imports nothing from the other rooms.' },
  ],
};

const rendererDoor = {
  patterns: [
    { group: nodeBuiltins, message: 'The renderer never imports Node APIs; ask main through window.wattledger.' },
    { group: ['electron', 'electron/*'], message: 'The renderer never imports electron; use the preload API.' },
    { group: ['**/src-main/**'], message: 'The renderer never imports the main process.' },
    { group: ['**/shared-model/*/**'], message: 'Import the engine through shared-model/index.ts only.' },
  ],
};

const rendererChartDoor = {
  patterns: [
    ...rendererDoor.patterns,
    { group: ['chart.js', 'chart.js/*', 'chartjs-*'], message: 'Only the chart wrappers in src-renderer/charts import Chart.js.' },
  ],
};

/** Chart wrappers: Chart.js types only; the registered `Chart` comes from chart-kit.ts. */
const rendererChartKitDoor = {
  patterns: [
    ...rendererDoor.patterns,
    {
      group: ['chart.js', 'chart.js/*', 'chartjs-*'],
      allowTypeImports: true,
      message: 'Chart.js is set up in one place: import Chart (and plugins) from src-renderer/charts/chart-kit.ts; type imports are fine.',
    },
  ],
};

const mainDoor = {
  patterns: [
    { group: ['**/src-renderer/**', 'svelte', 'svelte/*', 'chart.js', 'chart.js/*'], message: 'Main never imports the renderer.' },
    { group: ['**/shared-model/*/**'], message: 'Import the engine through shared-model/index.ts only.' },
  ],
};

export default tseslint.config(
  { ignores: ['node_modules/', 'out/', 'dist/', '.reports/', '.artifacts/', 'assets/**/*.json', 'src-main/types/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  ...svelte.configs['flat/recommended'],
  {
    files: ['**/*.svelte', '**/*.svelte.ts'],
    languageOptions: { parserOptions: { parser: tseslint.parser, extraFileExtensions: ['.svelte'] } },
  },
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': 'error',
    },
  },
  {
    files: ['shared-model/**/*.ts'],
    languageOptions: { globals: {} },
    rules: {
      'no-restricted-imports': ['error', engineDoor],
      'no-restricted-globals': ['error', 'window', 'document', 'process', 'performance', 'setTimeout', 'setInterval', 'Date', 'fetch', 'localStorage'],
      'no-restricted-properties': ['error', { object: 'Math', property: 'random', message: 'Randomness enters the engine only as a seed argument.' }],
    },
  },
  {
    files: ['src-renderer/**/*.ts', 'src-renderer/**/*.svelte'],
    languageOptions: { globals: { ...globals.browser } },
    rules: { 'no-restricted-imports': ['error', rendererChartDoor] },
  },
  {
    files: ['src-renderer/charts/**/*.ts', 'src-renderer/charts/**/*.svelte'],
    rules: { 'no-restricted-imports': ['error', rendererChartKitDoor] },
  },
  {
    // The one place Chart.js is set up (registered pieces, defaults): the only value import of it.
    files: ['src-renderer/charts/chart-kit.ts'],
    rules: { 'no-restricted-imports': ['error', rendererDoor] },
  },
  {
    files: ['src-main/**/*.ts', 'src-main/**/*.js', 'electron.config.ts'],
    languageOptions: { globals: { ...globals.node } },
    rules: { 'no-restricted-imports': ['error', mainDoor] },
  },
  {
    // Scripts that use the engine as a package ('wattledger', built by npm install) run in Node.
    files: ['examples/**/*.js'],
    languageOptions: { globals: { ...globals.node } },
  },
  {
    files: ['test/**/*.ts', '*.config.ts', '*.config.js', '*.config.cjs', '.ci/**/*.js'],
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
  },
  {
    files: ['**/*.cjs'],
    languageOptions: { sourceType: 'commonjs', globals: { ...globals.node } },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
);
