/**
 * The oxygen PGs issue 11 added (rules/protecting-groups.json). Tests pin these ids rather than a
 * total, since other work adds PGs too; one list, so the pin cannot drift between tests.
 */
export const OXYGEN_PG_IDS = [
	'methyl-ether',
	'allyl-ether',
	'SEM',
	'MEM',
	'BOM',
	'tBu-ether',
	'TIPDS',
	'DTBS',
	'PMP-acetal',
	'cyclic-carbonate',
	'ethyl-ester',
	'PMB-ester'
];
