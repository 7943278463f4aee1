/*
 * officer.js: what the stores officer's pages share. startOfficer() signs the page in, works out the stores the
 * account looks after (its assigned depots and central store; every store for an admin), keeps the store chosen
 * in the address (?location=CODE) and in this browser, and draws the store picker and the task tabs.
 *   const {me, stores, store, parts, run} = await startOfficer({page: 'board', title: 'Morning board'})
 *   run: the forecast run planning uses (null before the first; undefined on the board, which reads its own)
 *   parts: part number → catalogue entry (description, unitOfIssue, packSize, minOrderQty, supplier, …)
 *   ready()        marks the page as showing its data (body[data-ready], performance mark)
 *   kindWords(k)   an alert reason in words, with the tone that only repeats it
 *   parseCsv(text) rows of cells, for the CSV the API exports
 */
import * as api from '/app/js/api.js';
import {startPage} from '/app/js/nav.js';
import {provenance} from '/app/js/provenance.js';
import {h, mount} from '/app/js/ui.js';

const STORE_KEY = 'depotcast.officer.store';

export const TASKS = [
    {page: 'board', href: '/app/officer/', label: 'Morning board'},
    {page: 'requests', href: '/app/officer/requests.html', label: 'Requests'},
    {page: 'transfers', href: '/app/officer/transfers.html', label: 'Transfers'},
    {page: 'purchases', href: '/app/officer/purchases.html', label: 'Purchases'},
    {page: 'stock', href: '/app/officer/stock.html', label: 'Stock, counts and files'},
    {page: 'sensors', href: '/app/officer/sensors.html', label: 'Pump sensors'}
];

const KIND_WORDS = {
    OUT_WITH_PUMPS_WAITING: ['Out of stock, pumps waiting', 'urgent'],
    BELOW_REORDER_POINT: ['Below reorder point', 'urgent'],
    STOCKOUT_PROJECTED: ['Runs out before resupply', 'warn'],
    PLANNED_WORK_SHORT: ['Short for planned services', 'info'],
    SHELF_LIFE_RISK: ['Shelf life at risk', 'info'],
    EXCESS: ['More than needed', 'quiet'],
    NO_FORECAST: ['No forecast', 'quiet']
};

export function kindWords(kind) {
    return KIND_WORDS[kind] || [String(kind).toLowerCase().replaceAll('_', ' '), 'quiet'];
}

export function storeName(store) {
    return store ? `${store.name} (${store.code})` : '';
}

async function storesOf(me) {
    const all = await api.get('/api/locations');
    const mine = new Set(me.locationCodes || []);
    return all.filter(l => (l.kind === 'CENTRAL_STORE' || l.kind === 'DEPOT')
        && (mine.size === 0 ? me.roles.includes('admin') : mine.has(l.code)));
}

function chooseStore(stores) {
    const asked = new URLSearchParams(location.search).get('location') || localStorage.getItem(STORE_KEY);
    const store = stores.find(s => s.code === asked) || stores.find(s => s.kind === 'DEPOT') || stores[0];
    if (store) {
        localStorage.setItem(STORE_KEY, store.code);
    }
    return store;
}

function picker(stores, store) {
    const select = h('select', {id: 'store', name: 'location'},
        stores.map(s => h('option', {value: s.code, selected: s.code === store.code}, storeName(s))));
    return h('form', {class: 'filters store-picker', method: 'get', action: location.pathname},
        h('label', {for: 'store'}, 'Store'), select, h('button', {type: 'submit'}, 'Show'));
}

function tabs(page, store, stores) {
    // The accuracy checks cover the whole programme: only accounts that see the central store may read them.
    const accuracy = stores.some(s => s.kind === 'CENTRAL_STORE')
        ? h('a', {href: '/app/lead/accuracy.html'}, 'Forecast accuracy') : null;
    return h('nav', {class: 'tabs', 'aria-label': 'Stores work'}, TASKS.map(t => h('a', {
        href: `${t.href}?location=${encodeURIComponent(store ? store.code : '')}`,
        'aria-current': t.page === page ? 'page' : null}, t.label)), accuracy);
}

export async function startOfficer({page, title}) {
    const me = await startPage({roles: ['stores-officer', 'admin']});
    // Every task page says which forecast run its planning numbers come from; the board draws its own line.
    const line = document.getElementById('provenance') ? null : h('p', {id: 'provenance', class: 'provenance'});
    const [stores, partList, run] = await Promise.all([storesOf(me), api.get('/api/parts'), line ? provenance(line, me) : undefined]);
    const store = chooseStore(stores);
    const head = document.getElementById('head');
    document.title = `${title}${store ? ` · ${store.code}` : ''} · depotcast`;
    mount(head, h('div', {class: 'page-head'}, h('h1', {}, title, store ? h('span', {class: 'muted h1-store'}, ` at ${storeName(store)}`) : null),
        stores.length > 1 ? picker(stores, store) : null), tabs(page, store, stores), line);
    if (!store) {
        head.append(h('p', {class: 'message'}, 'No store is assigned to your account yet. Ask an administrator to assign your depot.'));
    }
    const asked = new URLSearchParams(location.search).get('location');
    if (asked && store && asked !== store.code) {
        head.append(h('p', {class: 'message', id: 'store-not-yours'}, `${asked} is not one of your stores, so ${storeName(store)} `
            + `is shown. If you need ${asked}, ask the programme's administrator to assign it to your account.`));
    }
    const parts = new Map(partList.map(p => [p.partNumber, p]));
    return {me, stores, store, parts, run};
}

export function describe(parts, partNumber) {
    const p = parts.get(partNumber);
    return h('span', {class: 'part'}, h('strong', {}, partNumber), p ? h('span', {class: 'part__text'}, p.description) : null);
}

export function ready() {
    document.body.dataset.ready = 'true';
    performance.mark('depotcast-ready');
}

export function parseCsv(text) {
    const rows = [];
    let row = [];
    let cell = '';
    let quoted = false;
    const body = text.replace(/^\uFEFF/, '');
    for (let i = 0; i < body.length; i++) {
        const c = body[i];
        if (quoted) {
            if (c === '"' && body[i + 1] === '"') {
                cell += '"';
                i++;
            } else if (c === '"') {
                quoted = false;
            } else {
                cell += c;
            }
        } else if (c === '"') {
            quoted = true;
        } else if (c === ',') {
            row.push(cell);
            cell = '';
        } else if (c === '\n' || c === '\r') {
            if (c === '\r' && body[i + 1] === '\n') {
                i++;
            }
            row.push(cell);
            rows.push(row);
            row = [];
            cell = '';
        } else {
            cell += c;
        }
    }
    if (cell !== '' || row.length) {
        row.push(cell);
        rows.push(row);
    }
    return rows;
}

/** One CSV cell: quoted when it holds a comma, quote or line break. */
export function csvCell(value) {
    const text = value === null || value === undefined ? '' : String(value);
    return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

/** Whole packs of at least the minimum order that lift the position to the order-up-to level. */
export function orderQuantity(part, position, orderUpTo) {
    const gap = Math.max(0, Math.ceil(orderUpTo - position));
    const pack = part && part.packSize > 0 ? part.packSize : 1;
    const minimum = part && part.minOrderQty > 0 ? part.minOrderQty : 1;
    return Math.max(minimum, Math.ceil(gap / pack) * pack);
}
