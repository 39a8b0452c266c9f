import fs from 'node:fs';
import path from 'node:path';
import sqlite3 from 'sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { freePort, signInCookie, startBuiltServer } from '../../scripts/built-server.js';

// Crash safety: every write the server acknowledged survives a SIGKILL in the middle of a burst
// of writes, and the SQLite file is intact afterwards.
const dataDir = path.resolve('test-results/crash-data');
const WRITERS = 8;
const KILL_AFTER_ACKS = 30;

type Server = Awaited<ReturnType<typeof startBuiltServer>>;
let server: Server | null = null;
afterAll(async () => {
	await server?.stop('SIGKILL');
});

const routeDocument = (name: string) => ({
	name,
	intermediates: [
		{ id: 'a', structure: 'CC(=O)CCC(=O)OC' },
		{ id: 'b', structure: 'CC1(CCC(=O)OC)OCCO1' },
		{ id: 'c', structure: 'CC1(CCC(C)(C)O)OCCO1' }
	],
	steps: [
		{ id: 's1', from: ['a'], to: 'b', reagents: 'ethylene glycol, TsOH' },
		{ id: 's2', from: ['b'], to: 'c', reagents: 'MeMgBr, THF' }
	]
});

function integrityCheck(file: string): Promise<string> {
	return new Promise((resolve, reject) => {
		const db = new sqlite3.Database(file, sqlite3.OPEN_READONLY, (err) => {
			if (err) {
				return reject(err);
			}
			db.get('PRAGMA integrity_check', (error, row: Record<string, string> | undefined) => {
				db.close();
				if (error) {
					reject(error);
				} else {
					resolve(Object.values(row ?? {})[0] ?? 'no answer');
				}
			});
		});
	});
}

describe('SIGKILL during a burst of writes', () => {
	it('keeps every acknowledged write and leaves the database intact', async () => {
		fs.rmSync(dataDir, { recursive: true, force: true });
		server = await startBuiltServer({ dataDir, port: await freePort() });
		const { origin } = server;
		const cookie = await signInCookie(origin, 'chemist@example.com');
		const projects = await (await fetch(`${origin}/api/projects`, { headers: { cookie } })).json();
		const projectId: string = projects.projects.find((p: { name: string }) =>
			/Cormorant/.test(p.name)
		).id;

		const acknowledged: { id: string; name: string }[] = [];
		let sent = 0;
		let killed = false;
		const writer = async (w: number) => {
			while (!killed) {
				const name = `Crash ${w}-${sent++}`;
				try {
					const response = await fetch(`${origin}/api/projects/${projectId}/routes`, {
						method: 'POST',
						headers: { cookie, 'content-type': 'application/json' },
						body: JSON.stringify(routeDocument(name))
					});
					if (response.status === 201) {
						acknowledged.push({ id: (await response.json()).id, name });
					} else {
						throw new Error(`write answered ${response.status}: ${await response.text()}`);
					}
				} catch (caught) {
					if (!killed) {
						throw caught;
					}
				}
				if (acknowledged.length >= KILL_AFTER_ACKS && !killed) {
					killed = true;
					server!.child.kill('SIGKILL');
				}
			}
		};
		await Promise.all(Array.from({ length: WRITERS }, (_, w) => writer(w)));
		expect(await server.exited).toEqual({ code: null, signal: 'SIGKILL' });
		// Writes were still in flight when the server died, so the kill really was mid-burst.
		expect(sent).toBeGreaterThan(acknowledged.length);

		expect(await integrityCheck(path.join(dataDir, 'orthogon.db'))).toBe('ok');
		server = await startBuiltServer({ dataDir, port: await freePort() });
		const again = await signInCookie(server.origin, 'chemist@example.com');
		const missing: string[] = [];
		for (const { id, name } of acknowledged) {
			const response = await fetch(`${server.origin}/api/routes/${id}`, {
				headers: { cookie: again }
			});
			const body = response.ok ? await response.json() : null;
			const whole =
				body?.name === name &&
				body.document.intermediates.length === 3 &&
				body.document.steps.length === 2;
			if (!whole) {
				missing.push(`${name} (${response.status})`);
			}
		}
		expect(missing).toEqual([]);
		await server.stop();
		server = null;
		expect(await integrityCheck(path.join(dataDir, 'orthogon.db'))).toBe('ok');
		console.info(
			`crash test: ${acknowledged.length} acknowledged writes of ${sent} sent, all present after SIGKILL; integrity_check ok`
		);
	});
});
