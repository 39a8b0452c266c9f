export { default as ToastRegion } from './ToastRegion.svelte';
