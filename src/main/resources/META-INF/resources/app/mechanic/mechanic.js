/*
 * mechanic.js: the area mechanic's page, made for a phone whose connection comes and goes. It draws the last data
 * kept on the phone at once, then refreshes it when there is a connection; actions go to the outbox (store.js) and
 * are sent when the connection returns (send.js). The page says how fresh its data is and what is still waiting.
 */
import {startPage, topBar} from '/app/js/nav.js';
import * as fmt from '/app/js/format.js';
import {h, mount, say, showError, caution, ask} from '/app/js/ui.js';
import * as store from './store.js';
import {sendWaiting, sendAgain, withdrawNotice} from './send.js';
import {fetchSnapshot, kitRows} from './data.js';
import {kitView, pumpCard, requestsView, outboxView, discardQuestion} from './views.js';
import {askForm, repairForm} from './forms.js';
import {statusForm} from './report.js';
import {closeForm} from './close.js';
import {section, heading, openSection, followJumps} from './sections.js';
import {pumpRows} from './pumplist.js';
import {sensorView, sensorCounts} from './sensorview.js';

const main = document.getElementById('main');
const el = id => document.getElementById(id);
let me = null;
let snapshot = null;
let outbox = [];
let othersWaiting = [];
let forms = null;
let formsKey = '';

function layout() {
    const jumps = h('nav', {class: 'mech-jump', 'aria-label': 'Parts of this page'}, [['outbox', 'Waiting'], ['kit', 'Kit'],
        ['pumps', 'Pumps'], ['sensors', 'Sensors'], ['requests', 'Requests'], ['ask', 'Ask for parts'], ['repair', 'Record a repair'],
        ['close', 'Close a repair'], ['report', 'Report a pump']].map(([id, label]) => h('a', {href: `#${id}`}, label)));
    followJumps(jumps);
    mount(main,
        h('div', {class: 'page-head'}, h('h1', {}, 'My kit and pumps')),
        h('div', {id: 'status', class: 'status-region', role: 'status', 'aria-live': 'polite'}),
        h('div', {class: 'mech-sync card', id: 'sync'}),
        jumps,
        section('outbox', 'Waiting to send', h('div', {id: 'outbox-body'})),
        section('kit', 'My kit', h('p', {class: 'provenance', id: 'kit-provenance'}), h('div', {id: 'kit-body'})),
        section('pumps', 'My pumps', h('div', {class: 'row mech-filter'},
            h('label', {for: 'pump-search'}, 'Find a pump'), h('input', {id: 'pump-search', type: 'search', placeholder: 'Asset id',
                oninput: drawPumps}),
            h('label', {class: 'mech-check'}, h('input', {type: 'checkbox', id: 'pump-all', onchange: drawPumps}), ' Show all my pumps')),
            h('p', {class: 'hint', id: 'pump-count'}), h('div', {id: 'pump-list', class: 'pump-list'})),
        section('sensors', 'What the sensors say', h('div', {id: 'sensors-body'})),
        section('requests', 'My requests', h('div', {id: 'requests-body'})),
        section('ask', 'Ask for parts', h('div', {id: 'ask-body'})),
        section('repair', 'Record a repair', h('div', {id: 'repair-body'})),
        section('close', 'Close a repair as fixed', h('div', {id: 'close-body'})),
        section('report', 'Report a pump broken or working', h('div', {id: 'report-body'})),
        caution());
    openSection('pumps');
}

