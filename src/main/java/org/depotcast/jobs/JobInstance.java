package org.depotcast.jobs;

import jakarta.enterprise.context.ApplicationScoped;
import org.eclipse.microprofile.config.inject.ConfigProperty;

import java.time.Duration;
import java.util.UUID;

/**
 * This service instance's name in the job table (host, process id and a random suffix: new on every start, so a
 * restarted instance never takes over the jobs of its previous life), and how long a running job may go without a
 * heartbeat before it counts as dead.
 */
@ApplicationScoped
public class JobInstance {
    private final String id;
    private final Duration deadAfter;

    JobInstance(@ConfigProperty(name = "depotcast.jobs.dead-after") Duration deadAfter,
                @ConfigProperty(name = "depotcast.jobs.heartbeat-every") Duration heartbeatEvery) {
        if (deadAfter.compareTo(heartbeatEvery.multipliedBy(3)) < 0) {
            throw new IllegalStateException("depotcast.jobs.dead-after (" + deadAfter
                    + ") must be at least three heartbeats (depotcast.jobs.heartbeat-every = " + heartbeatEvery + ")");
        }
        String host = hostName();
        host = host.substring(0, Math.min(40, host.length()));
        this.id = host + "-" + ProcessHandle.current().pid() + "-" + UUID.randomUUID().toString().substring(0, 8);
        this.deadAfter = deadAfter;
    }

    private static String hostName() {
        try {
            return java.net.InetAddress.getLocalHost().getHostName();
        } catch (java.io.IOException unknown) {
            return "host";
        }
    }

    public String id() {
        return id;
    }

    public Duration deadAfter() {
        return deadAfter;
    }
}
