// Run mode's service worker, registered by /run only (scope /run). A driver station has no internet: after
// the first load the panel must open with no network at all. It keeps
//   - the app shell (the /run page), network first, so a new server version shows up when online;
//   - the built assets (JS, CSS, fonts under /assets/), cache first: their names carry a content hash;
//   - the last answers of /api/panels/published, /api/season* and the robot profile, network first.
// It never caches any other API call, and the relay (a WebSocket) never passes through here.
const CACHE = 'pitwall-run-v1';
const SHELL = '/run';
const API_KEPT = [/^\/api\/panels\/published$/, /^\/api\/season(\/.*)?$/, /^\/api\/robot\/profile$/, /^\/api\/team\/robot-profile$/];

self.addEventListener('install', (event) => {
  event.waitUntil(caches.open(CACHE).then((cache) => cache.addAll([SHELL, '/favicon.svg'])).then(() => self.skipWaiting()));
});

self.addEventListener('activate', (event) => {
  event.waitUntil(
    caches
      .keys()
      .then((names) => Promise.all(names.filter((n) => n.startsWith('pitwall-run-') && n !== CACHE).map((n) => caches.delete(n))))
      .then(() => self.clients.claim()),
  );
});

const isAsset = (url) => url.pathname.startsWith('/assets/') || url.pathname === '/favicon.svg';
const isKeptApi = (url) => API_KEPT.some((re) => re.test(url.pathname));

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
    // Every run address gets the one app shell; the router picks the page.
    if (url.pathname === '/run' || url.pathname.startsWith('/run/')) event.respondWith(networkFirst(request, SHELL));
    return;
  }
  if (isAsset(url)) return event.respondWith(cacheFirst(request));
  if (isKeptApi(url)) return event.respondWith(networkFirst(request));
});

// The page loaded before this worker controlled it, so it names what it already fetched: the assets it used
// and the API answers it needs offline. The worker fetches and keeps them, then says so.
self.addEventListener('message', (event) => {
  const data = event.data;
  if (!data || data.type !== 'pitwall-run-warm' || !Array.isArray(data.urls)) return;
  event.waitUntil(
    (async () => {
      const cache = await caches.open(CACHE);
      const urls = data.urls.map((u) => new URL(u, self.location.origin)).filter((u) => u.origin === self.location.origin && (isAsset(u) || isKeptApi(u)));
      let kept = 0;
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
