import { createContext } from 'svelte';
import type { RouteEditor } from './route-editor.svelte';

/** The open route's editor, for every component of the map (nodes and edges included). */
export const [getRouteEditor, setRouteEditor] = createContext<RouteEditor>();
