/*
 * The morning board: the store's alerts in the API's order (worst expected pump-days without water first), the
 * numbers behind each, and what can be done about it here: acknowledge, snooze, send a suggested transfer, put the
 * part into the purchase plan. Counts of the other work waiting link to its page.
 */
import * as api from '/app/js/api.js';
import * as fmt from '/app/js/format.js';
import {provenance} from '/app/js/provenance.js';
import {methodWords} from '/app/js/methods.js';
import {h, mount, table, state, say, busy, figures, caution} from '/app/js/ui.js';
import {startOfficer, kindWords, describe, ready, orderQuantity, storeName} from './officer.js';
import {refusedRepairs} from './refused.js';
import {arrivals, arrivalWords} from './arrivals.js';

const {me, store, stores, parts} = await startOfficer({page: 'board', title: 'Morning board'});
const main = document.getElementById('content');
const unit = p => (parts.get(p) || {}).unitOfIssue;
// In the table the unit is said once, beside the part; the cells hold the bare number.
const n = (value, p) => fmt.wholeUnits(unit(p)) ? fmt.num(Math.round(value)) : fmt.num(value, 2);
const UNIT_NAMES = {EACH: 'pieces', PAIR: 'pairs', SET: 'sets', LENGTH: 'lengths', METRE: 'metres', KILOGRAM: 'kg', LITRE: 'litres'};
const names = new Map(stores.map(s => [s.code, s.name]));
// The central store buys for the whole programme: its alerts count stock in every store and kit (as the budget plan).
const central = store && store.kind === 'CENTRAL_STORE';

async function load() {
    if (!store) {
        ready();
        return;
    }
    // Refused repairs show with or without a forecast run: they wait on the officer, not on planning.
    const [run, refused] = await Promise.all([provenance(document.getElementById('provenance'), me), refusedRepairs(store, load)]);
    if (!run) {
        mount(main, refused);
        ready();
        return;
    }
    const query = {location: store.code};
    const [alerts, policies, suggestions, waiting, inbound] = await Promise.all([
        api.get('/api/planning/alerts', query), api.get('/api/planning/policies', query),
        api.get('/api/planning/transfers/suggestions'), api.get('/api/requests', {status: 'RAISED'}),
        api.get('/api/planning/transfers', {to: store.code, state: 'IN_TRANSIT'})]);
    const policyOf = new Map(policies.map(p => [p.partNumber, p]));
    const due = await arrivals(store, inbound, central);
    const mine = suggestions.filter(s => s.to === store.code || s.from === store.code);
    const requests = waiting.filter(r => r.depot === store.code);
    mount(main, refused, summary(alerts, requests, inbound, mine),
        h('section', {'aria-labelledby': 'alerts-title'},
            h('h2', {id: 'alerts-title'}, 'Alerts, most pump-days without water first'),
            // The number had no span: it is counted until the part's next resupply, the days under "Expected use".
            h('p', {class: 'hint', id: 'pump-days-meaning'}, 'Pump-days without water: the days pumps are expected to '
                + 'stand broken for want of the part until it is next resupplied here (the days under "Expected use"), '
                + 'with each pump already waiting counted for all of them.'),
            alertTable(alerts, policyOf, mine, due)),
        caution());
    ready();
}

function summary(alerts, requests, inbound, suggestions) {
    const link = (page, words) => h('a', {href: `/app/officer/${page}?location=${encodeURIComponent(store.code)}`}, words);
    const open = alerts.filter(a => !a.acknowledged);
    return h('div', {class: 'card board-summary'}, figures([
        ['Alerts not yet acknowledged', fmt.num(open.length)],
        ['Expected pump-days without water', fmt.pumpDays(alerts.reduce((t, a) => t + a.pumpDaysAtRisk, 0))],
        ['Pumps waiting for parts', fmt.num(new Set(alerts.flatMap(a => a.waitingPumps.map(p => p.assetId))).size)],
        ['Requests to approve', link('requests.html', fmt.num(requests.length))],
        ['Transfers on the way here', link('transfers.html', fmt.num(inbound.length))],
        ['Suggested transfers', link('transfers.html', fmt.num(suggestions.length))]
    ]));
}

