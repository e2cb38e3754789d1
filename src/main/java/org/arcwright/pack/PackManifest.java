package org.arcwright.pack;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;

/**
 * The {@code pack.json} of a practice pack.
 *
 * @param name short name shown to users, e.g. {@code "Northfield Pumps practice"}
 * @param version the pack's own version, free text
 * @param description what the pack is for
 * @param overrides ids of items from lower layers this pack deliberately replaces (documentation
 *     and a check: overriding an id that does not exist is an error)
 * @param disables ids of items from lower layers this pack switches off
 */
public record PackManifest(String name, String version, String description, List<String> overrides,
                           List<String> disables) {

    @JsonCreator
    public PackManifest(@JsonProperty(value = "name", required = true) String name,
                        @JsonProperty("version") String version,
                        @JsonProperty("description") String description,
                        @JsonProperty("overrides") List<String> overrides,
                        @JsonProperty("disables") List<String> disables) {
        if (name == null || name.isBlank()) throw new IllegalArgumentException("name must not be blank");
        this.name = name;
        this.version = version == null ? "" : version;
        this.description = description == null ? "" : description;
        this.overrides = overrides == null ? List.of() : List.copyOf(overrides);
        this.disables = disables == null ? List.of() : List.copyOf(disables);
    }
}
