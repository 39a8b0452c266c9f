import { createContext } from 'svelte';

export type ToastTone = 'info' | 'success' | 'problem';
export type Toast = { id: string; message: string; tone: ToastTone };

/** Short messages about things that happened out of sight (a failed save, an import refused). */
export class Toasts {
	#items = $state<Toast[]>([]);

	get items(): readonly Toast[] {
		return this.#items;
	}

	show(message: string, tone: ToastTone = 'info', ms = tone === 'problem' ? 9000 : 5000) {
		const id = crypto.randomUUID();
		this.#items = [...this.#items.slice(-3), { id, message, tone }];
		setTimeout(() => this.dismiss(id), ms);
	}

	dismiss(id: string) {
		this.#items = this.#items.filter((toast) => toast.id !== id);
	}
}

// A context, not a module singleton: on the server a module-level store would be shared by
// every request.
export const [getToasts, setToasts] = createContext<Toasts>();
