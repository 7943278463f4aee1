/*
 * forms.js: two of the things a mechanic does on the phone, ask for parts and record a repair (a pump's report is in
 * report.js), and the pieces the forms share. A form checks what it can on the phone, then hands an outbox item to
 * `queue` (see store.js); the item carries the reference made here, so it counts once however often it is sent.
 */
import * as api from '/app/js/api.js';
import * as fmt from '/app/js/format.js';
import {h, mount, showError, clearErrors} from '/app/js/ui.js';
import {partLabel, partQty} from './views.js';
import {waitingUse} from './data.js';

let fieldIds = 0;

export function field(label, input, hint) {
    const id = input.id || `f${++fieldIds}`;
    input.id = id;
    return h('div', {class: 'field'}, h('label', {for: id}, label, hint ? h('span', {class: 'hint'}, hint) : null), input);
}

function pumpSelect(snapshot, name, withKit) {
    return h('select', {name, required: !withKit},
        withKit ? h('option', {value: ''}, 'Kit top-up (no pump)') : h('option', {value: ''}, 'Choose a pump'),
        snapshot.pumps.map(p => h('option', {value: p.assetId}, `${p.assetId} (${p.status === 'BROKEN' ? 'broken' : 'working'})`)));
}

/** Rows of part and quantity; `choices` lists the part numbers offered. */
export function partLines(snapshot, legend, choices, describe) {
    const list = h('div', {class: 'part-lines'});
    const box = h('fieldset', {}, h('legend', {}, legend), list);
    const add = (partNumber = '', quantity = 1) => {
        const i = list.children.length;
        const select = h('select', {'data-field': `lines[${i}].partNumber`, 'aria-label': `Part, line ${i + 1}`},
            h('option', {value: ''}, 'Choose a part'), choices.map(n => h('option', {value: n}, describe(n))));
        select.value = partNumber;
        const amount = h('input', {type: 'number', min: '0', step: 'any', inputmode: 'decimal', value: String(quantity),
            'data-field': `lines[${i}].quantity`, 'aria-label': `Quantity, line ${i + 1}`});
        const row = h('div', {class: 'part-line'}, select, amount, h('button', {type: 'button', 'aria-label': `Remove line ${i + 1}`,
            onclick: () => row.remove()}, 'Remove'));
        list.append(row);
    };
    box.append(h('button', {type: 'button', onclick: () => add()}, 'Add a part'));
    return {box, add, clear: () => mount(list), read: () => [...list.children].map(row => {
        const [select, amount] = row.querySelectorAll('select, input');
        const part = snapshot.parts.find(p => p.partNumber === select.value);
        return {partNumber: select.value, quantity: amount.value === '' ? NaN : Number(amount.value), select, amount,
            unit: part ? part.unitOfIssue : null};
    })};
}

export function checkLines(lines, required) {
    const errors = [];
    const seen = new Set();
    lines.forEach((l, i) => {
        l.select.dataset.field = `lines[${i}].partNumber`;
        l.amount.dataset.field = `lines[${i}].quantity`;
        if (!l.partNumber) {
            errors.push({field: `lines[${i}].partNumber`, message: 'choose a part or remove this line'});
        } else if (seen.has(l.partNumber)) {
            errors.push({field: `lines[${i}].partNumber`, message: 'this part is already on another line'});
        }
        seen.add(l.partNumber);
        if (!(l.quantity > 0)) {
            errors.push({field: `lines[${i}].quantity`, message: 'give a quantity above zero'});
        } else if (l.unit && fmt.wholeUnits(l.unit) && !Number.isInteger(l.quantity)) {
            // The API refuses it too; on the phone it is said now, not when the connection returns.
            errors.push({field: `lines[${i}].quantity`, message: `give a whole number: this part is counted in ${fmt.qty(2, l.unit).replace(/^2 /, '')}`});
        }
    });
    if (required && !lines.length) {
        errors.push({field: 'lines', message: 'add at least one part'});
    }
    return errors;
}

/**
 * Beside the forms that record work on a pump: the safety words the page's foot holds, where the work is written
 * down. depotcast plans parts and does not say how to repair; these are the rules the repair itself falls under.
 */
