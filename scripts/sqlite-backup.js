// An online backup of a SQLite database: `VACUUM INTO` copies a consistent snapshot (one read
// transaction; in WAL mode the server keeps writing meanwhile) into a new, compact file.
import fs from 'node:fs';
import path from 'node:path';
import sqlite3 from 'sqlite3';

function open(file, mode) {
	return new Promise((resolve, reject) => {
		const db = new sqlite3.Database(file, mode, (err) => (err ? reject(err) : resolve(db)));
	});
}
const run = (db, sql, params = []) =>
	new Promise((resolve, reject) => db.run(sql, params, (err) => (err ? reject(err) : resolve())));
const get = (db, sql) =>
	new Promise((resolve, reject) => db.get(sql, (err, row) => (err ? reject(err) : resolve(row))));
const close = (db) => new Promise((resolve) => db.close(() => resolve()));

/** `orthogon-2026-12-03T14-05-09Z.db`: sorts by time, safe on every file system. */
export function backupFileName(now = new Date()) {
	return `orthogon-${now
		.toISOString()
		.replace(/\.\d+Z$/, 'Z')
		.replace(/:/g, '-')}.db`;
}

/** PRAGMA integrity_check of a database file: 'ok', or SQLite's first complaint. */
export async function integrityCheck(file) {
	const db = await open(file, sqlite3.OPEN_READONLY);
	try {
		const row = await get(db, 'PRAGMA integrity_check');
		return Object.values(row ?? {})[0] ?? 'no answer';
	} finally {
		await close(db);
	}
}

/**
 * Copies the live database `source` into `targetDir`/orthogon-<UTC time>.db and checks the copy.
 * Returns the copy's path; throws when the copy fails its integrity check.
 */
export async function backupSqlite(source, targetDir, now = new Date()) {
	if (!fs.existsSync(source)) {
		throw new Error(`No database at ${source}.`);
	}
	fs.mkdirSync(targetDir, { recursive: true });
	const target = path.join(targetDir, backupFileName(now));
	const db = await open(source, sqlite3.OPEN_READWRITE);
	try {
		db.configure('busyTimeout', 10_000);
		await run(db, 'VACUUM INTO ?', [target]);
	} finally {
		await close(db);
	}
	const verdict = await integrityCheck(target);
	if (verdict !== 'ok') {
		throw new Error(`The backup ${target} failed its integrity check: ${verdict}`);
	}
	return target;
}
