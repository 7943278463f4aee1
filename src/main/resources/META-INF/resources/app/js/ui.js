/*
 * ui.js: small DOM helpers shared by every page.
 *   h(tag, attrs, ...children)   element; attrs: class, text, on<Event>: handler, boolean and data-* attributes;
 *                                children: strings, nodes, arrays; null/false/undefined are skipped
 *   mount(parent, ...children)   replaces the parent's children
 *   table({caption, columns: [{label, value: row => text|node, num}], rows, empty})  a captioned table in a
 *                                scroll box; on a phone each row stacks as "label: value" lines
 *   figures([[label, value], …]) a compact list of named numbers
 *   state(words, tone)           a state said in words; tone urgent|warn|ok|info|quiet only repeats it in colour
 *   say(text, tone) / showError(error, form?)  messages in the page's status region; problem+json field
 *                                errors are put beside the form's inputs (name="field" or data-field="field")
 *   busy(button, asyncFn)        disables the button while the work runs, shows errors, returns the result
 *   caution()                    the safety caution: one line, the full text a click away
 *   ask({title, lines, yes, no}) a modal question in words; resolves true only for the `yes` button (Escape and
 *                                `no` answer false, and `no` has the focus, so a stray tap changes nothing)
 */
export function h(tag, attrs, ...children) {
    const el = document.createElement(tag);
    for (const [name, value] of Object.entries(attrs || {})) {
        if (value === undefined || value === null || value === false) {
            continue;
        }
        if (name === 'class') {
            el.className = value;
        } else if (name === 'text') {
            el.textContent = value;
        } else if (name.startsWith('on') && typeof value === 'function') {
            el.addEventListener(name.slice(2).toLowerCase(), value);
        } else if (name === 'value' && 'value' in el) {
            el.value = value;
        } else {
            el.setAttribute(name, value === true ? '' : value);
        }
    }
    append(el, children);
    return el;
}

function append(el, children) {
    for (const child of children) {
        if (Array.isArray(child)) {
            append(el, child);
        } else if (child !== null && child !== undefined && child !== false) {
            el.append(child instanceof Node ? child : String(child));
        }
    }
}

export function mount(parent, ...children) {
    parent.replaceChildren();
    append(parent, children);
    return parent;
}

export function table({caption, columns, rows, empty = 'Nothing to show.', id, captionHidden = false}) {
    const head = h('thead', {}, h('tr', {}, columns.map(c => h('th', {scope: 'col', class: c.num ? 'num' : null}, c.label))));
    const body = h('tbody', {}, rows.map((row, i) => h('tr', {}, columns.map(c =>
        h('td', {class: c.num ? 'num' : null, 'data-label': c.label}, c.value(row, i))))));
    const t = h('table', {class: 'stack', id},
        caption ? h('caption', {class: captionHidden ? 'visually-hidden' : null}, caption) : null, head, body);
    return h('div', {class: 'table-wrap'}, t, rows.length ? null : h('p', {class: 'empty'}, empty));
}

export function figures(pairs) {
    return h('dl', {class: 'figures'}, pairs.filter(Boolean).map(([label, value]) => h('div', {}, h('dt', {}, label), h('dd', {}, value))));
}

export function state(words, tone = 'quiet') {
    return h('span', {class: `state state--${tone}`}, words);
}

function region() {
    let el = document.getElementById('status');
    if (!el) {
        el = h('div', {id: 'status', class: 'status-region', role: 'status', 'aria-live': 'polite'});
        (document.querySelector('main') || document.body).prepend(el);
    }
    return el;
}

export function say(text, tone = 'ok', extra) {
    const box = h('div', {class: `message message--${tone}`, role: tone === 'error' ? 'alert' : null},
        h('span', {}, text), extra || null,
        h('button', {type: 'button', class: 'no-print', 'aria-label': 'Close this message', onclick: e => e.target.closest('.message').remove()}, 'Close'));
    mount(region(), box);
    return box;
}

export function clearErrors(form) {
    if (!form) {
        return;
    }
    form.querySelectorAll('.field-error').forEach(e => e.remove());
    form.querySelectorAll('[aria-invalid]').forEach(e => {
        e.removeAttribute('aria-invalid');
        e.removeAttribute('aria-describedby');
    });
}

function fieldInput(form, field) {
    const simple = String(field).replace(/^.*\./, '');
    return form.querySelector(`[data-field="${CSS.escape(field)}"]`) || form.querySelector(`[name="${CSS.escape(field)}"]`)
        || form.querySelector(`[name="${CSS.escape(simple)}"]`);
}

/** Shows what went wrong; returns the field errors that had no input of their own on the form. */
export function showError(error, form) {
    clearErrors(form);
    const unplaced = [];
    for (const e of error.errors || []) {
        const input = form ? fieldInput(form, e.field) : null;
        if (input) {
            const id = `err-${Math.random().toString(36).slice(2)}`;
            input.setAttribute('aria-invalid', 'true');
            input.setAttribute('aria-describedby', id);
            input.after(h('p', {class: 'field-error', id}, e.message));
        } else {
            unplaced.push(e);
        }
    }
    const lead = error.offline ? error.detail
        : error.refused ? `Not allowed: ${error.detail || 'your account may not do this.'}`
        : error.detail || error.message || 'Something went wrong.';
    const list = unplaced.length ? h('ul', {}, unplaced.map(e => h('li', {}, `${e.field}: ${e.message}`))) : null;
    say(lead, 'error', list);
    return unplaced;
}

export async function busy(button, work, form) {
    button.disabled = true;
    button.setAttribute('aria-busy', 'true');
    try {
        clearErrors(form);
        return await work();
    } catch (e) {
        showError(e, form);
        return undefined;
    } finally {
        button.disabled = false;
        button.removeAttribute('aria-busy');
    }
}

export function caution() {
    return h('aside', {class: 'caution'}, h('details', {},
        h('summary', {}, 'Safety: repairs follow local codes, national drinking-water rules and trained, licensed practice.'),
        h('p', {}, 'depotcast plans parts; it does not tell anyone how to repair a well. Work on boreholes and hand pumps '
            + '(lifting rods and rising mains: heavy, under tension, a crushing and dropping hazard; working over an open '
            + 'well; anything that touches drinking water) must follow local codes, national drinking-water quality rules '
            + 'and the practice of trained, licensed people.'),
        h('p', {}, 'Parts in contact with drinking water (seals, pipes, grease) and any substitute part must be approved '
            + 'for that use where the pump is installed; catalogue descriptions certify nothing. After any repair that '
            + 'opens the rising main, the water supply authority\'s disinfection and testing rules apply.')));
}

export function ask({title, lines, yes, no}) {
    return new Promise(resolve => {
        const answer = value => () => {
            dialog.close();
            dialog.remove();
            resolve(value);
        };
        const stay = h('button', {type: 'button', class: 'primary', id: 'ask-no', onclick: answer(false)}, no);
        const dialog = h('dialog', {class: 'ask', 'aria-labelledby': 'question-title'},
            h('h2', {id: 'question-title'}, title), lines.map(l => (l instanceof Node ? l : h('p', {}, l))),
            h('p', {class: 'row'}, stay, h('button', {type: 'button', id: 'ask-yes', class: 'danger', onclick: answer(true)}, yes)));
        dialog.addEventListener('cancel', e => {
            e.preventDefault();
            answer(false)();
        });
        document.body.append(dialog);
        dialog.showModal();
        stay.focus();
    });
}
