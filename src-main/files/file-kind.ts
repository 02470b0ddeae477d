/**
 * What kind of thing a path is, from a stat record, and how to say it in a sentence. Open and save
 * accept only regular files; everything else is named in the refusal.
 */
import type { Stats } from 'node:fs';

export type FileKind = 'file' | 'symlink' | 'folder' | 'fifo' | 'device' | 'socket' | 'other';

/** From lstat (a link is reported as a link) or fstat/stat (never a link). */
export function kindOf(stat: Stats): FileKind {
  if (stat.isSymbolicLink()) return 'symlink';
  if (stat.isFile()) return 'file';
  if (stat.isDirectory()) return 'folder';
  if (stat.isFIFO()) return 'fifo';
  if (stat.isCharacterDevice() || stat.isBlockDevice()) return 'device';
  if (stat.isSocket()) return 'socket';
  return 'other';
}

const WORDS: Readonly<Record<FileKind, string>> = {
  file: 'a file',
  symlink: 'a symbolic link',
  folder: 'a folder',
  fifo: 'a named pipe (FIFO)',
  device: 'a device',
  socket: 'a socket',
  other: 'not a regular file',
};

/** "a folder", "a named pipe (FIFO)", … for "it is …, not a file". */
export function describeKind(kind: FileKind): string {
  return WORDS[kind];
}
