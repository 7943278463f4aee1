/*
 * send.js: sends the outbox to the server, oldest first, one sender at a time (also across tabs, through a Web
 * Lock), so nothing goes twice at once. An item leaves the outbox only when the server has it: a new record (201)
 * or the one it already had under the same reference (200, a resend after a lost answer). A refusal the same
 * action would meet again (400, 403, 404, 409, 422) stays on the phone with the server's words until the user
 * discards it or sends it again (sendAgain); no connection or a server fault (5xx) leaves the item waiting for the
 * next try. A refusal for too few parts on the kit's books (/problems/not-enough-stock) is marked `shortage`: the
 * repair happened, so it waits for the stores officer to book the parts to the kit and is then sent again under the
 * same reference (the server kept nothing of the refused send, so the resend records it once). Its answer says
 * whether the server put the refusal on the stores officer's morning board (officerNoticeRecorded): the item keeps
 * that as `officerTold`, and the notice's id as `officerNotice` once any send has written one. Discarding such an
 * item queues the withdrawal of its notice (withdrawNotice), sent like any other write, now or when the phone is
 * back online; a withdrawal answered 404 (no notice was ever written) leaves the outbox, having nothing to withdraw.
 */
import * as api from '/app/js/api.js';
import * as store from './store.js';
import * as fmt from '/app/js/format.js';

const REFUSALS = new Set([400, 403, 404, 409, 422]);
const SHORTAGE = '/problems/not-enough-stock';

let sending = null;

export function sendWaiting(username, onEach) {
    if (!sending) {
        sending = withLock(() => sendAll(username, onEach)).finally(() => {
            sending = null;
        });
    }
    return sending;
}

function withLock(work) {
    return navigator.locks ? navigator.locks.request('depotcast-mechanic-outbox', work) : work();
}

/** A refused item back to waiting, as it was queued (same reference and body), for the next send. */
export function sendAgain(item) {
    const {status, message, errors, shortage, officerTold, ...kept} = item;
    return store.update({...kept, state: 'waiting'});
}

/** A refusal for too few parts on the kit's books (also one kept on the phone before refusals were marked so). */
export function isShortage(item) {
    return item.state === 'refused' && (item.shortage || (item.status === 422 && STOCK_WORDS.test(item.message || '')));
}

const STOCK_WORDS = /only (\S+) of part '([^']+)' on hand at '([^']+)', cannot take (\S+)/;

/** "only 0 of part 'OB-BR-20' on hand at 'KIT-M03', cannot take 3" in the phone's words, codes without quotes. */
export function shortageText(detail) {
    const m = STOCK_WORDS.exec(detail || '');
    return m ? `The books show only ${m[1]} of part ${m[2]} in ${m[3]}, and this needs ${m[4]}.`
        : capital(String(detail || '').replace(/'([^']*)'/g, '$1'));
}

export function refusalText(error) {
    if (error.type === SHORTAGE) {
        return shortageText(error.detail);
    }
    const detail = error.detail || error.title || `The server answered ${error.status}.`;
    const own = (error.errors || []).find(e => e.field && e.message === detail);
    // "is already recorded as …" alone does not say what is: name the field in the form's words.
    const lead = own ? `${capital(fieldWords(own.field))}: ${detail}` : detail;
    const fields = (error.errors || []).filter(e => !lead.includes(e.message)).map(e => `${fieldWords(e.field)}: ${e.message}`);
    return localDates(fields.length ? `${lead} (${fields.join('; ')})` : lead);
}

function capital(text) {
    return text.charAt(0).toUpperCase() + text.slice(1);
}

/** The server's ISO days (2026-12-01) as the phone's own dates. */
function localDates(text) {
    return text.replace(/\b(\d{4}-\d{2}-\d{2})\b/g, (day) => fmt.date(day));
}

/** lines[0].partNumber → "part line 1, part number": the form's words, not the JSON path. */
function fieldWords(field) {
    const line = /^lines\[(\d+)]\.?(.*)$/.exec(field || '');
    if (line) {
        return `part line ${Number(line[1]) + 1}${line[2] ? `, ${line[2].replace(/([A-Z])/g, ' $1').toLowerCase()}` : ''}`;
    }
    return String(field || 'request').replace(/([A-Z])/g, ' $1').toLowerCase();
}

/** Whether this refusal reached the officer's board, and the notice any send of the item wrote (kept for withdrawing). */
function officerNotice(item, e) {
    if (e.type !== SHORTAGE) {
        return {};
    }
    return {officerTold: e.extensions.officerNoticeRecorded === true,
        officerNotice: e.extensions.officerNotice || item.officerNotice};
}

/**
 * After the mechanic discarded a refused repair: queues the withdrawal of its notice on the stores officer's board
 * when there may be one (a send wrote one, or the item was kept from before the answer said), then `sync`s. Answers
 * the words to add to "Discarded: …".
 */
export async function withdrawNotice(item, username, sync) {
    if (!isShortage(item) || !item.ref || (!item.officerNotice && item.officerTold === false)) {
        return '';
    }
    const queued = await store.queue({kind: 'withdraw', method: 'POST', username, ref: item.ref,
        path: `/api/refused-repairs/by-repair/${encodeURIComponent(item.ref)}/withdraw`,
        summary: `Withdraw the stores officer's notice of: ${item.summary}`});
    await sync();
    const left = (await store.items(username)).find(i => i.id === queued.id);
    return !left ? ' It is off the stores officer\'s morning board.'
        : left.state === 'refused' ? ' The server refused to take it off the stores officer\'s morning board: see "Waiting to send".'
        : ' It will be taken off the stores officer\'s morning board when this phone next sends (see "Waiting to send").';
}

async function sendAll(username, onEach) {
    const result = {sent: 0, refused: 0, stopped: null};
    for (const item of await store.items(username)) {
        if (item.state !== 'waiting') {
            continue;
        }
        try {
            await api.send(item.method || 'POST', item.path, item.body);
            await store.remove(item.id);
            result.sent++;
        } catch (e) {
            if (item.kind === 'withdraw' && e.status === 404) {
                await store.remove(item.id); // no notice was written for that repair: nothing to withdraw
                continue;
            }
            if (!REFUSALS.has(e.status)) {
                result.stopped = e;
                break;
            }
            await store.update({...item, state: 'refused', status: e.status, message: refusalText(e), errors: e.errors,
                shortage: e.type === SHORTAGE, ...officerNotice(item, e)});
            result.refused++;
        }
        if (onEach) {
            await onEach();
        }
    }
    return result;
}
