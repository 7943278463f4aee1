package org.depotcast.access;

import io.quarkus.elytron.security.common.BcryptUtil;
import org.wildfly.security.password.Password;
import org.wildfly.security.password.PasswordFactory;
import org.wildfly.security.password.WildFlyElytronPasswordProvider;
import org.wildfly.security.password.interfaces.BCryptPassword;
import org.wildfly.security.password.util.ModularCrypt;

import java.security.GeneralSecurityException;

/** bcrypt hashing and checking (Modular Crypt Format, "$2a$"), through the Elytron library Quarkus ships. */
public final class PasswordHasher {
    private static final WildFlyElytronPasswordProvider PROVIDER = new WildFlyElytronPasswordProvider();
    private static final int COST = 10;

    private PasswordHasher() {
    }

    public static String hash(String password) {
        return BcryptUtil.bcryptHash(password, COST);
    }

    public static boolean matches(String password, String storedHash) {
        try {
            Password stored = ModularCrypt.decode(storedHash);
            PasswordFactory factory = PasswordFactory.getInstance(BCryptPassword.ALGORITHM_BCRYPT, PROVIDER);
            return factory.verify(factory.translate(stored), password.toCharArray());
        } catch (GeneralSecurityException | IllegalArgumentException e) {
            return false;
        }
    }
}
