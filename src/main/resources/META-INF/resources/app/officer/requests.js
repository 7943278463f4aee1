/*
 * Requests: the mechanics' parts requests at this depot. Raised ones are approved in full, in part or with a
 * substitute from the part's compatibility list, or refused with a reason; approved ones are issued to the
 * mechanic's kit. A substitute for a part touching drinking water carries the API's caution.
 */
import * as api from '/app/js/api.js';
import * as fmt from '/app/js/format.js';
import {h, mount, table, state, say, busy, caution, showError} from '/app/js/ui.js';
import {startOfficer, describe, ready} from './officer.js';

const {store, parts} = await startOfficer({page: 'requests', title: 'Parts requests'});
const main = document.getElementById('content');
const unit = p => (parts.get(p) || {}).unitOfIssue;
const STATUS_WORDS = {RAISED: ['Waiting for approval', 'warn'], APPROVED: ['Approved, to issue', 'info'],
    PARTLY_APPROVED: ['Partly approved, to issue', 'info'], ISSUED: ['Issued', 'ok'], REFUSED: ['Refused', 'quiet'],
    CLOSED: ['Closed', 'quiet'], CANCELLED: ['Cancelled', 'quiet']};
const statusOf = s => state(...(STATUS_WORDS[s] || [s, 'quiet']));
const SUBSTITUTE_CAUTION = 'A substitute for a part in contact with drinking water (seals, pipes, grease) must be approved for '
    + 'drinking-water contact where the pump is installed, under national drinking-water quality rules and local codes, '
    + 'whatever the compatibility list says.';

async function load() {
    if (!store) {
        ready();
        return;
    }
    const all = (await api.get('/api/requests')).filter(r => r.depot === store.code);
    const raised = all.filter(r => r.status === 'RAISED');
    const toIssue = all.filter(r => r.status === 'APPROVED' || r.status === 'PARTLY_APPROVED');
    const substitutes = new Map(await Promise.all([...new Set(raised.flatMap(r => r.lines.map(l => l.partNumber)))]
        .map(async p => [p, await api.get(`/api/parts/${encodeURIComponent(p)}/substitutes`)])));
    mount(main,
        h('section', {'aria-labelledby': 'raised-title'}, h('h2', {id: 'raised-title'}, `Waiting for approval (${raised.length})`),
            raised.length ? h('div', {class: 'task-list'}, raised.map(r => approvalCard(r, substitutes)))
                : h('p', {class: 'empty'}, 'No request is waiting for approval at this depot.')),
        h('section', {'aria-labelledby': 'issue-title'}, h('h2', {id: 'issue-title'}, `Approved, to issue to the kit (${toIssue.length})`),
            toIssue.length ? h('div', {class: 'task-list'}, toIssue.map(issueCard))
                : h('p', {class: 'empty'}, 'Nothing approved is waiting to be issued.')),
        h('section', {'aria-labelledby': 'done-title'}, h('h2', {id: 'done-title'}, 'Earlier requests'),
            table({caption: 'Issued, refused, closed and cancelled requests at this depot', rows: all.filter(r => !raised.includes(r) && !toIssue.includes(r)),
                empty: 'None yet.', columns: [
                    {label: 'Request', value: r => String(r.id)}, {label: 'Mechanic', value: r => r.mechanic},
                    {label: 'Raised', value: r => fmt.dateTime(r.raisedAt)}, {label: 'State', value: r => statusOf(r.status)},
                    {label: 'Parts', value: r => r.lines.map(l => Number(l.issued) > 0
                        ? `${l.substitute || l.partNumber}: ${fmt.qty(l.issued, unit(l.partNumber))} issued`
                        : `${l.partNumber}: ${fmt.qty(l.requested, unit(l.partNumber))} asked`).join('; ')}]})),
        caution());
    ready();
}

function heading(r) {
    return [h('h3', {}, `Request ${r.id} from ${r.mechanic} (${r.kit}) `, statusOf(r.status)),
        // A "pump down" request from before one had to name its pump is not a kit top-up: requestFor says which it is.
        h('p', {class: 'small muted'}, r.urgency === 'PUMP_DOWN' && !r.assetId ? fmt.requestFor(r)
            : `${r.urgency === 'PUMP_DOWN' ? 'Pump down' : 'Routine'} · ${r.assetId ? `pump ${r.assetId}` : 'kit top-up'}`,
            r.fault ? ` · fault: ${r.fault}` : '',
            ` · raised ${fmt.dateTime(r.raisedAt)}`)];
}

