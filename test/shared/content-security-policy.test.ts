import { describe, expect, test } from 'vitest';
import { contentSecurityPolicy, metaContentSecurityPolicy, securityHeaders } from '../../src/shared/content-security-policy.ts';

/** Parse a serialised policy (CSP Level 3, W3C, §2.2.1: directives split on ";", names and sources on spaces). */
function parse(policy: string): Map<string, string[]> {
  return new Map(
    policy
      .split(';')
      .map((part) => part.trim())
      .filter((part) => part !== '')
      .map((part) => {
        const [name = '', ...sources] = part.split(/\s+/);
        return [name.toLowerCase(), sources] as const;
      }),
  );
}

describe('content security policy', () => {
  test('is the strict policy: own files only, no plug-ins, no framing, no base or form targets', () => {
    expect(contentSecurityPolicy()).toBe(
      "default-src 'self'; script-src 'self'; style-src 'self'; img-src 'self' data: blob:; font-src 'self'; " +
        "connect-src 'self'; object-src 'none'; base-uri 'none'; form-action 'none'; frame-ancestors 'none'",
    );
  });

  test('allows no inline script, no eval and no inline style', () => {
    // CSP Level 3 §6.1: 'unsafe-inline', 'unsafe-eval' and 'unsafe-hashes' are the keywords that relax these.
    const policy = parse(contentSecurityPolicy());
    for (const name of ['script-src', 'style-src', 'default-src']) {
      expect(policy.get(name)?.some((source) => source.startsWith("'unsafe"))).toBe(false);
    }
  });

  test('allows no other host anywhere', () => {
    for (const sources of parse(contentSecurityPolicy()).values()) {
      expect(sources.every((source) => ["'self'", "'none'", 'data:', 'blob:'].includes(source))).toBe(true);
    }
  });

  test('leaves frame-ancestors out of the meta-tag form, where browsers ignore it', () => {
    // CSP Level 3 §6.4.2: "The frame-ancestors directive is not supported inside a <meta> element".
    const meta = parse(metaContentSecurityPolicy());
    expect(meta.has('frame-ancestors')).toBe(false);
    expect(meta.get('script-src')).toEqual(["'self'"]);
  });

  test('is sent with the other security headers', () => {
    const headers = securityHeaders();
    expect(headers['Content-Security-Policy']).toBe(contentSecurityPolicy());
    expect(headers['X-Content-Type-Options']).toBe('nosniff');
    expect(headers['Referrer-Policy']).toBe('no-referrer');
  });
});
