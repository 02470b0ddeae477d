/**
 * Test helper: the real save facade with failures injected at chosen steps, and a journal of the
 * operations in order (to check that the data is flushed before the rename).
 */
import nodePath from 'node:path';
import { nodeSaveFs, type SaveFs } from '../../../src-main/files/atomic-save.ts';

export function fsError(code: string, message = code): NodeJS.ErrnoException {
  return Object.assign(new Error(`${code}: ${message}`), { code });
}

function isTemporaryOf(fileName: string, targetName: string): boolean {
  const prefix = `.${targetName}.`;
  return fileName.startsWith(prefix) && fileName.endsWith('.tmp') && !fileName.slice(prefix.length, -'.tmp'.length).includes('.');
}

export interface Injection {
  /** Throws from rename when the destination is this path. */
  refuseRenameTo?: string;
  /** Throws this error on the first write to a temporary file of this target name. */
  failWriteFor?: { name: string; error: NodeJS.ErrnoException; writeHalfFirst?: boolean };
  failReadOf?: string;
  /** Called before every operation ("create", "write", "sync", "close", "rename", "unlink", "read", "sync-folder"); an error it returns is thrown. */
  failOn?: (operation: string, path: string) => NodeJS.ErrnoException | null;
}

export function journalingFs(injection: Injection = {}): SaveFs & { journal: string[] } {
  const journal: string[] = [];
  const label = (path: string): string => nodePath.basename(path);
  const check = (operation: string, path: string): void => {
    const error = injection.failOn?.(operation, path);
    if (error) throw error;
  };
  return {
    journal,
    inspect: (path) => nodeSaveFs.inspect(path),
    realPath: (path) => nodeSaveFs.realPath(path),
    canWrite: (path) => nodeSaveFs.canWrite(path),
    list: (folder) => nodeSaveFs.list(folder),
    async create(path, mode) {
      journal.push(`create ${label(path)}`);
      check('create', path);
      const file = await nodeSaveFs.create(path, mode);
      // Temporary names are ".<target name>.<token>.tmp"; the backup's are ".<name>.bak.<token>.tmp".
      const failing = injection.failWriteFor && isTemporaryOf(label(path), injection.failWriteFor.name) ? injection.failWriteFor : null;
      return {
        async write(data) {
          journal.push(`write ${label(path)}`);
          check('write', path);
          if (failing) {
            // A crash in the middle: part of the bytes reach the disk, then the write fails.
            if (failing.writeHalfFirst) await file.write(data.subarray(0, Math.floor(data.length / 2)));
            throw failing.error;
          }
          return file.write(data);
        },
        async sync() {
          journal.push(`sync ${label(path)}`);
          check('sync', path);
          return file.sync();
        },
        async close() {
          journal.push(`close ${label(path)}`);
          await file.close();
          check('close', path);
        },
      };
    },
    async rename(from, to) {
      journal.push(`rename ${label(from)} -> ${label(to)}`);
      check('rename', to);
      if (injection.refuseRenameTo && to === injection.refuseRenameTo) throw fsError('EPERM', 'operation not permitted, rename');
      return nodeSaveFs.rename(from, to);
    },
    unlink: (path) => {
      journal.push(`unlink ${label(path)}`);
      return nodeSaveFs.unlink(path);
    },
    readFile: (path) => {
      if (injection.failReadOf === path) return Promise.reject(fsError('EIO', 'i/o error, read'));
      const error = injection.failOn?.('read', path);
      if (error) return Promise.reject(error);
      return nodeSaveFs.readFile(path);
    },
    syncFolder: async (path) => {
      journal.push(`sync-folder ${label(path)}`);
      check('sync-folder', path);
      return nodeSaveFs.syncFolder(path);
    },
  };
}
