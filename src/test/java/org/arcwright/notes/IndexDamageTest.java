package org.arcwright.notes;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.UncheckedIOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.NoSuchFileException;
import org.apache.lucene.index.CorruptIndexException;
import org.junit.jupiter.api.Test;

/** The index report says what went wrong in words; no Java class name reaches the user. */
class IndexDamageTest {
    @Test
    void damageIsNamedInWordsThroughItsWrappers() {
        assertThat(IndexDamage.name(new UncheckedIOException(new CorruptIndexException("checksum", "_0.cfs"))))
                .isEqualTo("its files are damaged");
        assertThat(IndexDamage.name(new NoSuchFileException("segments_2"))).isEqualTo("a file of the index is missing");
        assertThat(IndexDamage.name(new AccessDeniedException("/idx"))).isEqualTo("permission denied");
        assertThat(IndexDamage.name(new IllegalStateException("x"))).doesNotContain("Exception");
    }
}
