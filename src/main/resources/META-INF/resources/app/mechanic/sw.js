/*
 * The mechanic's page works without a connection after its first visit: this worker keeps the page's own files
 * (the page, its modules, the shared modules and styles it imports) and answers from them at once, fetching a
 * fresh copy in the background for the next visit. Data from /api is not kept here: the page keeps its last data
 * and its outbox in IndexedDB itself, and says how old that data is.
 */
const CACHE = 'depotcast-mechanic-v15';
const FILES = [
    '/app/mechanic/', '/app/mechanic/mechanic.js', '/app/mechanic/store.js', '/app/mechanic/send.js',
    '/app/mechanic/data.js', '/app/mechanic/views.js', '/app/mechanic/forms.js', '/app/mechanic/close.js',
    '/app/mechanic/sections.js', '/app/mechanic/route.js', '/app/mechanic/pumplist.js', '/app/mechanic/sensorview.js',
    '/app/mechanic/report.js',
    '/app/js/sensors.js', '/app/js/api.js', '/app/js/format.js', '/app/js/ui.js', '/app/js/nav.js', '/app/js/device.js',
    '/app/css/app.css', '/app/css/mechanic.css', '/app/favicon.svg'
];

self.addEventListener('install', event => {
    event.waitUntil(caches.open(CACHE).then(cache => cache.addAll(FILES)).then(() => self.skipWaiting()));
});

self.addEventListener('activate', event => {
    event.waitUntil(caches.keys()
        .then(names => Promise.all(names.filter(n => n.startsWith('depotcast-mechanic-') && n !== CACHE).map(n => caches.delete(n))))
        .then(() => self.clients.claim()));
});

/** The page itself under any of its addresses (with a query or a fragment, or as index.html). */
function cacheKey(url) {
    if (url.pathname === '/app/mechanic/index.html' || url.pathname === '/app/mechanic') {
        return '/app/mechanic/';
    }
    return url.pathname;
}

self.addEventListener('fetch', event => {
    const url = new URL(event.request.url);
    const key = cacheKey(url);
    if (event.request.method !== 'GET' || url.origin !== self.location.origin || !FILES.includes(key)) {
        return;
    }
    event.respondWith(caches.open(CACHE).then(async cache => {
        const kept = await cache.match(key);
        const fresh = fetch(key, {cache: 'no-cache', credentials: 'same-origin'}).then(answer => {
            if (answer.ok) {
                cache.put(key, answer.clone());
            }
            return answer;
        });
        if (kept) {
            // Answer from the phone now; the fresh copy (if the network is there) serves the next visit.
            event.waitUntil(fresh.catch(() => undefined));
            return kept;
        }
        return fresh;
    }));
});
