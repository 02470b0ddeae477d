/**
 * Finds keys that appear more than once in the same JSON object. RFC 8259 §4 says names SHOULD be
 * unique and leaves duplicates to the reader; JSON.parse silently keeps the last one, so a file with
 * "vinMaxV" twice would be read without a word. This scanner reports each repeat with its dotted path
 * and the lines of the first and the repeated occurrence.
 *
 * It runs on text that JSON.parse has already accepted, so it only tracks structure: it is iterative
 * (no recursion, any nesting depth), reads every character once and decodes a key only when it holds an
 * escape. Lines are 1-based and counted at LF.
 */

export interface DuplicateKey {
  /** Dotted path of the repeated key, e.g. "spec.vinMaxV" (long paths are shortened with "…"). */
  path: string;
  key: string;
  /** Line of the repeat (the value JSON.parse kept) and of the first occurrence. */
  line: number;
  firstLine: number;
}

/** At most this many repeats are reported; a file with more is clearly not hand-edited by mistake. */
export const MAX_DUPLICATES_REPORTED = 20;
const MAX_PATH_SEGMENTS = 12;

interface Frame {
  /** Keys seen so far in an object, with their line; null for an array. */
  keys: Map<string, number> | null;
  /** This container's own key or index in its parent ("" for the root). */
  name: string | number;
  /** Array index of the next item. */
  index: number;
}

function pathOf(stack: readonly Frame[], key: string): string {
  const names = [...stack.slice(1).map((f) => f.name), key];
  const shown = names.length > MAX_PATH_SEGMENTS ? [...names.slice(0, MAX_PATH_SEGMENTS - 2), '…', ...names.slice(-1)] : names;
  let out = '';
  for (const name of shown) out += typeof name === 'number' ? `[${name}]` : out === '' ? name : `.${name}`;
  return out;
}

/** Every repeated key of a JSON text that JSON.parse accepts (at most MAX_DUPLICATES_REPORTED). */
export function duplicateKeys(text: string): DuplicateKey[] {
  const out: DuplicateKey[] = [];
  const stack: Frame[] = [];
  let line = 1;
  let expectKey = false;
  /** The key whose value comes next, for naming a container opened as that value. */
  let pendingName: string | number = '';
  for (let i = 0; i < text.length; i += 1) {
    const c = text.charCodeAt(i);
    if (c === 0x0a) line += 1;
    else if (c === 0x22) {
      // A string: find its closing quote, skipping escaped characters.
      const start = i;
      let escaped = false;
      for (i += 1; i < text.length; i += 1) {
        const d = text.charCodeAt(i);
        if (d === 0x5c) {
          escaped = true;
          i += 1;
        } else if (d === 0x22) break;
      }
      const top = stack[stack.length - 1];
      if (expectKey && top?.keys) {
        const raw = text.slice(start + 1, i);
        const key = escaped ? (JSON.parse(text.slice(start, i + 1)) as string) : raw;
        const first = top.keys.get(key);
        if (first !== undefined && out.length < MAX_DUPLICATES_REPORTED) out.push({ path: pathOf(stack, key), key, line, firstLine: first });
        else if (first === undefined) top.keys.set(key, line);
        pendingName = key;
        expectKey = false;
      }
    } else if (c === 0x7b || c === 0x5b) {
      const parent = stack[stack.length - 1];
      const name = parent && !parent.keys ? parent.index : pendingName;
      stack.push({ keys: c === 0x7b ? new Map() : null, name, index: 0 });
      expectKey = c === 0x7b;
    } else if (c === 0x7d || c === 0x5d) {
      stack.pop();
      expectKey = false;
    } else if (c === 0x2c) {
      const top = stack[stack.length - 1];
      if (top?.keys) expectKey = true;
      else if (top) top.index += 1;
    }
  }
  return out;
}
