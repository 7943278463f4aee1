/*
 * close.js: the mechanic closes an open repair as fixed: the day it was fixed and the parts it took from the kit
 * (the parts the repair was waiting for, as a start). The change goes to the outbox as a PATCH of the repair under
 * its own reference, so sending it twice changes nothing (the API keeps a date already recorded, and answers 409
 * only when a different fix date is on record, e.g. an officer closed it first; that refusal is shown in words).
 */
import * as fmt from '/app/js/format.js';
import {h, clearErrors} from '/app/js/ui.js';
import {partQty} from './views.js';
import {field, partLines, checkLines, refuse, describeKit, kitShortfall, repairCaution} from './forms.js';

function repairWords(r) {
    return `${r.assetId}: ${r.kind === 'PREVENTIVE' ? 'service' : 'repair'} reported ${fmt.date(r.reportedOn)}`
        + (r.fault ? ` (${r.fault.length > 40 ? `${r.fault.slice(0, 40)}…` : r.fault})` : '');
}

/** The latest date already on the repair: the fix cannot be dated before it. */
function latestDate(r) {
    return [r.reportedOn, r.diagnosedOn, r.partsAvailableOn].filter(Boolean).sort().pop();
}

export function closeForm(snapshot, queue, waiting) {
    const open = snapshot.openRepairs;
    const byRef = new Map(open.map(r => [r.repairRef, r]));
    // The kit's parts and those the open repairs wait for (one may have come since the page last read the kit).
    const choices = [...new Set([...snapshot.balances.map(b => b.partNumber), ...open.flatMap(r => r.lines.map(l => l.partNumber))])].sort();
    const lines = partLines(snapshot, 'Parts used from your kit', choices, describeKit(snapshot));
    const today = fmt.isoDay();
    const form = h('form', {id: 'close-form', novalidate: true},
        field('Repair', h('select', {name: 'repairRef', onchange: () => fill()}, h('option', {value: ''}, 'Choose an open repair'),
            open.map(r => h('option', {value: r.repairRef}, repairWords(r))))),
        field('Fixed on', h('input', {type: 'date', name: 'fixedOn', max: today, value: today})),
        lines.box,
        h('p', {class: 'hint'}, 'Closing takes these parts out of your kit when it reaches the server, and the pump counts as '
            + 'working again unless another breakdown of it is still open.'),
        repairCaution(),
        h('p', {}, h('button', {type: 'submit', class: 'primary'}, 'Close this repair as fixed')));
    const shortfall = kitShortfall(snapshot, waiting, form, lines, () => true);
    lines.box.after(shortfall.note);
    const fill = () => {
        const r = byRef.get(form.elements.repairRef.value);
        lines.clear();
        (r ? r.lines : []).forEach(l => lines.add(l.partNumber, Number(l.quantity)));
        form.elements.fixedOn.min = r ? latestDate(r) : '';
        shortfall.draw();
    };
    form.addEventListener('submit', async e => {
        e.preventDefault();
        clearErrors(form);
        const r = byRef.get(form.elements.repairRef.value);
        const fixedOn = form.elements.fixedOn.value;
        const errors = checkLines(lines.read(), false);
        if (!r) {
            errors.push({field: 'repairRef', message: 'choose the repair you fixed'});
        }
        if (!fixedOn || fixedOn > today) {
            errors.push({field: 'fixedOn', message: 'give the day it was fixed, up to today'});
        } else if (r && fixedOn < latestDate(r)) {
            errors.push({field: 'fixedOn', message: `cannot be before ${fmt.date(latestDate(r))}, already on the repair`});
        }
        if (errors.length) {
            return refuse(form, errors);
        }
        const body = {fixedOn, lines: lines.read().map(l => ({partNumber: l.partNumber, quantity: l.quantity}))};
        await queue({kind: 'close', method: 'PATCH', path: `/api/repairs/${encodeURIComponent(r.repairRef)}`, body,
            ref: r.repairRef, assetId: r.assetId,
            summary: `Close the ${r.kind === 'PREVENTIVE' ? 'service' : 'repair'} of pump ${r.assetId} as fixed on ${fmt.date(fixedOn)}`
                + (body.lines.length ? `, parts used: ${body.lines.map(l => partQty(snapshot, l.partNumber, l.quantity)).join(', ')}` : '')});
        form.reset();
        form.elements.fixedOn.value = today;
        lines.clear();
        return true;
    });
    return {form, open(assetId, repairRef) {
        form.elements.repairRef.value = repairRef || '';
        fill();
    }};
}

