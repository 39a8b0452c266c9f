import { fireEvent, render, screen } from '@testing-library/svelte';
import { describe, expect, it, vi } from 'vitest';
import MaterialRowEditor from '$lib/components/quantities/MaterialRowEditor.svelte';
import type { MaterialInput } from '$lib/quantities/contract';

const row: MaterialInput = { name: 'ethylene glycol', role: 'reagent' };
const show = () => {
	const onchange = vi.fn();
	render(MaterialRowEditor, {
		row,
		index: 2,
		intermediates: [],
		errors: [],
		onchange,
		onremove: () => {}
	});
	return { onchange, amount: screen.getByLabelText('Amount') as HTMLInputElement };
};
/** The text of every element the input's aria-describedby names, as a screen reader reads it. */
const description = (input: HTMLElement) =>
	(input.getAttribute('aria-describedby') ?? '')
		.split(/\s+/)
		.filter(Boolean)
		.map((id) => document.getElementById(id)?.textContent?.trim())
		.join(' ');

describe('MaterialRowEditor amount field', () => {
	it('ties an amount that cannot be read to its input, and saves nothing', async () => {
		const { amount, onchange } = show();
		expect(amount.id).toBe('material-2-amount');
		await fireEvent.input(amount, { target: { value: '75 oz' } });
		expect(amount.getAttribute('aria-invalid')).toBe('true');
		expect(description(amount)).toContain('“oz” is not a unit');
		expect(onchange).not.toHaveBeenCalled();
	});

	it('drops the message and the invalid mark once the amount reads', async () => {
		const { amount, onchange } = show();
		await fireEvent.input(amount, { target: { value: '75 oz' } });
		await fireEvent.input(amount, { target: { value: '75 mL' } });
		expect(amount.hasAttribute('aria-invalid')).toBe(false);
		expect(description(amount)).toBe('');
		expect(screen.queryByText(/is not a unit/)).toBeNull();
		expect(onchange).toHaveBeenCalledWith(expect.objectContaining({ name: row.name }), 'amount');
	});
});
