/**
 * The one origin the desktop app's own pages come from. The renderer is served from a
 * privileged custom scheme (not file://), so the page has a real origin that the
 * navigation rules, the IPC sender check and the request filter can compare against.
 */

/** The custom scheme the renderer is served from. */
export const APP_SCHEME = 'app';

/** The host part of every app address; any other host is refused. */
export const APP_HOST = 'chancewise';

/** The origin of the app's pages, as `new URL(...).origin` reports it. */
export const APP_ORIGIN = `${APP_SCHEME}://${APP_HOST}`;

/** The address the main window loads. */
export const APP_ENTRY_URL = `${APP_ORIGIN}/index.html`;

/**
 * The privileges of the app scheme, registered before the app is ready: standard (real
 * origin, relative addresses), secure (like https), and fetch() of the app's own files (the
 * handout font). Not CORS-enabled, no service workers, no CSP bypass.
 */
export const APP_SCHEME_PRIVILEGES = { standard: true, secure: true, supportFetchAPI: true } as const;
