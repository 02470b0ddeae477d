/**
 * Which files the renderer may name. A path enters this set only when the USER picked it (open or save
 * dialog, file argument, drag onto the dock, recent list); saveDesign with an explicit path and
 * openRecent are refused for any other path, so a compromised renderer cannot write or read arbitrary
 * files by inventing paths.
 */
import nodePath from 'node:path';

export class GrantedPaths {
  readonly #paths = new Set<string>();
  readonly #caseInsensitive: boolean;

  constructor(platform: NodeJS.Platform = process.platform) {
    this.#caseInsensitive = platform === 'win32' || platform === 'darwin';
  }

  #key(path: string): string {
    const resolved = nodePath.resolve(path);
    return this.#caseInsensitive ? resolved.toLowerCase() : resolved;
  }

  grant(path: string): void {
    this.#paths.add(this.#key(path));
  }

  has(path: string): boolean {
    return nodePath.isAbsolute(path) && this.#paths.has(this.#key(path));
  }
}
