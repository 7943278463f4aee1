/*
 * Transfers: suggestions touching this store (sent from here with one click), a dispatch by hand, transfers on
 * the way here to receive in full or in part (with what was lost or damaged and why), and those sent from here.
 * Each dispatch and receipt carries a key made here, so pressing twice never moves stock twice.
 */
import * as api from '/app/js/api.js';
import * as fmt from '/app/js/format.js';
import {h, mount, table, state, say, busy, caution} from '/app/js/ui.js';
import {startOfficer, describe, ready} from './officer.js';

const {me, store, parts, run} = await startOfficer({page: 'transfers', title: 'Transfers'});
const main = document.getElementById('content');
const unit = p => (parts.get(p) || {}).unitOfIssue;
const mayDispatchFrom = code => me.roles.includes('admin') || me.locationCodes.includes(code);
// Lane costs are in the currency most of the catalogue is priced in, as on the lead's lane settings.
const currencies = {};
[...parts.values()].forEach(p => currencies[p.currency] = (currencies[p.currency] || 0) + 1);
const laneCurrency = Object.entries(currencies).sort((a, b) => b[1] - a[1])[0]?.[0] || 'USD';

async function load() {
    if (!store) {
        ready();
        return;
    }
    // Suggestions need forecasts: before the first run (startOfficer read which) there are none to ask for.
    const [suggestions, inbound, outbound] = await Promise.all([
        run ? api.get('/api/planning/transfers/suggestions') : null,
        api.get('/api/planning/transfers', {to: store.code, state: 'IN_TRANSIT'}),
        api.get('/api/planning/transfers', {from: store.code})]);
    const mine = (suggestions || []).filter(s => s.from === store.code || s.to === store.code);
    mount(main,
        h('section', {'aria-labelledby': 'suggest-title'}, h('h2', {id: 'suggest-title'}, 'Suggested transfers'),
            suggestions === null ? h('p', {class: 'message'}, 'No forecast has been run yet, so there are no suggestions.')
                : suggestionTable(mine)),
        h('section', {'aria-labelledby': 'receive-title'}, h('h2', {id: 'receive-title'}, `On the way here (${inbound.length})`),
            inbound.length ? h('div', {class: 'task-list'}, inbound.map(receiveCard))
                : h('p', {class: 'empty'}, 'Nothing is on the way to this store.')),
        h('section', {'aria-labelledby': 'hand-title'}, h('h2', {id: 'hand-title'}, 'Dispatch by hand'), handForm()),
        h('section', {'aria-labelledby': 'sent-title'}, h('h2', {id: 'sent-title'}, 'Sent from here'), sentTable(outbound)),
        caution());
    ready();
}

function dispatch(button, body, form) {
    return busy(button, async () => {
        const order = await api.post('/api/planning/transfers', {...body, idempotencyKey: button.dataset.key});
        await load();
        say(`Transfer ${order.id} dispatched: ${fmt.qty(order.quantity, unit(order.partNumber))} of ${order.partNumber} `
            + `from ${order.from} to ${order.to}, now in transit.`);
    }, form);
}

function suggestionTable(rows) {
    const wrap = table({caption: 'Moves that remove the most pump-days without water for their transport cost; pump-days are '
        + 'those the receiving store would otherwise lose before its next delivery (transfer time and review)', id: 'suggestions', rows,
        empty: 'No transfer is suggested for this store now.', columns: [
            {label: 'Part', value: s => describe(parts, s.partNumber)},
            {label: 'From', value: s => s.from}, {label: 'To', value: s => s.to},
            {label: 'Quantity', value: s => fmt.qty(s.quantity, unit(s.partNumber)), num: true},
            {label: 'Distance', value: s => `${fmt.num(s.distanceKm)} km`, num: true},
            {label: 'Transport cost', value: s => fmt.money(s.quantity * s.unitCost, laneCurrency), num: true},
            {label: 'Pump-days avoided', value: s => `${fmt.pumpDays(s.pumpDaysAvoided)} over ${s.overDays} days`, num: true},
            {label: 'Action', value: s => {
                if (!mayDispatchFrom(s.from)) {
                    return h('span', {class: 'hint'}, `The officer of ${s.from} dispatches it.`);
                }
                const go = h('button', {type: 'button', class: 'primary dispatch', 'data-key': api.clientRef('dispatch'),
                    'data-part': s.partNumber, 'data-from': s.from, 'data-to': s.to, 'data-quantity': s.quantity}, 'Dispatch',
                    h('span', {class: 'visually-hidden'}, ` ${s.partNumber} from ${s.from} to ${s.to}`));
                go.addEventListener('click', () => dispatch(go, {partNumber: s.partNumber, from: s.from, to: s.to, quantity: s.quantity}));
                return go;
            }}]});
    return wrap;
}