function reasons(alert) {
    return h('div', {class: 'reasons'}, alert.reasons.map(r => state(kindWords(r.kind)[0], kindWords(r.kind)[1])),
        alert.acknowledged ? state('Acknowledged', 'ok') : null,
        alert.raisedAgainBy.length ? state('Raised again', 'warn') : null);
}

function pumps(alert, due) {
    if (!alert.waitingPumps.length) {
        return 'none';
    }
    // A pump can wait on its mechanic's kit while the part sits here (50 on the shelf, "More than needed", a pump
    // waiting 9 days): the shelf is not the problem, getting the part to the kit is.
    const spare = alert.onHand - alert.committed;
    return h('span', {class: 'pump-list'}, `${alert.pumpsWaiting}: `,
        alert.waitingPumps.map((p, i) => [i ? ', ' : '', h('span', {class: 'nowrap'}, `${p.assetId} (${fmt.num(p.daysWaiting)} d)`)]),
        spare > 0 ? h('span', {class: 'hint on-shelf'}, `${n(spare, alert.partNumber)} on the shelf here and not promised: `
            + `the pump waits on its mechanic's kit, not on this store`)
            // "More than needed" counts what is on order: with none here to give, say how long the pumps will wait.
            : alert.onOrder > 0 && arrivalWords(due) ? h('span', {class: 'hint'}, 'none here to give; what is on order: ',
                arrivalWords(due)) : null);
}

// The forecast method a policy carries when the latest run has no forecast of the part there (AlertRules.NO_FORECAST).
const unknown = alert => alert.forecastMethod === 'no forecast';

function alertTable(alerts, policyOf, suggestions, due) {
    const rows = alerts.map((a, i) => ({a, i, policy: policyOf.get(a.partNumber), due: due.get(a.partNumber)}));
    const wrap = table({
        caption: `${fmt.num(alerts.length)} alerts at ${storeName(store)}` + (central
            ? ': bought for the whole programme, so stock counts every store and kit, and what is on order' : ''),
        id: 'alerts',
        empty: 'No alerts at this store: every part is above its reorder point.',
        columns: [
            {label: 'Rank', value: r => String(r.i + 1), num: true},
            {label: 'Part', value: r => [describe(parts, r.a.partNumber),
                h('span', {class: 'hint'}, `counted in ${UNIT_NAMES[unit(r.a.partNumber)] || 'units'}`)]},
            {label: 'Why', value: r => reasons(r.a)},
            {label: 'Pump-days without water', value: r => fmt.pumpDays(r.a.pumpDaysAtRisk), num: true},
            {label: central ? 'On hand in the programme' : 'On hand', value: r => n(r.a.onHand, r.a.partNumber), num: true},
            // A depot's "on order" counts transfers dispatched to it and not yet received, as its position does.
            {label: central ? 'On order for the programme' : 'On order or on the way', value: r => r.a.onOrder > 0
                ? h('span', {}, n(r.a.onOrder, r.a.partNumber), arrivalWords(r.due)) : n(r.a.onOrder, r.a.partNumber), num: true},
            {label: 'Committed', value: r => n(r.a.committed, r.a.partNumber), num: true},
            // With no forecast the demand is unknown, not zero: the reason says there is no reorder point, so the
            // columns say so too (they showed 0, 1 and "0 over the next 60 days").
            {label: 'Reorder point', value: r => unknown(r.a) ? '–' : n(r.a.reorderPoint, r.a.partNumber), num: true},
            {label: 'Order up to', value: r => unknown(r.a) ? '–' : n(r.a.orderUpTo, r.a.partNumber), num: true},
            // The demand the reorder point covers, in the officer's words; an average, so a small one keeps a decimal
            // (0.3 showed as "0" beside a reorder point of 2).
            {label: 'Expected use', value: r => r.policy && !unknown(r.a)
                ? h('span', {}, fmt.num(r.policy.demandMean, r.policy.demandMean < 10 ? 1 : 0),
                    h('span', {class: 'hint'}, `over the next ${fmt.num(r.policy.protectionDays)} days`))
                : '–', num: true},
            {label: 'Pumps waiting', value: r => pumps(r.a, r.due)},
            {label: 'Actions', value: r => actions(r.a, r.policy, suggestions.filter(s => s.partNumber === r.a.partNumber))}
        ],
        rows
    });
    wrap.querySelectorAll('tbody tr').forEach((tr, i) => {
        tr.dataset.part = alerts[i].partNumber;
        tr.dataset.pumpDays = String(alerts[i].pumpDaysAtRisk);
        tr.classList.add('alert-row');
        // The details open in a row of their own below the alert, as wide as the table.
        tr.after(h('tr', {class: 'details-row', hidden: true, id: `details-${i}`},
            h('td', {colspan: 12, 'data-label': `Details of ${alerts[i].partNumber}`}, h('div', {class: 'alert-details'}))));
    });
    wrap.querySelector('table').classList.add('alert-table');
    return wrap;
}

