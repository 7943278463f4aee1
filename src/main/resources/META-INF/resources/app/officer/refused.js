/*
 * refused.js: the morning board's repairs refused for parts the kit's books did not hold (/api/refused-repairs for
 * the store's kits). Each says in words who used what, where and when, what the books held, and what to do: book
 * the parts to the kit, then the mechanic's phone can send the repair again (it closes here when it is recorded).
 * The officer may also dismiss one. Drawn only when some are open.
 *   const section = await refusedRepairs(store, reload)   a <section>, or null when none is open
 */
import * as api from '/app/js/api.js';
import * as fmt from '/app/js/format.js';
import {h, state, say, busy} from '/app/js/ui.js';

function partsWords(lines) {
    return lines.map(l => `${fmt.qty(l.unitsUsed, l.unitOfIssue)} of ${l.partNumber} (${l.description})`).join(' and ');
}

function heldWords(lines) {
    return lines.map(l => `${fmt.qty(l.unitsHeld, l.unitOfIssue)} of ${l.partNumber}`).join(' and ');
}

function sentWords(n) {
    return n.attempts === 1 ? `Sent once, ${fmt.dateTime(n.lastRefusedAt)}.`
        : `Sent ${fmt.num(n.attempts)} times, first ${fmt.dateTime(n.firstRefusedAt)}, last ${fmt.dateTime(n.lastRefusedAt)}.`;
}

function notice(n, reload) {
    const dismiss = h('button', {type: 'button', class: 'dismiss'}, 'Dismiss',
        h('span', {class: 'visually-hidden'}, ` the refused repair at pump ${n.assetId}`));
    dismiss.addEventListener('click', () => busy(dismiss, async () => {
        await api.post(`/api/refused-repairs/${n.id}/dismiss`);
        await reload();
        say(`The refused repair at pump ${n.assetId} is dismissed; the mechanic's phone still keeps it.`);
    }));
    return h('li', {class: 'card refused-repair', 'data-ref': n.repairRef},
        h('p', {}, state('Refused: parts not on the kit\'s books', 'urgent')),
        h('p', {class: 'refused-repair__words'}, `Mechanic ${n.mechanic} reported using ${partsWords(n.lines)} at pump `
            + `${n.assetId} on ${fmt.date(n.fixedOn)}; the books of kit ${n.kitCode} held ${heldWords(n.lines)}. `
            + `Book the parts to kit ${n.kitCode} (a transfer to the kit or a count of it), then the phone can send it again.`),
        h('p', {class: 'hint'}, `${sentWords(n)} It closes here when the repair is recorded.`),
        dismiss);
}

export async function refusedRepairs(store, reload) {
    if (store.kind !== 'DEPOT') {
        return null;
    }
    const open = await api.get('/api/refused-repairs', {depot: store.code});
    if (!open.length) {
        return null;
    }
    return h('section', {'aria-labelledby': 'refused-title', id: 'refused-repairs'},
        h('h2', {id: 'refused-title'}, `Repairs refused for parts not on a kit's books: ${fmt.num(open.length)}`),
        h('ul', {class: 'plain-list'}, open.map(n => notice(n, reload))));
}
