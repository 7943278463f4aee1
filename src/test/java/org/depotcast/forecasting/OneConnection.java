package org.depotcast.forecasting;

import javax.sql.DataSource;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.lang.reflect.Proxy;
import java.sql.Connection;

/** A data source that always hands out one open connection, which its users cannot close (the owner does). */
final class OneConnection {
    private OneConnection() {
    }

    static DataSource of(Connection connection) {
        Connection unclosable = (Connection) Proxy.newProxyInstance(OneConnection.class.getClassLoader(),
                new Class<?>[]{Connection.class}, (proxy, method, args) ->
                        "close".equals(method.getName()) ? null : call(method, connection, args));
        return (DataSource) Proxy.newProxyInstance(OneConnection.class.getClassLoader(), new Class<?>[]{DataSource.class},
                (proxy, method, args) -> switch (method.getName()) {
                    case "getConnection" -> unclosable;
                    case "getLoginTimeout" -> 0;
                    case "isWrapperFor" -> false;
                    case "hashCode" -> System.identityHashCode(proxy);
                    case "equals" -> proxy == args[0];
                    case "toString" -> "one connection";
                    default -> null;
                });
    }

    private static Object call(Method method, Connection target, Object[] args) throws Throwable {
        try {
            return method.invoke(target, args);
        } catch (InvocationTargetException e) {
            throw e.getCause();
        }
    }
}
