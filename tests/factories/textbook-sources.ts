// How the rule-table fact tests name their sources: the ratings were written from memory of these
// books, so the sources say so.

export const WUTS =
	'Wuts, Greene’s Protective Groups in Organic Synthesis, 5th ed., reactivity charts — from memory';
export const KOC = 'Kocienski, Protecting Groups, 3rd ed. — from memory';
export const CLAYDEN = 'Clayden, Greeves & Warren, Organic Chemistry, 2nd ed. — from memory';
export const COMMON = 'common practice';
