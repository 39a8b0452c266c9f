import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { verifyCredentials } from '../../src/lib/server/auth/credentials';
import { closeDatabase, openDatabase } from '../../src/lib/server/db';
import { teamsOf } from '../../src/lib/server/services/teams';

const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'orthogon-cli-'));
afterAll(async () => {
	await closeDatabase();
	fs.rmSync(dir, { recursive: true, force: true });
});

describe('npm run user:create', () => {
	it('creates a team and its first lead in an empty database (ORTHOGON_DEMO=0 start)', async () => {
		const databaseUrl = `sqlite:${path.join(dir, 'cli.db')}`;
		const output = execFileSync(
			'npx',
			[
				'tsx',
				'scripts/create-user.ts',
				'--email',
				'First.Lead@lab.example',
				'--name',
				'Ada Quill',
				'--team',
				'Quill Group',
				'--password',
				'a-strong-password'
			],
			{
				env: { ...process.env, DATABASE_URL: databaseUrl, ORTHOGON_DATA_DIR: dir },
				encoding: 'utf8'
			}
		);
		expect(output).toContain('Created team “Quill Group” with first.lead@lab.example as lead.');
		openDatabase(databaseUrl);
		const user = await verifyCredentials('first.lead@lab.example', 'a-strong-password');
		expect(user?.name).toBe('Ada Quill');
		expect(await teamsOf(user!.id)).toEqual([
			{ id: expect.any(String), name: 'Quill Group', role: 'lead' }
		]);
	}, 30_000);

	it.each([
		['a short password', 'short', 'Password: Use at least 10 characters.'],
		// bcrypt would read only the first 72 bytes of it (src/lib/schemas/limits.ts).
		['a password bcrypt would cut', 'x'.repeat(73), 'Password: Use at most 72 characters']
	])(
		'refuses %s',
		(_what, password, message) => {
			expect(() =>
				execFileSync(
					'npx',
					[
						'tsx',
						'scripts/create-user.ts',
						'--email',
						'x@lab.example',
						'--name',
						'X',
						'--team',
						'T',
						'--password',
						password
					],
					{
						env: {
							...process.env,
							DATABASE_URL: `sqlite:${path.join(dir, 'short.db')}`,
							ORTHOGON_DATA_DIR: dir
						},
						stdio: 'pipe'
					}
				)
			).toThrow(message);
		},
		30_000
	);
});
