// The gate's service worker: keeps the app shell, its hashed assets and car photos on the phone, so
// the gate screen opens and reloads with no signal. Check-ins never pass through here: they are written
// to IndexedDB by the page and sent by its own outbox loop. API calls always go to the network.
const SHELL = 'placard-gate-shell-v1';
const ASSETS = 'placard-gate-assets-v1';

async function cacheShell() {
  const cache = await caches.open(SHELL);
  const res = await fetch('/gate', { cache: 'no-store' });
  if (!res.ok) return;
  const html = await res.clone().text();
  await cache.put('/gate', res);
  // Everything the shell names under /assets is fetched now, so a reload with no signal finds it all.
  const assets = [...html.matchAll(/(?:src|href)="(\/assets\/[^"]+)"/g)].map((m) => m[1]);
  const assetCache = await caches.open(ASSETS);
  await assetCache.addAll([...new Set(assets)]);
}

self.addEventListener('install', (event) => {
  event.waitUntil(cacheShell().then(() => self.skipWaiting()));
});

self.addEventListener('activate', (event) => {
  event.waitUntil(
    caches
      .keys()
      .then((keys) => Promise.all(keys.filter((k) => k.startsWith('placard-gate-') && k !== SHELL && k !== ASSETS).map((k) => caches.delete(k))))
      .then(() => self.clients.claim()),
  );
});

self.addEventListener('fetch', (event) => {
  const req = event.request;
  if (req.method !== 'GET') return;
  const url = new URL(req.url);
  if (url.origin !== self.location.origin) return;

  // The judge's pages: the network when there is one (and keep the newest shell), else the kept shell.
  if (req.mode === 'navigate' && url.pathname.startsWith('/gate')) {
    event.respondWith(
      fetch(req)
        .then(async (res) => {
          if (res.ok) await (await caches.open(SHELL)).put('/gate', res.clone());
          return res;
        })
        .catch(async () => (await caches.match('/gate', { cacheName: SHELL })) ?? Response.error()),
    );
    return;
  }

  // Hashed assets never change under one name, and a photo's key is never reused: the kept copy is always right.
  if (url.pathname.startsWith('/assets/') || url.pathname.startsWith('/media/')) {
    event.respondWith(
      caches.open(ASSETS).then(async (cache) => {
        const kept = await cache.match(req);
        if (kept) return kept;
        const res = await fetch(req);
        if (res.ok) await cache.put(req, res.clone());
        return res;
      }),
    );
  }
});
