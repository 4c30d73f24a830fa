/**
 * The app's start-up stages, shared with the components that draw later parts of the page
 * through Svelte's context (so there is one per app, and none in component tests, where
 * every part is drawn at once).
 */
import { getContext, setContext } from 'svelte';
import type { StagedReveal } from './staged-reveal.ts';

const STAGED_KEY = Symbol('chancewise.staged-reveal');

/** Give the components below the calling one `staged`. */
export function provideStagedReveal(staged: StagedReveal): void {
  setContext(STAGED_KEY, staged);
}

/** The stages of the app the calling component sits in, if any. */
export function stagedRevealInContext(): StagedReveal | undefined {
  return getContext<StagedReveal | undefined>(STAGED_KEY);
}
