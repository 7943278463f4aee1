/*
 * Pump sensors at a store: the pumps that have probably stopped (most likely first) with the parts to have ready
 * (the server's number: enough to cover the pumps' need at the part's service level) against the depot's and its
 * kits' stock, the parts not worth setting aside named apart, and the service kits falling due week by week for 90
 * days from operating hours (measured where a pump has a sensor), against the same stock. Shortfalls are in words.
 */
import * as api from '/app/js/api.js';
import * as fmt from '/app/js/format.js';
import {h, mount, table, state, figures, caution} from '/app/js/ui.js';
import {stopCaution, downWords, fellWords, repairWords, dueWords, hoursWords} from '/app/js/sensors.js';
import {startOfficer, describe, ready} from './officer.js';

const {store, parts, run} = await startOfficer({page: 'sensors', title: 'Pump sensors'});
const main = document.getElementById('content');
const unit = p => (parts.get(p) || {}).unitOfIssue;
const HORIZON_DAYS = 90;

function sensorProvenance(down, plan) {
    const fleet = down.forecastRunId
        ? `Expected parts from the fleet models of forecast run ${down.forecastRunId}${run && run.id === down.forecastRunId
            ? `, finished ${fmt.dateTime(run.finishedAt)}` : ''}.`
        : 'No forecast run has finished yet, so no parts are expected for the pumps probably down.';
    return h('p', {class: 'provenance', id: 'sensor-provenance'}, `Sensor flags and service dates worked out on `
        + `${fmt.date(plan.today)} from the daily sensor readings received (the quarterly estimates for pumps without a `
        + `sensor). ${fleet}`);
}

function downTable(down) {
    const count = down.pumps.length === 1 ? '1 pump' : `${fmt.num(down.pumps.length)} pumps`;
    return table({caption: `${count} probably down at ${store.code}, most likely first`,
        id: 'down-pumps', rows: down.pumps, empty: 'No pump at this store looks stopped: every sensor shows use, or a '
            + 'repair is already reported.', columns: [
            {label: 'Pump', value: p => h('strong', {}, p.assetId)},
            {label: 'State', value: p => state(downWords(p), 'urgent')},
            {label: 'Use fell', value: p => fellWords(p)},
            {label: 'Usual use', value: p => `${fmt.num(p.baselineHoursPerDay, 1)} h a day before`, num: true},
            {label: 'Repair', value: p => repairWords(p)},
            {label: 'Mechanic', value: p => p.assignedMechanic || 'none assigned'}]});
}

function shortWords(need) {
    const held = Number(need.onHandDepot || 0) + Number(need.onHandKits || 0);
    const wanted = need.haveReady;
    return need.enoughInStock ? state('Enough in stock', 'ok')
        : state(`Short by ${fmt.qty(wanted - held, unit(need.partNumber))}`, 'warn');
}

/**
 * "0.4 pieces expected" (an average over the repairs these pumps may need); a part expected less than once in twenty
 * repairs says so instead of "0 expected".
 */
function expectedWords(units, partNumber) {
    const words = fmt.units(unit(partNumber));
    return units < 0.05 ? `less than 0.05 ${words} expected` : `${fmt.num(units, 1)} ${words} expected on average`;
}

function coverWords(need) {
    return `${expectedWords(need.expectedUnits, need.partNumber)} for these pumps; this many covers their need `
        + `${fmt.percent(need.coverLevel, 0)} of the time`;
}

