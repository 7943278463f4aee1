/*
 * methods.js: forecast methods in words, for every page that names the method behind a planning number
 * (the lead's forecast explorer, the officer's board). The API sends the method's code (FLEET, SBA, ...).
 */
export const METHOD_WORDS = {
    FLEET: 'fleet model (breakdown rate of the installed pumps)', CROSTON: 'Croston', SBA: 'SBA (Croston, bias-corrected)',
    SBJ: 'SBJ (Croston, Shale–Boylan–Johnston correction)', TSB: 'TSB (Teunter–Syntetos–Babai)',
    SES: 'simple exponential smoothing', POISSON: 'Poisson mean', MEAN12: 'mean of the last 12 months',
    COMBINED: 'combination (the middle value of SBA, TSB, smoothing, Poisson mean and 12-month mean)', 'no forecast': 'no forecast'
};

export function methodWords(method) {
    return METHOD_WORDS[method] || METHOD_WORDS[String(method).toUpperCase()] || String(method).toLowerCase();
}
