package org.feedernote.report.pdf;

import static org.junit.jupiter.api.Assertions.*;

import java.util.List;

import org.junit.jupiter.api.Test;

/** The CSS subset the typesetter reads: cascade by specificity then order, inheritance, the page box. */
class StyleSheetTest {
    private static final String CSS = """
            /* a comment { with braces } */
            @page { size: A4 portrait; margin: 24mm 20mm 20mm 20mm; @top-left { content: "x"; } }
            body { font-size: 10pt; line-height: 1.5; color: #000; }
            td { padding: 1mm; font-weight: normal; }
            .titleblock td.k { width: 35mm; font-weight: bold; }
            td.k { width: 10mm; }
            .pageno:before { content: counter(page); }
            sub { font-size: 70%; vertical-align: sub; }
            .step { page-break-inside: avoid; margin: 0 0 2mm 0; }
            """;

    private static final List<String[]> NONE = List.of();

    private static List<String[]> chain(String... tagAndClass) {
        java.util.List<String[]> out = new java.util.ArrayList<>();
        for (int i = 0; i < tagAndClass.length; i += 2) out.add(new String[] {tagAndClass[i], tagAndClass[i + 1]});
        return out;
    }

    /** The style of the last element of a chain of (tag, class) pairs, each resolved under its parent. */
    private static Style resolve(Style.Resolver r, String... tagAndClass) {
        Style s = r.root();
        java.util.List<String[]> ancestors = new java.util.ArrayList<>();
        for (int i = 0; i < tagAndClass.length; i += 2) {
            s = r.resolve(s, List.copyOf(ancestors), tagAndClass[i], tagAndClass[i + 1], "");
            ancestors.add(new String[] {tagAndClass[i], tagAndClass[i + 1]});
        }
        return s;
    }

    @Test
    void thePageBoxGivesTheMarginsAndItsMarginBoxesAreSkipped() {
        StyleSheet sheet = StyleSheet.parse(CSS);
        assertEquals("24mm 20mm 20mm 20mm", sheet.page().get("margin"));
        assertFalse(sheet.page().containsKey("content"));
    }

    @Test
    void aMoreSpecificRuleWinsOverALaterOneAndTheDescendantSelectorNeedsItsAncestor() {
        Style.Resolver r = new Style.Resolver(StyleSheet.parse(CSS));
        Style inTitleBlock = resolve(r, "body", "", "table", "titleblock full", "tr", "", "td", "k");
        assertEquals(35 * Style.MM, inTitleBlock.width, 1e-3, ".titleblock td.k (21) beats the later td.k (11)");
        assertTrue(inTitleBlock.bold);
        Style elsewhere = resolve(r, "body", "", "table", "full", "tr", "", "td", "k");
        assertEquals(10 * Style.MM, elsewhere.width, 1e-3, "without the .titleblock ancestor only td.k applies");
        assertFalse(elsewhere.bold);
    }

    @Test
    void fontsAndColoursAreInheritedBoxPropertiesAreNot() {
        Style.Resolver r = new Style.Resolver(StyleSheet.parse(CSS));
        Style body = r.resolve(r.root(), NONE, "body", "", "");
        Style step = r.resolve(body, chain("body", ""), "div", "step", "");
        Style inner = r.resolve(step, chain("body", "", "div", "step"), "div", "work", "");
        assertEquals(10f, inner.fontSize, 1e-6);
        assertEquals(1.5f, inner.lineHeight, 1e-6);
        assertTrue(step.breakInsideAvoid);
        assertFalse(inner.breakInsideAvoid);
        assertEquals(2 * Style.MM, step.marginBottom, 1e-3);
        assertEquals(0f, inner.marginBottom, 1e-6);
    }

    @Test
    void percentagesOfFontSizeAreOfTheParentAndSubscriptsAreLowered() {
        Style.Resolver r = new Style.Resolver(StyleSheet.parse(CSS));
        Style body = r.resolve(r.root(), NONE, "body", "", "");
        Style sub = r.resolve(body, chain("body", ""), "sub", "", "");
        assertEquals(7f, sub.fontSize, 1e-5);
        assertTrue(sub.rise < 0);
    }

    @Test
    void anInlineStyleAttributeComesLast() {
        Style.Resolver r = new Style.Resolver(StyleSheet.parse(CSS));
        Style body = r.resolve(r.root(), NONE, "body", "", "");
        Style th = r.resolve(body, chain("body", "", "table", "", "tr", ""), "td", "", "width:18%; padding: 0");
        assertEquals(-18f, th.width, 1e-6, "a percentage width is kept as minus the percentage");
        assertEquals(0f, th.paddingLeft, 1e-6);
    }

    @Test
    void rulesWithPseudoElementsAreLeftOut() {
        StyleSheet sheet = StyleSheet.parse(CSS);
        assertTrue(sheet.rules().stream().noneMatch(rule -> rule.declarations().containsKey("content")));
    }

    @Test
    void theSameAncestryGivesTheSameStyleObject() {
        Style.Resolver r = new Style.Resolver(StyleSheet.parse(CSS));
        Style body = r.resolve(r.root(), NONE, "body", "", "");
        assertSame(r.resolve(body, chain("body", ""), "div", "step", ""), r.resolve(body, chain("body", ""), "div", "step", ""));
    }
}
