package org.arcwright.rules;

import org.arcwright.model.DesignCase;
import org.arcwright.model.BlendKind;
import org.arcwright.model.Process;
import org.arcwright.model.Loading;
import org.arcwright.model.BlendFunction;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.List;
import org.arcwright.callout.Callout;
import org.arcwright.callout.Extent;
import org.arcwright.pack.PackStack;
import org.arcwright.tolerance.DrawingStyle;
import org.arcwright.tolerance.Units;
import org.assertj.core.data.Offset;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The built-in practice on a table of scenarios: every function, both standards, with and without
 * datums. Each row's expectation is explained in the comment above it; all are common practice
 * unless a source is named.
 */
class AdvisorScenarioTest {
    private static Advisor advisor;

    @BeforeAll
    static void load() {
        advisor = new Advisor(RuleBook.load(PackStack.builtIn()), FilletChecks.NONE, NoteLinker.NONE);
    }

    static DesignCase scenario(String function, String loading, String standard, String kind, boolean form,
                               boolean location, String datums, String process) {
        List<String> d = datums.equals("-") ? List.of() : Arrays.asList(datums.split(" "));
        return new DesignCase(Units.MM, DrawingStyle.parse(standard), null, BlendKind.fromKey(kind), 2.0,
                BlendFunction.fromKey(function), Loading.fromKey(loading), form, location, d, Process.fromKey(process),
                null, null, null);
    }

    @ParameterizedTest(name = "{0} {1} {2} {3} form={4} location={5} datums={6} -> {8}")
    @CsvSource(delimiter = '|', textBlock = """
            # A fatigue shoulder on an ASME drawing: CR, because it bounds every local radius (ASME Y14.5-2018 CR definition, from memory).
            stress-relief | fatigue | asme | fillet | true  | false | -   | machined | stress-relief.fatigue.asme-cr        | controlled-radius
            # The same shoulder with datums and location: the location need rules CR out (it cannot locate); the composite locates and bounds form (needs first).
            stress-relief | fatigue | asme | fillet | true  | true  | A B | machined | stress-relief.located-form.composite | composite-profile
            # ISO has no CR, and fatigue needs form (a flat is a sharper local radius): the floating profile, not the limit radius.
            stress-relief | fatigue | iso  | fillet | false | false | -   | machined | stress-relief.fatigue.iso-profile-form | profile
            # ISO and the shape matters: profile without datums bounds size and form (ISO 1101).
            stress-relief | fatigue | iso  | fillet | true  | false | -   | machined | stress-relief.fatigue.iso-profile-form | profile
            # ISO, shape and location matter, datums exist: the floating form profile cannot locate; the composite meets both needs.
            stress-relief | fatigue | iso  | fillet | true  | true  | A   | machined | stress-relief.located-form.composite | composite-profile
            # Static, nothing else matters: a ± radius bounds size and that is enough.
            stress-relief | static  | asme | fillet | false | false | -   | machined | stress-relief.static.radius          | radius
            # Static, shape matters, ASME: CR is the cheapest form control.
            stress-relief | static  | asme | fillet | true  | false | -   | machined | stress-relief.static.asme-cr         | controlled-radius
            # Static, shape matters, ISO: profile without datums.
            stress-relief | static  | iso  | fillet | true  | false | -   | cast     | stress-relief.static.iso-profile     | profile
            # Static, location matters, datums: profile with datums on the radius and adjacent surfaces locates it.
            stress-relief | static  | iso  | fillet | false | true  | A B | cast     | stress-relief.located.profile-datums | profile
            # Static, location and shape: composite, located upper tier, form-refining lower tier.
            stress-relief | static  | asme | fillet | true  | true  | A B | machined | stress-relief.located-form.composite | composite-profile
            # Location matters and no datums: floating profile with the advice to establish datums.
            stress-relief | static  | asme | fillet | false | true  | -   | machined | located.no-datums.profile            | profile
            # Sealing, nothing stated: a limit radius, half the usual band (seal makers' gland data).
            sealing       | none    | asme | fillet | false | false | -   | machined | sealing.limits                       | radius
            # Sealing, shape matters: profile over the radius and its adjacent surfaces, floating.
            sealing       | none    | iso  | fillet | true  | false | -   | machined | sealing.form.profile                 | profile
            # Sealing, located with datums: profile with datums.
            sealing       | none    | iso  | round  | false | true  | A   | machined | sealing.located.profile-datums       | profile
            # Sealing, located but no datums: floating profile, and establish datums.
            sealing       | none    | asme | fillet | false | true  | -   | molded   | sealing.located.no-datums            | profile
            # Sealing, located and shaped, datums: composite.
            sealing       | none    | asme | fillet | true  | true  | A B | machined | sealing.located-form.composite       | composite-profile
            # Mating fillet: the maximum decides seating, so the band goes below the nominal.
            mating        | static  | asme | fillet | false | false | -   | machined | mating.fillet.max-radius             | radius
            # Mating fillet with datums and location: a limit radius cannot locate; the located profile also has its largest radius checked.
            mating        | static  | iso  | fillet | false | true  | A B | machined | mating.located.profile-datums        | profile
            # Mating fillet whose shape matters, ASME: CR with the band below the nominal.
            mating        | static  | asme | fillet | true  | false | -   | machined | mating.form.asme-cr                  | controlled-radius
            # Mating fillet whose shape matters, ISO: floating profile.
            mating        | static  | iso  | fillet | true  | false | A   | machined | mating.form.iso-profile              | profile
            # Mating round: the minimum matters, band above the nominal.
            mating        | static  | iso  | round  | false | false | -   | machined | mating.round.min-radius              | radius
            # Cosmetic edge, ASME: title-block general tolerance (ISO 2768-1 Table 2).
            cosmetic      | none    | asme | round  | false | false | -   | machined | cosmetic.asme.title-block            | general
            # Cosmetic edge, ISO, cast: general tolerance (the castings table, not ISO 2768-1) with an ISO 13715 edge indication.
            cosmetic      | none    | iso  | round  | false | false | -   | cast     | cosmetic.iso.edge-note               | general
            # Cosmetic with datums changes nothing: the title block still covers it.
            cosmetic      | none    | iso  | fillet | false | false | A   | machined | cosmetic.iso.edge-note               | general
            # Cosmetic but shaped (appearance part): floating profile.
            cosmetic      | none    | asme | round  | true  | false | -   | molded   | cosmetic.form.profile                | profile
            # A "cosmetic" edge under fatigue load needs form: a floating profile.
            cosmetic      | fatigue | iso  | round  | false | false | -   | forged   | cosmetic.fatigue.form                | profile
            # A "cosmetic" edge under static load is given a radius with limits.
            cosmetic      | static  | iso  | round  | false | false | -   | forged   | cosmetic.loaded.radius               | radius
            """)
    void builtInPracticeRanksTheExpectedControlFirst(String function, String loading, String standard, String kind,
                                                     boolean form, boolean location, String datums, String process,
                                                     String expectedRule, String expectedType) {
        Advice a = advisor.advise(scenario(function, loading, standard, kind, form, location, datums, process));
        Recommendation first = a.first().orElseThrow();
        assertThat(first.ruleId()).isEqualTo(expectedRule);
        assertThat(first.callout().typeName()).isEqualTo(expectedType);
        assertThat(first.demoted()).isFalse();
        assertThat(a.conflicts()).isEmpty();
    }

