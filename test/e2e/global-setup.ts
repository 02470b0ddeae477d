/**
 * Builds the renderer once before the end-to-end files run (Vitest globalSetup of the 'e2e' project).
 * Every e2e file then serves out/renderer with vite's preview() on a free port (helpers/browser.ts).
 */
import { buildRenderer } from './helpers/build.ts';

export default async function setup(): Promise<void> {
  await buildRenderer();
}
