package org.arcwright.pack;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;
import org.arcwright.io.InputProblem;
import org.arcwright.io.JsonFiles;

/**
 * Reads a table of one kind from the packs' {@code tables/*.json}, the one way every table is read: each
 * file from inside its own pack only (a link leaving the pack is refused), the {@code "kind"} field
 * chosen on and then removed, the rest bound with located errors, the highest layer winning.
 */
public final class PackTables {
    private PackTables() {}

    /**
     * The table of {@code kind} whose id ({@code idOf}) is {@code id}.
     *
     * @throws InputProblem naming the file when a table of the kind is malformed or outside its pack, or
     *         the field {@code table} when no pack in force has one with the id
     */
    public static <T> T byId(PackStack stack, String kind, String id, Class<T> type, Function<T, String> idOf) {
        T found = null;
        for (T t : all(stack, kind, type)) {
            if (idOf.apply(t).equals(id)) found = t;
        }
        if (found == null) throw InputProblem.ofField("table", "no " + kind + " table '" + id + "' in the packs in force");
        return found;
    }

    /**
     * The table of {@code kind} from the highest layer that has one, whatever its id; empty when no
     * pack in force has one.
     *
     * @throws InputProblem naming the file when a table of the kind is malformed or outside its pack
     */
    public static <T> Optional<T> highest(PackStack stack, String kind, Class<T> type) {
        List<T> tables = all(stack, kind, type);
        return tables.isEmpty() ? Optional.empty() : Optional.of(tables.get(tables.size() - 1));
    }

    /** Every table of {@code kind}, lowest layer first. */
    private static <T> List<T> all(PackStack stack, String kind, Class<T> type) {
        JsonFiles json = new JsonFiles();
        List<T> tables = new ArrayList<>();
        for (PackStack.PackFile f : stack.files("tables", ".json")) {
            ObjectNode tree = json.readPackObject(f.path(), f.pack().root());
            if (!kind.equals(tree.path("kind").asText())) continue;
            ObjectNode obj = tree.deepCopy();
            obj.remove("kind");
            tables.add(json.convert(obj, f.path().toString(), type));
        }
        return tables;
    }
}
