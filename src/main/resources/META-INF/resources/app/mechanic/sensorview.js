/*
 * sensorview.js: the mechanic's pumps as their sensors see them, from the snapshot kept on the phone (so it shows
 * offline too): the pumps probably down, most likely first, and the pumps due for service in the next 90 days in
 * the order of their projected due date (hours since the last service at the recent daily load).
 *   sensorCounts(snapshot)        {down, due} for the section's heading
 *   sensorView(snapshot, act, waiting)  the section's body; act('status', assetId, 'BROKEN', pump) opens the report
 *                                 form on the day the pump's use fell, unless a report of that pump is already
 *                                 waiting in the outbox
 *   measuredDue(snapshot)         assetId → the pump card's service-due row with the sensor plan's hours and date, for
 *                                 pumps measured by sensor, so the card and this list give the same day
 */
import * as fmt from '/app/js/format.js';
import {h, state} from '/app/js/ui.js';
import {stopCaution, downWords, fellWords, repairWords, dueWords, hoursWords} from '/app/js/sensors.js';

const HORIZON_DAYS = 90;

function horizonEnd(today) {
    const end = new Date(`${today}T12:00:00`);
    end.setDate(end.getDate() + HORIZON_DAYS - 1);
    return `${end.getFullYear()}-${String(end.getMonth() + 1).padStart(2, '0')}-${String(end.getDate()).padStart(2, '0')}`;
}

/** The plan's pumps that fall due within 90 days, already soonest first from the API; overdue ones lead. */
function dueRows(snapshot) {
    const plan = snapshot.servicePlan;
    if (!plan) {
        return [];
    }
    const last = horizonEnd(plan.today);
    return plan.pumps.filter(p => p.dueOn && p.dueOn <= last);
}

const SOON_DAYS = 30;

export function measuredDue(snapshot) {
    const plan = snapshot.servicePlan;
    const byAsset = new Map();
    if (!plan) {
        return byAsset;
    }
    const soon = new Date(`${plan.today}T12:00:00`);
    soon.setDate(soon.getDate() + SOON_DAYS);
    const soonIso = `${soon.getFullYear()}-${String(soon.getMonth() + 1).padStart(2, '0')}-${String(soon.getDate()).padStart(2, '0')}`;
    const measured = new Map(plan.pumps.filter(x => x.usageBasis === 'measured by sensor').map(x => [x.assetId, x]));
    for (const row of snapshot.due) {
        const p = measured.get(row.assetId);
        if (p) {
            const state = !p.dueOn ? 'NOT_IN_USE' : p.hoursSinceService >= p.serviceIntervalHours ? 'OVERDUE'
                : p.dueOn <= soonIso ? 'DUE_SOON' : 'LATER';
            byAsset.set(row.assetId, {...row, hoursSinceService: p.hoursSinceService, hoursPerDay: p.recentHoursPerDay,
                dueOn: p.dueOn, state});
        }
    }
    return byAsset;
}

export function sensorCounts(snapshot) {
    return {down: snapshot.probablyDown ? snapshot.probablyDown.pumps.length : 0, due: dueRows(snapshot).length};
}

function downCard(p, act, waiting) {
    // A second tap would queue the same report twice; until it reaches the server the card says it is on its way.
    const reported = waiting.find(i => i.kind === 'status' && i.assetId === p.assetId);
    return h('li', {class: 'pump card', 'data-asset': p.assetId},
        h('h4', {}, p.assetId),
        h('p', {}, state(downWords(p), 'urgent')),
        h('p', {class: 'hint'}, `${fellWords(p)}; about ${fmt.num(p.baselineHoursPerDay, 1)} h a day before.`),
        reported ? null : h('p', {class: 'hint'}, repairWords(p)),
        reported ? h('p', {class: 'sensor-reported'}, state(reported.state === 'refused'
            ? 'Your report was refused: see "Waiting to send"' : 'Reported on this phone: waiting to send', 'info'))
            : p.openRepairRef ? null : h('button', {type: 'button', onclick: () => act('status', p.assetId, 'BROKEN', p)},
                'Report it broken'));
}

function dueItem(p, today) {
    return h('li', {'data-asset': p.assetId, 'data-due': p.dueOn},
        h('strong', {}, p.assetId), ' ', state(dueWords(p, today), p.dueOn <= today ? 'warn' : 'info'),
        h('span', {class: 'hint'}, `${hoursWords(p)}; ${fmt.num(p.recentHoursPerDay, 1)} h a day lately (${p.usageBasis}).`));
}

export function sensorView(snapshot, act, waiting = []) {
    const down = snapshot.probablyDown;
    const plan = snapshot.servicePlan;
    if (!down || !plan) {
        return h('p', {class: 'muted'}, 'Refresh with a connection to see what the pump sensors say.');
    }
    const due = dueRows(snapshot);
    return [
        h('h3', {id: 'down-title'}, `Probably down: ${down.pumps.length}`),
        down.pumps.length ? [stopCaution('mechanic'), h('ul', {class: 'pump-list plain-list', id: 'down-list'},
            down.pumps.map(p => downCard(p, act, waiting)))]
            : h('p', {class: 'muted'}, 'None of your pumps is probably down: every sensor shows use, or a repair is already reported.'),
        h('h3', {id: 'due-title'}, `Service due in the next ${HORIZON_DAYS} days, soonest first: ${due.length}`),
        h('p', {class: 'hint'}, `Worked out on ${fmt.date(plan.today)} from operating hours since each pump's last service `
            + 'and its use over its last 28 days read (sensor readings where the pump has a sensor).'),
        due.length ? h('ol', {class: 'due-list', id: 'service-due-list'}, due.map(p => dueItem(p, plan.today)))
            : h('p', {class: 'muted'}, `No pump of yours falls due in the next ${HORIZON_DAYS} days.`)
    ];
}