export function repairCaution() {
    return h('p', {class: 'message repair-caution'}, h('strong', {}, 'Safety: '), 'parts that touch drinking water (seals, '
        + 'pipes, grease) and any substitute must be approved for that use here. After a repair that opens the rising main, '
        + 'the water authority\'s disinfection and testing rules apply before people drink from the pump.');
}

export function refuse(form, errors) {
    showError({errors, detail: 'Check the marked fields; nothing was saved.'}, form);
    return false;
}

export function describeKit(snapshot) {
    const onHand = new Map(snapshot.balances.map(b => [b.partNumber, b.onHand]));
    const units = new Map(snapshot.parts.map(p => [p.partNumber, p.unitOfIssue]));
    return n => `${partLabel(snapshot, n)} (${fmt.qty(onHand.get(n) || 0, units.get(n))} in kit)`;
}

/**
 * Under the parts used of a fixed repair: the lines that take more than the kit held at the last refresh, less what
 * the fixed repairs still waiting to send take, since the server refuses such a repair unless parts reached the kit
 * since. It warns and does not stop the form: the phone's data may be older than the parts in the mechanic's hands.
 *   waiting()  the mechanic's outbox now;  fixed()  whether this repair is recorded as fixed
 */
export function kitShortfall(snapshot, waiting, form, lines, fixed) {
    const note = h('p', {class: 'kit-short', role: 'status', 'aria-live': 'polite'});
    const units = new Map(snapshot.parts.map(p => [p.partNumber, p.unitOfIssue]));
    const draw = () => {
        const held = new Map(snapshot.balances.map(b => [b.partNumber, Number(b.onHand)]));
        const using = waitingUse(waiting());
        const short = !fixed() ? [] : lines.read().filter(l => l.partNumber && l.quantity > 0)
            .map(l => ({...l, left: Math.max(0, (held.get(l.partNumber) || 0) - (using.get(l.partNumber) || 0)), waits: using.has(l.partNumber)}))
            .filter(l => l.quantity > l.left);
        mount(note, short.length ? [h('strong', {}, 'More than your kit holds: '),
            short.map(l => `${l.partNumber} has ${fmt.qty(l.left, units.get(l.partNumber))} left${l.waits ? ' after the repairs waiting to send' : ''}`)
                .join('; ') + `, as of the last refresh. The server will refuse this repair unless these parts reached your kit since.`] : []);
    };
    ['input', 'change', 'click', 'reset'].forEach(e => form.addEventListener(e, () => setTimeout(draw)));
    return {note, draw};
}

export function askForm(snapshot, queue) {
    const lines = partLines(snapshot, 'Parts', snapshot.parts.map(p => p.partNumber), n => partLabel(snapshot, n));
    const form = h('form', {id: 'ask-form', novalidate: true},
        field('For', pumpSelect(snapshot, 'assetId', true)),
        field('Urgency', h('select', {name: 'urgency'}, h('option', {value: 'ROUTINE'}, 'Routine'),
            h('option', {value: 'PUMP_DOWN'}, 'Pump down: people are without water'))),
        field('Fault or note', h('textarea', {name: 'fault', maxlength: '300', rows: '2'}), 'optional, up to 300 characters'),
        lines.box,
        h('p', {}, h('button', {type: 'submit', class: 'primary'}, 'Ask for these parts')));
    form.addEventListener('submit', async e => {
        e.preventDefault();
        clearErrors(form);
        const read = lines.read();
        const errors = checkLines(read, true);
        if (form.elements.urgency.value === 'PUMP_DOWN' && !form.elements.assetId.value) {
            // The server refuses it too: "pump down" is about one pump, and the officer needs to know which.
            errors.push({field: 'assetId', message: 'choose the pump that is down, or ask as routine for a kit top-up'});
        }
        if (errors.length) {
            return refuse(form, errors);
        }
        const assetId = form.elements.assetId.value || null;
        const ref = api.clientRef('req');
        const body = {clientRef: ref, assetId, urgency: form.elements.urgency.value, fault: form.elements.fault.value.trim() || null,
            lines: read.map(l => ({partNumber: l.partNumber, quantity: l.quantity}))};
        await queue({kind: 'request', method: 'POST', path: '/api/requests', body, ref, assetId,
            summary: `Parts request ${assetId ? `for pump ${assetId}` : 'to top up the kit'}: ${body.lines.map(l => partQty(snapshot, l.partNumber, l.quantity)).join(', ')}`});
        form.reset();
        lines.clear();
        lines.add();
        return true;
    });
    lines.add();
    return {form, open(assetId, wanted) {
        form.elements.assetId.value = assetId || '';
        if (wanted && wanted.length) {
            lines.clear();
            wanted.forEach(w => lines.add(w.partNumber, w.quantity));
        }
    }};
}

