/*
 * device.js: what this browser keeps for the signed-in person, and clearing it at sign-out so the next person to
 * sign in on the same phone sees nothing of the last one's kit, pumps or requests.
 *   unsent()   the mechanic's outbox items that have not reached the server (waiting or refused), every account
 *   forget()   deletes the mechanic page's IndexedDB (kept data and outbox), the Cache Storage caches of the pages,
 *              the service worker and the pages' localStorage keys
 * unsent() never creates the database (opening a missing one would make an empty one that store.js could not
 * upgrade), and forget() is only called once the person has agreed to lose what unsent() found.
 */
const DB_NAME = 'depotcast-mechanic';
const OWN_KEYS = /^depotcast\./;

async function exists() {
    if (!window.indexedDB) {
        return false;
    }
    if (!indexedDB.databases) {
        return true;
    }
    return (await indexedDB.databases()).some(d => d.name === DB_NAME);
}

export async function unsent() {
    if (!(await exists())) {
        return [];
    }
    const db = await new Promise((resolve, reject) => {
        const request = indexedDB.open(DB_NAME);
        request.onsuccess = () => resolve(request.result);
        request.onerror = () => reject(request.error);
    });
    try {
        if (!db.objectStoreNames.contains('outbox')) {
            return [];
        }
        return await new Promise((resolve, reject) => {
            const request = db.transaction('outbox', 'readonly').objectStore('outbox').getAll();
            request.onsuccess = () => resolve((request.result || []).sort((a, b) => a.id - b.id));
            request.onerror = () => reject(request.error);
        });
    } finally {
        db.close();
    }
}

function deleteDatabase() {
    // Open pages close their connection on 'versionchange' (store.js), so the deletion is not left blocked.
    return new Promise(resolve => {
        const request = indexedDB.deleteDatabase(DB_NAME);
        request.onsuccess = () => resolve(true);
        request.onerror = () => resolve(false);
    });
}

export async function forget() {
    const work = [];
    if (await exists()) {
        work.push(deleteDatabase());
    }
    if (window.caches) {
        work.push(caches.keys().then(names => Promise.all(names.filter(n => n.startsWith('depotcast-')).map(n => caches.delete(n)))));
    }
    if (navigator.serviceWorker) {
        work.push(navigator.serviceWorker.getRegistrations().then(all => Promise.all(all.map(r => r.unregister()))));
    }
    await Promise.all(work);
    Object.keys(localStorage).filter(k => OWN_KEYS.test(k)).forEach(k => localStorage.removeItem(k));
}
