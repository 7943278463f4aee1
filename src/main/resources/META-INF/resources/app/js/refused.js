/* The refused page: which page was refused, for whom it is, who is signed in, and where to go instead. */
import * as api from './api.js';
import {h, mount} from './ui.js';
import {ROLE_WORDS, roleWords, topBar, signOut, LINKS} from './nav.js';

const params = new URLSearchParams(location.search);
const page = params.get('page') || '';
const forRoles = (params.get('for') || '').split(',').filter(Boolean);
const PAGE_WORDS = [['/app/officer/', 'the stores pages'], ['/app/mechanic/', 'the mechanic\'s kit and pumps page'],
    ['/app/lead/', 'the programme lead\'s forecast and budget pages'], ['/app/admin/', 'account management']];

const me = await api.get('/api/me');
document.body.prepend(topBar(me));
const which = (PAGE_WORDS.find(([path]) => page.startsWith(path)) || [null, 'this page'])[1];
const whom = forRoles.map(r => `${ROLE_WORDS[r] || r}s`).join(' and ');
const own = LINKS.filter(l => me.roles.includes(l.role));
mount(document.getElementById('explain'),
    h('p', {}, `You opened ${which}${whom ? ` (for ${whom})` : ''}.`),
    h('p', {}, `You are signed in as ${me.username} (${roleWords(me.roles)}).`),
    own.length ? h('p', {}, 'Your own pages: ', own.map((l, i) => [i ? ', ' : '', h('a', {href: l.href}, l.label)])) : null,
    h('p', {}, 'If you need this page for your work, ask the programme\'s administrator to give your account that role. '
        + 'To use another account, sign out first.'),
    h('p', {}, h('button', {type: 'button', onclick: signOut}, 'Sign out')));
