/**
 * Moves the keyboard focus to the design-editor field of a path. The editor marks every field with
 * data-path (its validator path, "parts.inductor.isatA"); a path that names a group
 * ("thermal.paths.switch") goes to the group's first field. A field inside a closed part card is
 * revealed first. Returns false when the editor shows no such field.
 */
export function findField(path: string, root: ParentNode = document): HTMLElement | null {
  const exact = root.querySelector<HTMLElement>(`[data-path="${CSS.escape(path)}"]`);
  if (exact) return exact;
  return root.querySelector<HTMLElement>(`[data-path^="${CSS.escape(`${path}.`)}"], [data-path^="${CSS.escape(`${path}[`)}"]`);
}

export function focusField(path: string): boolean {
  const field = findField(path);
  if (!field) return false;
  const details = field.closest('details');
  if (details && !details.open) details.open = true;
  field.scrollIntoView({ block: 'center' });
  field.focus();
  return true;
}