    @Test
    void isoDrawingsNeverGetAControlledRadius() {
        for (BlendFunction f : BlendFunction.values()) {
            for (Loading l : Loading.values()) {
                for (boolean form : new boolean[] {false, true}) {
                    Advice a = advisor.advise(scenario(f.key(), l.key(), "iso", "fillet", form, false, "-", "machined"));
                    assertThat(a.recommendations()).noneMatch(r -> r.callout() instanceof Callout.ControlledRadius);
                }
            }
        }
    }

    @Test
    void everyRecommendationAboutStressOrSealingCarriesTheGuidanceCaution() {
        for (String f : List.of("stress-relief", "sealing", "mating")) {
            Advice a = advisor.advise(scenario(f, "static", "asme", "fillet", false, false, "-", "machined"));
            assertThat(a.recommendations()).isNotEmpty()
                    .allSatisfy(r -> assertThat(r.cautions()).contains(Advisor.GUIDANCE_CAUTION));
        }
    }

    @Test
    void aLimitRadiusExplainsThatItBoundsSizeOnly() {
        Recommendation r = advisor.advise(scenario("stress-relief", "static", "asme", "fillet", false, false, "-",
                "machined")).first().orElseThrow();
        assertThat(String.join(" ", r.because())).contains("bounds size only");
    }

    @Test
    void aLocatingProfileReferencesTheDatumsAndCoversTheAdjacentSurfaces() {
        Recommendation r = advisor.advise(scenario("stress-relief", "static", "iso", "fillet", false, true, "A B",
                "cast")).first().orElseThrow();
        Callout.Profile p = (Callout.Profile) r.callout();
        assertThat(p.datums()).extracting(dr -> dr.label()).containsExactly("A", "B");
        assertThat(p.extent().kind()).isEqualTo(Extent.Kind.WITH_ADJACENT);
        // cast R2: ±1.0 mm (capability table: ISO 8062-3:2007 Table 2, DCTG 10, 2 mm total up to 10 mm); the zone
        // holding the same radius band at a 90° corner is 2 × 1.0 × (1/sin 45° − 1) = 0.8284, rounded up to 0.83
        assertThat(r.text()).isEqualTo("|⌓|0.83|A|B| on the radius and its adjacent surfaces");
    }