function actions(alert, policy, suggestions) {
    const box = h('div', {class: 'actions'});
    // Every row has the same two buttons: the hidden words tell a screen reader which part each one is for.
    const forPart = h('span', {class: 'visually-hidden'}, ` the alert for ${alert.partNumber}`);
    const ack = h('button', {type: 'button', class: 'ack'}, 'Acknowledge', forPart);
    ack.addEventListener('click', () => busy(ack, async () => {
        await api.post('/api/planning/alerts/actions', {partNumber: alert.partNumber, location: alert.locationCode, action: 'ACKNOWLEDGE'});
        await load();
        say(`Alert for ${alert.partNumber} acknowledged until the next review.`);
    }));
    const more = h('button', {type: 'button', class: 'more', 'aria-expanded': 'false'}, 'Details, snooze, transfer, buy',
        h('span', {class: 'visually-hidden'}, ` for ${alert.partNumber}`));
    more.addEventListener('click', () => {
        const row = more.closest('tr').nextElementSibling;
        const details = row.querySelector('.alert-details');
        row.hidden = !row.hidden;
        more.setAttribute('aria-expanded', String(!row.hidden));
        more.setAttribute('aria-controls', row.id);
        if (!row.hidden && !details.childElementCount) {
            mount(details, detailsOf(alert, policy, suggestions));
        }
    });
    // append() writes a null as the word "null": an acknowledged alert keeps only its details button.
    box.append(...(alert.acknowledged ? [more] : [ack, more]));
    return box;
}

function detailsOf(alert, policy, suggestions) {
    const u = unit(alert.partNumber);
    return [
        h('h4', {}, 'Reasons'),
        h('ul', {}, alert.reasons.map(r => h('li', {}, `${kindWords(r.kind)[0]}: ${r.detail}`))),
        figures([
            ['Inventory position', fmt.qty(alert.position, u)],
            ['Demand a day', `${fmt.num(alert.dailyDemand, 2)} ${fmt.qty(2, u).replace(/^2 /, '')}`],
            ['Days of cover', alert.daysOfCover === null ? '–' : fmt.num(alert.daysOfCover, 1)],
            ['Forecast method', alert.forecastMethod ? methodWords(alert.forecastMethod) : '–'],
            policy ? ['Service level', fmt.percent(policy.serviceLevel)] : null
        ]),
        alert.waitingPumps.length ? table({caption: 'Pumps waiting for this part', rows: alert.waitingPumps, columns: [
            {label: 'Pump', value: p => p.assetId}, {label: 'Days waiting', value: p => fmt.num(p.daysWaiting), num: true},
            {label: 'Repair', value: p => p.repairRef}]}) : null,
        suggestions.length ? h('h4', {}, 'Suggested transfers') : null,
        suggestions.map(s => transferOffer(s, u)),
        snoozeForm(alert),
        planForm(alert)
    ];
}

