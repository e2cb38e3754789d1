package org.arcwright.rules;

/**
 * A practice note attached to a recommendation.
 *
 * @param id the note's id
 * @param title its title
 * @param pack the name of the pack it comes from
 */
public record NoteLink(String id, String title, String pack) {

    public NoteLink {
        if (id == null || id.isBlank()) throw new IllegalArgumentException("id is missing; a linked note needs its id");
        if (title == null) throw new IllegalArgumentException("title is missing; a linked note needs its title");
        if (pack == null) throw new IllegalArgumentException("pack is missing; a linked note needs its pack's name");
    }
}
