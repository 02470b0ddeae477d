/**
 * The app's own privileged scheme. The renderer is served from `wattledger://app/…` instead of `file://`
 * (Electron security checklist: prefer a custom protocol over file://), so the page has a real origin
 * that CSP 'self', the IPC sender check and the navigation rules can name.
 *
 * `resolveAppRequest` maps a request URL to a file inside the renderer folder and refuses everything
 * else: other schemes or hosts, malformed escapes, NUL bytes, backslashes, and any path that would leave
 * the folder after decoding and normalising (`..`, `%2e%2e`, `%2f`, drive letters, UNC names).
 */
import nodePath from 'node:path';
import { contentSecurityPolicy } from './csp.ts';

export const APP_SCHEME = 'wattledger';
export const APP_HOST = 'app';
export const APP_ORIGIN = `${APP_SCHEME}://${APP_HOST}`;
export const APP_ENTRY_URL = `${APP_ORIGIN}/index.html`;

/** Privileges for protocol.registerSchemesAsPrivileged: a standard, secure origin that fetch() can use. */
export const APP_SCHEME_PRIVILEGES = {
  standard: true,
  secure: true,
  supportFetchAPI: true,
  codeCache: true,
  bypassCSP: false,
  corsEnabled: false,
  allowServiceWorkers: false,
  stream: false,
} as const;

const MIME_TYPES: Readonly<Record<string, string>> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.woff2': 'font/woff2',
  '.woff': 'font/woff',
  '.txt': 'text/plain; charset=utf-8',
  '.wasm': 'application/wasm',
};

export type AppRequest =
  | { ok: true; filePath: string; mimeType: string }
  | { ok: false; status: 400 | 403 | 404; reason: string };

type PathApi = Pick<typeof nodePath, 'resolve' | 'relative' | 'isAbsolute' | 'extname' | 'sep'>;

/** Content type for a served file; unknown extensions are refused rather than guessed. */
export function mimeTypeFor(filePath: string, pathApi: PathApi = nodePath): string | null {
  return MIME_TYPES[pathApi.extname(filePath).toLowerCase()] ?? null;
}

/**
 * Maps `wattledger://app/<path>` to a file under `rootDir` (the built renderer).
 * `pathApi` is injectable so the Windows rules can be tested on any machine.
 */
export function resolveAppRequest(url: string, rootDir: string, pathApi: PathApi = nodePath): AppRequest {
  let parsed: URL;
  try {
    parsed = new URL(url);
  } catch {
    return { ok: false, status: 400, reason: 'The address is not a valid URL.' };
  }
  if (parsed.protocol !== `${APP_SCHEME}:` || parsed.host !== APP_HOST) {
    return { ok: false, status: 403, reason: `Only ${APP_ORIGIN} is served by the app scheme.` };
  }
  let relativePath: string;
  try {
    relativePath = decodeURIComponent(parsed.pathname);
  } catch {
    return { ok: false, status: 400, reason: 'The path has a malformed escape sequence.' };
  }
  if (relativePath.includes('\0') || relativePath.includes('\\')) {
    return { ok: false, status: 400, reason: 'The path contains a forbidden character.' };
  }
  const segments = relativePath.split('/').filter((segment) => segment.length > 0);
  if (segments.some((segment) => segment === '..' || segment === '.' || /^[a-zA-Z]:/.test(segment))) {
    return { ok: false, status: 403, reason: 'The path tries to leave the app folder.' };
  }
  if (segments.length === 0) segments.push('index.html');
  const root = pathApi.resolve(rootDir);
  const filePath = pathApi.resolve(root, ...segments);
  const inside = pathApi.relative(root, filePath);
  if (inside === '' || inside.startsWith('..') || pathApi.isAbsolute(inside)) {
    return { ok: false, status: 403, reason: 'The path tries to leave the app folder.' };
  }
  const mimeType = mimeTypeFor(filePath, pathApi);
  if (mimeType === null) {
    return { ok: false, status: 404, reason: 'The app does not serve this kind of file.' };
  }
  return { ok: true, filePath, mimeType };
}

/** Headers of every file the app scheme serves: its type, the CSP, and no sniffing or caching. */
export function appResponseHeaders(mimeType: string): Record<string, string> {
  return {
    'Content-Type': mimeType,
    'Content-Security-Policy': contentSecurityPolicy(),
    'X-Content-Type-Options': 'nosniff',
    'Cross-Origin-Opener-Policy': 'same-origin',
    'Referrer-Policy': 'no-referrer',
    'Cache-Control': 'no-cache',
  };
}