function transferOffer(s, u) {
    const send = h('button', {type: 'button', class: 'primary'}, 'Dispatch this transfer');
    send.addEventListener('click', () => busy(send, async () => {
        const order = await api.post('/api/planning/transfers', {partNumber: s.partNumber, from: s.from, to: s.to,
            quantity: s.quantity, idempotencyKey: api.clientRef('dispatch')});
        await load();
        say(`Transfer ${order.id} dispatched: ${fmt.qty(order.quantity, u)} of ${s.partNumber} from ${s.from} to ${s.to}, now in transit.`);
    }));
    return h('div', {class: 'transfer'}, h('p', {}, `Send ${fmt.qty(s.quantity, u)} from ${names.get(s.from) || s.from} to `
        + `${names.get(s.to) || s.to} (${fmt.num(s.distanceKm)} km); removes about ${fmt.pumpDays(s.pumpDaysAvoided)} pump-days without water over the next ${s.overDays} days.`),
        me.locationCodes.length && !me.locationCodes.includes(s.from) && !me.roles.includes('admin')
            ? h('p', {class: 'hint'}, `The officer of ${s.from} dispatches it.`) : send);
}

function snoozeForm(alert) {
    const id = `snooze-${alert.partNumber}`;
    const input = h('input', {type: 'date', id, name: 'snoozeUntil', value: fmt.isoDay(7), min: fmt.isoDay(1), required: true});
    const note = h('input', {type: 'text', id: `${id}-note`, name: 'note', maxlength: 300});
    const go = h('button', {type: 'submit'}, 'Snooze');
    const form = h('form', {class: 'row'}, h('div', {class: 'inline-field'}, h('label', {for: id}, 'Snooze until'), input),
        h('div', {class: 'inline-field'}, h('label', {for: `${id}-note`}, 'Note (optional)'), note), go);
    form.addEventListener('submit', e => {
        e.preventDefault();
        busy(go, async () => {
            await api.post('/api/planning/alerts/actions', {partNumber: alert.partNumber, location: alert.locationCode,
                action: 'SNOOZE', snoozeUntil: input.value, note: note.value || null});
            await load();
            say(`Alert for ${alert.partNumber} snoozed until ${fmt.date(input.value)}.`);
        }, form);
    });
    return h('div', {}, h('h4', {}, 'Snooze'), form);
}

function planForm(alert) {
    const part = parts.get(alert.partNumber);
    const id = `plan-${alert.partNumber}`;
    const suggested = orderQuantity(part, alert.position, alert.orderUpTo);
    const input = h('input', {type: 'number', id, name: 'quantity', min: 0, step: fmt.wholeUnits(part && part.unitOfIssue) ? 1 : 'any', value: suggested});
    const go = h('button', {type: 'submit'}, 'Put into the purchase plan');
    const form = h('form', {class: 'row'}, h('div', {class: 'inline-field'},
        h('label', {for: id}, 'Quantity to buy', h('span', {class: 'hint'}, `up to the order-up-to level in packs of ${part ? part.packSize : 1}`)), input), go);
    form.addEventListener('submit', e => {
        e.preventDefault();
        busy(go, async () => {
            await api.put(`/api/planning/planned-purchases/${encodeURIComponent(alert.locationCode)}/${encodeURIComponent(alert.partNumber)}`,
                {quantity: Number(input.value), note: `${kindWords(alert.kind)[0]}: ${alert.detail}`.slice(0, 300)});
            say(`${alert.partNumber} is in the purchase plan of ${alert.locationCode}.`, 'ok',
                h('a', {href: `/app/officer/purchases.html?location=${encodeURIComponent(alert.locationCode)}`}, ' Open the purchase plan'));
        }, form);
    });
    return h('div', {}, h('h4', {}, 'Buy'), form);
}

await load();
