/**
 * The Electron glue (main.ts and setup/*.ts) run against a fake 'electron' module: it checks the wiring
 * that the pure modules cannot — what happens before and after `ready`, that every IPC channel is
 * behind the sender check, that the window gets the secure options and the app URL, that navigation,
 * new windows, webviews and permissions are refused, and that closing with unsaved changes asks.
 */
import nodeFs from 'node:fs/promises';
import os from 'node:os';
import nodePath from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { INVOKE_CHANNELS, SEND_CHANNELS } from '../../src-main/ipc/channels.ts';

type Handler = (...args: never[]) => unknown;

const fake = vi.hoisted(() => {
  const order: string[] = [];
  const on = (store: Map<string, Handler[]>) => (event: string, handler: Handler) => {
    store.set(event, [...(store.get(event) ?? []), handler]);
  };
  class FakeContents {
    events = new Map<string, Handler[]>();
    on = on(this.events);
    windowOpenHandler: Handler | null = null;
    send = vi.fn();
    setWindowOpenHandler(handler: Handler): void {
      this.windowOpenHandler = handler;
    }
    getURL(): string {
      return 'wattledger://app/index.html';
    }
  }
  class FakeWindow {
    static all: FakeWindow[] = [];
    events = new Map<string, Handler[]>();
    on = on(this.events);
    once = on(this.events);
    webContents = new FakeContents();
    setTitle = vi.fn();
    setDocumentEdited = vi.fn();
    loadURL = vi.fn(async () => undefined);
    close = vi.fn();
    constructor(public options: Record<string, unknown>) {
      order.push('new BrowserWindow');
      FakeWindow.all.push(this);
    }
    isDestroyed(): boolean {
      return false;
    }
    getNormalBounds() {
      return { x: 1, y: 2, width: 1000, height: 700 };
    }
    isMaximized(): boolean {
      return false;
    }
    static fromWebContents(): FakeWindow | null {
      return FakeWindow.all[0] ?? null;
    }
    static getAllWindows(): FakeWindow[] {
      return FakeWindow.all;
    }
  }
  let markReady: () => void = () => undefined;
  const ready = new Promise<void>((resolve) => {
    markReady = resolve;
  });
  const appEvents = new Map<string, Handler[]>();
  const paths = { appRoot: '', userData: '' };
  const ipcHandle = new Map<string, Handler>();
  const ipcOn = new Map<string, Handler>();
  const sessionHandlers: Record<string, Handler> = {};
  return {
    order,
    FakeWindow,
    FakeContents,
    markReady,
    appEvents,
    paths,
    ipcHandle,
    ipcOn,
    sessionHandlers,
    protocolHandlers: new Map<string, Handler>(),
    app: {
      requestSingleInstanceLock: vi.fn(() => (order.push('single-instance lock'), true)),
      enableSandbox: vi.fn(() => void order.push('enableSandbox')),
      disableHardwareAcceleration: vi.fn(() => void order.push('disableHardwareAcceleration')),
      getAppPath: () => paths.appRoot,
      getPath: () => paths.userData,
      isPackaged: false,
      isReady: () => order.includes('ready'),
      whenReady: () => ready,
      on: on(appEvents),
      quit: vi.fn(),
      addRecentDocument: vi.fn(),
      clearRecentDocuments: vi.fn(),
    },
    dialog: { showMessageBox: vi.fn(async () => ({ response: 2, checkboxChecked: false })), showOpenDialog: vi.fn(), showSaveDialog: vi.fn() },
  };
});

vi.mock('electron', () => ({
  app: fake.app,
  BrowserWindow: fake.FakeWindow,
  dialog: fake.dialog,
  ipcMain: {
    handle: (channel: string, handler: Handler) => void fake.ipcHandle.set(channel, handler),
    on: (channel: string, handler: Handler) => void fake.ipcOn.set(channel, handler),
  },
  protocol: {
    registerSchemesAsPrivileged: vi.fn((schemes: unknown) => void fake.order.push(`registerSchemesAsPrivileged ${JSON.stringify(schemes)}`)),
    handle: (scheme: string, handler: Handler) => void fake.protocolHandlers.set(scheme, handler),
  },
  session: {
    defaultSession: {
      setPermissionRequestHandler: (handler: Handler) => void (fake.sessionHandlers['request'] = handler),
      setPermissionCheckHandler: (handler: Handler) => void (fake.sessionHandlers['check'] = handler),
      setDevicePermissionHandler: (handler: Handler) => void (fake.sessionHandlers['device'] = handler),
    },
  },
  Menu: { buildFromTemplate: vi.fn((template: unknown) => template), setApplicationMenu: vi.fn() },
  screen: { getPrimaryDisplay: () => ({ workArea: { x: 0, y: 0, width: 1920, height: 1080 } }), getAllDisplays: () => [] },
  nativeTheme: { shouldUseDarkColors: false },
}));

let folder: string;
const ours = { sender: null as unknown, senderFrame: { url: 'wattledger://app/index.html', parent: null } };
const foreign = { sender: null as unknown, senderFrame: { url: 'https://example.com/', parent: null } };
const flush = () => new Promise((resolve) => setTimeout(resolve, 20));

beforeAll(async () => {
  folder = await nodeFs.mkdtemp(nodePath.join(os.tmpdir(), 'wattledger-main-'));
  fake.paths.appRoot = nodePath.join(folder, 'app');
  fake.paths.userData = nodePath.join(folder, 'user-data');
  await nodeFs.mkdir(nodePath.join(fake.paths.appRoot, 'out', 'renderer'), { recursive: true });
  await nodeFs.writeFile(nodePath.join(fake.paths.appRoot, 'out', 'renderer', 'index.html'), '<!doctype html><title>t</title>');
  await import('../../src-main/main.ts');
  fake.order.push('ready');
  fake.markReady();
  // Wait for the ready work (menu, window state read, window creation) however busy the machine is.
  await vi.waitFor(() => expect(fake.FakeWindow.all[0]?.loadURL).toHaveBeenCalled(), { timeout: 20_000, interval: 20 });
});
afterAll(async () => {
  await nodeFs.rm(folder, { recursive: true, force: true });
});

