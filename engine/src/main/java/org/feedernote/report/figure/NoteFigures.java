package org.feedernote.report.figure;

import java.io.IOException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.feedernote.calc.Result;
import org.feedernote.report.pdf.Figure;
import org.feedernote.report.pdf.FigureFonts;

/**
 * The note's pictures, by the names the figures template places them by: the single-line
 * diagram's sheets ("diagram-1", "diagram-2", …) and the voltage-drop profile ("drop-profile").
 * Drawn from the result alone.
 */
public record NoteFigures(List<String> diagramSheets, String profile, Map<String, Figure> registry) {
    /** A note without pictures. */
    public static final NoteFigures NONE = new NoteFigures(List.of(), null, Map.of());

    public static final String PROFILE = "drop-profile";

    public NoteFigures {
        diagramSheets = List.copyOf(diagramSheets);
        registry = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(registry));
    }

    public static NoteFigures of(Result result) throws IOException {
        FigureFonts fonts = new FigureFonts();
        Map<String, Figure> registry = new LinkedHashMap<>();
        List<String> sheets = new java.util.ArrayList<>();
        List<Figure> diagram = SingleLineDiagram.sheets(result, fonts);
        for (int i = 0; i < diagram.size(); i++) {
            String name = "diagram-" + (i + 1);
            sheets.add(name);
            registry.put(name, diagram.get(i));
        }
        registry.put(PROFILE, DropProfile.of(result, fonts));
        return new NoteFigures(sheets, PROFILE, registry);
    }

    public boolean isEmpty() {
        return registry.isEmpty();
    }
}
