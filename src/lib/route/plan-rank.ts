/** A plan's rank as the planner numbers them (1, 2, 3 …), e.g. `isPlanRank('2')` → true, `'0'` → false. */
export function isPlanRank(param: string): boolean {
	return /^[1-9][0-9]{0,2}$/.test(param);
}
