import type { ParamMatcher } from '@sveltejs/kit';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * Team, project and route ids are UUIDs; anything else is a 404 before any query runs (on
 * PostgreSQL a non-uuid id in a uuid column was a 500), e.g. `/teams/not-an-id` → 404.
 */
export const match = ((param: string) => UUID.test(param)) satisfies ParamMatcher;