function drawSync() {
    const waiting = outbox.filter(i => i.state === 'waiting').length;
    const refused = outbox.filter(i => i.state === 'refused').length;
    document.body.dataset.outbox = String(waiting);
    document.body.dataset.refused = String(refused);
    mount(el('sync'),
        h('p', {id: 'connection'}, navigator.onLine ? 'Connected.'
            : h('strong', {}, 'No connection: what you do is kept on this phone and sent when the connection returns.')),
        h('p', {id: 'freshness'}, snapshot ? `Data from the server as of ${fmt.dateTime(snapshot.savedAt)} (${fmt.relative(snapshot.savedAt)}).`
            : 'No data on this phone yet.'),
        h('p', {id: 'outbox-count'}, waiting ? `${waiting} ${waiting === 1 ? 'action is' : 'actions are'} waiting to send.` : 'Nothing waiting to send.',
            refused ? h('strong', {}, ` ${refused} refused by the server: see "Waiting to send".`) : null),
        othersWaiting.length ? h('p', {id: 'others-waiting'}, `${othersWaiting.length} unsent ${othersWaiting.length === 1 ? 'action' : 'actions'} `
            + `of ${[...new Set(othersWaiting.map(i => i.username))].join(', ')} ${othersWaiting.length === 1 ? 'is' : 'are'} kept on this `
            + 'phone and sent when that account signs in here again.') : null,
        h('p', {class: 'row'}, h('button', {type: 'button', id: 'send-now', disabled: !navigator.onLine || !me,
            onclick: () => syncAndRefresh(true)}, waiting ? 'Send now and refresh' : 'Refresh now')));
}

function drawPumps() {
    if (!snapshot) {
        return;
    }
    const search = el('pump-search').value.trim().toLowerCase();
    const list = pumpRows(snapshot, outbox, {all: el('pump-all').checked, search});
    heading('pumps', `My pumps: ${list.toVisit} to visit, of ${snapshot.pumps.length}`);
    mount(el('pump-count'), list.words);
    mount(el('pump-list'), list.rows.length ? list.rows.map(r => pumpCard(snapshot, r, outbox, act))
        : h('p', {class: 'empty'}, search ? 'No pump of yours matches.' : 'No pump needs you now. Tick "Show all my pumps" to see them all.'));
}

/** The headings say how much each folded part holds; the kit opens by itself when something needs topping up. */
function drawHeadings(firstTime) {
    const short = kitRows(snapshot, outbox).filter(r => r.state === 'out' || r.state === 'top-up').length;
    heading('kit', `My kit ${snapshot.me.kitCode || ''}: ${short ? `${short} to top up` : 'nothing to top up'}`);
    const open = snapshot.requests.filter(r => ['RAISED', 'APPROVED', 'PARTLY_APPROVED'].includes(r.status)).length
        + outbox.filter(i => i.kind === 'request').length;
    heading('requests', `My requests: ${open} open`);
    heading('close', `Close a repair as fixed: ${snapshot.openRepairs.length} open`);
    const sensors = sensorCounts(snapshot);
    heading('sensors', `What the sensors say: ${sensors.down} probably down, ${sensors.due} due for service`);
    if (firstTime && short) {
        openSection('kit');
    }
    if (firstTime && sensors.down) {
        openSection('sensors');
    }
}

function drawData() {
    drawHeadings(!el('kit-body').hasChildNodes());
    mount(el('kit-provenance'), snapshot.run ? `Min and max from forecast run ${snapshot.run.id}, finished ${fmt.dateTime(snapshot.run.finishedAt)}.`
        : 'No forecast run yet.');
    mount(el('kit-body'), kitView(snapshot, outbox, (asset, wanted) => act('ask', asset, wanted)));
    mount(el('requests-body'), requestsView(snapshot, outbox));
    mount(el('sensors-body'), sensorView(snapshot, act, outbox));
    drawPumps();
    const key = JSON.stringify([snapshot.pumps.map(p => p.assetId + p.status), snapshot.balances.map(b => b.partNumber + b.onHand),
        snapshot.openRepairs.map(r => r.repairRef)]);
    if (key !== formsKey) {
        formsKey = key;
        forms = {ask: askForm(snapshot, queue), repair: repairForm(snapshot, queue, () => outbox), report: statusForm(snapshot, queue),
            close: closeForm(snapshot, queue, () => outbox)};
        mount(el('ask-body'), forms.ask.form);
        mount(el('repair-body'), forms.repair.form);
        mount(el('report-body'), forms.report.form);
        mount(el('close-body'), forms.close.form);
    }
}

