import type { OutboxStatus } from '$lib/review/contract';

// Both the server render and the browser use UTC, so the page hydrates without a mismatch.
const FORMAT = new Intl.DateTimeFormat('en-GB', {
	dateStyle: 'medium',
	timeStyle: 'short',
	timeZone: 'UTC'
});

/** An ISO date as `4 Dec 2026, 05:00 UTC`; a dash for none. */
export function when(iso: string | null): string {
	return iso ? `${FORMAT.format(new Date(iso))} UTC` : '—';
}

export const STATUS_TEXT: Record<OutboxStatus, string> = {
	queued: 'Queued',
	sending: 'Sending',
	sent: 'Sent',
	failed: 'Failed'
};

export const STATUS_TONE: Record<OutboxStatus, string> = {
	queued: 'bg-accent-soft text-accent-strong',
	sending: 'bg-caution-soft text-ink',
	sent: 'bg-fine-soft text-ink',
	failed: 'bg-clash-soft text-clash'
};
