/*
 * data.js: reads everything the mechanic's page shows in one go (the snapshot kept on the phone) and works out the
 * kit's rows: on hand against min and max, what is already coming, and what to ask for to top up.
 */
import * as api from '/app/js/api.js';

export async function fetchSnapshot(me) {
    const kit = me.kitCode;
    const [runs, balances, pumps, due, openRepairs, requests, parts, kitPlace, depots, servicePlan, probablyDown] = await Promise.all([
        api.get('/api/forecast/runs', {status: 'DONE', planning: true, limit: 1}),
        kit ? api.get('/api/stock/balances', {location: kit}) : [],
        api.get('/api/pumps'),
        api.get('/api/pumps/service-due'),
        api.get('/api/repairs', {open: 'true'}),
        api.get('/api/requests'),
        api.get('/api/parts'),
        kit ? api.get(`/api/locations/${encodeURIComponent(kit)}`) : null,
        api.get('/api/locations', {kind: 'DEPOT'}),
        // Without a depot the sensor reports cover the mechanic's own pumps and kit.
        api.get('/api/sensors/service-plan'),
        api.get('/api/sensors/probably-down')
    ]);
    // The round to the pumps starts at the depot the kit belongs to (pumplist.js).
    const home = kitPlace && depots.find(d => d.code === kitPlace.parentCode);
    const depot = home ? {code: home.code, name: home.name, latitude: home.latitude, longitude: home.longitude} : null;
    const run = runs[0] || null;
    // Min and max come from the forecasts: before the first run there are none, and the API would say 409.
    const policies = run && kit ? await api.get('/api/planning/policies', {location: kit}) : null;
    return {
        username: me.username, me, savedAt: new Date().toISOString(), run, balances, policies, depot,
        pumps: pumps.filter(p => p.status !== 'DECOMMISSIONED'), due, openRepairs, servicePlan: trimPlan(servicePlan), probablyDown,
        requests: requests.sort((a, b) => String(b.raisedAt).localeCompare(String(a.raisedAt))),
        parts: parts.map(p => ({partNumber: p.partNumber, description: p.description, unitOfIssue: p.unitOfIssue}))
    };
}

/** The phone keeps only what the page shows of the service plan: the pumps, not the weekly kit sums. */
function trimPlan(plan) {
    return {today: plan.today, pumps: plan.pumps.map(p => ({assetId: p.assetId, usageBasis: p.usageBasis, dueOn: p.dueOn,
        serviceIntervalHours: p.serviceIntervalHours, hoursSinceService: p.hoursSinceService, recentHoursPerDay: p.recentHoursPerDay}))};
}

const OPEN_STATES = new Set(['RAISED', 'APPROVED', 'PARTLY_APPROVED']);

/** Quantities on their way to the kit: open requests (raised, or approved and not yet issued) and waiting ones. */
export function coming(snapshot, waiting) {
    const byPart = new Map();
    const add = (part, quantity) => byPart.set(part, (byPart.get(part) || 0) + Number(quantity || 0));
    for (const r of snapshot.requests) {
        if (!OPEN_STATES.has(r.status)) {
            continue;
        }
        for (const l of r.lines) {
            if (r.status === 'RAISED') {
                add(l.partNumber, l.requested);
            } else {
                add(l.substitute || l.partNumber, Number(l.approved || 0) - Number(l.issued || 0));
            }
        }
    }
    for (const item of waiting.filter(i => i.kind === 'request')) {
        item.body.lines.forEach(l => add(l.partNumber, l.quantity));
    }
    return byPart;
}

/** Parts that waiting (unsent) fixed repairs and closings will take out of the kit. */
export function waitingUse(waiting) {
    const byPart = new Map();
    // A refused repair took nothing from the kit: only those still waiting to send count.
    for (const item of waiting.filter(i => i.state !== 'refused' && (i.kind === 'repair' || i.kind === 'close') && i.body.fixedOn)) {
        (item.body.lines || []).forEach(l => byPart.set(l.partNumber, (byPart.get(l.partNumber) || 0) + Number(l.quantity)));
    }
    return byPart;
}

/**
 * One row per part the kit holds or has a min for: state in words and what to ask for. A kit at or below its min
 * (counting what is coming) asks for enough to reach its max.
 */
export function kitRows(snapshot, waiting) {
    const parts = new Map(snapshot.parts.map(p => [p.partNumber, p]));
    const policies = new Map((snapshot.policies || []).map(p => [p.partNumber, p]));
    const onHand = new Map(snapshot.balances.map(b => [b.partNumber, Number(b.onHand)]));
    const incoming = coming(snapshot, waiting);
    const using = waitingUse(waiting);
    const numbers = new Set([...onHand.keys(), ...incoming.keys(), ...[...policies.values()].filter(p => Math.round(p.reorderPoint) > 0
        || Math.round(p.orderUpTo) > 0).map(p => p.partNumber)]);
    return [...numbers].sort().map(number => {
        const policy = policies.get(number);
        const held = onHand.get(number) || 0;
        const afterWaiting = Math.max(0, held - (using.get(number) || 0));
        const on = incoming.get(number) || 0;
        const min = policy ? Math.round(policy.reorderPoint) : null;
        const max = policy ? Math.max(Math.round(policy.orderUpTo), min) : null;
        const position = afterWaiting + on;
        const ask = policy && position <= min ? Math.max(0, max - position) : 0;
        const state = afterWaiting <= 0 && (min === null || min > 0) ? 'out'
            : policy && position <= min ? 'top-up'
            : policy && afterWaiting > max ? 'above-max' : policy ? 'enough' : 'no-policy';
        return {partNumber: number, part: parts.get(number), onHand: held, waitingUse: using.get(number) || 0, coming: on,
            min, max, ask, state};
    });
}
