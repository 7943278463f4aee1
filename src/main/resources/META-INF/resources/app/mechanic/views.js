/*
 * views.js: the mechanic's page drawn from a snapshot and the outbox: kit, pumps, requests, waiting actions.
 * Every state is said in words (the colour only repeats it).
 */
import * as fmt from '/app/js/format.js';
import {h, state, table} from '/app/js/ui.js';
import {kitRows} from './data.js';
import {stopWords} from './pumplist.js';
import {isShortage, shortageText} from './send.js';
import {downWords, fellWords} from '/app/js/sensors.js';

const KIT_STATES = {
    out: ['Out: none left', 'urgent'], 'top-up': ['At or below min: top up', 'warn'],
    'above-max': ['Above max', 'info'], enough: ['Enough', 'ok'], 'no-policy': ['No min or max yet', 'quiet']
};
const REQUEST_STATES = {
    RAISED: ['Waiting for approval', 'info'], APPROVED: ['Approved, to be issued', 'ok'],
    PARTLY_APPROVED: ['Partly approved, to be issued', 'warn'], REFUSED: ['Refused', 'urgent'],
    ISSUED: ['Issued to your kit', 'ok'], CLOSED: ['Closed', 'quiet'], CANCELLED: ['Cancelled', 'quiet']
};
const SERVICE_STATES = {OVERDUE: 'urgent', DUE_SOON: 'warn', LATER: 'ok', NOT_IN_USE: 'quiet'};

function unitOf(snapshot, partNumber) {
    const part = snapshot.parts.find(p => p.partNumber === partNumber);
    return part ? part.unitOfIssue : undefined;
}

/** A quantity of one part in the part's unit, as the kit table says it: "2 pieces OB-CS-50", "1.5 m PIPE-25". */
export function partQty(snapshot, partNumber, quantity) {
    return `${fmt.qty(quantity, unitOf(snapshot, partNumber))} ${partNumber}`;
}

export function partLabel(snapshot, partNumber) {
    const part = snapshot.parts.find(p => p.partNumber === partNumber);
    return part ? `${partNumber} · ${part.description}` : partNumber;
}

export function kitView(snapshot, waiting, onAsk) {
    const rows = kitRows(snapshot, waiting);
    const asks = rows.filter(r => r.ask > 0);
    const q = (value, r) => fmt.qty(value, r.part && r.part.unitOfIssue);
    return [
        snapshot.policies ? null : h('p', {class: 'muted'}, 'Min and max come from the forecasts; none has been run yet, so only what you hold is shown.'),
        table({caption: `Kit ${snapshot.me.kitCode || ''}: on hand against min and max`, id: 'kit-table', rows,
            empty: 'Your kit holds nothing on record.', columns: [
                {label: 'Part', value: r => h('span', {}, h('strong', {}, r.partNumber), h('span', {class: 'hint'}, r.part ? r.part.description : ''))},
                {label: 'On hand', num: true, value: r => h('span', {}, q(r.onHand, r), r.waitingUse
                    ? h('span', {class: 'hint'}, `${q(r.waitingUse, r)} in repairs waiting to send`) : null)},
                {label: 'Min', num: true, value: r => r.min === null ? '–' : q(r.min, r)},
                {label: 'Max', num: true, value: r => r.max === null ? '–' : q(r.max, r)},
                {label: 'Coming', num: true, value: r => r.coming ? q(r.coming, r) : '–'},
                {label: 'State', value: r => state(...KIT_STATES[r.state])},
                {label: 'Ask for', num: true, value: r => r.ask ? h('strong', {}, q(r.ask, r)) : '–'}
            ]}),
        asks.length ? h('p', {class: 'row'}, h('button', {type: 'button', class: 'primary', id: 'ask-top-up',
            onclick: () => onAsk(null, asks.map(r => ({partNumber: r.partNumber, quantity: r.ask})))},
            `Ask for a top-up of ${asks.length === 1 ? 'this part' : `these ${asks.length} parts`}`))
            : h('p', {class: 'muted'}, 'Nothing to ask for: every part is above its min, counting what is coming.')
    ];
}

/** Below this a pump's recent use shows as "0 h a day" and a due date worked out from it lies centuries ahead. */
const HARDLY_USED_HOURS_A_DAY = 0.05;

