package dev.plumb.report;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Binding;
import dev.plumb.analysis.Value;
import dev.plumb.present.ValueText;
import dev.plumb.units.Unit;
import java.util.Optional;

/** The values a report puts in place of names: each in its display unit, to the analysis's figures. */
final class ReportValues implements ValueSource {
    private final Analysis analysis;

    ReportValues(Analysis analysis) {
        this.analysis = analysis;
    }

    @Override
    public Optional<ShownValue> find(String name) {
        if (!(analysis.scope().lookup(name) instanceof Binding.ValueBinding v)) return Optional.empty();
        return Optional.of(shown(v.value(), v.display()));
    }

    ShownValue shown(Value v, Unit display) {
        ValueText.Parts p = ValueText.parts(v, display, analysis.settings().significantFigures());
        return p.unit().isEmpty() ? ShownValue.plain(p.number()) : new ShownValue(p.number(), p.unit());
    }
}
