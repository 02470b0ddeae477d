/**
 * The Content-Security-Policy of the WattLedger renderer, sent as a response header by the app scheme
 * (Electron) and by the browser-mode preview server, so both modes run under the same rules.
 *
 * - script-src 'self': no inline script and no eval; zod must run with `z.config({ jitless: true })`
 *   because its fast path compiles validators with `new Function`.
 * - style-src 'self' without 'unsafe-inline': Svelte 5 emits component CSS as files and applies dynamic
 *   styles through the CSSOM (`element.style`), which CSP does not govern; only literal `style="…"`
 *   attributes in markup would need 'unsafe-inline', and the renderer does not use them.
 * - img-src adds data: and blob: for chart PNG export (canvas.toDataURL / toBlob).
 * - worker-src 'self': the engine worker is a bundled file, never a blob: URL.
 * - Everything not needed is 'none': objects, frames, forms, base URI rewrites.
 * The same policy is in the renderer's HTML as a meta tag (src-renderer/index.html; a test keeps the two
 * equal), minus frame-ancestors, which CSP Level 3 ignores in a meta element (browsers log an error).
 */

export const CSP_DIRECTIVES: Readonly<Record<string, readonly string[]>> = {
  'default-src': ["'self'"],
  'script-src': ["'self'"],
  'style-src': ["'self'"],
  'img-src': ["'self'", 'data:', 'blob:'],
  'font-src': ["'self'"],
  'connect-src': ["'self'"],
  'worker-src': ["'self'"],
  'object-src': ["'none'"],
  'frame-src': ["'none'"],
  'base-uri': ["'none'"],
  'form-action': ["'none'"],
  'frame-ancestors': ["'none'"],
};

/** The policy as one header value: `directive source source; directive …`. */
export function contentSecurityPolicy(directives: Readonly<Record<string, readonly string[]>> = CSP_DIRECTIVES): string {
  return Object.entries(directives)
    .map(([name, sources]) => `${name} ${sources.join(' ')}`)
    .join('; ');
}

/** Directives a <meta http-equiv> policy cannot carry (CSP Level 3 §3.3: ignored there). */
export const META_IGNORED_DIRECTIVES: readonly string[] = ['frame-ancestors', 'report-uri', 'sandbox'];

/** The same policy for the renderer's <meta http-equiv="Content-Security-Policy"> tag. */
export function metaContentSecurityPolicy(directives: Readonly<Record<string, readonly string[]>> = CSP_DIRECTIVES): string {
  return contentSecurityPolicy(Object.fromEntries(Object.entries(directives).filter(([name]) => !META_IGNORED_DIRECTIVES.includes(name))));
}

/** Parses a policy string back into directives (used by tests and by the meta-tag consistency check). */
export function parseContentSecurityPolicy(policy: string): Record<string, string[]> {
  const result: Record<string, string[]> = {};
  for (const part of policy.split(';')) {
    const [name, ...sources] = part.trim().split(/\s+/);
    if (name) result[name.toLowerCase()] = sources;
  }
  return result;
}
