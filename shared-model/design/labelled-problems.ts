/**
 * Problems that name fields by their on-screen labels. The validator's sentences name fields by document
 * path ("spec.voutV is 0 V; allowed: …"); before they leave the engine every path the sentence names gets
 * its label in front, the path kept in brackets ("Output voltage (spec.voutV) is 0 V; allowed: …"), and a
 * sentence that does not name its own field starts with the field's label. `fieldLabels` records what was
 * added, so `pathMessage` can give back the sentence in paths (the editor rewords it in its own phrases).
 */
import { designFieldLabel } from './field-labels.ts';
import type { Problem } from './problems.ts';

/** A document path inside a sentence ("spec.vinMaxV", "thermal.heatsinks[0].id", "conditions.vinV"). */
const PATH_IN_TEXT = /\b(?:spec|topology|parts|thermal|margins|conditions|missionProfile)(?:\.[A-Za-z][A-Za-z0-9_]*|\[\d+\])+/g;

/** The problem with its fields named by label (`doc`: the document the paths are in). */
export function labelProblem(p: Problem, doc: unknown): Problem {
  const labels: Record<string, string> = {};
  const message = p.message.replace(PATH_IN_TEXT, (path) => {
    if (Object.hasOwn(labels, path)) return path;
    const label = designFieldLabel(path, doc);
    if (label === undefined) return path;
    labels[path] = label;
    return `${label} (${path})`;
  });
  const ownLabel = p.path === '' || Object.hasOwn(labels, p.path) ? undefined : designFieldLabel(p.path, doc);
  if (ownLabel !== undefined) labels[p.path] = ownLabel;
  if (Object.keys(labels).length === 0) return p;
  return { ...p, message: ownLabel === undefined ? message : `${ownLabel}: ${message}`, fieldLabels: labels };
}

export function labelProblems(problems: readonly Problem[], doc: unknown): Problem[] {
  return problems.map((p) => labelProblem(p, doc));
}

/** The problem's sentence with the labels `labelProblem` added taken out again (fields named by path). */
export function pathMessage(p: Problem): string {
  const labels = p.fieldLabels;
  if (!labels) return p.message;
  let text = p.message;
  const ownLabel = labels[p.path];
  if (ownLabel !== undefined && text.startsWith(`${ownLabel}: `)) text = text.slice(ownLabel.length + 2);
  for (const [path, label] of Object.entries(labels)) text = text.replaceAll(`${label} (${path})`, path);
  return text;
}