export function repairForm(snapshot, queue, waiting) {
    const kitParts = snapshot.balances.map(b => b.partNumber);
    const lines = partLines(snapshot, 'Parts used from your kit', kitParts, describeKit(snapshot));
    const today = fmt.isoDay();
    const date = (name, value) => h('input', {type: 'date', name, max: today, value: value || ''});
    const form = h('form', {id: 'repair-form', novalidate: true},
        field('Pump', pumpSelect(snapshot, 'assetId', false)),
        field('Kind of work', h('select', {name: 'kind'}, h('option', {value: 'BREAKDOWN'}, 'Breakdown repair'),
            h('option', {value: 'PREVENTIVE'}, 'Preventive service'))),
        field('Fault found', h('textarea', {name: 'fault', maxlength: '300', rows: '2'}), 'what was wrong, up to 300 characters'),
        h('div', {class: 'row'}, field('Reported on', date('reportedOn', today)), field('Diagnosed on', date('diagnosedOn'), 'optional'),
            field('Fixed on', date('fixedOn', today), 'leave empty while the pump waits')),
        lines.box,
        h('p', {class: 'hint'}, 'A fixed repair takes its parts out of your kit when it reaches the server.'),
        repairCaution(),
        h('p', {}, h('button', {type: 'submit', class: 'primary'}, 'Record this repair')));
    const shortfall = kitShortfall(snapshot, waiting, form, lines, () => Boolean(form.elements.fixedOn.value));
    lines.box.after(shortfall.note);
    form.addEventListener('submit', async e => {
        e.preventDefault();
        clearErrors(form);
        const v = name => form.elements[name].value || null;
        const errors = checkLines(lines.read(), false);
        if (!v('assetId')) {
            errors.push({field: 'assetId', message: 'choose the pump'});
        }
        if (!v('reportedOn')) {
            errors.push({field: 'reportedOn', message: 'give the day the breakdown was reported'});
        }
        const order = ['reportedOn', 'diagnosedOn', 'fixedOn'].filter(n => v(n));
        for (let i = 0; i < order.length; i++) {
            if (v(order[i]) > today) {
                errors.push({field: order[i], message: 'cannot be after today'});
            } else if (i > 0 && v(order[i]) < v(order[i - 1])) {
                errors.push({field: order[i], message: 'dates run reported, diagnosed, fixed'});
            }
        }
        if (errors.length) {
            return refuse(form, errors);
        }
        const ref = api.clientRef('rep');
        const body = {repairRef: ref, assetId: v('assetId'), kind: v('kind'), reportedOn: v('reportedOn'),
            diagnosedOn: v('diagnosedOn'), fixedOn: v('fixedOn'), fault: (v('fault') || '').trim() || null,
            lines: lines.read().map(l => ({partNumber: l.partNumber, quantity: l.quantity}))};
        await queue({kind: 'repair', method: 'POST', path: '/api/repairs', body, ref, assetId: body.assetId,
            summary: `${body.kind === 'PREVENTIVE' ? 'Service' : 'Repair'} of pump ${body.assetId}${body.fixedOn ? `, fixed ${fmt.date(body.fixedOn)}` : ', not fixed yet'}`
                + (body.lines.length ? `, parts used: ${body.lines.map(l => partQty(snapshot, l.partNumber, l.quantity)).join(', ')}` : '')});
        form.reset();
        form.elements.reportedOn.value = today;
        form.elements.fixedOn.value = today;
        lines.clear();
        return true;
    });
    return {form, open(assetId) {
        form.elements.assetId.value = assetId || '';
        shortfall.draw();
    }};
}
