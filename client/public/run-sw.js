// Run mode's service worker, registered by /run only (scope /run). A driver station has no internet: after
// the first load the panel must open with no network at all. It keeps
//   - the shell: the /run page (run mode's own light page, client/run.html), network first, so a new server
//     version shows up when online; with it, the scripts, styles and Latin fonts that page names;
//   - the built assets (JS, CSS, fonts under /assets/), cache first: their names carry a content hash;
//   - the last answers of /api/panels/published, /api/season* and the robot profile, network first.
// It never caches any other API call, and the relay (a WebSocket) never passes through here.
// v2: /run is its own page (run.html) since; v1 kept the app's page and its assets.
const CACHE = 'pitwall-run-v2';
const SHELL = '/run';
const API_KEPT = [/^\/api\/panels\/published$/, /^\/api\/season(\/.*)?$/, /^\/api\/robot\/profile$/, /^\/api\/team\/robot-profile$/];

const isAsset = (url) => url.pathname.startsWith('/assets/') || url.pathname === '/favicon.svg';
const isKeptApi = (url) => API_KEPT.some((re) => re.test(url.pathname));

/** Asset addresses (same origin, under /assets/) named in `text` by `pattern`'s first group. */
function assetsIn(text, pattern) {
  const urls = [];
  for (const match of text.matchAll(pattern)) {
    const url = new URL(match[1], self.location.origin);
    if (url.origin === self.location.origin && url.pathname.startsWith('/assets/')) urls.push(url.pathname);
  }
  return urls;
}

/** Keeps `pathname` unless it is cached already (assets are named by their content); returns the response. */
async function keepAsset(cache, pathname) {
  const cached = await cache.match(pathname);
  if (cached) return cached;
  const response = await fetch(pathname, { credentials: 'same-origin' });
  if (!response.ok) throw new Error(`${pathname}: ${response.status}`);
  await cache.put(pathname, response.clone());
  return response;
}

/**
 * Fetches the shell and keeps it with what it needs: the scripts and styles its HTML names, and from the
 * styles the Latin WOFF2 fonts (the other scripts' font files load only when such text is drawn).
 */
async function keepShell(cache) {
  const response = await fetch(SHELL, { credentials: 'same-origin', cache: 'no-cache' });
  if (!response.ok) throw new Error(`${SHELL}: ${response.status}`);
  const html = await response.clone().text();
  await cache.put(SHELL, response);
  const named = assetsIn(html, /(?:src|href)="([^"]+)"/g);
  const styles = await Promise.all(named.map((u) => keepAsset(cache, u).then((r) => (u.endsWith('.css') ? r.clone().text() : ''))));
  const fonts = styles.flatMap((css) => assetsIn(css, /url\(\s*["']?([^"')\s]+\.woff2)/g)).filter((u) => /-latin-(ext-)?\d/.test(u));
  await Promise.all([...new Set(fonts)].map((u) => keepAsset(cache, u)));
}

self.addEventListener('install', (event) => {
  event.waitUntil(
    caches
      .open(CACHE)
      .then((cache) => Promise.all([keepShell(cache), cache.add('/favicon.svg')]))
      .then(() => self.skipWaiting()),
  );
});

self.addEventListener('activate', (event) => {
  event.waitUntil(
    caches
      .keys()
      .then((names) => Promise.all(names.filter((n) => n.startsWith('pitwall-run-') && n !== CACHE).map((n) => caches.delete(n))))
      .then(() => self.clients.claim()),
  );
});

async function networkFirst(request, key) {
  const cache = await caches.open(CACHE);
  try {
    const response = await fetch(request);
    if (response.ok) await cache.put(key ?? request, response.clone());
    return response;
  } catch (err) {
    const cached = await cache.match(key ?? request, { ignoreVary: true, ignoreSearch: key !== undefined });
    if (cached) return cached;
    throw err;
  }
}

async function cacheFirst(request) {
  const cache = await caches.open(CACHE);
  const cached = await cache.match(request, { ignoreVary: true });
  if (cached) return cached;
  const response = await fetch(request);
  if (response.ok) await cache.put(request, response.clone());
  return response;
}

self.addEventListener('fetch', (event) => {
  const request = event.request;
  if (request.method !== 'GET') return;
  const url = new URL(request.url);
  if (url.origin !== self.location.origin) return;
  if (request.mode === 'navigate') {
    // Every run address under the scope gets the one shell; the page reads the address.
    if (url.pathname === '/run' || url.pathname.startsWith('/run/')) event.respondWith(networkFirst(request, SHELL));
    return;
  }
  if (isAsset(url)) return event.respondWith(cacheFirst(request));
  if (isKeptApi(url)) return event.respondWith(networkFirst(request));
});

// The page loaded before this worker controlled it, so it names what it already fetched: the assets it used
// and the API answers it needs offline. The worker fetches and keeps them, and the shell's own (run mode
// may have been opened inside the full app, whose assets are not the shell's), then says so.
self.addEventListener('message', (event) => {
  const data = event.data;
  if (!data || data.type !== 'pitwall-run-warm' || !Array.isArray(data.urls)) return;
  event.waitUntil(
    (async () => {
      const cache = await caches.open(CACHE);
      const urls = data.urls.map((u) => new URL(u, self.location.origin)).filter((u) => u.origin === self.location.origin && (isAsset(u) || isKeptApi(u)));
      let kept = 0;
      await keepShell(cache).catch(() => {
        // Offline already, or the server is down: the shell kept before stays.
      });
      await Promise.all(
        urls.map(async (u) => {
          try {
            const response = await fetch(u.href, { credentials: 'same-origin' });
            if (response.ok) {
              await cache.put(u.href, response);
              kept += 1;
            }
          } catch {
            // Offline already: whatever is cached stays.
          }
        }),
      );
      event.source?.postMessage({ type: 'pitwall-run-warmed', kept, asked: urls.length });
    })(),
  );
});
