package org.arcwright.model;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonValue;

/** How the radius is made; it bounds the tolerance the shop can hold. */
public enum Process {
    MACHINED("machined"),
    CAST("cast"),
    MOLDED("molded"),
    FORGED("forged"),
    ADDITIVE("additive"),
    SHEET_METAL("sheet-metal");

    private final String key;

    Process(String key) { this.key = key; }

    @JsonValue
    public String key() { return key; }

    @JsonCreator
    public static Process fromKey(String key) { return Keys.fromKey(Process.class, values(), key, Process::key); }
}
