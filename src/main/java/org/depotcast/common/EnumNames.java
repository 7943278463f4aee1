package org.depotcast.common;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;

/**
 * How clients may write our enum values (query parameters, CSV cells, model files): any case, '-' for '_'.
 * One place, so "cup-seal", "CUP_SEAL" and "cup_seal" mean the same everywhere.
 */
public final class EnumNames {
    private EnumNames() {
    }

    public static <E extends Enum<E>> Optional<E> parse(Class<E> type, String value) {
        try {
            return Optional.of(Enum.valueOf(type, value.strip().toUpperCase(Locale.ROOT).replace('-', '_')));
        } catch (IllegalArgumentException e) {
            return Optional.empty();
        }
    }

    /** The values a field accepts, for an error message. */
    public static String allowed(Class<? extends Enum<?>> type) {
        return Arrays.toString(type.getEnumConstants());
    }
}
