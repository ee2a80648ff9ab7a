package dev.plumb.analysis;

import org.junit.jupiter.api.Test;

/** Range, regime and formula checks at correlation and table calls; block declarations. */
class CorrelationDiagnosticsTest {

    @Test
    void callsOutsideTheFittedRangeAreWarnedWithTheNumbers() {
        Fixture.checkResource("range.outside.plumb");
    }

    @Test
    void laminarAndTurbulentFormulasOutsideTheirRegime() {
        Fixture.checkResource("range.regime.plumb");
    }

    @Test
    void aPiecewiseCorrelationWithNoApplicablePiece() {
        Fixture.checkResource("range.no-formula.plumb");
        Fixture.checkResource("range.transition-name.plumb");
    }

    @Test
    void blockDeclarationsMustBeKnownWords() {
        Fixture.checkResource("block.invalid.plumb");
    }
}
