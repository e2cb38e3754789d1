package org.arcwright.app.model;

/** Each question of the Decide form, with its label and the help text shown beside it. */
public enum Question {
    FEATURE("Feature", "A short label so the drawing and the worksheet agree, e.g. 'shoulder fillet at bearing seat'."),
    KIND("Kind", "Fillet: an inside (concave) corner, material outside the arc. Round: an outside (convex) corner."),
    NOMINAL("Nominal radius", "The radius the designer intends, in the drawing units. Must be greater than zero."),
    FUNCTION("What the radius does", "Stress relief at a change of section, a sealing surface, a mating seat under "
            + "another part's corner, or only an edge finish. This decides most of the answer."),
    LOADING("Loading", "How the section is loaded in service. Under fatigue the smallest radius the drawing allows "
            + "decides the life, so its lower limit matters most."),
    FORM_MATTERS("Shape of the blend matters", "Tick when flats, steps or reversals in the blend would harm its "
            + "function (stress flow, sealing, appearance). A plain radius does not forbid them."),
    LOCATION_MATTERS("Position relative to datums matters", "Tick when where the blend sits, not just its size, "
            + "matters: a seat that must clear a mating corner at a located shoulder, a sealing land."),
    DATUMS("Datums", "Datum features the adjacent surfaces can reference, letters separated by commas (e.g. A, B). "
            + "Leave empty when none are established."),
    PROCESS("Process", "How the radius is made; it bounds what the shop can hold and how the blend is inspected."),
    STANDARD("Drawing standard", "ASME Y14.5 or ISO (ISO 1101, ISO 129-1). ISO has no controlled radius (CR)."),
    UNITS("Units", "The drawing units of every length on this form: millimetres or inches."),
    TOLERANCE("Tolerance intent", "The size tolerance you have in mind, as a radius callout: R2 ±0.2, R2 +0.3/-0.1, "
            + "CR 1.8-2.4, R.06 MAX. Leave empty to let the title block's general tolerance apply."),
    ANGLE("Corner angle", "Included angle between the surfaces the radius blends, in degrees (90 for a shoulder). "
            + "It sets the crescent width and the equivalent profile zone the advisor sizes."),
    STRESS("Check stress concentration", "Give the section so the stress view can estimate Kt (and Kf with a "
            + "strength) at the smallest radius the tolerance allows."),
    SHAPE("Section shape", "A stepped round shaft, or a flat stepped bar."),
    LOAD("Load type", "The load that the fillet relieves: tension, bending or torsion."),
    BIG_D("Larger diameter D", "The larger diameter (or width) of the step, in the drawing units."),
    SMALL_D("Smaller diameter d", "The smaller diameter (or width); must be less than D."),
    STRENGTH("Ultimate strength", "Material ultimate tensile strength, for notch sensitivity (Kf). Optional."),
    STRENGTH_UNITS("Strength units", "The unit the strength is given in: MPa or ksi."),
    TARGET_KT("Largest acceptable Kt", "The most stress concentration the design tolerates (Kf when a strength is "
            + "given). Optional; with it the stress view marks the smallest radius that meets it."),
    MATING("Check the mating corner", "Give the corner of the part that seats against this fillet so its "
            + "clearance can be checked at the largest radius the tolerance allows."),
    CORNER("Mating corner", "The mating part's corner: a chamfer or a radius."),
    CORNER_SIZE("Mating corner size", "The mating part's smallest chamfer leg or smallest corner radius."),
    CORNER_ANGLE("Chamfer angle", "Chamfer angle in degrees from the seating face; 45 when empty.");

    private final String label;
    private final String help;

    Question(String label, String help) {
        this.label = label;
        this.help = help;
    }

    public String label() { return label; }

    public String help() { return help; }
}
