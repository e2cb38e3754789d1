package org.arcwright;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * What each production package may import, read from the {@code May import:} sentence of its
 * {@code package-info.java}, so that the sentence a reader sees is the rule the build checks.
 *
 * <p>The sentence runs from {@code May import:} to the first full stop that ends a sentence, or a
 * semicolon. Its
 * items are separated by commas, {@code and} or {@code including}; each is
 * <ul>
 *   <li>a package: {@code {@code org.arcwright.io}}, the short {@code {@code io}} or
 *       {@code {@code app.model}} (under {@code org.arcwright}), or a library or JDK package such as {@code {@code java.awt}}. A
 *       package of ours means that package only (a sub-package is named on its own); any other
 *       package includes its sub-packages;</li>
 *   <li>a word of {@link #VOCABULARY}: {@code the JDK}, {@code Jackson}, {@code the core packages}...;</li>
 *   <li>{@code WORDS (ITEM, ITEM)}: the items in the brackets stand for the words before them; a
 *       bracket with no package in it is a comment and is dropped. When the words name a package
 *       and the items are types, {@code from {@code tolerance} only ({@code Units}, {@code DrawingStyle})},
 *       only those types of that package may be imported.</li>
 * </ul>
 * Anything else is an error naming the file, so the declaration stays readable by both.
 *
 * <p>{@code the JDK} is every {@code java}/{@code javax} package except AWT, Swing and image I/O,
 * which must be named ({@code Swing/AWT}, {@code {@code java.awt}}, {@code {@code javax.imageio}}).
 */
final class ImportDeclarations {
    /** The Swing-free core that both shells use (the central case vocabulary, {@code model}, included). */
    static final List<String> CORE = List.of("org.arcwright.io", "org.arcwright.model", "org.arcwright.tolerance",
            "org.arcwright.pack", "org.arcwright.callout", "org.arcwright.worksheet", "org.arcwright.zone",
            "org.arcwright.inspect", "org.arcwright.mechanics", "org.arcwright.rules", "org.arcwright.notes",
            "org.arcwright.templates", "org.arcwright.simulate");

    /** Packages {@code the JDK} leaves out: each must be named to be imported. */
    static final List<String> GUARDED = List.of("java.awt..", "javax.swing..", "javax.imageio..");

    private static final List<String> JDK = List.of("java..", "javax..", "jdk..", "org.w3c..", "org.xml..");

    /** Words a declaration may use, lower case, with the package patterns each stands for. */
    static final Map<String, List<String>> VOCABULARY = Map.ofEntries(
            Map.entry("the jdk", JDK),
            Map.entry("swing/awt", List.of("javax.swing..", "java.awt..")),
            Map.entry("swing", List.of("javax.swing..")),
            Map.entry("awt", List.of("java.awt..")),
            Map.entry("flatlaf", List.of("com.formdev.flatlaf..")),
            Map.entry("miglayout", List.of("net.miginfocom..")),
            Map.entry("jfreechart", List.of("org.jfree.chart..", "org.jfree.data..")),
            Map.entry("jfreesvg", List.of("org.jfree.svg..")),
            Map.entry("pdfbox", List.of("org.apache.pdfbox..", "org.apache.fontbox..")),
            Map.entry("jackson", List.of("com.fasterxml.jackson..")),
            Map.entry("lucene", List.of("org.apache.lucene..")),
            Map.entry("jmustache", List.of("com.samskivert.mustache..")),
            Map.entry("picocli", List.of("picocli..")),
            Map.entry("commonmark-java", List.of("org.commonmark..")),
            Map.entry("apache commons rng", List.of("org.apache.commons.rng..")),
            Map.entry("the core packages", CORE),
            Map.entry("every core package", CORE));

    private static final Pattern SENTENCE = Pattern.compile("May import:(.*?)(\\.(\\s|$)|;)", Pattern.DOTALL);
    private static final Pattern CODE = Pattern.compile("\\{@code\\s+([^}]*)}");
    private static final Pattern BRACKETS = Pattern.compile("[^,(]*\\(([^)]*)\\)");
    /** First names of library and JDK packages; any other name is short for a package of ours. */
    private static final Pattern LIBRARY_ROOT = Pattern.compile("(java|javax|jdk|org|com|net|picocli)(\\.|$)");
    private static final Pattern PACKAGE = Pattern.compile("[a-z][a-z0-9_]*(\\.[a-z][a-z0-9_]*)*");

    /** Prefix of a pattern that names one class, {@code class:org.arcwright.tolerance.Units}. */
    static final String CLASS = "class:";

    /** One package's declaration. {@code patterns} are package patterns, or {@link #CLASS} and a class name. */
    record Declaration(String packageName, Path file, String sentence, List<String> patterns, boolean jdk) {
        /** Whether a class of this package may depend on the class {@code targetClass} of package {@code target}. */
        boolean allows(String target, String targetClass) {
            return allows(target) || patterns.contains(CLASS + targetClass.replace('$', '.'))
                    || targetClass.contains("$") && patterns.contains(CLASS + targetClass.substring(0, targetClass.indexOf('$')));
        }

        /** Whether a class of this package may depend on any class in {@code target}. */
        boolean allows(String target) {
            if (target.equals(packageName)) return true;
            boolean guarded = GUARDED.stream().anyMatch(g -> matches(g, target));
            if (jdk && !guarded && JDK.stream().anyMatch(p -> matches(p, target))) return true;
            return patterns.stream().anyMatch(p -> matches(p, target));
        }
    }

    private ImportDeclarations() {}

    /** The declarations of every {@code package-info.java} under {@code sourceRoot}, by package name. */
    static Map<String, Declaration> read(Path sourceRoot) {
        Map<String, Declaration> out = new TreeMap<>();
        try (Stream<Path> files = Files.walk(sourceRoot)) {
            for (Path f : files.filter(p -> p.getFileName().toString().equals("package-info.java")).toList()) {
                String pkg = sourceRoot.relativize(f.getParent()).toString().replace(f.getFileSystem().getSeparator(), ".");
                out.put(pkg, parse(pkg, f, Files.readString(f)));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out;
    }

    /** Parses the declaration in the Javadoc {@code source} of {@code pkg}'s package-info. */
    static Declaration parse(String pkg, Path file, String source) {
        String text = source.replaceAll("(?m)^\\s*/?\\*+/?", " ").replaceAll("\\s+", " ");
        Matcher m = SENTENCE.matcher(text);
        if (!m.find()) throw new AssertionError(file + ": no 'May import:' sentence saying what " + pkg + " may import");
        String sentence = m.group(1).strip();
        String items = BRACKETS.matcher(sentence.replaceAll("\\s+(and|including)\\s+", ", ")).replaceAll(r -> {
            String before = r.group().substring(0, r.group().indexOf('('));
            String inside = r.group(1);
            if (!CODE.matcher(inside).find()) return Matcher.quoteReplacement(before);
            Matcher owner = CODE.matcher(before);
            String of = owner.find() ? owner.group(1).strip() : null;
            if (of == null) return Matcher.quoteReplacement(inside);
            // "only some types of {@code P} ({@code A}, {@code B})": the types A and B of P
            return Matcher.quoteReplacement(CODE.matcher(inside).replaceAll(
                    c -> Matcher.quoteReplacement(Character.isUpperCase(c.group(1).strip().charAt(0))
                            ? "{@code " + of + "." + c.group(1).strip() + "}" : c.group())));
        });
        Set<String> patterns = new LinkedHashSet<>();
        boolean jdk = false;
        for (String raw : items.split(",")) {
            String item = raw.strip();
            if (item.isEmpty()) continue;
            Matcher code = CODE.matcher(item);
            if (code.matches()) {
                patterns.add(packagePattern(code.group(1).strip(), file));
                continue;
            }
            String word = item.toLowerCase(Locale.ROOT);
            List<String> known = VOCABULARY.get(word);
            if (known == JDK) {
                jdk = true;
            } else if (known != null) {
                patterns.addAll(known);
            } else if (PACKAGE.matcher(item).matches() && item.contains(".")) {
                patterns.add(packagePattern(item, file));
            } else {
                throw new AssertionError(file + ": 'May import' item '" + item + "' is neither a package nor one of "
                        + new TreeMap<>(VOCABULARY).keySet());
            }
        }
        return new Declaration(pkg, file, sentence, new ArrayList<>(patterns), jdk);
    }

    private static String packagePattern(String name, Path file) {
        int last = name.lastIndexOf('.');
        if (last > 0 && Character.isUpperCase(name.charAt(last + 1))) {
            return CLASS + packagePattern(name.substring(0, last), file) + "." + name.substring(last + 1);
        }
        String n = name.endsWith("..") ? name.substring(0, name.length() - 2) : name;
        if (!PACKAGE.matcher(n).matches()) throw new AssertionError(file + ": '" + name + "' is not a package name");
        if (n.startsWith("org.arcwright.")) return name.endsWith("..") ? n + ".." : n;
        if (!LIBRARY_ROOT.matcher(n).lookingAt()) return "org.arcwright." + n + (name.endsWith("..") ? ".." : "");
        return n + "..";
    }

    /** ArchUnit's reading of a package pattern: {@code a.b..} is a.b and below, {@code a.b} is a.b only. */
    static boolean matches(String pattern, String pkg) {
        if (pattern.endsWith("..")) {
            String base = pattern.substring(0, pattern.length() - 2);
            return pkg.equals(base) || pkg.startsWith(base + ".");
        }
        return pkg.equals(pattern);
    }
}
