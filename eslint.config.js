// ESLint: the recommended TypeScript and Svelte rules, plus the habits the house style promises
// (braces always, no forgotten promises, typed buttons, no state copied by an effect). Formatting
// is prettier's job (`npm run format`); eslint-config-prettier turns off rules that would fight it.
import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import svelte from 'eslint-plugin-svelte';
import globals from 'globals';
import ts from 'typescript-eslint';
import svelteConfig from './svelte.config.js';

export default ts.config(
	{ ignores: ['build/', '.svelte-kit/', 'node_modules/', 'test-results/', 'data/', 'coverage/'] },
	js.configs.recommended,
	...ts.configs.recommended,
	...svelte.configs.recommended,
	prettier,
	...svelte.configs.prettier,
	{
		languageOptions: {
			globals: { ...globals.browser, ...globals.node },
			parserOptions: {
				projectService: true,
				tsconfigRootDir: import.meta.dirname
			}
		}
	},
	{
		files: ['**/*.svelte', '**/*.svelte.ts', '**/*.svelte.js'],
		languageOptions: {
			parserOptions: {
				parser: ts.parser,
				extraFileExtensions: ['.svelte'],
				svelteConfig
			}
		}
	},
	{
		rules: {
			curly: ['error', 'all'],
			'@typescript-eslint/no-floating-promises': 'error',
			'@typescript-eslint/no-misused-promises': 'error',
			'@typescript-eslint/no-unused-vars': [
				'error',
				{ argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }
			],
			'svelte/button-has-type': 'error',
			// A $state kept in step with another by an $effect is a copy: derive it instead.
			'svelte/prefer-writable-derived': 'error',
			// Typed routes via resolve() are a later migration; links here are plain paths.
			'svelte/no-navigation-without-resolve': 'off'
		}
	},
	{
		// Plain JavaScript, the command-line scripts and the Tailwind config are outside the
		// TypeScript project (tsconfig.json covers the app and its tests).
		files: ['**/*.js', '**/*.mjs', '**/*.cjs', 'scripts/**/*.ts', 'tailwind.config.ts'],
		...ts.configs.disableTypeChecked
	}
);