    @Test
    void aFloatingProfileHasNoDatums() {
        Recommendation r = advisor.advise(scenario("sealing", "none", "iso", "fillet", true, false, "-", "machined"))
                .first().orElseThrow();
        assertThat(((Callout.Profile) r.callout()).datums()).isEmpty();
    }

    @Test
    void theCompositeUpperTierLocatesAndTheLowerTierRefinesWithoutDatums() {
        Recommendation r = advisor.advise(scenario("sealing", "none", "asme", "fillet", true, true, "A B", "machined"))
                .first().orElseThrow();
        Callout.CompositeProfile cp = (Callout.CompositeProfile) r.callout();
        assertThat(cp.tiers().get(0).datums()).extracting(dr -> dr.label()).containsExactly("A", "B");
        assertThat(cp.tiers().get(1).datums()).isEmpty();
        assertThat(cp.tiers().get(1).zone()).isLessThan(cp.tiers().get(0).zone());
    }

    @Test
    void aStressReliefFillingIsSizedFromTheProcessCapabilityWithTheBandAboveTheNominal() {
        // machined R2: ±0.1 mm in the capability table (common practice), plus-only: 2.0 to 2.2
        Recommendation r = advisor.advise(scenario("stress-relief", "fatigue", "asme", "fillet", true, false, "-",
                "machined")).first().orElseThrow();
        Callout.ControlledRadius cr = (Callout.ControlledRadius) r.callout();
        assertThat(cr.min()).isEqualTo(2.0);
        assertThat(cr.max()).isEqualTo(2.2);
        assertThat(r.text()).isEqualTo("CR2 +0.2/0");
        // crescent at 90°: (rmax - rmin)(1/sin 45° - 1) = 0.2 × 0.41421 (the CrescentZone construction)
        assertThat((Double) r.numbers().asMap().get("crescentWidth")).isCloseTo(0.2 * (Math.sqrt(2) - 1), Offset.offset(1e-6));
    }

    @Test
    void aCosmeticEdgeTakesTheIso2768MediumValue() {
        // ISO 2768-1:1989 Table 2: 0.5 to 3 mm, class m: ±0.2 mm
        Recommendation r = advisor.advise(scenario("cosmetic", "none", "iso", "round", false, false, "-", "machined"))
                .first().orElseThrow();
        assertThat(r.numbers().asMap()).containsEntry("min", 1.8).containsEntry("max", 2.2);
        assertThat(((Callout.General) r.callout()).edgeNote()).contains("ISO 13715");
    }

    @Test
    void belowTheSmallestIso2768RangeTheTitleBlockIsDemotedAndALimitRadiusComesFirst() {
        // ISO 2768-1:1989 Table 2 starts at 0.5 mm: smaller radii get their deviations stated next to the size
        DesignCase c = new DesignCase(Units.MM, DrawingStyle.ISO, null, BlendKind.ROUND, 0.3, BlendFunction.COSMETIC,
                Loading.NONE, false, false, List.of(), Process.MACHINED, null, null, null);
        Advice a = advisor.advise(c);
        assertThat(a.first().orElseThrow().ruleId()).isEqualTo("fallback.limits");
        assertThat(a.recommendations()).filteredOn(r -> r.callout() instanceof Callout.General)
                .isNotEmpty().allSatisfy(r -> {
                    assertThat(r.demoted()).isTrue();
                    assertThat(r.cautions()).anySatisfy(t -> assertThat(t).startsWith("Demoted:").contains("no value"));
                });
    }

    @Test
    void aCaseOwnToleranceIsUsedWhereTheRuleSizesFromIntent() {
        DesignCase c = new DesignCase(Units.MM, DrawingStyle.ASME, null, BlendKind.FILLET, 2.0,
                BlendFunction.STRESS_RELIEF, Loading.FATIGUE, true, false, List.of(), Process.MACHINED, null, null,
                "R2 ±0.2");
        Recommendation r = advisor.advise(c).first().orElseThrow();
        assertThat(r.text()).isEqualTo("CR2 ±0.2");
        assertThat(r.trace()).anySatisfy(t -> assertThat(t).contains("the engineer's tolerance R2 ±0.2"));
    }
}
