// Vite plugin: under `vite dev` and Vitest, bundle the chemistry worker before any server code
// runs, and again when chemistry code changes (dev), retiring the pool's old workers so the next
// call loads the new code. Production builds bundle it into build/ (build-if-stale.js).
import path from 'node:path';
import { buildChemWorker } from './build-chem-worker.js';

const CHEMISTRY =
	/src[\\/]lib[\\/](chem|rules|team-rules|route|server[\\/](chem-pool|route-sdf|services[\\/](check|plan)))/;

/** @returns {import('vite').Plugin} */
export function chemWorker() {
	return {
		name: 'orthogon-chem-worker',
		apply: 'serve',
		configResolved() {
			buildChemWorker();
		},
		configureServer(server) {
			server.watcher.on('change', (file) => {
				if (!CHEMISTRY.test(path.relative(server.config.root, file))) {
					return;
				}
				buildChemWorker();
				const key = Symbol.for('orthogon.chemPool');
				const holder = /** @type {Record<symbol, { destroy(): Promise<void> } | undefined>} */ (
					globalThis
				);
				const pool = holder[key];
				delete holder[key];
				void pool?.destroy();
			});
		}
	};
}
