export { default as Chip } from './Chip.svelte';
