/**
 * Turns a file-system error into one plain sentence for the user. The code (ENOSPC, EACCES…) is kept
 * at the end in brackets so a support question can quote it.
 */

const REASONS: Readonly<Record<string, string>> = {
  ENOSPC: 'the disk is full',
  EDQUOT: 'the disk quota is used up',
  EACCES: 'permission was denied',
  EPERM: 'the operating system did not allow it',
  EROFS: 'the disk is read-only',
  EBUSY: 'the file is in use by another program',
  ENOENT: 'the file or its folder does not exist',
  ENOTDIR: 'a part of the path is not a folder',
  EISDIR: 'the path is a folder, not a file',
  EMFILE: 'too many files are open',
  EIO: 'the disk reported an input/output error',
  ENAMETOOLONG: 'the file name is too long',
  EEXIST: 'a file with that name already exists',
  EXDEV: 'the temporary file ended up on another disk',
  ENXIO: 'it is a socket or a device without a reader, not a file',
  ELOOP: 'it is a link that loops back on itself',
};

export function errorCode(error: unknown): string | null {
  if (typeof error === 'object' && error !== null && 'code' in error && typeof error.code === 'string') return error.code;
  return null;
}

/** "the disk is full (ENOSPC)", or the error's own message for unknown codes. */
export function describeFsError(error: unknown): string {
  const code = errorCode(error);
  if (code !== null && REASONS[code]) return `${REASONS[code]} (${code})`;
  if (error instanceof Error && error.message) return error.message;
  return String(error);
}