/** A pump card's service state in words, with the hours behind it. */
export function serviceLine(due) {
    if (!due) {
        return null;
    }
    const hours = `${fmt.num(due.hoursSinceService)} of ${fmt.num(due.serviceIntervalHours)} operating hours since `
        + (due.lastServiceOn ? `the service on ${fmt.date(due.lastServiceOn)}` : due.serviceOnRecord
            ? `installation (${fmt.date(due.countedFrom)})` : `${fmt.date(due.countedFrom)}, no service on record since`);
    const hardlyUsed = due.hoursPerDay < HARDLY_USED_HOURS_A_DAY;
    const words = {
        OVERDUE: `Service overdue since about ${fmt.date(due.dueOn)}`,
        DUE_SOON: `Service due ${fmt.date(due.dueOn)}`,
        LATER: hardlyUsed ? `Next service after ${fmt.num(due.hoursLeft)} more operating hours`
            : `Next service about ${fmt.date(due.dueOn)}`,
        NOT_IN_USE: 'Not in use: no service falls due'
    }[due.state];
    const use = hardlyUsed && due.hoursPerDay > 0 ? 'hardly used lately (under 0.1 h a day), so no date can be given'
        : `at ${fmt.num(due.hoursPerDay, 1)} h a day`;
    return h('p', {class: 'pump__service'}, state(words, SERVICE_STATES[due.state]), h('span', {class: 'hint'}, `${hours}; ${use}.`));
}

/** An open repair on a pump's card, with the button that closes it, or the words that its closing waits to send. */
function openRepair(snapshot, r, waiting, act) {
    const closing = waiting.find(i => i.kind === 'close' && i.ref === r.repairRef);
    return h('li', {'data-repair': r.repairRef},
        `Open ${r.kind === 'PREVENTIVE' ? 'service' : 'repair'}, reported ${fmt.date(r.reportedOn)}`,
        r.fault ? `: ${r.fault}` : '', r.lines.length ? `; needs ${r.lines.map(l => partQty(snapshot, l.partNumber, l.quantity)).join(', ')}` : '',
        h('span', {class: 'hint'}, `Reference ${r.repairRef}`),
        closing ? h('p', {}, state(closing.state === 'refused' ? 'Closing refused: see "Waiting to send"' : 'Closed on this phone: waiting to send',
            closing.state === 'refused' ? 'urgent' : 'info'))
            : h('button', {type: 'button', class: 'close-repair', onclick: () => act('close', r.assetId, r.repairRef)}, 'Close as fixed'));
}

/** The sensor's judgement on a pump's card, with what to check before the trip. */
function sensorLine(sensor) {
    return sensor ? h('p', {class: 'pump__sensor'}, state(`Sensor: ${downWords(sensor)}`, 'warn'), h('span', {class: 'hint'},
        `${fellWords(sensor)}. Not known to be broken: ask the community before the trip.`)) : null;
}

/** A pump's card from its row of pumplist.js ({pump, due, repairs, sensor, stop}). */
export function pumpCard(snapshot, {pump, due, repairs, sensor, stop}, waiting, act) {
    const statusWords = pump.status === 'BROKEN' ? [`Broken since ${fmt.date(pump.statusSince || pump.brokenSince)}`, 'urgent']
        : [`Working${pump.statusSince ? ` since ${fmt.date(pump.statusSince)}` : ''}`, 'ok'];
    const mine = waiting.filter(i => i.assetId === pump.assetId);
    return h('article', {class: 'pump card', id: `pump-${pump.assetId}`, 'aria-labelledby': `pump-${pump.assetId}-name`},
        h('h3', {id: `pump-${pump.assetId}-name`}, pump.assetId, ' ', h('span', {class: 'hint pump__model'},
            `${pump.modelCode}, ${fmt.num(pump.depthM, 1)} m deep`)),
        stop ? h('p', {class: 'pump__stop'}, stopWords(stop)) : null,
        h('p', {}, state(...statusWords), pump.statusNote ? h('span', {class: 'hint'}, pump.statusNote) : null),
        sensorLine(sensor),
        serviceLine(due),
        repairs.length ? h('ul', {class: 'pump__repairs', 'aria-label': 'Open repairs'}, repairs.map(r => openRepair(snapshot, r, waiting, act)))
            : null,
        mine.length ? h('p', {class: 'hint'}, `${mine.length} of your actions for this pump ${mine.length === 1 ? 'is' : 'are'} waiting to send.`) : null,
        h('div', {class: 'row pump__actions'},
            pump.status === 'BROKEN'
                ? h('button', {type: 'button', onclick: () => act('status', pump.assetId, 'WORKING')}, 'Report working again')
                // Flagged by its sensor, the report starts from the day use fell, as from the sensors' list.
                : h('button', {type: 'button', onclick: () => act('status', pump.assetId, 'BROKEN', sensor)}, 'Report broken'),
            h('button', {type: 'button', onclick: () => act('repair', pump.assetId)}, 'Record a repair'),
            h('button', {type: 'button', onclick: () => act('ask', pump.assetId)}, 'Ask for parts')));
}

