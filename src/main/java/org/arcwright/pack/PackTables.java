package org.arcwright.pack;

import com.fasterxml.jackson.databind.node.ObjectNode;
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
        JsonFiles json = new JsonFiles();
        T found = null;
        for (PackStack.PackFile f : stack.files("tables", ".json")) {
            ObjectNode tree = json.readPackObject(f.path(), f.pack().root());
            if (!kind.equals(tree.path("kind").asText())) continue;
            ObjectNode obj = tree.deepCopy();
            obj.remove("kind");
            T t = json.convert(obj, f.path().toString(), type);
            if (idOf.apply(t).equals(id)) found = t;
        }
        if (found == null) throw InputProblem.ofField("table", "no " + kind + " table '" + id + "' in the packs in force");
        return found;
    }
}
