/*
 * Budget plan: enter a budget, see what the plan buys and why, pump-days without water before and after, what was
 * left out; accept it into purchase orders at the central store, or download it as CSV. ?plan=ID reopens a plan.
 */
import {startLeadPage, ready, api, fmt} from './lead.js';
import {h, mount, table, state, busy, caution, showError} from '/app/js/ui.js';

const {run} = await startLeadPage();
const planBox = document.getElementById('plan');
const form = document.getElementById('budget-form');
const parts = await api.get('/api/parts');
const units = new Map(parts.map(p => [p.partNumber, p.unitOfIssue]));
const counts = {};
parts.forEach(p => counts[p.currency] = (counts[p.currency] || 0) + 1);
const currency = Object.entries(counts).sort((a, b) => b[1] - a[1])[0]?.[0] || 'USD';
document.getElementById('budget-currency').textContent = `in ${currency}, the currency of most of the catalogue`;

const REASONS = {BUDGET: 'the budget ran out', OTHER_CURRENCY: 'priced in another currency (no exchange rate set)'};

function pumpDays(v) {
    return `${fmt.pumpDays(v)} pump-days`;
}

function acceptedOrders(orders, plan) {
    const mine = orders.filter(o => o.orderNumber.startsWith(`PP${plan.id}-`));
    return h('div', {class: 'message message--ok', id: 'accepted'},
        h('p', {}, `Accepted: ${mine.length} purchase order${mine.length === 1 ? '' : 's'} placed for delivery to the central store.`),
        table({caption: 'Purchase orders from this plan', rows: mine, columns: [
            {label: 'Order', value: o => o.orderNumber}, {label: 'Supplier', value: o => o.supplier},
            {label: 'Lines', num: true, value: o => fmt.num(o.lines.length)},
            {label: 'Ordered', value: o => fmt.date(o.orderedOn)}, {label: 'Expected', value: o => fmt.date(o.expectedOn)},
            {label: 'State', value: o => state(o.status.toLowerCase().replace(/_/g, ' '), 'info')}]}));
}

async function show(plan) {
    history.replaceState(null, '', `?plan=${plan.id}`);
    const q = (value, part) => fmt.qty(value, units.get(part));
    const accepted = plan.status === 'ACCEPTED';
    const acceptButton = h('button', {type: 'button', class: 'primary', id: 'accept', disabled: accepted || !plan.lines.length},
        'Accept into purchase orders');
    const outcome = h('div', {id: 'outcome'});
    acceptButton.addEventListener('click', () => busy(acceptButton, async () => {
        const done = await api.post(`/api/planning/purchase-plans/${plan.id}/accept`);
        await show(done);
    }));
    mount(planBox, h('div', {class: 'card'},
        h('div', {class: 'page-head'}, h('h2', {}, `Plan ${plan.id} for ${fmt.money(plan.budget, plan.currency)}`),
            state(accepted ? 'accepted: purchase orders placed' : 'proposed: nothing ordered yet', accepted ? 'ok' : 'info')),
        h('p', {class: 'provenance'}, `Worked out on ${fmt.date(plan.planningDate)}${run ? ` from forecast run ${run.id}` : ''}.`),
        h('p', {class: 'message'}, h('strong', {}, 'Before you buy: '), plan.caution),
        h('div', {class: 'before-after'},
            h('p', {}, 'Expected pump-days without water: ', h('strong', {id: 'pump-days-before'}, pumpDays(plan.pumpDaysBefore)),
                ' before, ', h('strong', {id: 'pump-days-after'}, pumpDays(plan.pumpDaysAfter)), ' after this plan.'),
            h('p', {}, 'Spent: ', h('strong', {id: 'spent'}, fmt.money(plan.spent, plan.currency)), ` of ${fmt.money(plan.budget, plan.currency)}.`)),
        h('p', {class: 'hint'}, `The plan's aim: to ${plan.objective.statement}.`),
        // The plan buys for the programme, so its positions are the programme's, not the central store's shelf.
        h('p', {class: 'hint', id: 'position-meaning'}, 'Stock positions here are the whole programme\'s: what the central '
            + 'store, the depots and the mechanics\' kits hold, plus what is on order, against the programme\'s reorder '
            + 'point and order-up-to level.'),
        h('div', {class: 'row no-print'}, acceptButton,
            h('a', {class: 'button', href: `/api/planning/purchase-plans/${plan.id}/export`, download: `purchase-plan-${plan.id}.csv`},
                'Download as CSV')),
        outcome,
        table({caption: `What the plan buys (${plan.lines.length} line${plan.lines.length === 1 ? '' : 's'})`, id: 'plan-lines', rows: plan.lines,
            empty: 'The budget buys nothing: no part is below its reorder point, or the smallest order costs more than the budget.',
            columns: [{label: 'Part', value: l => `${l.partNumber} · ${l.description}`}, {label: 'Supplier', value: l => l.supplier},
                {label: 'Packs', num: true, value: l => fmt.num(l.packs)},
                {label: 'Quantity', num: true, value: l => q(l.quantity, l.partNumber)},
                {label: 'Cost', num: true, value: l => fmt.money(l.cost, plan.currency)},
                {label: 'Programme stock position before', num: true, value: l => q(l.positionBefore, l.partNumber)},
                // The plan buys up to the reorder point first and past it only where a unit still saves most: the
                // position after shows where each part ends, often short of its order-up-to level.
                {label: 'Position after', num: true, value: l => q(l.positionBefore + l.quantity, l.partNumber)},
                {label: 'Reorder point', num: true, value: l => q(l.reorderPoint, l.partNumber)},
                {label: 'Order-up-to', num: true, value: l => q(l.orderUpTo, l.partNumber)}]}),
        table({caption: 'Left out', id: 'plan-left-out', rows: plan.leftOut,
            empty: 'Nothing left out: every part that was below its reorder point reaches it with this plan.',
            columns: [{label: 'Part', value: l => `${l.partNumber} · ${l.description}`},
                {label: 'Still needed', num: true, value: l => q(l.quantity, l.partNumber)},
                {label: 'Would cost', num: true, value: l => fmt.money(l.cost, l.currency)},
                {label: 'Why left out', value: l => REASONS[l.reason] || l.reason.toLowerCase()},
                {label: 'Programme position after the plan', num: true, value: l => q(l.positionAfter, l.partNumber)},
                {label: 'Reorder point', num: true, value: l => q(l.reorderPoint, l.partNumber)}]}),
        plan.noForecast.length ? h('p', {}, `Not weighed, having no programme forecast in the run: ${plan.noForecast.join(', ')}.`) : null,
        caution()));
    if (accepted) {
        mount(outcome, acceptedOrders(await api.get('/api/purchase-orders'), plan));
    }
}

form.addEventListener('submit', e => {
    e.preventDefault();
    busy(e.submitter || form.querySelector('button'), async () => {
        const plan = await api.post('/api/planning/purchase-plans', {budget: form.budget.value === '' ? null : Number(form.budget.value)});
        await show(plan);
        document.getElementById('plan').scrollIntoView({block: 'start'});
    }, form);
});

const reopen = new URLSearchParams(location.search).get('plan');
if (reopen) {
    try {
        await show(await api.get(`/api/planning/purchase-plans/${encodeURIComponent(reopen)}`));
    } catch (e) {
        showError(e);
    }
} else if (!run) {
    form.querySelector('button').disabled = true;
}
ready();
