/*
 * When what is on order reaches a store: for each part, the earliest expected day among the open purchase orders
 * still owing it here (for the central store, anywhere in the programme, as its "on order" counts), and whether a
 * transfer is on the way. The board says it beside "on order": a part "More than needed" because 30 are on order
 * reads as nothing to do while a pump has waited 34 days for an order due in March.
 */
import * as api from '/app/js/api.js';
import * as fmt from '/app/js/format.js';
import {h} from '/app/js/ui.js';

const DAY = 86400000;

/** Map of part number → {due: earliest expected ISO day or null, unset: an order with no day, since: a transfer's dispatch}. */
export async function arrivals(store, inbound, central) {
    const orders = await api.get('/api/purchase-orders', {status: 'OPEN'});
    const byPart = new Map();
    const entry = part => byPart.get(part) || byPart.set(part, {due: null, unset: false, since: null}).get(part);
    for (const order of orders) {
        if (!central && order.destination !== store.code) {
            continue;
        }
        for (const line of order.lines.filter(l => l.outstanding > 0)) {
            const e = entry(line.partNumber);
            if (!order.expectedOn) {
                e.unset = true;
            } else if (!e.due || order.expectedOn < e.due) {
                e.due = order.expectedOn;
            }
        }
    }
    for (const t of inbound) {
        const e = entry(t.partNumber);
        e.since = !e.since || t.dispatchedAt < e.since ? t.dispatchedAt : e.since;
    }
    return byPart;
}

/** "first due 15 Mar 2027, in 101 days" (or overdue, or no day given; a transfer on the way), or null. */
export function arrivalWords(e) {
    if (!e) {
        return null;
    }
    const said = [];
    if (e.due) {
        const days = Math.round((Date.parse(e.due) - Date.parse(fmt.isoDay())) / DAY);
        said.push(days >= 0 ? `first due ${fmt.date(e.due)}, in ${fmt.num(days)} ${days === 1 ? 'day' : 'days'}`
            : `first was due ${fmt.date(e.due)}, ${fmt.num(-days)} ${days === -1 ? 'day' : 'days'} ago: ask the supplier`);
    } else if (e.unset) {
        said.push('no expected day on the order');
    }
    if (e.since) {
        said.push(`a transfer on the way since ${fmt.date(e.since)}`);
    }
    return said.length ? h('span', {class: 'hint arrival', 'data-due': e.due || ''}, said.join('; ')) : null;
}
