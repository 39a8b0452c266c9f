import { render, screen, within } from '@testing-library/svelte';
import { describe, expect, it } from 'vitest';
import ClashList from '$lib/components/route-map/ClashList.svelte';
import type { Clash } from '$lib/client/route-client';

const clash = (severity: Clash['severity'], message: string) => ({ severity, message }) as Clash;

describe('ClashList', () => {
	it('lists every clash with its severity word, clashes and cautions told apart', () => {
		render(ClashList, {
			clashes: [
				clash('clash', 'MeMgBr adds to the free ketone.'),
				clash('caution', 'The ester may be attacked slowly.')
			]
		});
		const items = within(screen.getByRole('list', { name: 'Clashes' })).getAllByRole('listitem');
		expect(items.map((item) => item.textContent?.replace(/\s+/g, ' ').trim())).toEqual([
			'Clash: MeMgBr adds to the free ketone.',
			'Caution: The ester may be attacked slowly.'
		]);
		expect(items[0]?.className).toContain('bg-clash-soft');
		expect(items[1]?.className).toContain('bg-caution-soft');
	});

	it('shows two clashes with the same message twice, not once', () => {
		render(ClashList, { clashes: [clash('clash', 'Same.'), clash('clash', 'Same.')] });
		expect(screen.getAllByRole('listitem')).toHaveLength(2);
	});
});
