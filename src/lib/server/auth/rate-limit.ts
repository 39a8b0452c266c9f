import {
	RateLimiterPostgres,
	RateLimiterRes,
	RateLimiterSQLite,
	type RateLimiterStoreAbstract
} from 'rate-limiter-flexible';
import type { Sequelize } from 'sequelize';
import { dbReady, User } from '../db';
import { openSqliteConnection } from '../db/connection';
import { queuedWrite } from '../db/write-queue';
import { normaliseEmail } from './credentials';

// What a stranger can do and what they cannot: five wrong passwords for one account *from one
// address* block that account from that address only, so the owner elsewhere signs in as usual;
// one address spraying many accounts is stopped by its own count. Only failures count: an attempt
// reserves a point before the password is checked (so parallel guesses cannot overtake the limit)
// and a correct password gives it back.
export const SIGN_IN_LIMITS = {
	windowSeconds: 15 * 60,
	perAccountFromAddress: 5,
	// A shared address (a site's outbound proxy, a test run) may need more.
	perAddress: Number(process.env.ORTHOGON_SIGNIN_LIMIT_PER_ADDRESS) || 30
} as const;

// The counts live in the database (migration 0004), so every server counts against the same
// numbers: rate-limiter-flexible's PostgreSQL store through Sequelize's pool, its SQLite store on
// Sequelize's own connection.
const TABLE = 'sign_in_limits';

type Limiters = {
	perAccountFromAddress: RateLimiterStoreAbstract;
	perAddress: RateLimiterStoreAbstract;
};
const limitersByDatabase = new WeakMap<Sequelize, Promise<Limiters>>();

async function limiters(): Promise<Limiters> {
	await dbReady();
	const sequelize = User.sequelize!;
	let found = limitersByDatabase.get(sequelize);
	if (!found) {
		found = createLimiters(sequelize);
		limitersByDatabase.set(sequelize, found);
	}
	return found;
}

type SqliteConnectionManager = { getConnection(options: object): Promise<unknown> };

/**
 * The limiter's store wraps each count in a SAVEPOINT on the connection it is given. On
 * Sequelize's shared connection, other queries would run inside that transaction, and a count
 * that met the lock could leave it open. A file database therefore gets a connection of its own
 * (its writes go through the process's write queue: see limiterWrite); an in-memory database
 * (tests) has only Sequelize's one connection.
 */
async function sqliteConnectionFor(sequelize: Sequelize): Promise<unknown> {
	const { options } = sequelize as unknown as { options: { storage?: string } };
	const storage = options.storage ?? ':memory:';
	if (storage !== ':memory:') {
		return openSqliteConnection(storage);
	}
	const manager = sequelize.connectionManager as unknown as SqliteConnectionManager;
	return manager.getConnection({});
}

/** A limiter write, queued with the process's other SQLite writes (PostgreSQL: run at once). */
function limiterWrite<T>(work: () => Promise<T>): Promise<T> {
	return queuedWrite(User.sequelize!, work);
}

async function createLimiters(sequelize: Sequelize): Promise<Limiters> {
	const common = { tableName: TABLE, tableCreated: true, duration: SIGN_IN_LIMITS.windowSeconds };
	let make: (keyPrefix: string, points: number) => RateLimiterStoreAbstract;
	if (sequelize.getDialect() === 'postgres') {
		make = (keyPrefix, points) =>
			new RateLimiterPostgres({
				...common,
				storeClient: sequelize,
				storeType: 'sequelize',
				keyPrefix,
				points
			});
	} else {
		const connection = await sqliteConnectionFor(sequelize);
		make = (keyPrefix, points) =>
			new RateLimiterSQLite({
				...common,
				storeClient: connection,
				storeType: 'sqlite3',
				keyPrefix,
				points
			});
	}
	return {
		perAccountFromAddress: make('signin-account', SIGN_IN_LIMITS.perAccountFromAddress),
		perAddress: make('signin-address', SIGN_IN_LIMITS.perAddress)
	};
}

export type SignInAllowance = { allowed: true } | { allowed: false; retryAfterSeconds: number };

const accountKey = (email: string, address: string) =>
	`${normaliseEmail(email) || '(blank)'}|${address}`;

function refusal(res: RateLimiterRes): SignInAllowance {
	return { allowed: false, retryAfterSeconds: Math.max(1, Math.ceil(res.msBeforeNext / 1000)) };
}

/**
 * Reserves one attempt for this e-mail from this address, or refuses it (without checking the
 * password) while either count is spent. Call `settleSignInAttempt` once the password is checked.
 */
export async function takeSignInAttempt(email: string, address: string): Promise<SignInAllowance> {
	const { perAccountFromAddress, perAddress } = await limiters();
	const key = accountKey(email, address);
	const [account, addressCount] = await Promise.all([
		perAccountFromAddress.get(key),
		perAddress.get(address)
	]);
	if (account && account.remainingPoints <= 0) {
		return refusal(account);
	}
	if (addressCount && addressCount.remainingPoints <= 0) {
		return refusal(addressCount);
	}
	try {
		await limiterWrite(() => perAddress.consume(address));
		await limiterWrite(() => perAccountFromAddress.consume(key));
		return { allowed: true };
	} catch (rejection) {
		if (rejection instanceof RateLimiterRes) {
			return refusal(rejection);
		}
		throw rejection;
	}
}

/** A correct password: the attempt did not fail, so its point goes back and the account's count clears. */
export async function settleSignInAttempt(
	email: string,
	address: string,
	succeeded: boolean
): Promise<void> {
	if (!succeeded) {
		return;
	}
	const { perAccountFromAddress, perAddress } = await limiters();
	await limiterWrite(() => perAccountFromAddress.delete(accountKey(email, address)));
	await limiterWrite(() => perAddress.reward(address, 1));
}
