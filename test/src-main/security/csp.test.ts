import { describe, expect, it } from 'vitest';
import { CSP_DIRECTIVES, contentSecurityPolicy, metaContentSecurityPolicy, parseContentSecurityPolicy } from '../../../src-main/security/csp.ts';

describe('contentSecurityPolicy()', () => {
  const policy = parseContentSecurityPolicy(contentSecurityPolicy());

  it('falls back to the page origin only', () => {
    expect(policy['default-src']).toEqual(["'self'"]); // CSP Level 3 (W3C) §6.1.3 default-src; Electron security checklist "Define a Content Security Policy" [from memory]
  });

  it('allows scripts from the origin only: no inline script, no eval, no wasm-eval', () => {
    expect(policy['script-src']).toEqual(["'self'"]); // CSP Level 3 (W3C) §6.1.11: without 'unsafe-eval', eval and new Function are blocked [from memory]; zod must run jitless
    expect(contentSecurityPolicy()).not.toMatch(/unsafe-eval|wasm-unsafe-eval|unsafe-inline|unsafe-hashes|\*/); // CSP Level 3 keyword list [from memory]
  });

  it('does not allow inline styles (Svelte 5 styles through CSS files and the CSSOM)', () => {
    expect(policy['style-src']).toEqual(["'self'"]); // CSP Level 3: style attributes in markup need 'unsafe-inline', CSSOM writes are not governed [from memory]
  });

  it('lets images come from the origin, data: and blob: (chart PNG export) and nothing else', () => {
    expect(policy['img-src']).toEqual(["'self'", 'data:', 'blob:']); // brief: img-src 'self' data: blob:
  });

  it('shuts the doors a calculator never uses', () => {
    for (const name of ['object-src', 'frame-src', 'base-uri', 'form-action', 'frame-ancestors']) {
      expect(policy[name], name).toEqual(["'none'"]); // CSP Level 3 'none' source expression; OWASP CSP cheat sheet (strict policy) [from memory]
    }
  });

  it('round-trips through the parser, so the header and the directive table agree', () => {
    expect(Object.keys(policy)).toEqual(Object.keys(CSP_DIRECTIVES)); // independent parse of the emitted header
  });
});

describe('one policy for the header and the renderer\'s meta tag (issue 15 §4)', () => {
  it('src-renderer/index.html carries exactly the header policy, less what a meta element cannot carry', async () => {
    const { readFileSync } = await import('node:fs');
    const html = readFileSync(new URL('../../../src-renderer/index.html', import.meta.url), 'utf8');
    const meta = /<meta\s+http-equiv="Content-Security-Policy"\s+content="([^"]*)"/.exec(html)?.[1];
    expect(meta).toBe(metaContentSecurityPolicy());
    const header = parseContentSecurityPolicy(contentSecurityPolicy());
    delete header['frame-ancestors']; // CSP Level 3 §6.4.2: frame-ancestors is not supported in a meta element [from memory]
    expect(parseContentSecurityPolicy(meta ?? '')).toEqual(header);
  });

  it('allows no inline style and no blob: workers (the renderer needs neither)', () => {
    const policy = parseContentSecurityPolicy(metaContentSecurityPolicy());
    expect(policy['style-src']).toEqual(["'self'"]);
    expect(policy['worker-src']).toEqual(["'self'"]);
  });
});
