package org.arcwright.tolerance;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;

/**
 * The general-tolerance tables in force: every {@code tables/*.json} of every pack whose
 * {@code kind} is a general-tolerance table, later layers replacing earlier ones by id.
 */
public final class GeneralToleranceTables {
    /** Id of the built-in ISO 2768-1 table for each quantity. */
    public static final String ISO_LINEAR = "iso2768-1-linear";
    public static final String ISO_RADIUS_CHAMFER = "iso2768-1-radius-chamfer";
    public static final String ISO_ANGULAR = "iso2768-1-angular";

    private final Map<String, GeneralToleranceTable> byId;

    public GeneralToleranceTables(List<GeneralToleranceTable> tables) {
        Map<String, GeneralToleranceTable> m = new LinkedHashMap<>();
        for (GeneralToleranceTable t : tables) m.put(t.id(), t);
        this.byId = Collections.unmodifiableMap(m);
    }

    /**
     * Loads the general-tolerance tables among {@code tableFiles} (a pack stack's {@code tables/*.json},
     * lowest layer first, so a later table replaces an earlier one with the same id); files of another
     * {@code kind} are skipped, a malformed table is an error naming its file.
     */
    public static GeneralToleranceTables load(List<TableFile> tableFiles) {
        JsonFiles json = new JsonFiles();
        List<GeneralToleranceTable> tables = new ArrayList<>();
        for (TableFile tf : tableFiles) {
            Path file = tf.file();
            var tree = json.readPackObject(file, tf.packFolder());
            if (!"general-tolerance".equals(tree.path("kind").asText())) continue;
            var obj = ((ObjectNode) tree.deepCopy());
            obj.remove("kind");
            tables.add(json.convert(obj, file.toString(), GeneralToleranceTable.class));
        }
        return new GeneralToleranceTables(tables);
    }

    /**
     * A table file and the folder of the pack that supplies it: the file must lie, links followed,
     * inside that folder (a shared pack cannot pull in another file of the user's).
     */
    public record TableFile(Path file, Path packFolder) {}

    /** All tables, in load order. */
    public List<GeneralToleranceTable> all() { return List.copyOf(byId.values()); }

    public Optional<GeneralToleranceTable> byId(String id) { return Optional.ofNullable(byId.get(id)); }

    /** The table with {@code id}, or an error listing the ids there are. */
    public GeneralToleranceTable require(String id) {
        GeneralToleranceTable t = byId.get(id);
        if (t == null) {
            throw InputProblem.ofField("table", "no general-tolerance table '" + id + "'; known tables: "
                    + String.join(", ", byId.keySet()));
        }
        return t;
    }

    /** The ISO 2768-1 table (or its company replacement) for a quantity. */
    public GeneralToleranceTable iso(ToleranceQuantity q) {
        return require(switch (q) {
            case LINEAR -> ISO_LINEAR;
            case RADIUS_CHAMFER -> ISO_RADIUS_CHAMFER;
            case ANGULAR -> ISO_ANGULAR;
        });
    }
}
