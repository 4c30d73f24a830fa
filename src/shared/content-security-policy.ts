/**
 * The one Content-Security-Policy of the app, shared by the browser server, the built
 * page's meta tag and the desktop shell, so every way of running the app is held to the
 * same rules: only the app's own files, no inline script, no eval, no network beyond
 * its own origin, no plug-ins, no framing.
 */

/** The directives, in the order they are written. */
export const CONTENT_SECURITY_POLICY_DIRECTIVES: readonly (readonly [string, readonly string[]])[] = [
  ['default-src', ["'self'"]],
  ['script-src', ["'self'"]],
  ['style-src', ["'self'"]],
  ['img-src', ["'self'", 'data:', 'blob:']],
  ['font-src', ["'self'"]],
  ['connect-src', ["'self'"]],
  ['object-src', ["'none'"]],
  ['base-uri', ["'none'"]],
  ['form-action', ["'none'"]],
  ['frame-ancestors', ["'none'"]],
];

/**
 * Directives a `<meta http-equiv>` policy cannot carry (CSP Level 3, W3C, §3.3: `frame-ancestors`,
 * `report-uri` and `sandbox` are ignored there), so they are left out of the meta tag.
 */
const HEADER_ONLY = new Set(['frame-ancestors', 'report-uri', 'sandbox']);

function serialise(directives: readonly (readonly [string, readonly string[]])[]): string {
  return directives.map(([name, sources]) => `${name} ${sources.join(' ')}`).join('; ');
}

/** The policy as sent in the `Content-Security-Policy` response header. */
export function contentSecurityPolicy(): string {
  return serialise(CONTENT_SECURITY_POLICY_DIRECTIVES);
}

/** The policy for a `<meta http-equiv="Content-Security-Policy">` tag (header-only directives left out). */
export function metaContentSecurityPolicy(): string {
  return serialise(CONTENT_SECURITY_POLICY_DIRECTIVES.filter(([name]) => !HEADER_ONLY.has(name)));
}

/** Every security header the app's own server sends with each response. */
export function securityHeaders(): Readonly<Record<string, string>> {
  return {
    'Content-Security-Policy': contentSecurityPolicy(),
    'X-Content-Type-Options': 'nosniff',
    'Referrer-Policy': 'no-referrer',
    'Cross-Origin-Opener-Policy': 'same-origin',
    'Cross-Origin-Resource-Policy': 'same-origin',
    'Permissions-Policy': 'camera=(), microphone=(), geolocation=()',
  };
}
