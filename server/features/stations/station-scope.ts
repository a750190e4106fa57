/**
 * What a station session may ask for: everything else answers 403 STATION_SCOPE. One line per
 * request, each saying which station screen needs it. Paths are below /api; `:code` is one segment.
 */
export const STATION_ALLOW_LIST: readonly { method: string; path: string; screen: string }[] = [
  { method: 'GET', path: '/auth/me', screen: 'every screen: who is signed in' },
  { method: 'GET', path: '/auth/csrf', screen: 'every screen: the token for the next change' },
  { method: 'POST', path: '/station/sign-in', screen: 'badge screen: the next badge scanned' },
  { method: 'GET', path: '/station/session', screen: 'every screen: the countdown' },
  { method: 'POST', path: '/station/done', screen: 'every screen: Done' },
  { method: 'GET', path: '/tools/:code', screen: 'tool: opened by scan or code' },
  { method: 'POST', path: '/tools/:code/checkout', screen: 'tool: check out' },
  { method: 'POST', path: '/tools/:code/return', screen: 'tool: return' },
  { method: 'POST', path: '/tools/:code/holds', screen: 'tool: hold' },
  { method: 'DELETE', path: '/tools/:code/holds/mine', screen: 'tool: cancel my hold' },
  { method: 'GET', path: '/signoffs/mine', screen: 'tool: whether my sign-offs allow a checkout' },
  { method: 'GET', path: '/loans/mine', screen: 'my loans: what to return' },
  { method: 'GET', path: '/bins/:code', screen: 'bin: opened by scan or code' },
  { method: 'POST', path: '/bins/:code/draw', screen: 'bin: draw' },
  { method: 'POST', path: '/bins/:code/return', screen: 'bin: return unused' },
  { method: 'GET', path: '/assemblies', screen: 'bin: my open assemblies to draw for' },
];

const matchers = STATION_ALLOW_LIST.map(({ method, path }) => ({
  method,
  pattern: new RegExp(`^${path.replace(/:[a-z]+/g, '[^/]+')}/?$`),
}));

/** Whether a station session may make this request (`path` below /api, without the query). */
export function stationMayRequest(method: string, path: string): boolean {
  return matchers.some((m) => m.method === method && m.pattern.test(path));
}