function approvalCard(r, substitutes) {
    // The page names a wrong quantity beside its field in words, not in the browser's own bubble.
    const form = h('form', {class: 'task', 'data-request-id': r.id, novalidate: true});
    const caution = h('p', {class: 'message', hidden: true}, SUBSTITUTE_CAUTION);
    const lines = r.lines.map((l, i) => {
        const qty = h('input', {type: 'number', id: `q-${r.id}-${i}`, name: `lines[${i}].quantity`, min: 0, max: l.requested,
            step: 'any', value: Number(l.requested), class: 'count-input'});
        const options = substitutes.get(l.partNumber) || [];
        const sub = h('select', {id: `s-${r.id}-${i}`, name: `lines[${i}].substitutePartNumber`},
            h('option', {value: ''}, `${l.partNumber} as asked`), options.map(p => h('option', {value: p}, `Substitute ${p}`)));
        sub.addEventListener('change', () => {
            caution.hidden = ![...form.querySelectorAll('select')].some(s => s.value);
        });
        return {l, qty, sub, cell: h('fieldset', {}, h('legend', {}, describe(parts, l.partNumber)),
            h('p', {class: 'small'}, `Asked for ${fmt.qty(l.requested, unit(l.partNumber))}`),
            h('div', {class: 'inline-field'}, h('label', {for: qty.id}, 'Approve'), qty),
            options.length ? h('div', {class: 'inline-field'}, h('label', {for: sub.id}, 'Part to issue'), sub)
                : h('p', {class: 'hint'}, 'No substitute on the compatibility list.'))};
    });
    const note = h('input', {type: 'text', id: `note-${r.id}`, name: 'note', maxlength: 300});
    const reason = h('input', {type: 'text', id: `reason-${r.id}`, name: 'reason', maxlength: 300});
    const full = h('button', {type: 'button', class: 'primary approve-full'}, 'Approve in full');
    const asEntered = h('button', {type: 'submit', class: 'approve-entered'}, 'Approve as entered');
    const refuse = h('button', {type: 'button', class: 'danger refuse'}, 'Refuse');
    const approve = body => api.post(`/api/requests/${r.id}/approve`, body).then(async view => {
        await load();
        say(`Request ${r.id} ${view.status === 'APPROVED' ? 'approved in full' : 'partly approved'}; the parts are set aside until issued.`,
            'ok', view.cautions.length ? h('ul', {}, view.cautions.map(c => h('li', {}, c))) : null);
    });
    full.addEventListener('click', () => busy(full, () => approve({lines: r.lines.map(l => ({partNumber: l.partNumber,
        quantity: l.requested})), note: note.value || null}), form));
    form.addEventListener('submit', e => {
        e.preventDefault();
        const errors = lines.flatMap((x, i) => overAsked(x, i));
        if (errors.length) {
            showError({errors, detail: 'Check the marked quantities; nothing was approved.'}, form);
            return;
        }
        busy(asEntered, () => approve({lines: lines.map(x => ({partNumber: x.l.partNumber, quantity: x.qty.value === '' ? null : Number(x.qty.value),
            substitutePartNumber: x.sub.value || null})), note: note.value || null}), form);
    });
    refuse.addEventListener('click', () => busy(refuse, async () => {
        await api.post(`/api/requests/${r.id}/refuse`, {reason: reason.value});
        await load();
        say(`Request ${r.id} refused; ${r.mechanic} sees the reason.`);
    }, form));
    mount(form, heading(r), h('div', {class: 'line-grid'}, lines.map(x => x.cell)), caution,
        h('div', {class: 'inline-field'}, h('label', {for: note.id}, 'Note to the mechanic (optional)'), note),
        h('div', {class: 'row'}, full, asEntered),
        h('div', {class: 'row'}, h('div', {class: 'inline-field'}, h('label', {for: reason.id}, 'Reason for refusing'), reason), refuse));
    return form;
}

/** What the API would refuse in a line's quantity, said before sending (the API still checks). */
function overAsked({l, qty}, i) {
    const value = qty.value === '' ? NaN : Number(qty.value);
    const asked = fmt.qty(l.requested, unit(l.partNumber));
    const message = !(value >= 0) ? `give a quantity from 0 to the ${asked} asked for`
        : value > Number(l.requested) ? `cannot approve more than the ${asked} asked for` : null;
    return message ? [{field: `lines[${i}].quantity`, message}] : [];
}

function issueCard(r) {
    const go = h('button', {type: 'button', class: 'primary issue'}, `Issue to ${r.kit}`);
    go.addEventListener('click', () => busy(go, async () => {
        await api.post(`/api/requests/${r.id}/issue`);
        await load();
        say(`Request ${r.id} issued: the parts moved from ${r.depot} to ${r.kit}.`);
    }));
    return h('div', {class: 'task', 'data-request-id': r.id}, heading(r),
        table({caption: `Parts approved for request ${r.id}`, captionHidden: true, rows: r.lines, columns: [
            {label: 'Part', value: l => describe(parts, l.substitute || l.partNumber)},
            {label: 'In place of', value: l => l.substitute ? l.partNumber : '–'},
            {label: 'Asked', value: l => fmt.qty(l.requested, unit(l.partNumber)), num: true},
            {label: 'Approved', value: l => fmt.qty(l.approved, unit(l.substitute || l.partNumber)), num: true}]}),
        r.cautions.length ? h('div', {class: 'message'}, r.cautions.map(c => h('p', {}, c))) : null, go);
}

await load();
