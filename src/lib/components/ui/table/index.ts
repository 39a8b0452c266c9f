export { default as SortableHead } from './SortableHead.svelte';
