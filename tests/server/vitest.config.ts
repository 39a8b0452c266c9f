import { defineConfig } from 'vitest/config';

// Tests against the built server (`node build`), run by `npm test` after the build stage:
// `npx vitest run -c tests/server/vitest.config.ts`.
export default defineConfig({
	test: {
		root: new URL('../..', import.meta.url).pathname,
		include: ['tests/server/**/*.test.ts'],
		environment: 'node',
		pool: 'forks',
		fileParallelism: false,
		testTimeout: 180_000,
		hookTimeout: 120_000
	}
});
