import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { defineConfig } from '@playwright/test';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const PORT = Number(process.env.E2E_PORT ?? 4173);
const dataDir = path.join(root, `test-results/e2e-data-${PORT}`);

// Browser tests run against the built app started exactly as `npm start` starts it, on a fresh
// database with the demo scenario, in Debian's Chromium (no browser download).
export default defineConfig({
	testDir: '.',
	outputDir: path.join(root, 'test-results/e2e-artifacts'),
	fullyParallel: false,
	workers: 2,
	retries: process.env.CI ? 1 : 0,
	reporter: [
		['list'],
		[
			'json',
			{
				outputFile:
					process.env.PLAYWRIGHT_JSON_OUTPUT_NAME ?? path.join(root, 'test-results/playwright.json')
			}
		]
	],
	use: {
		baseURL: `http://localhost:${PORT}`,
		trace: 'retain-on-failure',
		launchOptions: {
			executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
			args: [
				'--no-sandbox',
				'--headless',
				'--disable-gpu',
				'--disable-quic',
				'--disable-background-networking',
				'--disable-component-update',
				'--disable-sync',
				'--no-first-run'
			]
		}
	},
	webServer: {
		command: `rm -rf "${dataDir}" && node scripts/start.js`,
		cwd: root,
		url: `http://localhost:${PORT}/signin`,
		reuseExistingServer: false,
		timeout: 120_000,
		env: {
			PORT: String(PORT),
			ORIGIN: `http://localhost:${PORT}`,
			ORTHOGON_DATA_DIR: dataDir,
			// The local mail catcher's port follows the e2e port, so it never meets a dev server's
			// 2525 (nor vite's 5173, which PORT + 1000 would be).
			SMTP_FAKE_PORT: String(PORT + 2000),
			// Every test signs in from 127.0.0.1; the per-address limit has its own unit test.
			ORTHOGON_SIGNIN_LIMIT_PER_ADDRESS: '1000',
			AUTH_SECRET: 'e2e-only-secret-not-for-production-use-0123456789'
		}
	}
});
