/**
 * Serves the built renderer from wattledger://app/ (Electron glue; the path rules and headers live in
 * security/app-scheme.ts, where they are unit-tested).
 */
import nodeFs from 'node:fs/promises';
import { protocol } from 'electron';
import { APP_SCHEME, APP_SCHEME_PRIVILEGES, appResponseHeaders, resolveAppRequest } from '../security/app-scheme.ts';
import type { AppContext } from './context.ts';

/** Must run before the app is ready. */
export function registerAppScheme(): void {
  protocol.registerSchemesAsPrivileged([{ scheme: APP_SCHEME, privileges: { ...APP_SCHEME_PRIVILEGES } }]);
}

// The CSP is sent as a response header with every file the app scheme serves (appResponseHeaders in
// security/app-scheme.ts, policy in security/csp.ts, both unit-tested), and the same policy is in the HTML.
export function serveAppScheme(context: AppContext): void {
  protocol.handle(APP_SCHEME, async (request) => {
    if (request.method !== 'GET' && request.method !== 'HEAD') {
      return new Response('Method not allowed', { status: 405, headers: { 'Content-Type': 'text/plain' } });
    }
    const resolved = resolveAppRequest(request.url, context.paths.rendererRoot);
    if (!resolved.ok) {
      context.log(`app scheme refused ${request.url}: ${resolved.reason}`);
      return new Response(resolved.reason, { status: resolved.status, headers: { 'Content-Type': 'text/plain' } });
    }
    try {
      const body = await nodeFs.readFile(resolved.filePath);
      return new Response(request.method === 'HEAD' ? null : new Uint8Array(body), { status: 200, headers: appResponseHeaders(resolved.mimeType) });
    } catch {
      return new Response('Not found', { status: 404, headers: { 'Content-Type': 'text/plain' } });
    }
  });
}
