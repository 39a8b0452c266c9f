import { QueryTypes, TimeoutError, type Sequelize } from 'sequelize';

/** How long a write waits for its turn before it gives up with DatabaseBusy (→ 503). */
export const WRITE_WAIT_LIMIT_MS = 15_000;

/** The database could not take a write in time; the client may retry (503 + retry-after). */
export class DatabaseBusy extends Error {
	readonly retryAfterSeconds = 2;
	constructor() {
		super('The database is busy with other changes; nothing was changed. Try again in a moment.');
	}
}

/**
 * True for errors that mean "another writer holds the lock", on either dialect: our own queue's
 * timeout, SQLite's SQLITE_BUSY / SQLITE_LOCKED (Sequelize wraps them as TimeoutError), and
 * PostgreSQL's serialization failure, deadlock and lock-not-available codes.
 */
export function isDatabaseBusy(caught: unknown): boolean {
	if (caught instanceof DatabaseBusy || caught instanceof TimeoutError) {
		return true;
	}
	const original = (caught as { original?: { code?: string } } | null)?.original;
	const code = original?.code ?? (caught as { code?: string } | null)?.code;
	return ['SQLITE_BUSY', 'SQLITE_LOCKED', '40001', '40P01', '55P03'].includes(code ?? '');
}

/**
 * One write at a time, in arrival order. SQLite allows one writer per file; letting writers race
 * for the lock makes them sleep in busy handlers on libuv's four worker threads, which starves
 * every other query (20 parallel saves took 91 s and 11 failed). Waiting here costs nothing.
 */
export class WriteQueue {
	#tail: Promise<unknown> = Promise.resolve();

	constructor(private readonly waitLimitMs = WRITE_WAIT_LIMIT_MS) {}

	/** Runs `work` once every earlier write has settled; DatabaseBusy if its turn is too long coming. */
	run<T>(work: () => Promise<T>): Promise<T> {
		const previous = this.#tail;
		return new Promise<T>((resolve, reject) => {
			let gaveUp = false;
			// The limit covers the wait only: a write that has started is never abandoned, or the
			// client could hear "failed" about a change that then commits.
			const timer = setTimeout(() => {
				gaveUp = true;
				reject(new DatabaseBusy());
			}, this.waitLimitMs);
			const turn = previous.then(async () => {
				clearTimeout(timer);
				if (gaveUp) {
					return;
				}
				await Promise.resolve().then(work).then(resolve, reject);
			});
			this.#tail = turn;
		});
	}
}

const queues = new WeakMap<Sequelize, WriteQueue>();

/**
 * Runs a write that does not go through Sequelize (a raw sqlite3 connection, such as the sign-in
 * limiter's) in the same queue, so it never races this process's transactions for the lock.
 * Without a queue (PostgreSQL) it just runs, e.g. `await queuedWrite(sequelize, () => save())`.
 */
export function queuedWrite<T>(sequelize: Sequelize, work: () => Promise<T>): Promise<T> {
	const queue = queues.get(sequelize);
	return queue ? queue.run(work) : work();
}

const WRITE_QUERY_TYPES = new Set<string>([
	QueryTypes.INSERT,
	QueryTypes.UPDATE,
	QueryTypes.BULKUPDATE,
	QueryTypes.BULKDELETE,
	QueryTypes.DELETE,
	QueryTypes.UPSERT
]);

function isWrite(sql: unknown, options: { type?: string } | undefined): boolean {
	if (options?.type && WRITE_QUERY_TYPES.has(options.type)) {
		return true;
	}
	const text = typeof sql === 'string' ? sql : (sql as { query?: string } | null)?.query;
	return /^\s*(insert|update|delete|replace)\b/i.test(text ?? '');
}

/**
 * Routes every managed transaction and every write outside a transaction through one queue, so
 * a process never has two SQLite writers. Reads outside transactions are not queued: WAL lets
 * them run beside the writer. Unmanaged transactions (no callback) are not used in Orthogon and
 * would bypass the queue; they still begin IMMEDIATE, so they wait on the busy timeout.
 */
export function serialiseWrites(sequelize: Sequelize, queue = new WriteQueue()): void {
	queues.set(sequelize, queue);
	const transaction = sequelize.transaction.bind(sequelize) as (
		...args: unknown[]
	) => Promise<unknown>;
	const query = sequelize.query.bind(sequelize) as (...args: unknown[]) => Promise<unknown>;
	Object.assign(sequelize, {
		transaction(...args: unknown[]) {
			const managed = args.some((arg) => typeof arg === 'function');
			return managed ? queue.run(() => transaction(...args)) : transaction(...args);
		},
		query(sql: unknown, options?: { type?: string; transaction?: unknown }) {
			if (options?.transaction || !isWrite(sql, options)) {
				return query(sql, options);
			}
			return queue.run(() => query(sql, options));
		}
	});
}
