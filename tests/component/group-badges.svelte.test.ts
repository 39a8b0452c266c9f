import { render, screen, within } from '@testing-library/svelte';
import { describe, expect, it } from 'vitest';
import GroupBadges from '$lib/components/route-map/GroupBadges.svelte';
import type { Analysis } from '$lib/client/route-client';

const analysis = (groups: string[], pgs: string[]): Analysis => ({
	formula: 'C6H14O3',
	mass: 134.17,
	canonical: 'x',
	groups: groups.map((id) => ({ id, atoms: [] })),
	protectingGroups: pgs.map((id) => ({ id, atoms: [], masks: 'alcohol' }))
});
const items = (name: string) =>
	within(screen.getByRole('list', { name }))
		.getAllByRole('listitem')
		.map((li) => li.textContent?.trim());

describe('GroupBadges', () => {
	it('shows one badge per kind with a count, protecting groups apart from free groups', () => {
		render(GroupBadges, {
			analysis: analysis(['alcohol', 'ketone', 'alcohol', 'alcohol'], ['TBS', 'TBS'])
		});
		expect(items('Free groups')).toEqual(['alcohol ×3', 'ketone']);
		expect(items('Protecting groups')).toEqual(['TBS ×2']);
	});

	it('leaves out an empty list', () => {
		render(GroupBadges, { analysis: analysis(['ketone'], []) });
		expect(screen.queryByRole('list', { name: 'Protecting groups' })).toBeNull();
	});
});
