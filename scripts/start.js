#!/usr/bin/env node
// `npm start`: build when needed, then serve. The server migrates the database and seeds the
// demo scenario itself at start-up (hooks.server.ts `init`), so every way of starting it agrees.
import { spawn } from 'node:child_process';
import { buildIfStale } from './build-if-stale.js';
import { demoScenario, loadDotEnv, resolveEnvironment } from './environment.js';

const args = new Set(process.argv.slice(2));
buildIfStale({ force: args.has('--rebuild') });
if (args.has('--build-only')) {
	process.exit(0);
}

loadDotEnv();
const env = resolveEnvironment();
const demo = env.ORTHOGON_DEMO !== '0';
const server = spawn(process.execPath, ['build/index.js'], {
	env,
	stdio: ['ignore', 'inherit', 'inherit']
});

for (const signal of ['SIGINT', 'SIGTERM']) {
	process.on(signal, () => server.kill(signal));
}
server.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));

await announceWhenUp(env.ORIGIN, env.PORT);

async function announceWhenUp(origin, port) {
	const deadline = Date.now() + 60_000;
	while (Date.now() < deadline) {
		try {
			const response = await fetch(`http://127.0.0.1:${port}/signin`);
			if (response.ok) {
				break;
			}
		} catch {
			// not listening yet
		}
		await new Promise((r) => setTimeout(r, 250));
	}
	const lines = [``, `Orthogon is running at ${origin}`];
	if (demo) {
		const scenario = demoScenario();
		lines.push(`Demo sign-ins (password "${scenario.password}"):`);
		for (const team of scenario.teams) {
			for (const person of team.people) {
				lines.push(`  ${person.email.padEnd(24)} ${person.role.padEnd(9)} ${team.name}`);
			}
		}
	} else {
		lines.push(
			'Demo data is off (ORTHOGON_DEMO=0). Create the first lead with: npm run user:create'
		);
	}
	lines.push('Stop with Ctrl+C.', '');
	console.log(lines.join('\n'));
}
