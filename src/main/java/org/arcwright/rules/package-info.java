/**
 * The advisor: the design case an engineer describes, practice-pack rules, the engine that ranks
 * callout recommendations, and the recommendations with their reasoning, numbers and cautions.
 *
 * <h2>Main abstractions</h2>
 * <ul>
 *   <li>the case it reads ({@link org.arcwright.model.DesignCase}, in the central model package).</li>
 *   <li>{@link org.arcwright.rules.Rule}: {@code when} ({@link org.arcwright.rules.When}, conditions on
 *       {@link org.arcwright.rules.Fact}s), {@code recommend} ({@link org.arcwright.rules.CalloutPlan}),
 *       needs it adds ({@link org.arcwright.rules.RuleNeed}), controls it prefers ({@code Preference}),
 *       weight, reasoning, cautions, references and self-test examples.</li>
 *   <li>{@link org.arcwright.rules.RuleBook}: the rules in force after layering every pack, with what
 *       failed to load and the conflicts found; never stops at the first bad file.</li>
 *   <li>{@link org.arcwright.rules.Advisor}: the engine, needs first, returning an {@link org.arcwright.rules.Advice}
 *       of {@link org.arcwright.rules.Recommendation}s best first, the {@link org.arcwright.rules.Need}s it derived
 *       and, when nothing meets every need, {@link org.arcwright.rules.DesignChange}s. Its steps live in their own
 *       classes: {@link org.arcwright.rules.Needs} (derive), {@code Sizer} and {@code Draft} (size a candidate),
 *       {@code Candidates} (one per control when no rule meets every need), {@link org.arcwright.rules.Proof}
 *       (meets, per need), {@code Ranking} (order) and {@code DesignChanges} (what would work).</li>
 *   <li>{@link org.arcwright.rules.AdviceFigures}: a recommendation's figures, lengths with their units.</li>
 *   <li>{@link org.arcwright.rules.FilletChecks}: the mechanics seam, implemented over
 *       {@code org.arcwright.mechanics} by {@link org.arcwright.rules.MechanicsChecks}.</li>
 *   <li>{@link org.arcwright.rules.PackCheck}: runs a pack's examples; {@link org.arcwright.rules.CaseTable}
 *       reads a part's radii from CSV.</li>
 * </ul>
 *
 * <h2>Typical use</h2>
 * <pre>
 *   PackStack stack = PackStack.load(teamPacks, personalPack);
 *   Advisor advisor = Advisor.forStack(stack, noteLinker);   // or new Advisor(book, checks, notes)
 *   advisor.book().problems();                               // show them; the rest loaded
 *   Advice advice = advisor.advise(designCase);              // deterministic, thread-safe
 * </pre>
 *
 * <p>May import: the JDK, Jackson and the core packages ({@code model}, {@code io}, {@code tolerance},
 * {@code pack}, {@code callout}, {@code mechanics}). Linked notes come in through the
 * {@link org.arcwright.rules.NoteLinker} seam, so this package does not depend on Lucene. Must not
 * import Swing/AWT or print.
 */
package org.arcwright.rules;
