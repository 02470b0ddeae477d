/** Hands the results area's LiveResults to its sections through Svelte context. */
import { getContext, setContext } from 'svelte';
import type { LiveResults } from './live-results.svelte.ts';

const KEY = Symbol('wattledger.live-results');

export function provideLiveResults(live: LiveResults): void {
  setContext(KEY, live);
}

export function useLiveResults(): LiveResults {
  const live = getContext<LiveResults | undefined>(KEY);
  if (!live) throw new Error('useLiveResults() called outside the results area');
  return live;
}

/** Svelte action: reports whether the element is on screen (heavy sections compute only then). */
export function onScreen(node: HTMLElement, report: (visible: boolean) => void) {
  if (typeof IntersectionObserver === 'undefined') {
    report(true);
    return {};
  }
  const observer = new IntersectionObserver((entries) => report(entries.some((e) => e.isIntersecting)));
  observer.observe(node);
  return { destroy: () => observer.disconnect() };
}