async function drawOutbox() {
    const all = await store.items();
    outbox = me ? all.filter(i => i.username === me.username) : [];
    othersWaiting = all.filter(i => !me || i.username !== me.username);
    mount(el('outbox-body'), outboxView(outbox, discard, again, me && me.kitCode));
    const waiting = outbox.filter(i => i.state === 'waiting').length;
    const refused = outbox.length - waiting;
    // "Waiting to send: 0, and 1 refused" before.
    heading('outbox', `Waiting to send: ${waiting || 'nothing'}${refused ? `, ${refused} refused by the server` : ''}`);
    if (refused) {
        openSection('outbox');
    }
    drawSync();
}

function act(kind, assetId, ...extra) {
    const target = {ask: 'ask', repair: 'repair', status: 'report', close: 'close'}[kind];
    forms[target].open(assetId, ...extra);
    openSection(target, true);
    forms[target].form.querySelector('select, input, textarea').focus({preventScroll: true});
}

async function queue(item) {
    await store.queue({...item, username: me.username});
    await drawOutbox();
    drawData();
    say(navigator.onLine ? `Saved on this phone and sending: ${item.summary}.` : `Saved on this phone; it will be sent when the connection returns: ${item.summary}.`, 'ok');
    if (navigator.onLine) {
        await syncAndRefresh(false);
    }
}

async function discard(item) {
    // Made on this phone, perhaps offline: a stray tap must not lose it.
    if (!(await ask(discardQuestion(item)))) {
        say(`Kept on this phone: ${item.summary}.`, 'ok');
        return;
    }
    await store.remove(item.id);
    const withdrawn = await withdrawNotice(item, me.username, () => syncAndRefresh(false));
    say(`Discarded: ${item.summary}.${withdrawn}`, 'ok');
    await drawOutbox();
    drawData();
}

async function again(item) {
    await sendAgain(item);
    say(navigator.onLine ? `Sending again: ${item.summary}.` : `It will be sent again when the connection returns: ${item.summary}.`, 'ok');
    await drawOutbox();
    drawData();
    await syncAndRefresh(false);
}

async function syncAndRefresh(announce) {
    if (!me || !navigator.onLine) {
        return;
    }
    const result = await sendWaiting(me.username, drawOutbox);
    if (result.stopped && !result.stopped.offline) {
        say(`Not sent yet: ${result.stopped.message}. It stays waiting and is tried again.`, 'error');
    }
    try {
        snapshot = await fetchSnapshot(me);
        await store.saveSnapshot(snapshot);
    } catch (e) {
        if (!e.offline) {
            showError(e);
        }
    }
    await drawOutbox();
    drawData();
    document.body.dataset.refreshed = snapshot.savedAt;
    if (result.refused) {
        say(`${result.refused} ${result.refused === 1 ? 'action was' : 'actions were'} refused by the server; the reason is shown under "Waiting to send".`, 'error');
    } else if (result.sent || announce) {
        say(result.sent ? `Sent ${result.sent} ${result.sent === 1 ? 'action' : 'actions'}; data refreshed.` : 'Data refreshed.', 'ok');
    }
}

function ready() {
    if (!document.body.dataset.ready) {
        performance.mark('depotcast-ready');
        document.body.dataset.ready = 'true';
    }
}

async function start() {
    if ('serviceWorker' in navigator) {
        navigator.serviceWorker.register('/app/mechanic/sw.js', {scope: '/app/mechanic/'}).catch(() => {});
    }
    if (navigator.onLine) {
        try {
            me = await startPage({roles: ['mechanic']});
        } catch (e) {
            if (!e.offline) {
                throw e;
            }
        }
    }
    snapshot = (await store.loadSnapshot(me ? me.username : store.lastUser())) || null;
    if (!me) {
        me = snapshot ? snapshot.me : null;
        document.body.prepend(topBar(me));
    }
    layout();
    await drawOutbox();
    if (snapshot) {
        drawData();
        ready();
    }
    window.addEventListener('online', () => syncAndRefresh(false));
    window.addEventListener('offline', drawSync);
    setInterval(() => (outbox.some(i => i.state === 'waiting') ? syncAndRefresh(false) : drawSync()), 60000);
    if (me && navigator.onLine) {
        await store.dropOtherSnapshots(me.username);
        await syncAndRefresh(false);
    } else if (!snapshot) {
        say('This page needs one visit with a connection before it can work without one.', 'error');
    }
    ready();
}

start();
