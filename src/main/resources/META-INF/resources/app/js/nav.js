/*
 * nav.js: starts every page. Reads the signed-in account (/api/me), sends an account whose roles may not open
 * this page to the refused page, and draws the top bar: product name, the links of the account's roles, the
 * signed-in name and a sign-out button.
 *   const me = await startPage({roles: ['stores-officer', 'admin']})
 *   me = {username, roles, locationCodes, kitCode, home}
 * LINKS lists each role's pages; a page whose path starts with a link's path marks that link current.
 */
import * as api from './api.js';
import {h, ask, say} from './ui.js';
import * as device from './device.js';

export const ROLE_WORDS = {
    'stores-officer': 'stores officer', mechanic: 'area mechanic', 'programme-lead': 'programme lead',
    admin: 'administrator'
};

export const LINKS = [
    {role: 'programme-lead', href: '/app/lead/', label: 'Forecasts and budget'},
    {role: 'stores-officer', href: '/app/officer/', label: 'Stores'},
    {role: 'mechanic', href: '/app/mechanic/', label: 'My kit and pumps'},
    {role: 'admin', href: '/app/admin/', label: 'Accounts'}
];

export function roleWords(roles) {
    return roles.map(r => ROLE_WORDS[r] || r).join(', ');
}

const NEEDS_CONNECTION = 'Signing out needs a connection to the server, which ends your session there. You are still '
    + 'signed in and nothing was deleted from this phone; sign out again when the connection is back.';

/**
 * Signs out and clears what this browser kept for the person (device.js). Actions made on the phone that have not
 * reached the server are never dropped without asking: the person is told what they are and chooses. Signing out
 * needs the server (it ends the session), so with no connection nothing is cleared and the page says why.
 */
export async function signOut() {
    if (!navigator.onLine) {
        say(NEEDS_CONNECTION, 'error');
        return;
    }
    const unsent = await device.unsent().catch(() => []);
    if (unsent.length && !(await ask(dropQuestion(unsent)))) {
        say('You are still signed in; nothing was deleted.', 'ok');
        return;
    }
    let answer;
    try {
        answer = await fetch('/sign-out', {method: 'POST', credentials: 'same-origin',
            headers: {Accept: 'application/json', [api.PAGE_HEADER]: api.PAGE_HEADER_VALUE}});
    } catch (e) {
        say(NEEDS_CONNECTION, 'error');
        return;
    }
    if (!answer.ok) {
        say(`The server could not sign you out (it answered ${answer.status}); you are still signed in. Try again in a moment.`, 'error');
        return;
    }
    await device.forget();
    location.assign('/sign-in.html?signed-out');
}

function dropQuestion(unsent) {
    const refused = unsent.filter(i => i.state === 'refused').length;
    const waiting = unsent.length - refused;
    const parts = [waiting ? `${waiting} waiting to send` : null, refused ? `${refused} refused by the server` : null].filter(Boolean);
    const shown = unsent.slice(0, 5);
    return {
        title: `${unsent.length} ${unsent.length === 1 ? 'action has' : 'actions have'} not reached the server`,
        lines: [`Made on this phone and not on the server yet (${parts.join(', ')}):`,
            h('ul', {}, shown.map(i => h('li', {}, i.summary)), unsent.length > shown.length
                ? h('li', {}, `and ${unsent.length - shown.length} more`) : null),
            'Signing out deletes everything kept on this phone, these actions too: they would never be sent. To keep '
            + 'them, stay signed in until the connection is back and they are sent (or, if refused, until you have dealt with them).'],
        yes: 'Delete them and sign out', no: 'Stay signed in'
    };
}

export function topBar(me) {
    const here = location.pathname;
    const links = me ? LINKS.filter(l => me.roles.includes(l.role)) : [];
    return h('header', {class: 'topbar'},
        h('a', {class: 'skip', href: '#main'}, 'Skip to the page'),
        h('a', {class: 'topbar__name', href: '/'}, 'depotcast'),
        h('nav', {'aria-label': 'Your pages'}, links.map(l => h('a', {href: l.href,
            'aria-current': here.startsWith(l.href) ? 'page' : null}, l.label))),
        me ? h('div', {class: 'topbar__who'},
            h('span', {}, `Signed in as ${me.username} (${roleWords(me.roles)})`),
            h('button', {type: 'button', onclick: signOut}, 'Sign out')) : null);
}

export async function startPage({roles}) {
    const me = await api.get('/api/me');
    localStorage.setItem(api.SIGNED_IN_MARK, '1');
    if (roles && !roles.some(r => me.roles.includes(r))) {
        location.replace(`/app/refused.html?page=${encodeURIComponent(location.pathname)}&for=${encodeURIComponent(roles.join(','))}`);
        return new Promise(() => {});
    }
    document.body.prepend(topBar(me));
    return me;
}
