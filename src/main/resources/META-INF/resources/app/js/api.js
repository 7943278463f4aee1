/*
 * api.js: the pages' one way to the server. Every call goes to /api with the session cookie and the header the
 * API's cross-site protection asks of cookie-signed writes (DEVELOPERS.md, "Sign-in"), on reads too, so the API
 * answers 401 instead of a password box.
 *   get(path, query?)              JSON (or text for CSV answers)
 *   post(path, body?) put(path, body) patch(path, body) del(path)
 *   send(method, path, body?)      any of them by name (the mechanic's outbox keeps the method with the item)
 *   upload(path, text, type?)      a CSV or other text body
 *   query(path, {name: value})     path with the non-empty values as query parameters
 *   clientRef(prefix?)             a random reference made on this device, for resends that must count once
 * A 401 sends the browser to the sign-in page ("your session has ended" when this browser had signed in).
 * Any other failure throws ApiError: status (0 = no connection), title, detail, errors[{field, message}],
 * refused (403), offline, extensions (the problem's own members beside the standard ones, e.g. officerNoticeRecorded).
 */
export const PAGE_HEADER = 'X-Requested-With';
export const PAGE_HEADER_VALUE = 'depotcast';
export const SIGNED_IN_MARK = 'depotcast.signed-in';

const STANDARD_MEMBERS = new Set(['type', 'title', 'status', 'detail', 'instance', 'errors']);

export class ApiError extends Error {
    constructor(status, problem) {
        super(problem.detail || problem.title || `The server answered ${status}`);
        this.status = status;
        this.title = problem.title || '';
        this.detail = problem.detail || '';
        this.type = problem.type || '';
        this.errors = Array.isArray(problem.errors) ? problem.errors : [];
        this.refused = status === 403;
        this.offline = status === 0;
        this.extensions = Object.fromEntries(Object.entries(problem).filter(([name]) => !STANDARD_MEMBERS.has(name)));
    }
}

export function query(path, params = {}) {
    const search = new URLSearchParams();
    for (const [name, value] of Object.entries(params)) {
        if (value !== undefined && value !== null && value !== '') {
            search.append(name, String(value));
        }
    }
    const text = search.toString();
    return text ? `${path}${path.includes('?') ? '&' : '?'}${text}` : path;
}

export function sessionEnded() {
    const next = location.pathname + location.search + location.hash;
    const hadSession = localStorage.getItem(SIGNED_IN_MARK) !== null;
    localStorage.removeItem(SIGNED_IN_MARK);
    location.assign(`/sign-in.html?${hadSession ? 'expired&' : ''}next=${encodeURIComponent(next)}`);
}

async function call(method, path, body, contentType) {
    const headers = {Accept: 'application/json, text/csv;q=0.9', [PAGE_HEADER]: PAGE_HEADER_VALUE};
    let payload;
    if (body !== undefined) {
        headers['Content-Type'] = contentType || 'application/json';
        payload = contentType ? body : JSON.stringify(body);
    }
    let answer;
    try {
        answer = await fetch(path, {method, headers, body: payload, credentials: 'same-origin', cache: 'no-store'});
    } catch (e) {
        throw new ApiError(0, {title: 'No connection', detail: 'No connection to the server. Check the network and try again.'});
    }
    if (answer.status === 401) {
        sessionEnded();
        // The page is going away; a promise that never settles keeps callers from showing a stray error meanwhile.
        return new Promise(() => {});
    }
    const type = answer.headers.get('Content-Type') || '';
    const content = answer.status === 204 ? null
        : type.includes('json') ? await answer.json().catch(() => ({})) : await answer.text();
    if (!answer.ok) {
        throw new ApiError(answer.status, content && typeof content === 'object' ? content
            : {title: answer.statusText, detail: `The server answered ${answer.status}.`});
    }
    return content;
}

export const get = (path, params) => call('GET', params ? query(path, params) : path);
export const post = (path, body) => call('POST', path, body);
export const put = (path, body) => call('PUT', path, body);
export const patch = (path, body) => call('PATCH', path, body);
export const send = (method, path, body) => call(method, path, body);
export const del = path => call('DELETE', path);
export const upload = (path, text, type = 'text/csv') => call('POST', path, text, type);

export function clientRef(prefix = 'web') {
    const bytes = crypto.getRandomValues(new Uint8Array(16));
    bytes[6] = (bytes[6] & 0x0f) | 0x40;
    bytes[8] = (bytes[8] & 0x3f) | 0x80;
    const hex = [...bytes].map(b => b.toString(16).padStart(2, '0')).join('');
    return `${prefix}-${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
