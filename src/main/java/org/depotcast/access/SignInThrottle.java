package org.depotcast.access;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.common.TooManyAttemptsException;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Paces password guessing. Every attempt is counted before its password is checked, once against the account and
 * once against the client address, so simultaneous guesses cannot all reach the check: an account allows
 * {@link #ACCOUNT_FREE_FAILURES} failures (an address {@link #ADDRESS_FREE_FAILURES}), counting the attempts still
 * being checked; after that one attempt at a time, each after a pause that doubles with every further failure (1 s,
 * 2 s, 4 s … never more than {@link #MAX_PAUSE_MILLIS}). Attempts refused during a pause are not counted, so a pause
 * is never longer than stated. A right password ends the account's count; an address's count is forgotten after
 * {@link #FORGET_AFTER_MILLIS} without failures (a success from it does not clear it, or one good account would
 * let an address guess at others without end).
 */
@ApplicationScoped
public class SignInThrottle {
    static final int ACCOUNT_FREE_FAILURES = 5;
    static final int ADDRESS_FREE_FAILURES = 20;
    static final long MAX_PAUSE_MILLIS = 5 * 60_000L;
    static final long FORGET_AFTER_MILLIS = 15 * 60_000L;
    private static final long BUSY_RETRY_MILLIS = 1_000L;
    private static final int MAX_TRACKED = 10_000;

    private final Map<String, Counter> accounts = new ConcurrentHashMap<>();
    private final Map<String, Counter> addresses = new ConcurrentHashMap<>();

    /** An attempt that holds a place in both counts until its outcome is known. */
    public final class Attempt {
        private final Counter account;
        private final Counter address;
        private boolean done;

        private Attempt(Counter account, Counter address) {
            this.account = account;
            this.address = address;
        }

        public synchronized void succeeded() {
            finish(Outcome.SUCCEEDED);
        }

        public synchronized void failed() {
            finish(Outcome.FAILED);
        }

        /** Nothing was decided (the check itself broke): release the places without counting. */
        public synchronized void abandoned() {
            finish(Outcome.ABANDONED);
        }

        private void finish(Outcome outcome) {
            if (done) {
                return;
            }
            done = true;
            long now = System.currentTimeMillis();
            account.leave(outcome, true, now);
            address.leave(outcome, false, now);
        }
    }

    private enum Outcome { SUCCEEDED, FAILED, ABANDONED }

    /** Takes a place for one password check, or refuses with the seconds to wait. */
    public Attempt begin(String username, String address) {
        long now = System.currentTimeMillis();
        Counter account = counter(accounts, username, ACCOUNT_FREE_FAILURES);
        Counter client = counter(addresses, address, ADDRESS_FREE_FAILURES);
        long wait = account.enter(now);
        if (wait > 0) {
            throw paused(wait);
        }
        wait = client.enter(now);
        if (wait > 0) {
            account.leave(Outcome.ABANDONED, true, now);
            throw paused(wait);
        }
        return new Attempt(account, client);
    }

    /** Refuses while the account or the address is paused; for a sign-in answered without a password check. */
    public void requireNotPaused(String username, String address) {
        long now = System.currentTimeMillis();
        long wait = Math.max(pauseLeft(accounts.get(username), now), pauseLeft(addresses.get(key(address)), now));
        if (wait > 0) {
            throw paused(wait);
        }
    }

    private static long pauseLeft(Counter counter, long now) {
        return counter == null ? 0 : counter.pauseLeft(now);
    }

    private static TooManyAttemptsException paused(long millis) {
        return new TooManyAttemptsException(Math.max(1, (millis + 999) / 1000));
    }

    private static Counter counter(Map<String, Counter> map, String name, int free) {
        if (map.size() > MAX_TRACKED) {
            long now = System.currentTimeMillis();
            map.values().removeIf(c -> c.forgettable(now));
        }
        return map.computeIfAbsent(key(name), k -> new Counter(free));
    }

    private static String key(String name) {
        return name == null ? "" : name;
    }

    private static final class Counter {
        private final int free;
        private int failures;
        private int inFlight;
        private long lastFailureAt;
        private long pausedUntil;

        Counter(int free) {
            this.free = free;
        }

        synchronized long enter(long now) {
            forgetIfQuiet(now);
            if (now < pausedUntil) {
                return pausedUntil - now;
            }
            int allowed = failures < free ? free - failures : 1;
            if (inFlight >= allowed) {
                return BUSY_RETRY_MILLIS;
            }
            inFlight++;
            return 0;
        }

        synchronized void leave(Outcome outcome, boolean successClears, long now) {
            inFlight--;
            if (outcome == Outcome.FAILED) {
                failures++;
                lastFailureAt = now;
                if (failures >= free) {
                    pausedUntil = now + Math.min(MAX_PAUSE_MILLIS, 1000L << Math.min(20, failures - free));
                }
            } else if (outcome == Outcome.SUCCEEDED && successClears) {
                failures = 0;
                pausedUntil = 0;
            }
        }

        synchronized long pauseLeft(long now) {
            return Math.max(0, pausedUntil - now);
        }

        synchronized boolean forgettable(long now) {
            return inFlight == 0 && now >= pausedUntil && now - lastFailureAt > FORGET_AFTER_MILLIS;
        }

        private void forgetIfQuiet(long now) {
            if (forgettable(now)) {
                failures = 0;
            }
        }
    }
}
