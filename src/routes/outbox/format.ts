import type { OutboxStatus } from '$lib/review/contract';

// Dates as the rest of Orthogon prints them (UTC, so the server render and the browser agree).
export { printedDate as when } from '$lib/review/history';

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
