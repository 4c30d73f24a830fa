/**
 * Which Host header values the local server answers. A page on any web site can make the
 * browser send requests to 127.0.0.1 under its own name by pointing that name at 127.0.0.1
 * (DNS rebinding); the browser then treats the answers as that site's. Checking the Host
 * header against the names the server is meant to be reached by stops it. By default those
 * are the loopback names only; `--allow-host NAME` adds others.
 */

/** The loopback names always answered: localhost, 127.0.0.1 and [::1] (RFC 6761 §6.3; RFC 5735; RFC 4291 §2.5.3). */
export const LOOPBACK_HOST_NAMES: readonly string[] = ['localhost', '127.0.0.1', '[::1]'];

/** The name and port of a Host header (RFC 9110 §7.2: `uri-host [ ":" port ]`), or null when it is not one. */
export function parseHostHeader(header: string): { readonly name: string; readonly port: number | null } | null {
  const match = /^(\[[0-9a-f:.]+\]|[a-z0-9.-]+)(?::(\d{1,5}))?$/iu.exec(header.trim());
  if (match === null) return null;
  const [, name = '', port] = match;
  return { name: name.toLowerCase().replace(/\.$/u, ''), port: port === undefined ? null : Number(port) };
}

/**
 * Whether a request's Host header names this server: one of the loopback names or the
 * allowed extra names, with the port the request came in on (no port means 80, the http
 * default). A missing or malformed header is refused.
 */
export function isAllowedHost(header: string | undefined, localPort: number, extraNames: readonly string[] = []): boolean {
  if (header === undefined) return false;
  const host = parseHostHeader(header);
  if (host === null) return false;
  const names = [...LOOPBACK_HOST_NAMES, ...extraNames.map((name) => name.toLowerCase())];
  return names.includes(host.name) && (host.port ?? 80) === localPort;
}

/** Whether an address to listen on keeps the server to this machine (127.0.0.0/8, ::1, localhost). */
export function isLoopbackAddress(address: string): boolean {
  const plain = address.replace(/^\[|\]$/gu, '').toLowerCase();
  return plain === 'localhost' || plain === '::1' || /^127\.\d{1,3}\.\d{1,3}\.\d{1,3}$/u.test(plain);
}

/** The warning printed when the server listens beyond this machine. */
export function exposureWarning(address: string): string {
  return (
    `Warning: listening on ${address} makes the app reachable from other machines on the network. Keep it on ` +
    '127.0.0.1 unless you mean to share it; other machines are answered only under names given with --allow-host NAME.'
  );
}
