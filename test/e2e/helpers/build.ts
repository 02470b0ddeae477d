/**
 * Production build of the renderer into out/renderer with the project's own renderer configuration
 * (electron.config.ts), the same output Electron loads and `npm start` serves in browser mode.
 */
import { fileURLToPath } from 'node:url';
import { build, type InlineConfig } from 'vite';
import { OUT, rendererConfig } from '../../../electron.config.ts';

export const repoRoot = fileURLToPath(new URL('../../../', import.meta.url));
export const rendererOutDir = OUT.renderer;

/** The renderer configuration the preview server uses too (it carries the CSP response header). */
export function rendererBuildConfig(): InlineConfig {
  return rendererConfig(rendererOutDir);
}

export async function buildRenderer(): Promise<void> {
  await build(rendererBuildConfig());
}