function partsTable(down) {
    // The parts most likely needed first.
    const rows = [...down.parts].filter(n => n.haveReady > 0)
        .sort((a, b) => b.expectedUnits - a.expectedUnits || a.partNumber.localeCompare(b.partNumber));
    const empty = !down.pumps.length ? 'No parts to have ready.'
        : !down.parts.length ? 'No parts expected: no forecast run has fitted the fleet models yet.'
            : 'None worth setting aside: each part these pumps might need is unlikely enough to be needed.';
    return table({caption: `Parts to have ready at ${store.code} for these pumps, against stock ${down.stockCounted}`,
        id: 'down-parts', rows, empty, columns: [
            {label: 'Part', value: n => describe(parts, n.partNumber)},
            {label: 'Have ready', value: n => h('span', {}, fmt.qty(n.haveReady, unit(n.partNumber)),
                h('span', {class: 'hint'}, coverWords(n))), num: true},
            {label: 'On hand at the depot', value: n => fmt.qty(n.onHandDepot, unit(n.partNumber)), num: true},
            {label: 'In the kits', value: n => fmt.qty(n.onHandKits, unit(n.partNumber)), num: true},
            {label: 'State', value: n => shortWords(n)}]});
}

/** The parts with nothing to set aside: the chance of needing none already reaches their service level. */
function notWorthSettingAside(down) {
    const rows = down.parts.filter(n => n.haveReady === 0)
        .sort((a, b) => b.expectedUnits - a.expectedUnits || a.partNumber.localeCompare(b.partNumber));
    if (!rows.length) {
        return null;
    }
    return h('p', {class: 'small', id: 'down-parts-aside'}, 'Also possible, not worth setting aside (the chance of '
        + 'needing none already meets the service level): ',
        rows.map((n, i) => h('span', {}, i ? ', ' : '', h('strong', {}, n.partNumber),
            ` ${(parts.get(n.partNumber) || {}).description || ''} (${expectedWords(n.expectedUnits, n.partNumber)})`)), '.');
}

/** The programme lead's setting in force; flags opened under an earlier one stay until closed. */
function certaintyLine(c) {
    return h('p', {class: 'small', id: 'stop-certainty'}, `A pump is called probably down when its sensor makes it at least `
        + `${fmt.num(c.leastProbability * 100, 1)} % likely (set by the programme lead; the default is `
        + `${fmt.num(c.defaultLeastProbability * 100, 0)} %).`);
}

function downSection(down, certainty) {
    return h('section', {'aria-labelledby': 'down-title'}, h('h2', {id: 'down-title'}, 'Pumps that have probably stopped'),
        certaintyLine(certainty),
        h('div', {class: 'card'}, figures([['Probably down now', count(down.pumps.length, 'pump')],
            ['Earlier flags closed by a repair report (all on record)', count(down.closedByRepair, 'flag')],
            ['Earlier flags where use came back without a repair (false alarms, all on record)', count(down.falseAlarms, 'flag')]])),
        down.pumps.length ? stopCaution() : null, downTable(down), partsTable(down), notWorthSettingAside(down),
        h('details', {class: 'small'}, h('summary', {}, 'How a pump is judged probably down'), h('p', {}, down.method)));
}

const count = (n, word) => `${fmt.num(n)} ${n === 1 ? word : `${word}s`}`;

function isoPlus(isoDay, days) {
    const d = new Date(`${isoDay}T12:00:00`);
    d.setDate(d.getDate() + days);
    return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
}

/** The last week stops at the 90th day, as the plan does (today + 89), so its label never promises a day it skips. */
function weekLabel(week, lastDay) {
    const end = isoPlus(week.weekStart, 6);
    return `${fmt.date(week.weekStart)} – ${fmt.date(end < lastDay ? end : lastDay)}`;
}

function weekShortfall(week) {
    const short = week.parts.filter(k => !k.enoughInStock);
    if (!week.pumpsDue.length) {
        return state('Nothing due', 'quiet');
    }
    return short.length ? h('span', {}, short.map(k => h('span', {class: 'hint'}, state('Short', 'warn'), ` ${k.partNumber} ${(parts.get(k.partNumber) || {}).description || ''}: `
        + `${fmt.qty(Math.ceil(k.unitsToDate - Number(k.inStock) - 1e-9), unit(k.partNumber))} short; the services due from `
        + `today to this week's end need ${fmt.qty(k.unitsToDate, unit(k.partNumber))}, ${fmt.qty(k.inStock, unit(k.partNumber))} in stock`)))
        : state('Enough in stock for the services due so far', 'ok');
}

