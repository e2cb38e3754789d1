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

    /**
     * True when ISO 2768-1 general tolerances cover a radius made this way: its scope is parts made by metal removal
     * or formed from sheet metal (ISO 2768-1:1989, clause 1), not castings, mouldings, forgings or additive parts.
     */
    public boolean coveredByIso2768() {
        return this == MACHINED || this == SHEET_METAL;
    }

    @JsonCreator
    public static Process fromKey(String key) { return Keys.fromKey(Process.class, values(), key, Process::key); }
}
