/**
 * One action between the design editor and the results: the skip link, the editor's "Results" link
 * and the results' "Editor" link move the view and the keyboard focus to the other side. Both targets
 * are headings with tabindex="-1" ("results-title", "editor-title"), so the next Tab reaches the first
 * control beyond them.
 */
function reveal(headingId: string): boolean {
  const heading = document.getElementById(headingId);
  if (!heading) return false;
  // The heading's region (data-region; a sticky heading alone would not move its column to the top).
  (heading.closest('[data-region]') ?? heading).scrollIntoView({ block: 'start' });
  heading.focus({ preventScroll: true });
  return true;
}

/** Shows the results column from its top (the headline figures) and focuses its heading. */
export function showResults(): boolean {
  return reveal('results-title');
}

/** Shows the design editor from its top and focuses its heading. */
export function showEditor(): boolean {
  return reveal('editor-title');
}
