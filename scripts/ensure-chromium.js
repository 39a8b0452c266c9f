#!/usr/bin/env node
// The e2e tests drive Debian's Chromium (never a browser download). Install it when missing and
// we are root; otherwise say exactly what to run.
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';

export const CHROMIUM = process.env.CHROMIUM_PATH || '/usr/bin/chromium';

export function ensureChromium() {
	if (fs.existsSync(CHROMIUM)) {
		return true;
	}
	if (process.getuid?.() === 0) {
		console.log('Chromium is missing; installing Debian’s chromium package…');
		const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
		const update = spawnSync('apt-get', ['update'], { stdio: 'inherit', env });
		const install =
			update.status === 0 &&
			spawnSync('apt-get', ['install', '-y', 'chromium'], { stdio: 'inherit', env });
		if (install && install.status === 0 && fs.existsSync(CHROMIUM)) {
			return true;
		}
	}
	console.error(
		[
			`The browser tests need Chromium at ${CHROMIUM}. Install it with:`,
			'  sudo apt-get update && sudo apt-get install -y chromium',
			'(or set CHROMIUM_PATH to another Chromium binary).'
		].join('\n')
	);
	return false;
}

if (import.meta.url === `file://${process.argv[1]}`) {
	process.exit(ensureChromium() ? 0 : 1);
}
