/**
 * Retired free-group ids that clients may still send (a highlight, a team override written
 * before a split): each means every group it was split into. Perception never reports them and the
 * rule files may not use them, e.g. `aryl-halide` → both halves. src/lib/rules/ids.ts re-exports
 * this map and checks that every target is a free-group id.
 */
export const FREE_GROUP_ALIASES = {
	'aryl-halide': ['aryl-halide-f-cl', 'aryl-halide-br-i']
} as const;
