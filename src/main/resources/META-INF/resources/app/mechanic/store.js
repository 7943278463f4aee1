/*
 * store.js: what the mechanic's phone keeps between visits, in IndexedDB.
 *   snapshot: the last data read from the server, per account, with the time it was read
 *   outbox:   actions made on the phone that have not reached the server yet, oldest first. Each carries the
 *             reference made on the phone (client reference or repair reference), so sending it again after a lost
 *             answer gives the first record back (the API answers 200 to the same reference and content).
 * An outbox item: {id, username, kind, method, path, body, ref, summary, createdAt, state: 'waiting'|'refused',
 * message, errors, shortage, officerTold, officerNotice} (kind 'withdraw': a refused repair's notice taken back when
 * the mechanic discards it). Nothing leaves the outbox except by reaching the server or by the user discarding it;
 * a refused item goes back to waiting only when the user sends it again.
 */
const DB_NAME = 'depotcast-mechanic';
const LAST_USER = 'depotcast.mechanic.last-user';

let opened;

function database() {
    if (!opened) {
        opened = new Promise((resolve, reject) => {
            const request = indexedDB.open(DB_NAME, 1);
            request.onupgradeneeded = () => {
                request.result.createObjectStore('snapshot', {keyPath: 'username'});
                request.result.createObjectStore('outbox', {keyPath: 'id', autoIncrement: true});
            };
            request.onsuccess = () => {
                // Sign-out deletes this database (device.js): let it, rather than block it while the page is open.
                request.result.onversionchange = () => request.result.close();
                resolve(request.result);
            };
            request.onerror = () => reject(request.error);
        });
    }
    return opened;
}

async function run(storeName, mode, work) {
    const db = await database();
    return new Promise((resolve, reject) => {
        const tx = db.transaction(storeName, mode);
        let result;
        const request = work(tx.objectStore(storeName));
        if (request) {
            request.onsuccess = () => { result = request.result; };
        }
        tx.oncomplete = () => resolve(result);
        tx.onerror = () => reject(tx.error);
        tx.onabort = () => reject(tx.error);
    });
}

export function lastUser() {
    return localStorage.getItem(LAST_USER);
}

export async function saveSnapshot(snapshot) {
    localStorage.setItem(LAST_USER, snapshot.username);
    await run('snapshot', 'readwrite', s => s.put(snapshot));
}

export function loadSnapshot(username) {
    return username ? run('snapshot', 'readonly', s => s.get(username)) : Promise.resolve(undefined);
}

export async function queue(item) {
    const stored = {...item, state: 'waiting', createdAt: new Date().toISOString()};
    stored.id = await run('outbox', 'readwrite', s => s.add(stored));
    return stored;
}

export async function items(username) {
    const all = await run('outbox', 'readonly', s => s.getAll());
    return (all || []).filter(i => !username || i.username === username).sort((a, b) => a.id - b.id);
}

export function update(item) {
    return run('outbox', 'readwrite', s => s.put(item));
}

export function remove(id) {
    return run('outbox', 'readwrite', s => s.delete(id));
}

/** A snapshot is one person's data: when someone else signs in on this phone, the others' go (never their outbox). */
export async function dropOtherSnapshots(username) {
    const keys = await run('snapshot', 'readonly', s => s.getAllKeys());
    const others = (keys || []).filter(k => k !== username);
    if (others.length) {
        await run('snapshot', 'readwrite', s => {
            others.forEach(k => s.delete(k));
        });
    }
}
