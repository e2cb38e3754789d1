package org.arcwright.templates;

import static org.arcwright.templates.FieldSchema.flag;
import static org.arcwright.templates.FieldSchema.list;
import static org.arcwright.templates.FieldSchema.object;
import static org.arcwright.templates.FieldSchema.text;

/**
 * Every field a drawing-note template may name. {@link NoteContext} fills exactly these; the
 * template check at load rejects any other name. Numbers arrive formatted in the part's drawing
 * style (ASME or ISO, mm or inch); a template only places them.
 */
public final class NoteFields {
    private NoteFields() {}

    /** A label and a formatted value, e.g. {@code crescent width} and {@code 0.0166}. */
    static final FieldSchema FIGURE = object("a labelled figure",
            "label", text("what the figure is, in words"),
            "value", text("the figure, formatted, with its unit where it has one"));

    /** One tier of a composite profile. */
    static final FieldSchema TIER = object("one tier of a composite profile frame",
            "zone", text("the tier's zone width, formatted"),
            "datums", text("its datum references, e.g. A, B(M); empty when it has none"),
            "hasDatums", flag("true when the tier references datums"));

    /** One radius feature of the part. */
    public static final FieldSchema FEATURE = object("one fillet, round or edge of the part",
            "id", text("the feature's id on the drawing, e.g. F3"),
            "label", text("what the engineer called it, or the id"),
            "kind", text("fillet or round"),
            "function", text("stress-relief, sealing, cosmetic or mating"),
            "process", text("machined, cast, molded..."),
            "nominal", text("the nominal radius, formatted"),
            "status", text("open, decided, measured: pass or measured: fail"),
            "decided", flag("true when a control is chosen"),
            "undecided", flag("true while no control is chosen"),
            "callout", text("the chosen control as one line of plain text, e.g. CR 1.8-2.2"),
            "calloutUnicode", text("the same with the GD&T code points, for pasting into CAD notes"),
            "calloutWords", text("the same in words"),
            "controlName", text("radius, controlled radius, profile of a surface, composite profile, general tolerance"),
            "isRadius", flag("a radius with limits"),
            "isControlledRadius", flag("a controlled radius (CR)"),
            "isProfile", flag("a single profile of a surface frame"),
            "isComposite", flag("a composite profile frame"),
            "isGeneral", flag("the title block governs"),
            "min", text("smallest radius (R and CR), formatted"),
            "max", text("largest radius (R and CR), formatted"),
            "zone", text("profile zone width (the upper tier's for a composite), formatted"),
            "unequal", flag("the profile zone is unequally disposed"),
            "outward", text("ASME unequally disposed value: the part of the zone outside the material"),
            "isoOffset", text("the ISO 1101 offset-zone value (UZ), signed"),
            "dynamic", flag("the dynamic profile modifier applies"),
            "datums", text("datum references, e.g. A, B(M); empty when none"),
            "hasDatums", flag("true when the frame references datums"),
            "extent", text("where the tolerance applies, in words"),
            "allAround", flag("all around"),
            "allOver", flag("all over"),
            "between", flag("between two labelled points"),
            "extentFrom", text("first point label of a between extent"),
            "extentTo", text("last point label of a between extent"),
            "tiers", list("tiers of a composite profile, upper first", TIER),
            "table", text("general-tolerance table id of a general callout"),
            "toleranceClass", text("its class"),
            "edgeNote", text("the edge note of a general callout (ISO 13715 or edge-break words)"),
            "hasEdgeNote", flag("true when the general callout carries an edge note"),
            "ruleId", text("the rule that proposed the chosen control"),
            "because", list("the reasoning, one sentence each; write {{.}}", text("a sentence")),
            "cautions", list("what to watch; write {{.}}", text("a caution")),
            "references", list("standards and handbooks the reasoning leans on; write {{.}}", text("a reference")),
            "figures", list("the numbers behind the choice (limits, crescent width, Kt, seating margin...)", FIGURE),
            "notes", list("linked practice notes", object("a practice note",
                    "id", text("note id"), "title", text("note title"), "pack", text("pack it comes from"))),
            "inspected", flag("true when a measured contour was checked"),
            "inspection", object("the latest inspection",
                    "verdict", text("pass, fail or indeterminate (ISO 14253-1: the stated uncertainty straddles a limit)"),
                    "passed", flag("true for pass"),
                    "indeterminate", flag("true when neither conformance nor non-conformance is proven"),
                    "source", text("the points or inspection file"),
                    "measuredOn", text("ISO date of the measurement"),
                    "figures", list("the inspection's key figures", FIGURE)));

    /** The whole context of a template. */
    public static final FieldSchema ROOT = object("a part and its features",
            "part", object("the part",
                    "number", text("part number"),
                    "name", text("part name"),
                    "material", text("material"),
                    "company", text("company"),
                    "revision", text("drawing revision")),
            "standard", text("ASME Y14.5-2018 or ISO 1101 / ISO 129-1"),
            "asme", flag("the part is drawn to ASME Y14.5"),
            "iso", flag("the part is drawn to ISO"),
            "units", text("mm or in"),
            "unitsWord", text("MILLIMETRES or INCHES"),
            "titleBlock", object("the general tolerance the title block invokes",
                    "table", text("table id, e.g. iso2768-1-radius-chamfer"),
                    "toleranceClass", text("class, e.g. m"),
                    "text", text("as written on the drawing, e.g. ISO 2768-m"),
                    "radiiTables", text("which ISO 2768-1 table applies to internal and to external radii, or empty")),
            "featureCount", text("number of features"),
            "decidedCount", text("number of features with a chosen control"),
            "openCount", text("number of features still undecided"),
            "features", list("every feature in drawing order", FEATURE),
            "decidedFeatures", list("features with a chosen control", FEATURE),
            "edgeFeatures", list("features the title block or an edge note governs", FEATURE),
            "hasEdgeFeatures", flag("true when some feature is governed by the title block or an edge note"),
            "allDecided", flag("true when every feature has a chosen control (no radius is left undecided)"),
            "feature", FEATURE,
            "generatedBy", text("Arcwright and its version"));
}