describe('main process wiring', () => {
  it('locks to one instance and sets sandboxing, CPU rendering and the app scheme before ready', () => {
    const beforeReady = fake.order.slice(0, fake.order.indexOf('ready'));
    expect(beforeReady[0]).toBe('single-instance lock');
    expect(beforeReady).toContain('enableSandbox'); // Electron docs: app.enableSandbox must be called before ready [from memory]
    expect(beforeReady).toContain('disableHardwareAcceleration'); // team rule 5, and Electron: only before ready [from memory]
    expect(beforeReady.some((entry) => entry.startsWith('registerSchemesAsPrivileged [{"scheme":"wattledger"'))).toBe(true); // Electron protocol docs: register before ready [from memory]
    expect(fake.order.indexOf('new BrowserWindow')).toBeGreaterThan(fake.order.indexOf('ready'));
  });

  it('serves the renderer from the app scheme with the CSP and refuses traversal', async () => {
    const handler = fake.protocolHandlers.get('wattledger') as (request: Request) => Promise<Response>;
    const page = await handler(new Request('wattledger://app/index.html'));
    expect(page.status).toBe(200);
    expect(page.headers.get('content-security-policy')).toContain("script-src 'self'");
    expect(await page.text()).toContain('<title>t</title>');
    expect((await handler(new Request('wattledger://app/..%2f..%2fpackage.json'))).status).toBe(403);
    expect((await handler(new Request('wattledger://app/index.html', { method: 'POST', body: 'x' }))).status).toBe(405);
  });

  it('opens one window with the secure options on the app URL', () => {
    const window = fake.FakeWindow.all[0];
    const web = window?.options['webPreferences'] as Record<string, unknown>;
    expect(web).toMatchObject({ sandbox: true, contextIsolation: true, nodeIntegration: false, preload: nodePath.join(fake.paths.appRoot, 'out', 'preload', 'preload.cjs') });
    expect(window?.loadURL).toHaveBeenCalledWith('wattledger://app/index.html');
  });

  it('registers a handler for every DesktopApi channel, each behind the sender check', async () => {
    expect([...fake.ipcHandle.keys()].sort()).toEqual(Object.values(INVOKE_CHANNELS).sort());
    expect([...fake.ipcOn.keys()]).toEqual(Object.values(SEND_CHANNELS));
    for (const [channel, handler] of fake.ipcHandle) {
      expect(() => (handler as (event: unknown) => unknown)(foreign), channel).toThrow(/did not come from the WattLedger window/);
    }
    expect(await (fake.ipcHandle.get(INVOKE_CHANNELS.listRecent) as (event: unknown) => Promise<unknown>)(ours)).toEqual([]);
  });

  it('denies navigation away from the app, new windows, webviews and permissions', () => {
    const contents = new fake.FakeContents();
    for (const handler of fake.appEvents.get('web-contents-created') ?? []) (handler as (event: unknown, contents: unknown) => void)({}, contents);
    const prevent = vi.fn();
    for (const handler of contents.events.get('will-navigate') ?? []) (handler as (event: unknown, url: string) => void)({ preventDefault: prevent }, 'file:///home/u/dropped.json');
    expect(prevent).toHaveBeenCalledTimes(1); // Electron checklist "Disable or limit navigation" [from memory]
    const allowed = vi.fn();
    for (const handler of contents.events.get('will-navigate') ?? []) (handler as (event: unknown, url: string) => void)({ preventDefault: allowed }, 'wattledger://app/index.html');
    expect(allowed).not.toHaveBeenCalled();
    expect((contents.windowOpenHandler as (details: unknown) => unknown)({ url: 'https://example.com/' })).toEqual({ action: 'deny' }); // checklist "Disable or limit creation of new windows"
    const webview = vi.fn();
    for (const handler of contents.events.get('will-attach-webview') ?? []) (handler as (event: unknown) => void)({ preventDefault: webview });
    expect(webview).toHaveBeenCalled();
    const answer = vi.fn();
    (fake.sessionHandlers['request'] as (c: unknown, p: string, cb: (ok: boolean) => void) => void)(contents, 'media', answer);
    expect(answer).toHaveBeenCalledWith(false); // checklist "Handle session permission requests"
    expect((fake.sessionHandlers['device'] as () => boolean)()).toBe(false);
  });

  it('puts the document state in the title and asks before closing unsaved work', async () => {
    const window = fake.FakeWindow.all[0];
    (fake.ipcOn.get(SEND_CHANNELS.setDocumentState) as (event: unknown, state: unknown) => void)(ours, { name: 'buck.json', dirty: true });
    expect(window?.setTitle).toHaveBeenLastCalledWith('● buck.json — WattLedger');
    const prevent = vi.fn();
    for (const handler of window?.events.get('close') ?? []) (handler as (event: unknown) => void)({ preventDefault: prevent });
    expect(prevent).toHaveBeenCalled();
    expect(fake.dialog.showMessageBox).toHaveBeenCalledWith(window, expect.objectContaining({ message: 'Save the changes to "buck.json" before closing?' }));
    await fake.dialog.showMessageBox.mock.results[0]?.value;
    await flush();
    expect(window?.close).not.toHaveBeenCalled(); // the fake dialog answered "Cancel"
  });
});
