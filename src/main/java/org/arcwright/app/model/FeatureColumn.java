package org.arcwright.app.model;

import java.util.function.Function;
import org.arcwright.worksheet.RadiusFeature;

/** The columns of the Part table, each with how its value is read from a feature. */
public enum FeatureColumn {
    ID("Id", f -> f.id()),
    KIND("Kind", f -> f.designCase().kind().key()),
    FUNCTION("Function", f -> f.designCase().function().key()),
    NOMINAL("Nominal", f -> Numbers.trim(f.designCase().nominalRadius()) + " " + f.designCase().units().symbol()),
    CALLOUT("Chosen callout", f -> f.chosen() == null ? "—" : f.chosen().text()),
    STATUS("Status", f -> f.status().label());

    private final String title;
    private final Function<RadiusFeature, String> value;

    FeatureColumn(String title, Function<RadiusFeature, String> value) {
        this.title = title;
        this.value = value;
    }

    public String title() { return title; }

    public String valueOf(RadiusFeature f) { return value.apply(f); }
}
