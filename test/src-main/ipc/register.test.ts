import { describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { registerInvoke, registerSend, type IpcEventLike, type IpcMainLike } from '../../../src-main/ipc/register.ts';

type Listener = (event: IpcEventLike<string>, ...args: unknown[]) => unknown;

function fakeIpc(): IpcMainLike<string> & { handlers: Map<string, Listener>; listeners: Map<string, Listener> } {
  const handlers = new Map<string, Listener>();
  const listeners = new Map<string, Listener>();
  return { handlers, listeners, handle: (channel, listener) => void handlers.set(channel, listener), on: (channel, listener) => void listeners.set(channel, listener) };
}

const ours: IpcEventLike<string> = { sender: 'window-1', senderFrame: { url: 'wattledger://app/index.html', parent: null } };
const foreign: IpcEventLike<string> = { sender: 'window-1', senderFrame: { url: 'https://example.com/', parent: null } };
const subFrame: IpcEventLike<string> = { sender: 'window-1', senderFrame: { url: 'wattledger://app/index.html', parent: {} } };
const gone: IpcEventLike<string> = { sender: 'window-1', senderFrame: null };

describe('registerInvoke()', () => {
  const run = vi.fn((sender: string, args: never[]) => `${sender}:${(args as unknown[]).join(',')}`);
  const ipc = fakeIpc();
  const log = vi.fn();
  registerInvoke(ipc, [{ method: 'echo', channel: 'test:echo', schema: z.tuple([z.string().max(5)]), run }], log);
  const handler = ipc.handlers.get('test:echo');

  it('runs the handler for our window with a valid payload', () => {
    expect(handler?.(ours, 'hello')).toBe('window-1:hello');
  });

  it('refuses foreign, sub-frame and vanished senders before looking at the payload', () => {
    run.mockClear();
    for (const event of [foreign, subFrame, gone]) expect(() => handler?.(event, 'hello')).toThrow(/did not come from the WattLedger window/); // Electron checklist "Validate the sender of all IPC messages" [from memory]
    expect(run).not.toHaveBeenCalled();
    expect(log).toHaveBeenCalled();
  });

  it('refuses an invalid payload with the argument path in the message', () => {
    run.mockClear();
    expect(() => handler?.(ours, 'too long')).toThrow(/^Refused echo: argument 0: /);
    expect(() => handler?.(ours, 'ok', 'extra')).toThrow(/Refused echo/);
    expect(run).not.toHaveBeenCalled();
  });
});

describe('registerSend()', () => {
  it('delivers valid messages from our window and drops everything else', () => {
    const run = vi.fn();
    const ipc = fakeIpc();
    registerSend(ipc, [{ method: 'state', channel: 'test:state', schema: z.tuple([z.boolean()]), run }], () => undefined);
    const listener = ipc.listeners.get('test:state');
    listener?.(foreign, true);
    listener?.(ours, 'yes');
    expect(run).not.toHaveBeenCalled();
    listener?.(ours, true);
    expect(run).toHaveBeenCalledWith('window-1', [true]);
  });
});
