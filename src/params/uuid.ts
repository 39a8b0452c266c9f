import type { ParamMatcher } from '@sveltejs/kit';
import { isUuid } from '$lib/uuid';

/**
 * Team, project and route ids are UUIDs; anything else is a 404 before any query runs (on
 * PostgreSQL a non-uuid id in a uuid column was a 500), e.g. `/teams/not-an-id` → 404.
 */
export const match = isUuid satisfies ParamMatcher;
