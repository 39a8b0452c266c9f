import type { Sequelize } from 'sequelize';
import { createSequelize, DEFAULT_DATABASE_URL } from './connection';
import { migrate } from './migrate';
import { initModels } from './models';

export * from './models';

let current: { url: string; sequelize: Sequelize; ready: Promise<void> } | null = null;

/**
 * The process's database: opened on first use from `DATABASE_URL` (or the URL given, as tests
 * do), migrated once before the first query that awaits `dbReady()`.
 */
export function openDatabase(url = process.env.DATABASE_URL || DEFAULT_DATABASE_URL) {
	if (current && current.url === url) {
		return current;
	}
	const sequelize = createSequelize(url);
	initModels(sequelize);
	const ready = migrate(sequelize).then(() => undefined);
	current = { url, sequelize, ready };
	return current;
}

/** Resolves once the schema is current; every service awaits it before its first query. */
export function dbReady(): Promise<void> {
	return (current ?? openDatabase()).ready;
}

export async function closeDatabase(): Promise<void> {
	if (!current) {
		return;
	}
	const { sequelize } = current;
	current = null;
	await sequelize.close();
}
