/**
 * Practice packs: the folders of rules, notes, templates and tables through which a company encodes
 * its tolerancing practice, and the layering that lets a team or a person refine the built-in one.
 *
 * <h2>Layers</h2>
 * Built-in ({@code knowledge/}, carried in the jar) &lt; team packs ({@code --pack DIR} or settings,
 * in the order given) &lt; a personal pack. A later layer replaces an item with the same id or name;
 * each kind of content decides what "item" means (a rule id, a note id, a template file name, a
 * table id).
 *
 * <h2>Layout of a pack folder</h2>
 * <pre>
 *   pack.json        name, version, description, what it overrides or disables
 *   rules/*.json     advisor rules
 *   notes/*.md       practice notes
 *   templates/*      drawing-note templates
 *   tables/*.json    general-tolerance and capability tables
 * </pre>
 *
 * <p>May import: the JDK, Jackson and {@code org.arcwright.io}. Must not import Swing/AWT or print.
 */
package org.arcwright.pack;
