package org.arcwright;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static org.assertj.core.api.Assertions.assertThat;

import com.tngtech.archunit.core.domain.Dependency;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.library.GeneralCodingRules;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Deque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.function.Function;
import org.arcwright.testing.ProductionClasses;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Holds the layers: the core is free of user-interface code and of printing, so it can serve both
 * shells; each package imports only what the "May import" sentence of its package-info declares
 * ({@link ImportDeclarations}); and packages form no cycles.
 */
@Tag("slow")
class ArchitectureTest {
    private static final String[] CORE = ImportDeclarations.CORE.stream().map(p -> p + "..").toArray(String[]::new);

    /**
     * Dependencies tolerated while a move is under way (none today). The test fails when an entry no
     * longer occurs, so the list cannot go stale.
     */
    static final List<KnownViolation> KNOWN_VIOLATIONS = List.of();

    /** A dependency from classes of package {@code from} on classes of package {@code to}, tolerated for now. */
    record KnownViolation(String from, String to, String why) {
        boolean covers(String originPackage, String targetPackage) {
            return from.equals(originPackage) && to.equals(targetPackage);
        }
    }

    private final JavaClasses classes = ProductionClasses.get();

    @Test
    void corePackagesDoNotUseSwingOrAwt() {
        noClasses().that().resideInAnyPackage(CORE)
                .should().dependOnClassesThat().resideInAnyPackage("javax.swing..", "java.awt..")
                .check(classes);
    }

    @Test
    void corePackagesDoNotPrint() {
        noClasses().that().resideInAnyPackage(CORE)
                .should(GeneralCodingRules.ACCESS_STANDARD_STREAMS)
                .check(classes);
    }

    @Test
    void renderingOpensNoWindow() {
        noClasses().that().resideInAPackage("org.arcwright.render..")
                .should().dependOnClassesThat().resideInAnyPackage("javax.swing..", "org.arcwright.app..")
                .allowEmptyShould(true)
                .check(classes);
    }

    @Test
    void coreDoesNotDependOnTheShells() {
        noClasses().that().resideInAnyPackage(CORE)
                .should().dependOnClassesThat().resideInAnyPackage("org.arcwright.cli..", "org.arcwright.app..",
                        "org.arcwright.render..", "picocli..")
                .check(classes);
    }

    @Test
    void everyPackageImportsOnlyWhatItsPackageInfoDeclares() {
        Map<String, ImportDeclarations.Declaration> declared = ImportDeclarations.read(Path.of("src/main/java"));
        Set<String> violations = new TreeSet<>();
        Set<KnownViolation> seen = new HashSet<>();
        for (JavaClass c : classes) {
            String pkg = c.getPackageName();
            ImportDeclarations.Declaration d = declared.get(pkg);
            if (d == null) {
                violations.add(pkg + " has no package-info.java with a 'May import:' sentence");
                continue;
            }
            for (Dependency dep : c.getDirectDependenciesFromSelf()) {
                JavaClass target = dep.getTargetClass().getBaseComponentType();
                String to = target.getPackageName();
                if (target.isPrimitive() || d.allows(to, target.getName())) continue;
                KnownViolation known = known(pkg, to);
                if (known != null) {
                    seen.add(known);
                    continue;
                }
                violations.add(c.getName() + " -> " + target.getName() + ": " + to + " is not in the 'May import' of "
                        + d.file());
            }
        }
        assertThat(violations).as("dependencies outside the declared 'May import'").isEmpty();
        assertThat(KNOWN_VIOLATIONS).as("known violations that no longer occur: delete them from KNOWN_VIOLATIONS")
                .allMatch(seen::contains);
    }

    @Test
    void topLevelPackagesFormNoCycles() {
        assertThat(cycles(p -> p.startsWith("org.arcwright.") ? "org.arcwright." + p.split("\\.")[2] : null))
                .as("cycles among org.arcwright.(*)..").isEmpty();
    }

