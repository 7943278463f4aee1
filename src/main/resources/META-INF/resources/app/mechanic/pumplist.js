/*
 * pumplist.js: which of the mechanic's pumps the page lists, and in what order. By default the pumps that need a
 * visit (broken, with an open repair, judged probably down by their sensor, a service due within 30 days, or an action of
 * the mechanic's waiting), in the order of a route from the depot (route.js); with "show all" or a search, every
 * match, most pressing first.
 */
import * as fmt from '/app/js/format.js';
import {visitOrder} from './route.js';
import {measuredDue} from './sensorview.js';

function needsAttention(r, waiting) {
    return r.pump.status === 'BROKEN' || r.repairs.length > 0 || Boolean(r.sensor)
        || (r.due && (r.due.state === 'OVERDUE' || r.due.state === 'DUE_SOON'))
        || waiting.some(i => i.assetId === r.pump.assetId);
}

function rankOf(r) {
    return r.pump.status === 'BROKEN' ? 0 : r.repairs.length ? 1 : r.sensor ? 2
        : ({OVERDUE: 3, DUE_SOON: 4}[(r.due || {}).state] ?? 5);
}

/**
 * {rows: [{pump, due, repairs, sensor, stop}], toVisit, words}; sensor = the pump's entry among those probably
 * down (sensorview.js), or undefined; stop = {n, legKm} on the round, or null.
 */
export function pumpRows(snapshot, waiting, {all, search}) {
    const measured = measuredDue(snapshot);
    const due = new Map(snapshot.due.map(d => [d.assetId, measured.get(d.assetId) || d]));
    const repairs = new Map();
    snapshot.openRepairs.forEach(r => repairs.set(r.assetId, [...(repairs.get(r.assetId) || []), r]));
    const stopped = new Map(((snapshot.probablyDown || {}).pumps || []).map(p => [p.assetId, p]));
    const row = p => ({pump: p, due: due.get(p.assetId), repairs: repairs.get(p.assetId) || [], sensor: stopped.get(p.assetId),
        stop: null});
    const pressing = (a, b) => rankOf(a) - rankOf(b) || a.pump.assetId.localeCompare(b.pump.assetId);
    const visit = snapshot.pumps.map(row).filter(r => needsAttention(r, waiting)).sort(pressing);
    const total = snapshot.pumps.length;
    if (search || all) {
        const rows = snapshot.pumps.map(row).filter(r => !search || r.pump.assetId.toLowerCase().includes(search)).sort(pressing);
        return {rows, toVisit: visit.length, words: `Showing ${rows.length} of your ${total} pumps, most pressing first.`};
    }
    const round = visitOrder(snapshot.depot, visit.map(r => ({...r, latitude: r.pump.latitude, longitude: r.pump.longitude})));
    const rows = round.map(({stop, legKm}, i) => ({...stop, stop: {n: i + 1, legKm}}));
    const km = round.reduce((sum, s) => sum + (s.legKm || 0), 0);
    const from = snapshot.depot ? snapshot.depot.name || snapshot.depot.code : 'the first pump';
    return {rows, toVisit: visit.length, words: `${visit.length} of your ${total} pumps need a visit: broken, with an open repair, `
        + `judged probably down by their sensor, or with a service due within 30 days. In the order of a route from ${from}, nearest next pump first: about `
        + `${fmt.num(km, 1)} km from the depot to the last pump in straight lines (roads are longer).`};
}

export function stopWords(stop) {
    return stop.legKm === null ? `Stop ${stop.n}: no position on record` : `Stop ${stop.n}: ${fmt.num(stop.legKm, 1)} km from the ${stop.n === 1 ? 'depot' : 'stop before'}`;
}
