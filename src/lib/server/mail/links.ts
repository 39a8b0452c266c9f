/**
 * An absolute link for a mail, on the app's public address (`ORIGIN`, which `npm start` always
 * sets), e.g. `appUrl('/routes/…')` → `https://orthogon.lab.example/routes/…`.
 */
export function appUrl(path: string): string {
	return new URL(path, process.env.ORIGIN || 'http://localhost:3000').toString();
}
