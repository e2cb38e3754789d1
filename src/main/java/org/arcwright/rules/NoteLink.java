package org.arcwright.rules;

/**
 * A practice note attached to a recommendation.
 *
 * @param id the note's id
 * @param title its title
 * @param pack the name of the pack it comes from
 */
public record NoteLink(String id, String title, String pack) {}
