// One lint setup for the whole repository: type-aware typescript-eslint rules on .ts and .vue files
// (one TypeScript program from tsconfig.json via the project service), eslint-plugin-vue on .vue files.
// Prettier owns layout, so layout rules are off. Run by `npm test` (scripts/test.mjs).
import tseslint from 'typescript-eslint';
import pluginVue from 'eslint-plugin-vue';
import vueParser from 'vue-eslint-parser';

export default tseslint.config(
  {
    ignores: [
      'dist/**',
      'node_modules/**',
      '.data/**',
      '.test-data/**',
      'test-results/**',
      'public/**',
      'tests/fixtures/typedClient/**',
      '**/*.js',
      '**/*.mjs',
      '**/*.cjs',
    ],
  },
  ...tseslint.configs.recommendedTypeChecked,
  ...pluginVue.configs['flat/recommended'],
  {
    files: ['**/*.ts', '**/*.vue'],
    languageOptions: {
      parser: vueParser,
      parserOptions: {
        parser: tseslint.parser,
        projectService: true,
        tsconfigRootDir: import.meta.dirname,
        extraFileExtensions: ['.vue'],
        sourceType: 'module',
      },
    },
    rules: {
      '@typescript-eslint/no-explicit-any': 'warn',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      // Prettier formats templates; these layout rules would fight it.
      'vue/max-attributes-per-line': 'off',
      'vue/singleline-html-element-content-newline': 'off',
      'vue/multiline-html-element-content-newline': 'off',
      'vue/html-closing-bracket-newline': 'off',
      'vue/html-indent': 'off',
      'vue/html-self-closing': 'off',
      // Form sections edit fields of the parent's reactive form object by design; replacing a prop stays an error.
      'vue/no-mutating-props': ['error', { shallowOnly: true }],
      // Quantities carry their unit in the name (baseCondenserDuty_kW), as in the payload types.
      'vue/prop-name-casing': 'off',
    },
  },
  {
    // Tests read JSON they did not type (supertest's `res.body` is `any`, CLI output is parsed text) and check
    // its shape with expect(); typing it would only restate the assertions.
    files: ['tests/**/*.ts'],
    rules: {
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-unsafe-argument': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
    },
  },
);
