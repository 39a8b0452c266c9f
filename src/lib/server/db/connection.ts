import { Sequelize, Transaction } from 'sequelize';
import sqlite3 from 'sqlite3';
import { serialiseWrites } from './write-queue';

export const DEFAULT_DATABASE_URL = 'sqlite:data/orthogon.db';
const BUSY_TIMEOUT_MS = 5000;

/**
 * sqlite3 opens one connection per transaction under Sequelize, and Sequelize offers no hook on
 * that, so every connection gets its busy timeout and WAL mode from this subclass.
 */
class TunedDatabase extends sqlite3.Database {
	constructor(filename: string, mode?: number, callback?: (err: Error | null) => void) {
		super(filename, mode ?? sqlite3.OPEN_READWRITE | sqlite3.OPEN_CREATE, (err) => {
			if (!err) {
				this.configure('busyTimeout', BUSY_TIMEOUT_MS);
				if (filename !== ':memory:') {
					this.run('PRAGMA journal_mode=WAL');
				}
			}
			callback?.(err);
		});
	}
}
/** A connection of its own to a SQLite file, tuned like Sequelize's (busy timeout, WAL). */
export function openSqliteConnection(filename: string): sqlite3.Database {
	return new TunedDatabase(filename);
}

const tunedSqlite = Object.assign(Object.create(sqlite3) as typeof sqlite3, {
	Database: TunedDatabase
});

/** Where a `sqlite:` URL keeps its file, e.g. `sqlite:data/orthogon.db` → `data/orthogon.db`. */
export function sqliteStorage(url: string): string | null {
	if (!url.startsWith('sqlite:')) {
		return null;
	}
	const rest = url.slice('sqlite:'.length).replace(/^\/\//, '');
	return rest === '' || rest === ':memory:' ? ':memory:' : rest;
}

/** A Sequelize instance for `sqlite:<file>`, `sqlite::memory:` or `postgres://…`. */
export function createSequelize(url: string = DEFAULT_DATABASE_URL): Sequelize {
	const storage = sqliteStorage(url);
	if (storage) {
		const sequelize = new Sequelize({
			dialect: 'sqlite',
			storage,
			dialectModule: tunedSqlite,
			logging: false,
			// A deferred transaction that reads, then writes, fails at once with SQLITE_BUSY when
			// another connection wrote meanwhile (no busy wait can help it); IMMEDIATE takes the
			// write lock at BEGIN, where the busy timeout applies (other processes on the file).
			transactionType: Transaction.TYPES.IMMEDIATE
		});
		serialiseWrites(sequelize);
		return sequelize;
	}
	if (/^postgres(ql)?:\/\//.test(url)) {
		return new Sequelize(url, { dialect: 'postgres', logging: false });
	}
	throw new Error(
		`DATABASE_URL must start with sqlite: or postgres:// (got "${url.split(':')[0]}:…")`
	);
}
