package org.feedernote.verification;

import static org.junit.jupiter.api.Assertions.*;

import java.util.HashSet;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import org.feedernote.data.ReferenceData;

/**
 * The program agrees with every published value it is held to, within each case's stated
 * tolerance: the one list of {@link PublishedCases}, which {@code feedernote selfcheck} prints.
 */
class PublishedCasesTest {
    private static final ReferenceData DATA = ReferenceData.standard();

    static Stream<PublishedCase> cases() {
        return PublishedCases.all().stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void theProgramAgreesWithThePublishedValue(PublishedCase c) {
        PublishedCase.Outcome o = c.check(DATA);
        assertTrue(o.pass(), () -> c.id() + " " + c.quantity() + ": expected " + c.expected() + " " + c.unit() + " ± "
                + c.tolerance().band(c.expected()) + " (" + c.source().text() + "), computed " + o.computed() + " " + o.problem());
    }

    @Test
    void everyCaseNamesItsSourceAndHowTheValueWasRead() {
        var ids = new HashSet<String>();
        for (PublishedCase c : PublishedCases.all()) {
            assertTrue(ids.add(c.id()), "ids are unique: " + c.id());
            assertFalse(c.source().document().isBlank(), c.id());
            assertFalse(c.source().place().isBlank(), c.id());
            assertFalse(c.source().seen().isBlank(), c.id() + ": the copy seen, \"from memory\" or a hand calculation");
            assertTrue(c.tolerance().band(c.expected()) >= 0, c.id());
        }
    }

    @Test
    void aCaseTheProgramMissesFailsAndOneThatCannotBeComputedSaysWhy() {
        PublishedCase missed = new PublishedCase("T-1", "an invented value", PublishedCase.Source.recalled("none", "none"), 1, "",
                PublishedCase.Tolerance.absolute(0.1, "test"), data -> 1.2);
        assertFalse(missed.check(DATA).pass());
        PublishedCase broken = new PublishedCase("T-2", "an invented value", PublishedCase.Source.recalled("none", "none"), 1, "",
                PublishedCase.Tolerance.exact(), data -> { throw new IllegalStateException("no such cell"); });
        PublishedCase.Outcome o = broken.check(DATA);
        assertFalse(o.pass());
        assertTrue(o.problem().contains("no such cell"), o.problem());
    }
}
