import { beforeAll, describe, expect, it, vi } from 'vitest';
import { EVENT_CHANNELS, INVOKE_CHANNELS, SEND_CHANNELS } from '../../src-main/ipc/channels.ts';

const electron = vi.hoisted(() => {
  const listeners = new Map<string, ((event: unknown, value: unknown) => void)[]>();
  return {
    listeners,
    contextBridge: { exposeInMainWorld: vi.fn() },
    ipcRenderer: {
      invoke: vi.fn(async (channel: string): Promise<unknown> => {
        if (channel === 'wattledger:write-recovery') throw new Error("Error invoking remote method 'wattledger:write-recovery': Error: Recovery snapshot not written.");
        return `answer from ${channel}`;
      }),
      send: vi.fn(),
      on: vi.fn((channel: string, listener: (event: unknown, value: unknown) => void) => {
        listeners.set(channel, [...(listeners.get(channel) ?? []), listener]);
      }),
      removeListener: vi.fn((channel: string, listener: (event: unknown, value: unknown) => void) => {
        listeners.set(channel, (listeners.get(channel) ?? []).filter((entry) => entry !== listener));
      }),
    },
  };
});
vi.mock('electron', () => ({ contextBridge: electron.contextBridge, ipcRenderer: electron.ipcRenderer }));

let api: Record<string, unknown>;
beforeAll(async () => {
  await import('../../src-main/preload.ts');
  api = electron.contextBridge.exposeInMainWorld.mock.calls[0]?.[1] as Record<string, unknown>;
});

describe('preload', () => {
  it('exposes exactly the DesktopApi as window.wattledger, once', () => {
    expect(electron.contextBridge.exposeInMainWorld).toHaveBeenCalledTimes(1);
    expect(electron.contextBridge.exposeInMainWorld.mock.calls[0]?.[0]).toBe('wattledger');
    const expected = ['kind', ...Object.keys(INVOKE_CHANNELS), ...Object.keys(SEND_CHANNELS), 'onMenuCommand', 'onOpenFile'];
    expect(Object.keys(api).sort()).toEqual(expected.sort());
    expect(api['kind']).toBe('electron');
  });

  it('never hands out ipcRenderer or any Electron object', () => {
    for (const value of Object.values(api)) {
      expect(value).not.toBe(electron.ipcRenderer); // Electron context-isolation docs: do not expose ipcRenderer [from memory]
      expect(['function', 'string']).toContain(typeof value);
    }
  });

  it('calls the matching channel with the arguments', async () => {
    await expect((api['saveDesign'] as (r: unknown) => Promise<unknown>)({ path: null })).resolves.toBe(`answer from ${INVOKE_CHANNELS.saveDesign}`);
    expect(electron.ipcRenderer.invoke).toHaveBeenLastCalledWith(INVOKE_CHANNELS.saveDesign, { path: null });
    (api['setDocumentState'] as (s: unknown) => void)({ name: 'a', dirty: true });
    expect(electron.ipcRenderer.send).toHaveBeenCalledWith(SEND_CHANNELS.setDocumentState, { name: 'a', dirty: true });
  });

  it("hands main's own sentence to the page when a call is refused", async () => {
    await expect((api['writeRecovery'] as (t: string) => Promise<void>)('x')).rejects.toThrow(/^Recovery snapshot not written\.$/);
  });

  it('passes only the value to listeners (never the IPC event) and unsubscribes', () => {
    const received: unknown[] = [];
    const unsubscribe = (api['onMenuCommand'] as (l: (v: unknown) => void) => () => void)((value) => received.push(value));
    const [forward] = electron.listeners.get(EVENT_CHANNELS.menuCommand) ?? [];
    forward?.({ sender: electron.ipcRenderer }, 'save');
    expect(received).toEqual(['save']);
    unsubscribe();
    expect(electron.listeners.get(EVENT_CHANNELS.menuCommand)).toEqual([]);
  });
});
