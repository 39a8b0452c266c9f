// Autosave of one route: a quiet moment after each edit the document goes to the server with the
// version it was based on. A version conflict stops saving until the chemist decides.

import { isVersionConflict } from '$lib/client/api';
import type { RouteClient } from '$lib/client/route-client';
import type { RouteDocument } from '$lib/route/document';

export type SaveState = 'saved' | 'pending' | 'saving' | 'failed' | 'conflict';

const SAVE_DELAY_MS = 700;

type Options = {
	routeId: string;
	version: number;
	saved: RouteDocument;
	/** The document on the page now. */
	current: () => RouteDocument;
	/** Called after each successful save (the stored route changed: check it again). */
	onsaved: () => void;
};

export class Autosave {
	#version = $state(1);
	#state = $state<SaveState>('saved');
	#failure = $state('');
	#saved: RouteDocument;
	#timer: ReturnType<typeof setTimeout> | undefined;
	#inFlight: Promise<unknown> | null = null;

	constructor(
		private readonly options: Options,
		private readonly client: RouteClient
	) {
		this.#version = options.version;
		this.#saved = options.saved;
	}

	get version() {
		return this.#version;
	}
	get state() {
		return this.#state;
	}
	get failure() {
		return this.#failure;
	}

	/** Records `document` as what the server holds (at `version`, when that changed too). */
	markSaved(document: RouteDocument, version = this.#version) {
		clearTimeout(this.#timer);
		this.#saved = document;
		this.#version = version;
		this.#state = 'saved';
	}

	/** A view-only change (a first layout) rides along unsaved unless nothing else is pending. */
	adoptIfSaved(before: RouteDocument, after: RouteDocument) {
		if (before === this.#saved) {
			this.#saved = after;
		}
	}

	/** After each change of the document: save it soon, or say it is saved if it is back as stored. */
	schedule() {
		// During a conflict nothing is sent: the chemist decides first, and keeps typing meanwhile.
		if (this.#state === 'conflict') {
			return;
		}
		this.#state = this.options.current() === this.#saved ? 'saved' : 'pending';
		clearTimeout(this.#timer);
		if (this.#state === 'pending') {
			this.#timer = setTimeout(() => void this.saveNow(), SAVE_DELAY_MS);
		}
	}

	/** Sends the document now (also used by "Retry" and before leaving the page). */
	async saveNow() {
		clearTimeout(this.#timer);
		// A save already on its way picks up newer edits when it returns.
		if (this.#inFlight || this.#state === 'conflict') {
			return;
		}
		const sent = this.options.current();
		if (sent === this.#saved) {
			return void (this.#state = 'saved');
		}
		this.#state = 'saving';
		const request = this.client.save(this.options.routeId, this.#version, sent);
		this.#inFlight = request;
		const result = await request;
		this.#inFlight = null;
		if (result.ok) {
			this.#version = result.data.version;
			this.#saved = sent;
			this.#state = 'saved';
			this.options.onsaved();
			this.schedule();
		} else if (isVersionConflict(result)) {
			this.#state = 'conflict';
		} else {
			this.#state = 'failed';
			this.#failure = result.message;
		}
	}

	/** Saves and waits until the server holds the page's document; false on a conflict or failure. */
	async flush(): Promise<boolean> {
		while (this.#state !== 'saved') {
			if (this.#state === 'conflict') {
				return false;
			}
			if (this.#inFlight) {
				await this.#inFlight;
			} else {
				await this.saveNow();
				if (this.#state === 'failed') {
					return false;
				}
			}
		}
		return true;
	}
}
