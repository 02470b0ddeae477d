import nodePath from 'node:path';
import { describe, expect, it } from 'vitest';
import { APP_ORIGIN, APP_SCHEME_PRIVILEGES, appResponseHeaders, mimeTypeFor, resolveAppRequest } from '../../../src-main/security/app-scheme.ts';
import { contentSecurityPolicy } from '../../../src-main/security/csp.ts';

const root = '/opt/wattledger/out/renderer';

function servedPath(url: string): string | number {
  const result = resolveAppRequest(url, root, nodePath.posix);
  return result.ok ? result.filePath : result.status;
}

describe('resolveAppRequest()', () => {
  it('serves index.html for the bare origin and files under the renderer folder', () => {
    expect(servedPath(`${APP_ORIGIN}/`)).toBe(`${root}/index.html`); // default document, common practice (static servers)
    expect(servedPath(`${APP_ORIGIN}/assets/index-abc.js`)).toBe(`${root}/assets/index-abc.js`);
    expect(servedPath(`${APP_ORIGIN}/assets/a%20b.css?v=1#x`)).toBe(`${root}/assets/a b.css`); // RFC 3986 §2.1 percent-decoding; query and fragment are not part of the path (§3.4, §3.5)
  });

  it('refuses every way of climbing out of the folder', () => {
    const attempts = [
      `${APP_ORIGIN}/..%2f..%2fetc%2fpasswd.txt`, // encoded slash: OWASP path traversal examples [from memory]
      `${APP_ORIGIN}/assets/..%2F..%2F..%2Fsecret.json`,
      `${APP_ORIGIN}/%2e%2e%2fsecret.json`,
      `${APP_ORIGIN}/..%5c..%5cwindows%5cwin.ini`, // encoded backslash (Windows separator)
      `${APP_ORIGIN}/C:%5cWindows%5cwin.ini`, // drive letter
      `${APP_ORIGIN}/x%00.html`, // NUL byte truncation
      `${APP_ORIGIN}/%E0%A4%A`, // malformed escape
    ];
    for (const url of attempts) expect([400, 403], url).toContain(servedPath(url)); // OWASP "Path Traversal" attack patterns [from memory]
  });

  it('keeps dot segments that the URL parser already resolved inside the folder', () => {
    // WHATWG URL standard: "../" segments are removed while parsing, so they cannot climb above "/".
    expect(servedPath(`${APP_ORIGIN}/../../index.html`)).toBe(`${root}/index.html`); // WHATWG URL Standard, path state / shorten a path [from memory]
  });

  it('refuses other schemes, other hosts and look-alike hosts', () => {
    expect(servedPath('file:///etc/passwd')).toBe(403); // Electron security checklist "Avoid usage of the file:// protocol" [from memory]
    expect(servedPath('wattledger://other/index.html')).toBe(403);
    expect(servedPath('wattledger://app.evil/index.html')).toBe(403);
    expect(servedPath('not a url')).toBe(400);
  });

  it('refuses file types it does not know rather than guessing', () => {
    expect(servedPath(`${APP_ORIGIN}/tool.exe`)).toBe(404); // common practice: allow-list of content types
  });

  it('applies the same rules with Windows paths', () => {
    const result = resolveAppRequest(`${APP_ORIGIN}/assets/app.js`, 'C:\\WattLedger\\out\\renderer', nodePath.win32);
    expect(result.ok && result.filePath).toBe('C:\\WattLedger\\out\\renderer\\assets\\app.js'); // Node path.win32 semantics
    expect(resolveAppRequest(`${APP_ORIGIN}/..%5C..%5Cboot.ini`, 'C:\\WattLedger\\out\\renderer', nodePath.win32).ok).toBe(false);
  });
});

describe('app scheme privileges and headers', () => {
  it('registers a standard, secure scheme without CSP bypass or service workers', () => {
    expect(APP_SCHEME_PRIVILEGES).toMatchObject({ standard: true, secure: true, bypassCSP: false, allowServiceWorkers: false }); // Electron protocol.registerSchemesAsPrivileged docs [from memory]
  });

  it('sends the CSP, the content type and nosniff with every file', () => {
    const headers = appResponseHeaders(mimeTypeFor('index.html') ?? '');
    expect(headers['Content-Security-Policy']).toBe(contentSecurityPolicy()); // CSP Level 3 delivery via header [from memory]
    expect(headers['Content-Type']).toBe('text/html; charset=utf-8'); // IANA media type text/html, RFC 2854
    expect(headers['X-Content-Type-Options']).toBe('nosniff'); // WHATWG Fetch standard, X-Content-Type-Options [from memory]
    expect(mimeTypeFor('app.js')).toBe('text/javascript; charset=utf-8'); // RFC 9239: text/javascript
  });
});
