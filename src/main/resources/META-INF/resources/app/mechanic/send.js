/*
 * send.js: sends the outbox to the server, oldest first, one sender at a time (also across tabs, through a Web
 * Lock), so nothing goes twice at once. An item leaves the outbox only when the server has it: a new record (201)
 * or the one it already had under the same reference (200, a resend after a lost answer). A refusal the same
 * action would meet again (400, 403, 404, 409, 422) stays on the phone with the server's words until the user
 * discards it; no connection or a server fault (5xx) leaves the item waiting for the next try.
 */
import * as api from '/app/js/api.js';
import * as store from './store.js';
import * as fmt from '/app/js/format.js';

const REFUSALS = new Set([400, 403, 404, 409, 422]);

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

export function refusalText(error) {
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
            if (!REFUSALS.has(e.status)) {
                result.stopped = e;
                break;
            }
            await store.update({...item, state: 'refused', status: e.status, message: refusalText(e), errors: e.errors});
            result.refused++;
        }
        if (onEach) {
            await onEach();
        }
    }
    return result;
}
