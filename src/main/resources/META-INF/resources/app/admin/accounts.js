/*
 * Accounts page (administrators): every account with its roles, assigned stores and kit; change an account's roles
 * or stores; make a new account. Passwords are never shown or read back.
 */
import * as api from '/app/js/api.js';
import {h, mount, table, state, busy, say} from '/app/js/ui.js';
import {startPage, ROLE_WORDS, roleWords} from '/app/js/nav.js';

const me = await startPage({roles: ['admin']});
const locations = await api.get('/api/locations');
const stores = locations.filter(l => l.kind === 'CENTRAL_STORE' || l.kind === 'DEPOT');
const kits = locations.filter(l => l.kind === 'KIT');
const ROLES = Object.keys(ROLE_WORDS);
const form = document.getElementById('create-form');

function checkboxes(name, options, chosen = []) {
    return options.map(([value, words]) => h('label', {}, h('input', {type: 'checkbox', name, value, checked: chosen.includes(value)}), words));
}

function ticked(container, name) {
    return [...container.querySelectorAll(`input[name="${name}"]:checked`)].map(i => i.value);
}

const roleOptions = ROLES.map(r => [r, ROLE_WORDS[r]]);
const storeOptions = stores.map(l => [l.code, `${l.name} (${l.code})`]);
mount(document.getElementById('new-roles'), checkboxes('roles', roleOptions));
mount(document.getElementById('new-locations'), checkboxes('locationCodes', storeOptions));
mount(form.kitCode, h('option', {value: ''}, 'no kit'), kits.map(k => h('option', {value: k.code}, `${k.name} (${k.code})`)));

function changeForm(account) {
    const box = h('form', {class: 'account-change', 'data-account': account.username, novalidate: true},
        h('fieldset', {'data-field': 'roles'}, h('legend', {}, `Roles of ${account.username}`), h('div', {class: 'checks'}, checkboxes('roles', roleOptions, account.roles))),
        h('fieldset', {'data-field': 'codes'}, h('legend', {}, `Stores ${account.username} acts on`), h('div', {class: 'checks'}, checkboxes('locationCodes', storeOptions, account.locationCodes))),
        h('button', {type: 'submit', class: 'primary'}, `Save ${account.username}`));
    box.addEventListener('submit', e => {
        e.preventDefault();
        busy(e.submitter || box.querySelector('button'), async () => {
            await api.put(`/api/accounts/${encodeURIComponent(account.username)}/roles`, {roles: ticked(box, 'roles')});
            await api.put(`/api/accounts/${encodeURIComponent(account.username)}/locations`, {codes: ticked(box, 'locationCodes')});
            say(`Account ${account.username} saved.`, 'ok');
            await showAccounts();
        }, box);
    });
    return h('details', {}, h('summary', {}, `Change ${account.username}`), box);
}

async function showAccounts() {
    const accounts = await api.get('/api/accounts');
    mount(document.getElementById('accounts'), table({caption: `Accounts (${accounts.length})`, id: 'account-table', rows: accounts,
        columns: [{label: 'Account', value: a => a.username === me.username ? `${a.username} (you)` : a.username},
            {label: 'Roles', value: a => roleWords(a.roles)},
            {label: 'State', value: a => a.enabled ? state('can sign in', 'ok') : state('switched off', 'quiet')},
            {label: 'Stores', value: a => a.locationCodes.length ? a.locationCodes.join(', ') : '–'},
            {label: 'Kit', value: a => a.kitCode || '–'},
            {label: 'Change', value: changeForm}]}));
}

form.addEventListener('submit', e => {
    e.preventDefault();
    busy(e.submitter || form.querySelector('button'), async () => {
        const made = await api.post('/api/accounts', {username: form.username.value.trim(), password: form.password.value,
            roles: ticked(form, 'roles'), kitCode: form.kitCode.value || null, locationCodes: ticked(form, 'locationCodes')});
        say(`Account ${made.username} made (${roleWords(made.roles)}). Give the first password to the person privately.`, 'ok');
        form.reset();
        await showAccounts();
    }, form);
});

await showAccounts();
performance.mark('depotcast-ready');
document.body.dataset.ready = 'true';
