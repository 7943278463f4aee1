/*
 * Purchases: the purchase plan (parts put aside from the board in this browser) turned into purchase orders, one
 * per supplier; and the open purchase orders for this store, received in full or line by line in part. Each
 * receipt carries a key made here, so a second press never books the goods twice.
 */
import * as api from '/app/js/api.js';
import * as fmt from '/app/js/format.js';
import {h, mount, table, state, say, busy, caution} from '/app/js/ui.js';
import {startOfficer, describe, ready, purchasePlan} from './officer.js';

const {store, parts} = await startOfficer({page: 'purchases', title: 'Purchases'});
const main = document.getElementById('content');
const unit = p => (parts.get(p) || {}).unitOfIssue;

async function load() {
    if (!store) {
        ready();
        return;
    }
    const orders = (await api.get('/api/purchase-orders', {status: 'OPEN'})).filter(o => o.destination === store.code);
    const plan = purchasePlan.list().filter(l => l.destination === store.code);
    const bySupplier = new Map();
    plan.forEach(l => bySupplier.set(l.supplier || 'Supplier not set', [...(bySupplier.get(l.supplier || 'Supplier not set') || []), l]));
    mount(main,
        h('section', {'aria-labelledby': 'plan-title'}, h('h2', {id: 'plan-title'}, `Purchase plan for ${store.code} (${plan.length} parts)`),
            h('p', {class: 'hint'}, 'Parts put into the plan from the morning board, kept in this browser until they are ordered.'),
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
    const leadDays = Math.max(0, ...lines.map(l => (parts.get(l.partNumber) || {}).leadTimeDays || 0));
    const number = h('input', {type: 'text', id: `po-${slug}`, name: 'orderNumber', maxlength: 40, required: true,
        value: `PO-${store.code}-${fmt.isoDay().replaceAll('-', '')}-${slug.slice(0, 6).toUpperCase()}`});
    const expected = h('input', {type: 'date', id: `due-${slug}`, name: 'expectedOn', value: fmt.isoDay(leadDays)});
    const quantities = lines.map((l, i) => h('input', {type: 'number', id: `pq-${slug}-${i}`, name: `lines[${i}].quantity`, min: 1,
        step: 'any', value: l.quantity, class: 'count-input'}));
    const go = h('button', {type: 'submit', class: 'primary'}, 'Place the purchase order');
    const form = h('form', {class: 'task', 'data-supplier': supplier}, h('h3', {}, supplier),
        table({caption: `Parts to order from ${supplier}`, captionHidden: true, rows: lines, columns: [
            {label: 'Part', value: l => describe(parts, l.partNumber)},
            {label: 'Quantity', value: (l, i) => [h('label', {for: quantities[i].id, class: 'visually-hidden'}, `Quantity of ${l.partNumber}`), quantities[i]]},
            {label: 'Pack', value: l => fmt.qty((parts.get(l.partNumber) || {}).packSize, unit(l.partNumber)), num: true},
            {label: 'Unit cost', value: l => fmt.money((parts.get(l.partNumber) || {}).unitCost, (parts.get(l.partNumber) || {}).currency), num: true},
            {label: '', value: l => {
                const drop = h('button', {type: 'button'}, `Take ${l.partNumber} out`);
                drop.addEventListener('click', () => {
                    purchasePlan.remove(l.partNumber, store.code);
                    load();
                });
                return drop;
            }}]}),
        h('div', {class: 'line-grid'}, h('div', {}, h('label', {for: number.id}, 'Order number'), number),
            h('div', {}, h('label', {for: expected.id}, 'Expected on', h('span', {class: 'hint'}, `longest lead time ${leadDays} days`)), expected)),
        go);
    form.addEventListener('submit', e => {
        e.preventDefault();
        busy(go, async () => {
            const order = await api.post('/api/purchase-orders', {orderNumber: number.value, supplier, destination: store.code,
                orderedOn: fmt.isoDay(), expectedOn: expected.value || null,
                lines: lines.map((l, i) => ({partNumber: l.partNumber, quantity: Number(quantities[i].value)}))});
            lines.forEach(l => purchasePlan.remove(l.partNumber, store.code));
            say(`Purchase order ${order.orderNumber} placed with ${supplier}; it counts as on order from now.`);
            await load();
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
        say(`Goods booked in against ${o.orderNumber}.`);
        await load();
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
        busy(some, () => receive(inputs.map(i => Number(i.value || 0))), form);
    });
    return form;
}

await load();