function handForm() {
    const part = h('select', {id: 'hand-part', name: 'partNumber', required: true}, h('option', {value: ''}, 'Choose a part'),
        [...parts.values()].map(p => h('option', {value: p.partNumber}, `${p.partNumber} – ${p.description}`)));
    const to = h('select', {id: 'hand-to', name: 'to', required: true}, h('option', {value: ''}, 'Choose a store'),
        allStores.filter(s => s.code !== store.code).map(s => h('option', {value: s.code}, `${s.name} (${s.code})`)));
    const quantity = h('input', {type: 'number', id: 'hand-quantity', name: 'quantity', min: 1, step: 'any', required: true});
    const go = h('button', {type: 'submit', class: 'primary', 'data-key': api.clientRef('dispatch')}, `Dispatch from ${store.code}`);
    const form = h('form', {class: 'task', id: 'hand-dispatch'},
        h('div', {class: 'line-grid'}, h('div', {}, h('label', {for: 'hand-part'}, 'Part'), part),
            h('div', {}, h('label', {for: 'hand-to'}, 'To'), to),
            h('div', {}, h('label', {for: 'hand-quantity'}, 'Quantity'), quantity)),
        h('p', {class: 'hint'}, 'The stock leaves this store now and stays in transit until the receiving store books it.'), go);
    form.addEventListener('submit', e => {
        e.preventDefault();
        dispatch(go, {partNumber: part.value, from: store.code, to: to.value, quantity: Number(quantity.value)}, form);
    });
    return mayDispatchFrom(store.code) ? form : h('p', {class: 'hint'}, 'Only the officers of this store dispatch from it.');
}

function receiveCard(t) {
    const u = unit(t.partNumber);
    const received = h('input', {type: 'number', id: `got-${t.id}`, name: 'receivedQuantity', min: 0, step: 'any', value: Number(t.outstanding)});
    const lost = h('input', {type: 'number', id: `lost-${t.id}`, name: 'writtenOffQuantity', min: 0, step: 'any', value: 0});
    const reason = h('input', {type: 'text', id: `why-${t.id}`, name: 'writeOffReason', maxlength: 300});
    const key = api.clientRef('receipt');
    const all = h('button', {type: 'button', class: 'primary receive-all'}, `Everything arrived (${fmt.qty(t.outstanding, u)})`);
    const part = h('button', {type: 'submit', class: 'receive-part'}, 'Book what is entered');
    const form = h('form', {class: 'task', 'data-transfer-id': t.id},
        h('h3', {}, `Transfer ${t.id}: `, describe(parts, t.partNumber), ' ', state('In transit', 'info')),
        h('p', {class: 'small'}, `${fmt.qty(t.quantity, u)} sent from ${t.from} ${fmt.dateTime(t.dispatchedAt)} by ${t.actor}; `
            + `${fmt.qty(t.outstanding, u)} still on the way.`),
        all,
        h('details', {}, h('summary', {}, 'Only part of it arrived, or some was lost or damaged'),
            h('div', {class: 'line-grid'}, h('div', {}, h('label', {for: received.id}, 'Arrived'), received),
                h('div', {}, h('label', {for: lost.id}, 'Lost or damaged'), lost),
                h('div', {}, h('label', {for: reason.id}, 'What happened (needed when something was lost)'), reason)), part));
    const receive = body => api.post(`/api/planning/transfers/${t.id}/receive`, {...body, idempotencyKey: key}).then(async order => {
        await load();
        say(`Transfer ${t.id}: ${order.status === 'RECEIVED' ? 'received' : `${fmt.qty(order.outstanding, u)} still on the way`}.`);
    });
    all.addEventListener('click', () => busy(all, () => receive({receivedQuantity: Number(t.outstanding)}), form));
    form.addEventListener('submit', e => {
        e.preventDefault();
        busy(part, () => receive({receivedQuantity: Number(received.value || 0), writtenOffQuantity: Number(lost.value || 0),
            writeOffReason: reason.value || null}), form);
    });
    return form;
}

function sentTable(rows) {
    return table({caption: 'Transfers dispatched from this store, in transit first', rows, empty: 'None yet.', columns: [
        {label: 'Transfer', value: t => String(t.id)}, {label: 'Part', value: t => describe(parts, t.partNumber)},
        {label: 'To', value: t => t.to}, {label: 'Sent', value: t => fmt.qty(t.quantity, unit(t.partNumber)), num: true},
        {label: 'Received', value: t => fmt.qty(t.receivedQuantity, unit(t.partNumber)), num: true},
        {label: 'Lost or damaged', value: t => fmt.qty(t.writtenOffQuantity, unit(t.partNumber)), num: true},
        {label: 'State', value: t => t.status === 'RECEIVED' ? state('Received', 'ok') : state('In transit', 'info')},
        {label: 'Dispatched', value: t => fmt.dateTime(t.dispatchedAt)}]});
}

const allStores = (await api.get('/api/locations')).filter(l => l.kind === 'CENTRAL_STORE' || l.kind === 'DEPOT');
await load();
