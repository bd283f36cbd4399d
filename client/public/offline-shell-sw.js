// The offline shell both phone areas share (the judges' at /judge, the gate's at /gate): keeps the app
// shell, its hashed assets and car photos on the phone, so the area's screens open and reload with no
// signal. Scores and check-ins never pass through here: the page writes them to IndexedDB and sends
// them from its own outbox. API calls always go to the network. Imported by judge-sw.js and gate-sw.js.
const AREA = self.PLACARD_OFFLINE_AREA; // 'judge' or 'gate', set by the worker that imports this file
const PAGE = `/${AREA}`;
const SHELL = `placard-${AREA}-shell-v1`;
const ASSETS = `placard-${AREA}-assets-v1`;
// Told to the server on the area's pages: the app is kept here and opens at once, so the server draws no first
// screen into them (server/first-screens/): none is kept with someone's cars in it, and the page comes sooner.
const KEPT = { 'X-Placard-Worker': 'app-kept' };

/**
 * Everything the page names under /assets (its entry, its screen's modulepreloads, and the list of the area's
 * other chunks the server puts in it: server/client-shell.ts) is kept, so a reload with no signal finds it
 * all. Only what is not kept yet is fetched: the names carry a content hash.
 */
async function keepAssetsOf(html) {
  const assets = [...new Set([...html.matchAll(/"(\/assets\/[^"]+)"/g)].map((m) => m[1]))];
  const assetCache = await caches.open(ASSETS);
  const missing = [];
  for (const url of assets) if (!(await assetCache.match(url))) missing.push(url);
  await assetCache.addAll(missing);
}

async function cacheShell() {
  const cache = await caches.open(SHELL);
  const res = await fetch(PAGE, { cache: 'no-store', headers: KEPT });
  if (!res.ok) return;
  const html = await res.clone().text();
  await cache.put(PAGE, res);
  await keepAssetsOf(html);
}

self.addEventListener('install', (event) => {
  event.waitUntil(cacheShell().then(() => self.skipWaiting()));
});

self.addEventListener('activate', (event) => {
  event.waitUntil(
    caches
      .keys()
      .then((keys) => Promise.all(keys.filter((k) => k.startsWith(`placard-${AREA}-`) && k !== SHELL && k !== ASSETS).map((k) => caches.delete(k))))
      .then(() => self.clients.claim()),
  );
});

self.addEventListener('fetch', (event) => {
  const req = event.request;
  if (req.method !== 'GET') return;
  const url = new URL(req.url);
  if (url.origin !== self.location.origin) return;

  // The area's pages: the network when there is one (and keep the newest shell), else the kept shell.
  if (req.mode === 'navigate' && url.pathname.startsWith(PAGE)) {
    event.respondWith(
      // A navigation's request cannot be re-sent with a header as it is; as a same-origin GET with the cookies, it can.
      fetch(new Request(req, { headers: KEPT }))
        .then(async (res) => {
          if (res.ok) {
            await (await caches.open(SHELL)).put(PAGE, res.clone());
            // A newer build names new chunks: keep them too, after the page is answered.
            const page = res.clone();
            event.waitUntil(page.text().then(keepAssetsOf).catch(() => undefined));
          }
          return res;
        })
        .catch(async () => (await caches.match(PAGE, { cacheName: SHELL })) ?? Response.error()),
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