function weeksTable(plan) {
    const lastDay = isoPlus(plan.today, HORIZON_DAYS - 1);
    return table({caption: `Service kits falling due at ${store.code} by week, for the next 90 days, against stock ${plan.stockCounted}`,
        id: 'service-weeks', rows: plan.weeks, columns: [
            {label: 'Week', value: w => weekLabel(w, lastDay)},
            {label: 'Pumps due', value: w => w.pumpsDue.length ? h('span', {}, h('strong', {}, fmt.num(w.pumpsDue.length)),
                h('span', {class: 'hint pump-list'}, w.pumpsDue.join(', '))) : '0'},
            {label: 'Kit parts this week', value: w => w.parts.length ? h('ul', {class: 'plain-list'}, w.parts.map(k =>
                h('li', {}, `${fmt.qty(k.unitsThisWeek, unit(k.partNumber))} ${k.partNumber}`))) : '–'},
            {label: 'Stock', value: w => weekShortfall(w)}]});
}

/** What to do when stock falls short, with the pages that do it: said once, under the table that shows it. */
function shortNext(plan, down) {
    const short = plan.weeks.some(w => w.parts.some(k => !k.enoughInStock)) || down.parts.some(n => n.haveReady > 0 && !n.enoughInStock);
    if (!short) {
        return null;
    }
    const at = `?location=${encodeURIComponent(store.code)}`;
    return h('p', {class: 'message', id: 'sensor-next'}, `Where a part is short, ${store.code} and its mechanics' kits hold less `
        + 'than the pumps above will need by then. Before that week, move stock here from another store (',
        h('a', {href: `/app/officer/transfers.html${at}`}, 'Transfers'), ') or order it (',
        h('a', {href: `/app/officer/purchases.html${at}`}, 'Purchases'), '); some of it may be in the kits rather than on the '
        + 'depot\'s shelf, so a kit holding more than its mechanic needs can give to another.');
}

/** Exactly the pumps counted in the weeks above, soonest first (overdue ones lead). */
function dueTable(plan) {
    const counted = new Set(plan.weeks.flatMap(w => w.pumpsDue));
    const rows = plan.pumps.filter(p => counted.has(p.assetId));
    return h('details', {}, h('summary', {}, `The ${fmt.num(rows.length)} pumps due in these weeks, soonest first`),
        table({caption: 'Pumps due for service by operating hours', id: 'service-pumps', rows, columns: [
            {label: 'Pump', value: p => h('strong', {}, p.assetId)},
            {label: 'Due', value: p => dueWords(p, plan.today)},
            {label: 'Hours', value: p => h('span', {}, hoursWords(p), h('span', {class: 'hint'}, p.usageBasis))},
            {label: 'Use lately (last 28 days read)', value: p => `${fmt.num(p.recentHoursPerDay, 1)} h a day`, num: true},
            {label: 'Mechanic', value: p => p.assignedMechanic || 'none assigned'}]}));
}

async function load() {
    if (!store) {
        ready();
        return;
    }
    if (store.kind !== 'DEPOT') {
        // Empty tables of a store with no pumps would read as "nothing wrong anywhere".
        mount(main, h('p', {class: 'message', id: 'sensor-no-pumps'}, `${store.code} has no pumps of its own: sensors and `
            + 'services belong to the depots. Choose a depot under "Store" to see its pumps probably stopped and its services due.'));
        ready();
        return;
    }
    const [down, plan, certainty] = await Promise.all([api.get('/api/sensors/probably-down', {depot: store.code}),
        api.get('/api/sensors/service-plan', {depot: store.code}), api.get('/api/sensors/stop-certainty')]);
    mount(main, sensorProvenance(down, plan),
        downSection(down, certainty),
        h('section', {'aria-labelledby': 'service-title'}, h('h2', {id: 'service-title'}, 'Service due by hours'),
            weeksTable(plan), shortNext(plan, down), dueTable(plan)),
        caution());
    ready();
}

await load();
