import { describe, expect, it } from 'vitest';
import { cleanInvokeError } from '../../../src-main/ipc/invoke-error.ts';

describe('cleanInvokeError()', () => {
  it("removes Electron's remote-method wrapper and keeps main's sentence", () => {
    // Wrapper text as produced by ipcRenderer.invoke when a handler throws (Electron ipc-renderer source) [from memory]
    const wrapped = new Error("Error invoking remote method 'wattledger:write-recovery': Error: Recovery snapshot not written: the disk is full (ENOSPC).");
    expect(cleanInvokeError(wrapped).message).toBe('Recovery snapshot not written: the disk is full (ENOSPC).');
  });

  it('leaves other messages alone', () => {
    expect(cleanInvokeError('plain').message).toBe('plain');
    expect(cleanInvokeError(new Error('Refused saveDesign: argument 0.text: too big.')).message).toBe('Refused saveDesign: argument 0.text: too big.');
  });
});
