/*
 * nav.js: starts every page. Reads the signed-in account (/api/me), sends an account whose roles may not open
 * this page to the refused page, and draws the top bar: product name, the links of the account's roles, the
 * signed-in name and a sign-out button.
 *   const me = await startPage({roles: ['stores-officer', 'admin']})
 *   me = {username, roles, locationCodes, kitCode, home}
 * LINKS lists each role's pages; a page whose path starts with a link's path marks that link current.
 */
import * as api from './api.js';
import {h} from './ui.js';

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

export async function signOut() {
    try {
        await fetch('/sign-out', {method: 'POST', credentials: 'same-origin',
            headers: {Accept: 'application/json', [api.PAGE_HEADER]: api.PAGE_HEADER_VALUE}});
    } finally {
        localStorage.removeItem(api.SIGNED_IN_MARK);
        location.assign('/sign-in.html?signed-out');
    }
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
