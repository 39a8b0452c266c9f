const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * Whether a value can be a row id, e.g. `isUuid('abc')` → false. Ids from paths and forms are
 * checked before they reach a query: PostgreSQL answers a non-uuid in a uuid column with an error.
 */
export function isUuid(value: string): boolean {
	return UUID.test(value);
}
