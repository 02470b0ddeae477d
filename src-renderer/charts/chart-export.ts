/**
 * Copying and saving a chart as PNG. Saving goes through a function the app provides (the desktop
 * adapter: a native dialog in Electron, a download in the browser); without one, a browser download.
 */
import { getContext, setContext } from 'svelte';

export type PngSaver = (fileName: string, base64: string) => Promise<{ ok: boolean; message?: string }>;

const KEY = Symbol('wattledger.chart-saver');

export function provideChartSaver(saver: PngSaver): void {
  setContext(KEY, saver);
}

function browserDownload(fileName: string, blob: Blob): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

export async function blobToBase64(blob: Blob): Promise<string> {
  const bytes = new Uint8Array(await blob.arrayBuffer());
  let text = '';
  const step = 0x8000;
  for (let i = 0; i < bytes.length; i += step) text += String.fromCharCode(...bytes.subarray(i, i + step));
  return btoa(text);
}

/** Returns the save function for this part of the tree (call during component set-up). */
export function useChartSaver(): (fileName: string, blob: Blob) => Promise<string> {
  const saver = getContext<PngSaver | undefined>(KEY);
  return async (fileName, blob) => {
    if (!saver) {
      browserDownload(fileName, blob);
      return `Saved ${fileName}.`;
    }
    const outcome = await saver(fileName, await blobToBase64(blob));
    return outcome.ok ? `Saved ${fileName}.` : (outcome.message ?? 'The chart was not saved.');
  };
}

/** Puts the PNG on the clipboard; says why not where the platform refuses. */
export async function copyPng(blob: Blob): Promise<string> {
  try {
    if (typeof ClipboardItem === 'undefined' || !navigator.clipboard?.write) throw new Error('this window offers no image clipboard');
    await navigator.clipboard.write([new ClipboardItem({ 'image/png': blob })]);
    return 'Copied the chart as a PNG image.';
  } catch (error) {
    return `Could not copy the chart (${(error as Error).message}); use Save PNG instead.`;
  }
}
