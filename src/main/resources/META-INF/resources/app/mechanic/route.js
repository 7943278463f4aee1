/*
 * route.js: the order to visit the pumps that need the mechanic, so the phone lists them as the day's round runs.
 * From the depot, always the nearest pump not yet visited (nearest neighbour), by straight-line (great-circle)
 * distance: no road network is on record, so the distances are as the crow flies and say so on the page. Pumps
 * without coordinates come last, in the order given (the most pressing first).
 *   distanceKm(a, b)          haversine on a 6,371 km sphere, as the server's transfer planner
 *   visitOrder(start, stops)  [{stop, legKm}]: legKm from the stop before (or the depot); null for a stop without
 *                             coordinates, and for the first when the depot has none
 */
const EARTH_KM = 6371.0;

const located = p => p && p.latitude !== null && p.latitude !== undefined && p.longitude !== null && p.longitude !== undefined;

export function distanceKm(a, b) {
    const rad = d => (Number(d) * Math.PI) / 180;
    const dLat = rad(b.latitude) - rad(a.latitude);
    const dLon = rad(b.longitude) - rad(a.longitude);
    const h = Math.sin(dLat / 2) ** 2 + Math.cos(rad(a.latitude)) * Math.cos(rad(b.latitude)) * Math.sin(dLon / 2) ** 2;
    return 2 * EARTH_KM * Math.asin(Math.min(1, Math.sqrt(h)));
}

export function visitOrder(start, stops) {
    const left = stops.filter(located);
    const route = [];
    let here = located(start) ? start : null;
    while (left.length) {
        let best = 0;
        for (let i = 1; here && i < left.length; i++) {
            if (distanceKm(here, left[i]) < distanceKm(here, left[best])) {
                best = i;
            }
        }
        const [next] = left.splice(best, 1);
        route.push({stop: next, legKm: here ? distanceKm(here, next) : null});
        here = next;
    }
    return [...route, ...stops.filter(s => !located(s)).map(stop => ({stop, legKm: null}))];
}
