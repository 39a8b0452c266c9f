#!/usr/bin/env node
// `npm run backup`: an online backup of the SQLite database into <data folder>/backups (or the
// folder given: `npm run backup -- /mnt/backups`), while the server keeps running.
// PostgreSQL is backed up with its own tools (pg_dump); see README "Backup and restore".
import path from 'node:path';
import { dataDir, loadDotEnv, resolveEnvironment } from './environment.js';
import { backupSqlite } from './sqlite-backup.js';

loadDotEnv();
const env = resolveEnvironment();
const url = env.DATABASE_URL;
if (!url.startsWith('sqlite:')) {
	console.error('DATABASE_URL is not SQLite: back up PostgreSQL with pg_dump, e.g.');
	console.error('  pg_dump --format=custom --file=orthogon.dump "$DATABASE_URL"');
	process.exit(1);
}
const source = url.slice('sqlite:'.length).replace(/^\/\//, '');
if (source === '' || source === ':memory:') {
	console.error('An in-memory database has nothing to back up.');
	process.exit(1);
}
const target = process.argv[2] ? path.resolve(process.argv[2]) : path.join(dataDir(env), 'backups');
try {
	const file = await backupSqlite(path.resolve(source), target);
	console.log(`Backup written and checked (integrity_check ok): ${file}`);
	console.log(
		'Restore: stop the server, copy it over the database file (and delete its -wal and -shm files), start again.'
	);
} catch (caught) {
	console.error(`Backup failed: ${caught instanceof Error ? caught.message : caught}`);
	process.exit(1);
}
