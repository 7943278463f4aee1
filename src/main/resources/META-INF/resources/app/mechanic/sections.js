/*
 * sections.js: the mechanic's page is long on a phone, so each part of it folds (<details>): the heading stays,
 * with its count ("My pumps: 3 to visit"), and opens with a tap. A link of the jump list, an action on a pump card
 * or a refusal opens the part it leads to; what the mechanic opened or closed stays so when the data is redrawn.
 *   section(id, title, ...body)   a folding part with a heading <h2 id="{id}-title">
 *   heading(id, text)             new heading words (with the count)
 *   openSection(id, scroll?)      opens it (and scrolls it into view)
 *   followJumps(nav)              the jump list's links open their part
 */
import {h} from '/app/js/ui.js';

export function section(id, title, ...body) {
    return h('details', {id, class: 'mech-section'},
        h('summary', {}, h('h2', {id: `${id}-title`}, title)), h('div', {class: 'mech-section__body', role: 'region',
            'aria-labelledby': `${id}-title`}, ...body));
}

export function heading(id, text) {
    const title = document.getElementById(`${id}-title`);
    if (title && title.textContent !== text) {
        title.textContent = text;
    }
}

export function openSection(id, scroll) {
    const part = document.getElementById(id);
    if (part) {
        part.open = true;
        if (scroll) {
            part.scrollIntoView({block: 'start'});
        }
    }
}

export function followJumps(nav) {
    nav.addEventListener('click', e => {
        const link = e.target.closest('a[href^="#"]');
        if (link) {
            openSection(link.getAttribute('href').slice(1));
        }
    });
}
