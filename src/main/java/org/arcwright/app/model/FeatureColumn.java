package org.arcwright.app.model;

import java.util.function.Function;
import org.arcwright.worksheet.RadiusFeature;

/**
 * The columns of the Part table, each with how its value is read from a feature, in the order they
 * show: what a narrow column must still show first (which feature, its state, its callout).
 */
public enum FeatureColumn {
    ID("Id", f -> f.id()),
    STATUS("Status", f -> f.status().label()),
    CALLOUT("Chosen callout", f -> f.chosen() == null ? "—" : f.chosen().text()),
    NOMINAL("Nominal", f -> Numbers.trim(f.designCase().nominalRadius()) + " " + f.designCase().units().symbol()),
    KIND("Kind", f -> f.designCase().kind().key()),
    FUNCTION("Function", f -> f.designCase().function().key());

    private final String title;
    private final Function<RadiusFeature, String> value;

    FeatureColumn(String title, Function<RadiusFeature, String> value) {
        this.title = title;
        this.value = value;
    }

    public String title() { return title; }

    public String valueOf(RadiusFeature f) { return value.apply(f); }
}
