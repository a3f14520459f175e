// ESLint flat config. Layering rules keep the physics and geometry free of UI code
// (see DEVELOPERS.md, "Layers").
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

const uiPackages = ['react', 'react-dom', 'konva', 'konva/*', 'zustand', 'zustand/*', 'd3', 'd3-*'];

/**
 * The layer table of DEVELOPERS.md ("Layers"): which folders of src each folder may import. Every other
 * folder of src is off limits, and the engine is reached only through src/engine/index.ts. Change the
 * table, DEVELOPERS.md and the folder's README.md together.
 */
const FOLDERS = [
  'model',
  'geometry',
  'engine',
  'designs',
  'io',
  'cli',
  'explore',
  'commands',
  'store',
  'canvas',
  'charts',
  'panels',
  'app',
  'workers',
];
const MAY_IMPORT = {
  model: [],
  geometry: ['model'],
  engine: ['model', 'geometry'],
  designs: ['model', 'geometry'],
  io: ['model', 'engine'],
  cli: ['model', 'engine', 'io', 'designs'],
  explore: ['model', 'geometry', 'engine', 'designs'],
  commands: ['model', 'geometry'],
  store: ['model', 'engine', 'commands', 'io', 'designs', 'explore'],
  canvas: ['model', 'geometry', 'engine', 'commands', 'store'],
  charts: [],
  panels: [
    'model',
    'geometry',
    'engine',
    'commands',
    'store',
    'canvas',
    'charts',
    'explore',
    'designs',
    'app',
  ],
  app: FOLDERS.filter((f) => f !== 'app'),
  workers: ['model', 'geometry', 'engine', 'designs', 'explore', 'charts'],
};
/** Web Worker entries compute and draw off the page: no React, Konva or zustand (d3 through charts). */
const WORKER_BANNED = ['react', 'react-dom', 'konva', 'konva/*', 'zustand', 'zustand/*'];
/** Folders that stay free of UI packages (pure TypeScript, tested in Node). */
const PURE = ['model', 'geometry', 'engine', 'designs', 'io', 'cli', 'explore', 'commands'];
const ENGINE_PARTS = ['physics', 'evaluation', 'figures'];
const insideEngine = ENGINE_PARTS.flatMap((part) => [`**/engine/${part}`, `**/engine/${part}/**`]);

function layerRule(folder) {
  const forbidden = FOLDERS.filter((f) => f !== folder && !MAY_IMPORT[folder].includes(f));
  const patterns = [];
  if (forbidden.length > 0)
    patterns.push({
      group: forbidden.flatMap((f) => [`**/${f}`, `**/${f}/**`]),
      message: `src/${folder} may import only ${MAY_IMPORT[folder].join(', ') || 'nothing of ours'} (DEVELOPERS.md, Layers).`,
    });
  if (folder !== 'engine')
    patterns.push({
      group: insideEngine,
      message: 'Other folders import the engine through src/engine/index.ts only.',
    });
  if (folder === 'workers')
    patterns.push({
      group: WORKER_BANNED,
      message: 'src/workers stays free of React, Konva and zustand (it runs in a Web Worker).',
    });
  if (PURE.includes(folder))
    patterns.push({
      group: uiPackages,
      message: `src/${folder} stays free of UI code (React, Konva, zustand, d3).`,
    });
  return { files: [`src/${folder}/**`], rules: { 'no-restricted-imports': ['error', { patterns }] } };
}

/**
 * Inside the engine: physics imports only the model; evaluation not the figures; figures read the model
 * and evaluation's report types. (A file's last matching config wins, so each part repeats the engine's
 * own patterns.)
 */
const ENGINE_PART_RULES = [
  ['physics', ['geometry', 'evaluation', 'figures']],
  ['evaluation', ['figures']],
  ['figures', ['geometry']],
].map(([part, forbidden]) => {
  const engine = layerRule('engine').rules['no-restricted-imports'][1].patterns;
  const own = {
    group: forbidden.flatMap((f) => [`**/${f}`, `**/${f}/**`]),
    message: `engine/${part} may not import ${forbidden.join(', ')} (DEVELOPERS.md, Layers).`,
  };
  return {
    files: [`src/engine/${part}/**`],
    rules: { 'no-restricted-imports': ['error', { patterns: [...engine, own] }] },
  };
});

/**
 * Inside the canvas: the gestures (pure state machines, tested in Node) and the painters (which also draw
 * the PNG on a plain 2D canvas) use no UI package; they keep the canvas's own patterns too.
 */
const CANVAS_PART_RULES = ['gestures', 'paint'].map((part) => {
  const canvas = layerRule('canvas').rules['no-restricted-imports'][1].patterns;
  const own = {
    group: uiPackages,
    message: `canvas/${part} stays free of React, Konva, zustand and d3 (see its README.md).`,
  };
  return {
    files: [`src/canvas/${part}/**`],
    rules: { 'no-restricted-imports': ['error', { patterns: [...canvas, own] }] },
  };
});

export default tseslint.config(
  { ignores: ['dist', 'node_modules', 'reports', 'test-results', 'playwright-report'] },
  js.configs.recommended,
  ...tseslint.configs.strict,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/consistent-type-imports': 'error',
    },
  },
  {
    files: ['src/**/*.tsx', 'src/**/*.ts'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
  ...FOLDERS.map(layerRule),
  ...ENGINE_PART_RULES,
  ...CANVAS_PART_RULES,
);