export function requestsView(snapshot, waiting) {
    const lines = r => r.lines.map(l => partQty(snapshot, l.partNumber, l.requested)
        + (l.substitute ? ` (approved as ${l.substitute})` : '')
        + (l.approved !== null && l.approved !== undefined && Number(l.approved) !== Number(l.requested) ? `, ${fmt.qty(l.approved, unitOf(snapshot, l.partNumber))} approved` : '')).join('; ');
    const recent = snapshot.requests.slice(0, 30);
    const refusal = r => (r.history || []).filter(e => e.reason).map(e => e.reason).pop();
    return table({caption: 'My parts requests, newest first', id: 'requests-table', rows: recent,
        empty: waiting.some(i => i.kind === 'request') ? 'None on the server yet; yours are waiting to send.' : 'No requests yet.',
        columns: [
            {label: 'Raised', value: r => fmt.date(r.raisedAt)},
            {label: 'For', value: r => fmt.requestFor(r)},
            {label: 'Parts', value: r => lines(r)},
            {label: 'State', value: r => h('span', {}, state(...(REQUEST_STATES[r.status] || [r.status, 'quiet'])),
                refusal(r) ? h('span', {class: 'hint'}, refusal(r)) : null,
                (r.cautions || []).map(c => h('span', {class: 'hint'}, c)))},
            {label: 'Reference', value: r => h('span', {class: 'small'}, r.clientRef)}
        ]});
}

/**
 * What to do about a refusal for too few parts on the kit's books: the repair happened, so it is not lost. When the
 * server put the refusal on the stores officer's morning board the mechanic need not ask; when it could not (its
 * answer says so), the mechanic is asked to tell the officer. Items kept from before the answer said so count as told.
 */
function shortageAdvice(item, kitCode) {
    const kit = kitCode ? `your kit ${kitCode}` : 'your kit';
    const told = item.officerTold !== false ? 'The stores officer has been told: this refusal is on their morning board. '
        : 'The server could not put this refusal on the stores officer\'s morning board: tell the stores officer yourself '
        + 'that the books show too few parts for this repair. ';
    return h('p', {class: 'outbox__advice'}, told
        + `Once they have booked the parts to ${kit} (a transfer to the kit, or a count of the kit), press "Send again". `
        + 'It stays on this phone until then.');
}

export function outboxView(waiting, discard, sendAgain, kitCode) {
    if (!waiting.length) {
        return h('p', {class: 'muted', id: 'outbox-empty'}, 'Nothing waiting: everything you did has reached the server.');
    }
    return h('ol', {class: 'outbox', id: 'outbox-list'}, waiting.map(item => h('li', {class: `outbox__item outbox__item--${item.state}`,
        'data-ref': item.ref || ''},
        h('p', {}, h('strong', {}, item.summary)),
        item.state === 'refused'
            ? h('p', {}, state('Refused by the server', 'urgent'), ' ', h('span', {class: 'outbox__message'},
                isShortage(item) ? shortageText(item.message) : item.message))
            : h('p', {}, state('Waiting to send', 'info'), h('span', {class: 'hint'}, `Made ${fmt.dateTime(item.createdAt)}`)),
        isShortage(item) ? shortageAdvice(item, kitCode) : null,
        item.ref ? h('p', {class: 'hint'}, `Reference ${item.ref}`) : null,
        item.state === 'refused' ? h('p', {class: 'row'},
            isShortage(item) ? h('button', {type: 'button', class: 'primary outbox__again', onclick: () => sendAgain(item)}, 'Send again') : null,
            h('button', {type: 'button', class: 'outbox__discard', onclick: () => discard(item)}, 'Discard this action')) : null)));
}

/** The question before an action made on this phone is deleted for good (ui.ask: "Keep it" has the focus). */
export function discardQuestion(item) {
    const where = item.state === 'refused' ? 'The server refused it, so it is not on record there.'
        : 'It has not reached the server yet.';
    return {
        title: 'Discard this action for good?',
        lines: [h('p', {}, h('strong', {}, item.summary)), `Made on this phone ${fmt.dateTime(item.createdAt)}. ${where}`,
            'Discarding deletes it from this phone: it will never be sent and cannot be brought back. If the work really '
            + 'happened, keep it and follow the advice beside it, or ask the stores officer.'],
        yes: 'Discard it for good', no: 'Keep it'
    };
}
