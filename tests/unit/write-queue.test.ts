import { TimeoutError } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { apiHandler } from '../../src/lib/server/api';
import { DatabaseBusy, isDatabaseBusy, WriteQueue } from '../../src/lib/server/db/write-queue';
import { fakeEvent } from '../factories';

const wait = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe('WriteQueue', () => {
	it('runs writes one at a time, in arrival order, whatever earlier ones did', async () => {
		const queue = new WriteQueue();
		const log: string[] = [];
		let running = 0;
		const job =
			(name: string, fail = false) =>
			async () => {
				running++;
				expect(running).toBe(1);
				await wait(5);
				log.push(name);
				running--;
				if (fail) {
					throw new Error(name);
				}
				return name;
			};
		const results = await Promise.allSettled([
			queue.run(job('a')),
			queue.run(job('b', true)),
			queue.run(job('c'))
		]);
		expect(log).toEqual(['a', 'b', 'c']);
		expect(results.map((r) => r.status)).toEqual(['fulfilled', 'rejected', 'fulfilled']);
	});

	it('gives up with DatabaseBusy when its turn does not come in time, and never runs late work', async () => {
		const queue = new WriteQueue(30);
		let lateRan = false;
		const slow = queue.run(() => wait(80));
		const late = queue.run(async () => {
			lateRan = true;
		});
		await expect(late).rejects.toBeInstanceOf(DatabaseBusy);
		await slow;
		await wait(5);
		expect(lateRan).toBe(false);
		// The queue still works after a give-up.
		await expect(queue.run(async () => 'next')).resolves.toBe('next');
	});

	it('does not abandon a write that has started, however long it takes', async () => {
		const queue = new WriteQueue(10);
		await expect(queue.run(() => wait(40).then(() => 'done'))).resolves.toBe('done');
	});
});

describe('lock errors at the API', () => {
	it('recognises lock errors of both dialects', () => {
		expect(isDatabaseBusy(new DatabaseBusy())).toBe(true);
		expect(
			isDatabaseBusy(
				new TimeoutError(
					Object.assign(new Error('busy'), { code: 'SQLITE_BUSY', sql: 'BEGIN IMMEDIATE' })
				)
			)
		).toBe(true);
		expect(isDatabaseBusy({ original: { code: '40P01' } })).toBe(true);
		expect(isDatabaseBusy(new Error('other'))).toBe(false);
	});

	it('answers 503 with retry-after and a message, never 500', async () => {
		const handler = apiHandler(async () => {
			throw new TimeoutError(
				Object.assign(new Error('SQLITE_BUSY: database is locked'), {
					code: 'SQLITE_BUSY',
					sql: 'BEGIN IMMEDIATE'
				})
			);
		});
		const response = await handler(fakeEvent({ path: '/api/x' }));
		expect(response.status).toBe(503);
		expect(response.headers.get('retry-after')).toBe('2');
		expect((await response.json()).error).toEqual({
			code: 'database_busy',
			message: expect.stringContaining('Try again')
		});
	});
});
