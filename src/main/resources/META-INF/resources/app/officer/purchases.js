/*
 * Purchases: the store's purchase plan (parts put into it from the board, shared by the store's officers) turned
 * into purchase orders, one per supplier; and the open purchase orders for this store, received in full or line by line in part. Each
 * receipt carries a key made here, so a second press never books the goods twice.
 */
import * as api from '/app/js/api.js';
import * as fmt from '/app/js/format.js';
import {h, mount, table, state, say, busy, caution, showError} from '/app/js/ui.js';
import {startOfficer, describe, ready} from './officer.js';

const {store, parts} = await startOfficer({page: 'purchases', title: 'Purchases'});
const main = document.getElementById('content');
const unit = p => (parts.get(p) || {}).unitOfIssue;

async function load() {
    if (!store) {
        ready();
        return;
    }
    const [allOrders, plan] = await Promise.all([api.get('/api/purchase-orders', {status: 'OPEN'}),
        api.get('/api/planning/planned-purchases', {location: store.code})]);
    const orders = allOrders.filter(o => o.destination === store.code);
    const bySupplier = new Map();
    plan.forEach(l => bySupplier.set(l.supplier, [...(bySupplier.get(l.supplier) || []), l]));
    mount(main,
        h('section', {'aria-labelledby': 'plan-title'}, h('h2', {id: 'plan-title'}, `Purchase plan for ${store.code} (${plan.length} part${plan.length === 1 ? '' : 's'})`),
            h('p', {class: 'hint'}, 'Parts put into the plan from the morning board, by anyone who looks after this store, until they are ordered.'),
            plan.length ? h('div', {class: 'task-list'}, [...bySupplier].map(([supplier, lines]) => orderForm(supplier, lines)))
                : h('p', {class: 'empty'}, 'The plan is empty. Use "Put into the purchase plan" on an alert of the morning board.')),
        h('section', {'aria-labelledby': 'receive-title'}, h('h2', {id: 'receive-title'}, `Purchase orders to receive (${orders.length})`),
            orders.length ? h('div', {class: 'task-list'}, orders.map(receiveCard)) : h('p', {class: 'empty'}, 'No open purchase order comes to this store.')),
        h('p', {}, h('a', {class: 'button', href: '/api/purchase-orders/export', download: 'purchase-orders.csv'}, 'Download all purchase orders (CSV)')),
        caution());
    ready();
}

function orderForm(supplier, lines) {
    const slug = supplier.replace(/[^A-Za-z0-9]+/g, '-');
    const leadDays = Math.max(0, ...lines.map(l => l.leadTimeDays));
    const plannedAt = `/api/planning/planned-purchases/${encodeURIComponent(store.code)}`;
    const number = h('input', {type: 'text', id: `po-${slug}`, name: 'orderNumber', maxlength: 40, required: true,
        value: `PO-${store.code}-${fmt.isoDay().replaceAll('-', '')}-${slug.slice(0, 6).toUpperCase()}`});
    const expected = h('input', {type: 'date', id: `due-${slug}`, name: 'expectedOn', value: fmt.isoDay(leadDays)});
    const total = h('strong', {});
    const quantities = lines.map((l, i) => h('input', {type: 'number', id: `pq-${slug}-${i}`, name: 'quantity', min: 0,
        step: fmt.wholeUnits(unit(l.partNumber)) ? 1 : 'any', value: Number(l.quantity), class: 'count-input'}));
    const sum = () => mount(total, fmt.money(lines.reduce((t, l, i) => t + Number(quantities[i].value || 0) * Number(l.unitCost), 0), lines[0].currency));
    const form = h('form', {class: 'task', 'data-supplier': supplier});
    const saving = [];
    quantities.forEach((input, i) => input.addEventListener('change', () => {
        sum();
        // Each change is saved at once, so the plan others see is the one on this screen.
        saving.push(api.put(`${plannedAt}/${encodeURIComponent(lines[i].partNumber)}`, {quantity: Number(input.value), note: lines[i].note})
            .then(() => say(`${lines[i].partNumber}: ${fmt.qty(input.value, unit(lines[i].partNumber))} in the plan.`))
            .catch(e => showError(e, form)));
    }));
    const go = h('button', {type: 'submit', class: 'primary'}, 'Place the purchase order');
    mount(form, h('h3', {}, supplier),
        table({caption: `Parts to order from ${supplier}`, captionHidden: true, rows: lines, columns: [
            {label: 'Part', value: l => [describe(parts, l.partNumber), l.note ? h('span', {class: 'hint'}, l.note) : null]},
            {label: 'Quantity', value: (l, i) => [h('label', {for: quantities[i].id, class: 'visually-hidden'}, `Quantity of ${l.partNumber}`), quantities[i]]},
            // "5 pieces, 5 pieces" left the officer to guess which was the pack and which the minimum.
            {label: 'Pack, minimum order', value: l => `packs of ${fmt.qty(l.packSize, unit(l.partNumber))}; `
                + `at least ${fmt.qty(l.minOrderQty, unit(l.partNumber))}`, num: true},
            {label: 'Unit cost', value: l => fmt.money(l.unitCost, l.currency), num: true},
            {label: 'Put in by', value: l => `${l.addedBy}, ${fmt.date(l.addedAt)}`},
            {label: 'Take out', value: l => {
                const drop = h('button', {type: 'button'}, `Take ${l.partNumber} out`);
                drop.addEventListener('click', () => busy(drop, async () => {
                    await api.del(`${plannedAt}/${encodeURIComponent(l.partNumber)}`);
                    await load();
                    say(`${l.partNumber} taken out of the plan.`);
                }));
                return drop;
            }}]}),
        h('p', {}, 'Order value: ', total),
        h('div', {class: 'line-grid'}, h('div', {}, h('label', {for: number.id}, 'Order number'), number),
            h('div', {}, h('label', {for: expected.id}, 'Expected on', h('span', {class: 'hint'}, `longest lead time ${leadDays} days`)), expected)),
        go);
    sum();
    form.addEventListener('submit', e => {
        e.preventDefault();
        busy(go, async () => {
            await Promise.all(saving);
            const order = await api.post(`${plannedAt}/orders`, {orderNumber: number.value, supplier, expectedOn: expected.value || null});
            await load();
            say(`Purchase order ${order.orderNumber} placed with ${supplier}; it counts as on order from now.`);
        }, form);
    });
    return form;
}

