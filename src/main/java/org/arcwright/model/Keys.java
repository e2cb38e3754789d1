package org.arcwright.model;

import java.util.Arrays;
import java.util.function.Function;
import java.util.stream.Collectors;

/** Reads the lower-case hyphenated names used for enum values in files. */
public final class Keys {
    private Keys() {}

    public static <E extends Enum<E>> E fromKey(Class<E> type, E[] values, String key, Function<E, String> keyOf) {
        for (E e : values) {
            if (keyOf.apply(e).equals(key)) return e;
        }
        throw new IllegalArgumentException("unknown value '" + key + "'; use one of "
                + Arrays.stream(values).map(keyOf).collect(Collectors.joining(", ")));
    }
}
