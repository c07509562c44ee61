import js from '@eslint/js'
import tseslint from 'typescript-eslint'
import pluginVue from 'eslint-plugin-vue'
import vueParser from 'vue-eslint-parser'
import globals from 'globals'

const nodeBuiltins = ['fs', 'path', 'os', 'child_process', 'crypto', 'url', 'util', 'stream', 'http', 'https', 'net', 'worker_threads', 'process', 'buffer', 'events', 'zlib', 'readline', 'perf_hooks']

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', 'test-results/**', 'playwright-report/**', '.tmp/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  ...pluginVue.configs['flat/recommended'],
  {
    files: ['**/*.vue'],
    languageOptions: { parser: vueParser, parserOptions: { parser: tseslint.parser, sourceType: 'module' } },
  },
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'vue/multi-word-component-names': 'off',
      'vue/max-attributes-per-line': 'off',
      'vue/singleline-html-element-content-newline': 'off',
      'vue/html-self-closing': 'off',
    },
  },
  {
    // The simulator runs in the browser Worker, on the server and in the CLI alike:
    // it may not reach for Vue, the DOM or Node.
    files: ['shared/**/*.ts'],
    ignores: ['shared/**/*.test.ts'],
    languageOptions: { globals: { ...globals.es2022 } },
    rules: {
      'no-restricted-imports': ['error', {
        paths: ['vue', 'pinia', 'vue-router', 'naive-ui', 'd3', ...nodeBuiltins, ...nodeBuiltins.map((m) => `node:${m}`)],
        patterns: [{ group: ['node:*', '@/*', '**/src/*', '**/server/*'], message: 'shared/ is isomorphic: no Node modules, no client or server code.' }],
      }],
      'no-restricted-globals': ['error', 'window', 'document', 'navigator', 'localStorage', 'process', 'Buffer', 'require', '__dirname'],
    },
  },
)
