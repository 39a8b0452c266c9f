import type { ChildProcess } from 'node:child_process';

export type BuiltServer = {
	origin: string;
	child: ChildProcess;
	exited: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
	stderr(): string;
	stop(signal?: NodeJS.Signals): Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
};

export function freePort(): Promise<number>;
export function startBuiltServer(options: {
	dataDir: string;
	port: number;
	env?: Record<string, string>;
	quiet?: boolean;
}): Promise<BuiltServer>;
export function signInCookie(origin: string, email: string, password?: string): Promise<string>;