function receiveCard(o) {
    const open = o.lines.filter(l => Number(l.outstanding) > 0);
    const inputs = open.map((l, i) => h('input', {type: 'number', id: `rq-${o.orderNumber}-${i}`, name: 'quantity', min: 0,
        step: 'any', value: Number(l.outstanding), class: 'count-input'}));
    const keys = open.map(() => api.clientRef('receipt'));
    const receive = async quantities => {
        for (let i = 0; i < open.length; i++) {
            if (quantities[i] > 0) {
                await api.post(`/api/purchase-orders/${encodeURIComponent(o.orderNumber)}/receipts`,
                    {partNumber: open[i].partNumber, quantity: quantities[i], idempotencyKey: keys[i]});
            }
        }
        await load();
        say(`Goods booked in against ${o.orderNumber}.`);
    };
    const all = h('button', {type: 'button', class: 'primary receive-all'}, 'Everything outstanding arrived');
    const some = h('button', {type: 'submit', class: 'receive-part'}, 'Book the quantities entered');
    const form = h('form', {class: 'task', 'data-order': o.orderNumber},
        h('h3', {}, `${o.orderNumber} from ${o.supplier} `, state('Open', 'info')),
        h('p', {class: 'small'}, `Ordered ${fmt.date(o.orderedOn)}, expected ${fmt.date(o.expectedOn)}.`),
        table({caption: `Lines of ${o.orderNumber}`, captionHidden: true, rows: open, columns: [
            {label: 'Part', value: l => describe(parts, l.partNumber)},
            {label: 'Ordered', value: l => fmt.qty(l.quantityOrdered, unit(l.partNumber)), num: true},
            {label: 'Received', value: l => fmt.qty(l.quantityReceived, unit(l.partNumber)), num: true},
            {label: 'Outstanding', value: l => fmt.qty(l.outstanding, unit(l.partNumber)), num: true},
            {label: 'Arrived now', value: (l, i) => [h('label', {for: inputs[i].id, class: 'visually-hidden'}, `Arrived now of ${l.partNumber}`), inputs[i]]}]}),
        h('div', {class: 'row'}, all, some));
    all.addEventListener('click', () => busy(all, () => receive(open.map(l => Number(l.outstanding))), form));
    form.addEventListener('submit', e => {
        e.preventDefault();
        busy(some, () => {
            const quantities = inputs.map(i => Number(i.value || 0));
            // Nothing above 0 used to book nothing yet say "booked in": refused here, beside the first line.
            if (!quantities.some(q => q > 0)) {
                throw {errors: [{field: 'quantity', message: 'enter what arrived, more than 0, on at least one line'}],
                    detail: `Nothing was booked against ${o.orderNumber}.`};
            }
            return receive(quantities);
        }, form);
    });
    return form;
}

await load();
