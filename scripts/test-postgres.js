// A throwaway PostgreSQL server for the dialect test, started by `npm test` when Debian's
// postgresql package is installed (CI installs it). Listens on 127.0.0.1 only, trusts local
// connections, lives in a temporary folder and is stopped when the tests end.
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

const PORT = 55432;

function findBin() {
	const root = '/usr/lib/postgresql';
	if (!fs.existsSync(root)) {
		return null;
	}
	const versions = fs.readdirSync(root).sort((a, b) => Number(b) - Number(a));
	for (const v of versions) {
		const bin = path.join(root, v, 'bin');
		if (fs.existsSync(path.join(bin, 'initdb'))) {
			return bin;
		}
	}
	return null;
}

/** Runs a PostgreSQL tool as the `postgres` user when we are root (initdb refuses root). */
function asPostgres(bin, args) {
	const isRoot = process.getuid?.() === 0;
	const [cmd, full] = isRoot ? ['runuser', ['-u', 'postgres', '--', bin, ...args]] : [bin, args];
	return spawnSync(cmd, full, { encoding: 'utf8' });
}

/** Starts the server and returns its URL and a stop function, or null with the reason. */
export function startTestPostgres() {
	const bin = findBin();
	if (!bin) {
		return { url: null, reason: 'PostgreSQL is not installed (apt-get install -y postgresql)' };
	}
	const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'orthogon-pg-'));
	if (process.getuid?.() === 0) {
		spawnSync('chown', ['postgres:postgres', dir]);
	}
	const data = path.join(dir, 'data');
	const init = asPostgres(path.join(bin, 'initdb'), [
		'-D',
		data,
		'-A',
		'trust',
		'-U',
		'postgres',
		'--no-sync'
	]);
	if (init.status !== 0) {
		return { url: null, reason: `initdb failed: ${init.stderr.trim().split('\n').pop()}` };
	}
	const options = `-p ${PORT} -k ${dir} -c listen_addresses=127.0.0.1 -c fsync=off`;
	const start = asPostgres(path.join(bin, 'pg_ctl'), [
		'-D',
		data,
		'-o',
		options,
		'-l',
		path.join(dir, 'log'),
		'-w',
		'start'
	]);
	if (start.status !== 0) {
		return { url: null, reason: `pg_ctl start failed: ${start.stderr.trim()}` };
	}
	const create = asPostgres(path.join(bin, 'createdb'), [
		'-h',
		'127.0.0.1',
		'-p',
		String(PORT),
		'-U',
		'postgres',
		'orthogon_test'
	]);
	const stop = () => {
		asPostgres(path.join(bin, 'pg_ctl'), ['-D', data, '-m', 'fast', 'stop']);
		fs.rmSync(dir, { recursive: true, force: true });
	};
	if (create.status !== 0) {
		stop();
		return { url: null, reason: `createdb failed: ${create.stderr.trim()}` };
	}
	return { url: `postgres://postgres@127.0.0.1:${PORT}/orthogon_test`, stop };
}
