/**
 * At start: removes temporary files that a save killed half-way (a crash, a power cut) left beside the
 * files the app keeps in its user-data folder. A user's own design gets the same clean-up on its next
 * save (files/atomic-save.ts); main does not touch the folders of files the user has not saved now.
 */
import nodePath from 'node:path';
import { removeStaleTemporaries } from '../files/atomic-save.ts';
import type { AppContext } from './context.ts';

export async function cleanUserDataTemporaries(context: AppContext): Promise<void> {
  const folder = context.paths.userData;
  for (const file of [nodePath.join(folder, 'recent-files.json'), nodePath.join(folder, 'window-state.json'), context.recovery.filePath]) {
    const removed = await removeStaleTemporaries(file);
    if (removed.length > 0) context.log(`removed ${removed.length} temporary file(s) left by an interrupted save: ${removed.join(', ')}`);
  }
}
