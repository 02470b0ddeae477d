/**
 * Wires IPC handlers so that no handler can run without both gates: the sender check and the payload
 * schema. Takes an ipcMain-like object so the wiring itself is unit-tested without Electron.
 */
import type { z } from 'zod';
import { isTrustedSender } from './sender.ts';
import { describePayloadError } from './payloads.ts';

/** The parts of Electron's IpcMainEvent / IpcMainInvokeEvent we read. */
export interface IpcEventLike<S> {
  sender: S;
  senderFrame: { url: string; parent: unknown } | null;
}

export interface IpcMainLike<S> {
  handle(channel: string, listener: (event: IpcEventLike<S>, ...args: unknown[]) => unknown): void;
  on(channel: string, listener: (event: IpcEventLike<S>, ...args: unknown[]) => void): void;
}

export interface Route<S> {
  method: string;
  channel: string;
  schema: z.ZodType<unknown[]>;
  run: (sender: S, args: never[]) => unknown;
}

export type Log = (message: string) => void;

function gate<S>(route: Route<S>, event: IpcEventLike<S>, args: unknown[], log: Log): { ok: true; args: unknown[] } | { ok: false; message: string } {
  const frame = event.senderFrame;
  if (!isTrustedSender(frame ? { url: frame.url, isMainFrame: frame.parent === null } : null)) {
    const message = `Refused ${route.method}: the request did not come from the WattLedger window.`;
    log(`${message} (frame ${frame ? frame.url : 'gone'})`);
    return { ok: false, message };
  }
  const parsed = route.schema.safeParse(args);
  if (!parsed.success) {
    const message = describePayloadError(route.method, parsed.error);
    log(message);
    return { ok: false, message };
  }
  return { ok: true, args: parsed.data };
}

/** Request/answer channels: a refused call rejects the renderer's promise with a clear message. */
export function registerInvoke<S>(ipc: IpcMainLike<S>, routes: readonly Route<S>[], log: Log): void {
  for (const route of routes) {
    ipc.handle(route.channel, (event, ...args) => {
      const checked = gate(route, event, args, log);
      if (!checked.ok) throw new Error(checked.message);
      return route.run(event.sender, checked.args as never[]);
    });
  }
}

/** Fire-and-forget channels: a refused message is logged and dropped. */
export function registerSend<S>(ipc: IpcMainLike<S>, routes: readonly Route<S>[], log: Log): void {
  for (const route of routes) {
    ipc.on(route.channel, (event, ...args) => {
      const checked = gate(route, event, args, log);
      if (checked.ok) route.run(event.sender, checked.args as never[]);
    });
  }
}
