package org.arcwright.model;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonValue;

/** How the section at the radius is loaded in service. */
public enum Loading {
    NONE("none"),
    STATIC("static"),
    /** Cyclic loading: the minimum radius decides fatigue life. */
    FATIGUE("fatigue");

    private final String key;

    Loading(String key) { this.key = key; }

    @JsonValue
    public String key() { return key; }

    @JsonCreator
    public static Loading fromKey(String key) { return Keys.fromKey(Loading.class, values(), key, Loading::key); }
}
