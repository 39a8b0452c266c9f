import { sveltekit } from '@sveltejs/kit/vite';
import tailwindcss from '@tailwindcss/vite';
import { svelteTesting } from '@testing-library/svelte/vite';
import { defineConfig } from 'vitest/config';
import { chemWorker } from './scripts/vite-chem-worker.js';

export default defineConfig({
	plugins: [tailwindcss(), chemWorker(), sveltekit()],
	build: {
		rolldownOptions: {
			checks: { pluginTimings: false },
			// Import cycles and comment placement inside dependencies (superforms' optional
			// validator adapters, zod, Auth.js) are theirs to fix and drown our own warnings.
			onwarn(warning, warn) {
				const inDependency = /node_modules/.test(`${warning.id ?? ''} ${warning.message}`);
				if (inDependency) {
					return;
				}
				warn(warning);
			}
		}
	},
	test: {
		// The first perception in a worker pays openchemlib's JIT warm-up (seconds on 2 busy cores);
		// speed is measured by `npm run bench`, not by test timeouts.
		testTimeout: 30_000,
		projects: [
			{
				extends: true,
				test: {
					name: 'node',
					include: ['tests/unit/**/*.test.ts', 'tests/reference/**/*.test.ts', 'src/**/*.test.ts'],
					environment: 'node',
					// The database tests each open their own in-memory SQLite; run files in separate workers.
					pool: 'forks'
				}
			},
			{
				// Component tests: Svelte's browser build rendered into jsdom by @testing-library/svelte.
				extends: true,
				plugins: [svelteTesting()],
				resolve: { conditions: ['browser'] },
				test: {
					name: 'client',
					include: ['tests/component/**/*.svelte.test.ts'],
					environment: 'jsdom'
				}
			}
		]
	}
});
