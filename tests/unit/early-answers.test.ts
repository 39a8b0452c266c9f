import {
	createServer,
	Agent,
	request as httpRequest,
	type IncomingMessage,
	type Server,
	type ServerResponse
} from 'node:http';
import type { AddressInfo } from 'node:net';
import type { Handle, RequestEvent } from '@sveltejs/kit';
import { getRequest, setResponse } from '@sveltejs/kit/node';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeAfterUnreadBody, markBodyRead } from '../../src/lib/server/hooks/early-answers';

// A real Node server with keep-alive, reading requests the way adapter-node does, whose endpoint
// refuses uploads from their Content-Length alone, like readJson's 413, without reading them.
function serve(hook: Handle): Server {
	const answer = async (req: IncomingMessage, res: ServerResponse) => {
		const request = await getRequest({
			request: req,
			base: 'http://localhost',
			bodySizeLimit: 512 * 1024
		});
		const event = { request, url: new URL(request.url) } as RequestEvent;
		const response = await hook({
			event,
			resolve: async () =>
				request.method === 'POST'
					? Response.json(
							{ error: { code: 'too_large', message: 'Over the limit.' } },
							{ status: 413 }
						)
					: Response.json({ ok: true })
		});
		await setResponse(res, response);
	};
	return createServer((req, res) => void answer(req, res));
}

type Answer = { status: number; connection: string | undefined };
function send(port: number, agent: Agent, method: string, body?: Buffer): Promise<Answer> {
	return new Promise((resolve, reject) => {
		const req = httpRequest(
			{
				port,
				agent,
				method,
				path: '/api/upload',
				headers: {
					'content-type': 'application/json',
					...(body ? { 'content-length': body.length } : {})
				}
			},
			(res) => {
				res.resume();
				res.on('end', () =>
					resolve({ status: res.statusCode ?? 0, connection: res.headers.connection })
				);
			}
		);
		req.setTimeout(4000, () => req.destroy(new Error('no answer on the reused connection')));
		req.on('error', reject);
		req.end(body);
	});
}

let server: Server;
let port = 0;
beforeAll(async () => {
	server = serve(closeAfterUnreadBody);
	await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
	port = (server.address() as AddressInfo).port;
});
afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

describe('early answers on a keep-alive connection', () => {
	it('closes the connection after a 413 sent before the body was read, so the next request succeeds', async () => {
		const agent = new Agent({ keepAlive: true, maxSockets: 1 });
		const refused = await send(port, agent, 'POST', Buffer.alloc(3 * 1024 * 1024, 0x20));
		expect(refused).toEqual({ status: 413, connection: 'close' });
		expect(await send(port, agent, 'GET')).toEqual({ status: 200, connection: 'keep-alive' });
		agent.destroy();
	});

	it('keeps the connection open for a body read in full through a clone (the form-body check)', async () => {
		const readViaClone: Handle = (input) =>
			closeAfterUnreadBody({
				...input,
				resolve: async (event) => {
					await event.request.clone().text();
					markBodyRead(event.request);
					return Response.json({ ok: true });
				}
			});
		const cloneServer = serve(readViaClone);
		await new Promise<void>((resolve) => cloneServer.listen(0, '127.0.0.1', resolve));
		const clonePort = (cloneServer.address() as AddressInfo).port;
		const agent = new Agent({ keepAlive: true, maxSockets: 1 });
		const answer = await send(clonePort, agent, 'POST', Buffer.from('name=Kittiwake'));
		expect(answer).toEqual({ status: 200, connection: 'keep-alive' });
		agent.destroy();
		await new Promise<void>((resolve) => cloneServer.close(() => resolve()));
	});

	it('reads a small refused body to its end, so the client gets the answer and keeps the connection', async () => {
		const refuse: Handle = (input) =>
			closeAfterUnreadBody({
				...input,
				resolve: async () =>
					Response.json({ error: { code: 'cross-site', message: 'No.' } }, { status: 403 })
			});
		const refuseServer = serve(refuse);
		await new Promise<void>((resolve) => refuseServer.listen(0, '127.0.0.1', resolve));
		const refusePort = (refuseServer.address() as AddressInfo).port;
		const agent = new Agent({ keepAlive: true, maxSockets: 1 });
		const refused = await send(refusePort, agent, 'POST', Buffer.alloc(2048, 0x20));
		expect(refused).toEqual({ status: 403, connection: 'keep-alive' });
		// A large refused body is not read: the connection closes instead.
		const large = await send(refusePort, agent, 'POST', Buffer.alloc(512 * 1024, 0x20));
		expect(large).toEqual({ status: 403, connection: 'close' });
		expect((await send(refusePort, agent, 'GET')).status).toBe(403);
		agent.destroy();
		await new Promise<void>((resolve) => refuseServer.close(() => resolve()));
	});

	it('keeps the connection open when nothing was left unread', async () => {
		const agent = new Agent({ keepAlive: true, maxSockets: 1 });
		expect(await send(port, agent, 'GET')).toEqual({ status: 200, connection: 'keep-alive' });
		expect(await send(port, agent, 'GET')).toEqual({ status: 200, connection: 'keep-alive' });
		agent.destroy();
	});
});
