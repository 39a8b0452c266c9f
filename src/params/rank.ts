import type { ParamMatcher } from '@sveltejs/kit';
import { isPlanRank } from '$lib/route/plan-rank';

/**
 * `/api/routes/{id}/plan/{rank}/save`: anything but a rank (`abc`, `0`, `1e9`) is a 404 before
 * the route is planned, which is the expensive part of saving a plan.
 */
export const match = isPlanRank satisfies ParamMatcher;