    @Test
    void desktopPackagesFormNoCycles() {
        assertThat(cycles(p -> p.equals("org.arcwright.app") || p.startsWith("org.arcwright.app.")
                ? String.join(".", List.of(p.split("\\.")).subList(0, Math.min(4, p.split("\\.").length))) : null))
                .as("cycles among org.arcwright.app and the packages below it").isEmpty();
    }

    /**
     * The cycles between slices of the production classes, {@code sliceOf} giving a package's slice
     * (null: not in any), known violations left out: each strongly connected set of more than one
     * slice (Tarjan), with one class dependency for each edge inside it. Computed from the shared
     * classes directly, which takes a fraction of the time of ArchUnit's slice rule.
     */
    private List<String> cycles(Function<String, String> sliceOf) {
        Map<String, Map<String, String>> edges = new TreeMap<>();
        for (JavaClass c : classes) {
            String from = sliceOf.apply(c.getPackageName());
            if (from == null) continue;
            edges.computeIfAbsent(from, k -> new TreeMap<>());
            for (Dependency dep : c.getDirectDependenciesFromSelf()) {
                JavaClass target = dep.getTargetClass().getBaseComponentType();
                String to = sliceOf.apply(target.getPackageName());
                if (to == null || to.equals(from) || known(c.getPackageName(), target.getPackageName()) != null) continue;
                edges.get(from).putIfAbsent(to, c.getName() + " -> " + target.getName());
            }
        }
        List<String> out = new ArrayList<>();
        for (List<String> component : new Tarjan(edges).components()) {
            if (component.size() < 2) continue;
            StringBuilder b = new StringBuilder("cycle among " + component + ":");
            for (String from : component) {
                for (Map.Entry<String, String> e : edges.get(from).entrySet()) {
                    if (component.contains(e.getKey())) b.append("\n  ").append(from).append(" -> ").append(e.getKey()).append(" (").append(e.getValue()).append(')');
                }
            }
            out.add(b.toString());
        }
        return out;
    }

    /** Strongly connected components of a small graph (Tarjan, 1972). */
    private static final class Tarjan {
        private final Map<String, Map<String, String>> edges;
        private final Map<String, Integer> index = new HashMap<>();
        private final Map<String, Integer> low = new HashMap<>();
        private final Deque<String> stack = new ArrayDeque<>();
        private final Set<String> onStack = new HashSet<>();
        private final List<List<String>> components = new ArrayList<>();

        Tarjan(Map<String, Map<String, String>> edges) {
            this.edges = edges;
        }

        List<List<String>> components() {
            for (String v : edges.keySet()) if (!index.containsKey(v)) visit(v);
            return components;
        }

        private void visit(String v) {
            index.put(v, index.size());
            low.put(v, index.get(v));
            stack.push(v);
            onStack.add(v);
            for (String w : edges.getOrDefault(v, Map.of()).keySet()) {
                if (!index.containsKey(w)) {
                    visit(w);
                    low.put(v, Math.min(low.get(v), low.get(w)));
                } else if (onStack.contains(w)) {
                    low.put(v, Math.min(low.get(v), index.get(w)));
                }
            }
            if (low.get(v).equals(index.get(v))) {
                List<String> component = new ArrayList<>();
                String w;
                do {
                    w = stack.pop();
                    onStack.remove(w);
                    component.add(w);
                } while (!w.equals(v));
                Collections.sort(component);
                components.add(component);
            }
        }
    }

    private static KnownViolation known(String from, String to) {
        for (KnownViolation k : KNOWN_VIOLATIONS) if (k.covers(from, to)) return k;
        return null;
    }

    @Test
    void theSharedServicesAreSwingFreeAndBelowTheShells() {
        noClasses().that().resideInAPackage("org.arcwright.services..")
                .should().dependOnClassesThat().resideInAnyPackage("javax.swing..", "org.arcwright.cli..",
                        "org.arcwright.app..", "picocli..")
                .check(classes);
    }
}
