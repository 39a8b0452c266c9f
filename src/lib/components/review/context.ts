import { createContext } from 'svelte';
import type { ReviewState } from './review-state.svelte';

/** The open route's comments and review actions, for the side panel, the edges and the bar. */
export const [getReviewState, setReviewState] = createContext<ReviewState>();
