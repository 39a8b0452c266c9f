import { mailConfigFromEnv, usesLocalFake, type MailConfig } from './config';
import { startFakeSmtp, type FakeSmtp } from './fake-smtp';
import { MailSender } from './sender';

export type RunningMail = { config: MailConfig; sender: MailSender; fake: FakeSmtp | null };

/**
 * Starts the local mail catcher (only without SMTP_URL) and the outbox sender, as the app server
 * does at start-up. The sender starts even when the catcher's port is taken: another Orthogon
 * server on this host may be listening there, and otherwise the mail waits, queued.
 */
export async function startMail(config: MailConfig = mailConfigFromEnv()): Promise<RunningMail> {
	const fake = usesLocalFake(config) ? await startFakeSmtp(config.fakePort) : null;
	const sender = new MailSender(config);
	sender.start();
	return { config, sender, fake };
}

/** Stops sending (the message in hand finishes) and closes the catcher. */
export async function stopMail(mail: RunningMail): Promise<void> {
	await mail.sender.stop();
	await mail.fake?.close();
}
