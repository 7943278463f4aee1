package org.depotcast.access;

import io.vertx.core.http.HttpServerRequest;
import io.vertx.core.net.SocketAddress;
import io.vertx.ext.web.RoutingContext;

/**
 * The address a request came from, as the sign-in throttle counts it. Behind a reverse proxy, set
 * {@code quarkus.http.proxy.*} so that this is the client's address, not the proxy's.
 */
final class ClientAddress {
    private ClientAddress() {
    }

    static String of(RoutingContext context) {
        return context == null ? "" : of(context.request());
    }

    static String of(HttpServerRequest request) {
        SocketAddress remote = request == null ? null : request.remoteAddress();
        return remote == null || remote.hostAddress() == null ? "" : remote.hostAddress();
    }
}
