import { fireEvent, render, screen } from '@testing-library/svelte';
import { describe, expect, it, vi } from 'vitest';
import TrapLog from '$lib/components/quantities/TrapLog.svelte';

// The trap log's two number boxes go through the shared NumberField; what is typed must reach
// the reading as numbers, and the boxes empty for the next one.
const show = () => {
	const onchange = vi.fn();
	render(TrapLog, { log: [{ minutes: 10, volume: 0.8 }], canEdit: true, onchange });
	return {
		onchange,
		minutes: screen.getByLabelText('Minutes') as HTMLInputElement,
		volume: screen.getByLabelText('Water, mL') as HTMLInputElement
	};
};

describe('TrapLog', () => {
	it('adds a reading typed in the two boxes after the earlier ones, then clears them', async () => {
		const { onchange, minutes, volume } = show();
		await fireEvent.input(minutes, { target: { value: '25' } });
		await fireEvent.input(volume, { target: { value: '1.9' } });
		await fireEvent.click(screen.getByRole('button', { name: 'Add reading' }));
		expect(onchange).toHaveBeenCalledWith([
			{ minutes: 10, volume: 0.8 },
			{ minutes: 25, volume: 1.9 }
		]);
		expect(minutes.value).toBe('');
		expect(volume.value).toBe('');
	});

	it('refuses a reading with a box left empty, and says why', async () => {
		const { onchange, minutes } = show();
		await fireEvent.input(minutes, { target: { value: '25' } });
		await fireEvent.click(screen.getByRole('button', { name: 'Add reading' }));
		expect(onchange).not.toHaveBeenCalled();
		expect(screen.getByRole('alert').textContent).toContain('Give both the minutes');
	});
});
