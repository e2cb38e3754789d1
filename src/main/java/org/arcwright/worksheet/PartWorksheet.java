package org.arcwright.worksheet;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;

/**
 * One part's tolerancing of its fillets, rounds and edges, as reviewed and released together.
 * Immutable: every edit returns a new worksheet, which is what undo and autosave build on.
 *
 * @param format file format version, currently 1
 * @param part what part this is
 * @param units drawing units of every feature
 * @param standard drawing standard of the part
 * @param titleBlock the general tolerance the title block invokes
 * @param features the radius features, in drawing order
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record PartWorksheet(int format, PartInfo part, Units units, DrawingStyle standard, TitleBlock titleBlock,
                            List<RadiusFeature> features) {

    /** The current file format version. */
    public static final int FORMAT = 1;

    @JsonCreator
    public PartWorksheet(@JsonProperty("format") int format,
                         @JsonProperty(value = "part", required = true) PartInfo part,
                         @JsonProperty(value = "units", required = true) Units units,
                         @JsonProperty(value = "standard", required = true) DrawingStyle standard,
                         @JsonProperty("titleBlock") TitleBlock titleBlock,
                         @JsonProperty("features") List<RadiusFeature> features) {
        if (format > FORMAT) {
            throw new IllegalArgumentException("worksheet format " + format + " is newer than this Arcwright reads ("
                    + FORMAT + ")");
        }
        if (part == null) throw new IllegalArgumentException("part is null; give the part's number and name");
        if (units == null) throw new IllegalArgumentException("units is null; use mm or in");
        if (standard == null) throw new IllegalArgumentException("standard is null; use asme or iso");
        this.format = FORMAT;
        this.part = part;
        this.units = units;
        this.standard = standard;
        this.titleBlock = titleBlock == null ? TitleBlock.ISO_2768_M : titleBlock;
        if (features != null) {
            for (int i = 0; i < features.size(); i++) {
                if (features.get(i) == null) throw new IllegalArgumentException("features[" + i + "] is null; expected a feature");
            }
        }
        this.features = features == null ? List.of() : List.copyOf(features);
        Set<String> ids = new HashSet<>();
        for (RadiusFeature f : this.features) {
            if (!ids.add(f.id())) throw new IllegalArgumentException("feature id '" + f.id() + "' appears twice");
        }
    }

    /** An empty worksheet for a new part. */
    public static PartWorksheet empty(PartInfo part, Units units, DrawingStyle standard) {
        return new PartWorksheet(FORMAT, part, units, standard, TitleBlock.ISO_2768_M, List.of());
    }

    public Optional<RadiusFeature> feature(String id) {
        return features.stream().filter(f -> f.id().equals(id)).findFirst();
    }

    /** This worksheet with {@code feature} added at the end, or replacing the feature with its id. */
    public PartWorksheet withFeature(RadiusFeature feature) {
        List<RadiusFeature> list = new ArrayList<>(features);
        int i = indexOf(feature.id());
        if (i >= 0) list.set(i, feature); else list.add(feature);
        return new PartWorksheet(format, part, units, standard, titleBlock, list);
    }

    /** This worksheet with {@code feature} inserted at {@code index}. */
    public PartWorksheet withFeatureAt(int index, RadiusFeature feature) {
        if (indexOf(feature.id()) >= 0) throw new IllegalArgumentException("feature id '" + feature.id() + "' exists");
        List<RadiusFeature> list = new ArrayList<>(features);
        list.add(Math.max(0, Math.min(index, list.size())), feature);
        return new PartWorksheet(format, part, units, standard, titleBlock, list);
    }

    /** This worksheet without the feature {@code id}. */
    public PartWorksheet withoutFeature(String id) {
        List<RadiusFeature> list = new ArrayList<>(features);
        list.removeIf(f -> f.id().equals(id));
        return new PartWorksheet(format, part, units, standard, titleBlock, list);
    }

    public PartWorksheet withPart(PartInfo newPart) {
        return new PartWorksheet(format, newPart, units, standard, titleBlock, features);
    }

    /** A feature id not yet used, e.g. {@code F4}. */
    public String nextFeatureId() {
        int n = features.size() + 1;
        while (indexOf("F" + n) >= 0) n++;
        return "F" + n;
    }

    private int indexOf(String id) {
        for (int i = 0; i < features.size(); i++) {
            if (features.get(i).id().equals(id)) return i;
        }
        return -1;
    }

    /**
     * What the part is.
     *
     * @param number part number, e.g. {@code NP-4471-B}
     * @param name part name
     * @param material material, free text
     * @param company the company the part belongs to
     * @param revision drawing revision
     */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    public record PartInfo(String number, String name, String material, String company, String revision) {
        public PartInfo {
            if (number == null || number.isBlank()) throw new IllegalArgumentException("part number must not be blank");
        }
    }

    /**
     * The general tolerance the title block invokes for features without their own tolerance.
     *
     * @param table general-tolerance table id
     * @param toleranceClass its class, e.g. {@code m}
     */
    public record TitleBlock(String table, String toleranceClass) {
        public static final TitleBlock ISO_2768_M = new TitleBlock("iso2768-1-radius-chamfer", "m");
    }
}
