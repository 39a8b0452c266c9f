import { sveltekit } from '@sveltejs/kit/vite';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
	plugins: [tailwindcss(), sveltekit()],
	build: {
		// Cycles inside superforms' optional validator adapters and plugin timing notes are noise.
		rolldownOptions: { checks: { circularDependency: false, pluginTimings: false } }
	},
	test: {
		include: ['tests/unit/**/*.test.ts', 'tests/reference/**/*.test.ts', 'src/**/*.test.ts'],
		environment: 'node',
		// The database tests each open their own in-memory SQLite; run files in separate workers.
		pool: 'forks'
	}
});
