import type { AddressObject } from 'mailparser';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { dbReady, ReceivedMail } from '../db';
import { FAKE_SMTP_HOST } from './config';

/** Outbox mails are a few kB; anything near this is not ours. */
const MAX_MESSAGE_BYTES = 1024 * 1024;

export type FakeSmtp = {
	/** The port it listens on (the chosen one when asked for port 0, as tests do). */
	port: number;
	close(): Promise<void>;
};

function addressText(address: AddressObject | AddressObject[] | undefined): string | null {
	if (!address) {
		return null;
	}
	return (Array.isArray(address) ? address : [address]).map((a) => a.text).join(', ');
}

/**
 * The local mail catcher used when SMTP_URL is unset: a real SMTP server on 127.0.0.1 (no TLS, no
 * login needed) that reads each message with mailparser and keeps it as a ReceivedMail row, so
 * the demo and the tests send real SMTP with no outside service. Resolves to null, after one
 * console line saying what to do, when the port is taken: the app runs on and mail waits queued.
 */
export async function startFakeSmtp(port: number): Promise<FakeSmtp | null> {
	await dbReady();
	const server = new SMTPServer({
		authOptional: true,
		disabledCommands: ['STARTTLS', 'AUTH'],
		size: MAX_MESSAGE_BYTES,
		logger: false,
		// Loopback only; a reverse DNS lookup per connection would cost time and tell nothing.
		disableReverseLookup: true,
		banner: 'Orthogon local mail catcher',
		onData(stream, session, callback) {
			simpleParser(stream)
				.then(async (parsed) => {
					if (stream.sizeExceeded) {
						throw Object.assign(new Error('Message too large for the local mail catcher.'), {
							responseCode: 552
						});
					}
					const envelopeTo = session.envelope.rcptTo.map((r) => r.address).join(', ');
					await ReceivedMail.create({
						messageId: parsed.messageId?.slice(0, 300) ?? null,
						from: addressText(parsed.from)?.slice(0, 320) ?? null,
						to: (addressText(parsed.to) ?? envelopeTo).slice(0, 2000),
						subject: (parsed.subject ?? '').slice(0, 300),
						text: parsed.text ?? '',
						receivedAt: new Date()
					});
				})
				.then(
					() => callback(),
					(caught: Error) => callback(caught)
				);
		}
	});
	// Errors after start (a client hanging up mid-message) are the client's problem, not the app's.
	const listening = await new Promise<boolean>((resolve) => {
		server.once('error', (caught: NodeJS.ErrnoException) => {
			if (caught.code === 'EADDRINUSE') {
				console.warn(
					`[mail] port ${port} is in use; mail stays queued until something listens there; set SMTP_FAKE_PORT or SMTP_URL`
				);
			} else {
				console.error(`[mail] The local mail catcher could not start on port ${port}:`, caught);
			}
			resolve(false);
		});
		server.listen(port, FAKE_SMTP_HOST, () => resolve(true));
	});
	if (!listening) {
		return null;
	}
	server.on('error', (caught) => console.error('[mail] local mail catcher:', caught.message));
	const address = server.server.address();
	return {
		port: typeof address === 'object' && address ? address.port : port,
		close: () => new Promise<void>((resolve) => server.close(() => resolve()))
	};
}
