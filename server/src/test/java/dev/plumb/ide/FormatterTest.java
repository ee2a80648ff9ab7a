package dev.plumb.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.syntax.ParsedSource;
import dev.plumb.syntax.SourceParser;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** Lining up definitions, what the formatter leaves alone, and that it never changes meaning. */
class FormatterTest {

    /** Formats {@code input} and compares with {@code expected}; then checks the invariants on both. */
    private static void check(String input, String expected) {
        assertEquals(expected, Formatter.apply(input, Formatter.format(input)));
        assertKeepsMeaning(input);
        assertEquals(List.of(), Formatter.format(expected), "formatting the formatted text changes it again");
    }

    private static void unchanged(String input) {
        check(input, input);
    }

    // ---- lining up -------------------------------------------------------------------

    @Test
    void aByteOrderMarkInsideALineIsNeverRemoved() {
        // Found by the fuzzer: a gap holding U+FEFF was once rewritten as blanks, losing it.
        String text = "input a = 1.2 kg/m^3   as fluid\ufeff   \"air\"\ninput bb = 2 m\n";
        String formatted = Formatter.apply(text, Formatter.format(text));
        assertEquals(text.chars().filter(c -> c == 0xFEFF).count(), formatted.chars().filter(c -> c == 0xFEFF).count());
        assertEquals(text.replaceAll("[ \t]", ""), formatted.replaceAll("[ \t]", ""), "only blanks change");
    }

    @Test
    void aSmallCalcLinesUpSectionBySection() {
        check("""
            title "Survey buoy B-7: drag on the antenna whip"
            author "R. Okonkwo"

            # Current and wind drag on the whip antenna of a moored survey buoy.

            section "Inputs"
            input V_w = 18 m/s "gust at the whip, mooring brief"
            input T_air=6 °C "air temperature, survey log"
            input p_air = 101.3 kPa
            input d_w = 12 mm "whip diameter, antenna data sheet"
            input L_w = 1.8 m   # above the float collar
            input C_D = 1.1 "long cylinder, subcritical"

            section "Drag"
            ρ_air = p_air / (287.05 J/(kg*K) * T_air) in kg/m³
            A_w = d_w * L_w as frontal "projected area"
            q = 0.5 * ρ_air * V_w^2 in Pa
            F_D = C_D * A_w * q in N "drag on the whip"
            M_base = F_D * L_w / 2 in N*m "bending moment at the collar"

            check M_base <= 25 N*m "whip base rating, data sheet"
            """, """
            title "Survey buoy B-7: drag on the antenna whip"
            author "R. Okonkwo"

            # Current and wind drag on the whip antenna of a moored survey buoy.

            section "Inputs"
            input V_w   = 18 m/s  "gust at the whip, mooring brief"
            input T_air = 6 °C    "air temperature, survey log"
            input p_air = 101.3 kPa
            input d_w   = 12 mm   "whip diameter, antenna data sheet"
            input L_w   = 1.8 m   # above the float collar
            input C_D   = 1.1     "long cylinder, subcritical"

            section "Drag"
            ρ_air  = p_air / (287.05 J/(kg*K) * T_air)  in kg/m³
            A_w    = d_w * L_w                          as frontal  "projected area"
            q      = 0.5 * ρ_air * V_w^2                in Pa
            F_D    = C_D * A_w * q                      in N        "drag on the whip"
            M_base = F_D * L_w / 2                      in N*m      "bending moment at the collar"

            check M_base <= 25 N*m "whip base rating, data sheet"
            """);
    }

    @Test
    void inputsLineUpTheirEqualsSignsAndNotesCountingCharactersNotUnits() {
        check("""
            section "Mooring"
            input V = 2.4 m/s "current at the buoy, survey log B-7"
            input ρ_sw=1025 kg/m³ "sea water, survey brief"
            input µ = 1.08e-3 Pa·s
            input T_w = 12 °C      "water temperature, survey log B-7"
            """, """
            section "Mooring"
            input V    = 2.4 m/s     "current at the buoy, survey log B-7"
            input ρ_sw = 1025 kg/m³  "sea water, survey brief"
            input µ    = 1.08e-3 Pa·s
            input T_w  = 12 °C       "water temperature, survey log B-7"
            """);
    }

    @Test
    void clausesStartInOneColumnAndNotesInAnother() {
        check("""
            A_f = d_w * L_w as frontal "projected area of the whip"
            q = 0.5 * ρ_sw * V^2 in Pa
            F_D = C_D * A_f * q in kN "drag on the whip"
            A_w = pi * d_w * L_w in m² as wetted
            Δp=q in kPa
            """, """
            A_f = d_w * L_w         as frontal  "projected area of the whip"
            q   = 0.5 * ρ_sw * V^2  in Pa
            F_D = C_D * A_f * q     in kN       "drag on the whip"
            A_w = pi * d_w * L_w    in m² as wetted
            Δp  = q                 in kPa
            """);
    }

    @Test
    void anAsAfterAnInLinesUpWithTheOthersThatFollowAnIn() {
        check("""
            A_1 = b * h in m² as frontal "face"
            A_22 = pi * d * L in mm² as wetted
            """, """
            A_1  = b * h       in m²  as frontal  "face"
            A_22 = pi * d * L  in mm² as wetted
            """);
    }

    @Test
    void aLoneDefinitionGetsOneSpaceAroundItsEqualsSign() {
        check("Re=ρ_sw * V * d_w / µ\n", "Re = ρ_sw * V * d_w / µ\n");
        check("input  d_w\t=\t12 mm\n", "input d_w = 12 mm\n");
    }

    @Test
    void theWordsOfAClauseAreOneSpaceApart() {
        check("input\tA_w = pi * d_w * L_w in\tm²   as   wetted\n", "input A_w = pi * d_w * L_w  in m² as wetted\n");
    }

    @Test
    void namesOutsideTheBasicPlaneCountAsOneCharacter() {
        check("""
            input 𝜌 = 1.2 kg/m³ "air"
            input ab = 3 m "span"
            """, """
            input 𝜌  = 1.2 kg/m³  "air"
            input ab = 3 m        "span"
            """);
    }

    @Test
    void blankLinesSectionsNarrativeChecksAndIndentationEndABlock() {
        check("""
            a = 1
            bbbb = 2

            cc = 3
            # narrative between
            d = 4
            check d > 1
            eeeee = 5
            section "Next"
            ff = 6
            # indented lines after narrative start statements of their own
              gg = 7
              h = 8
            f = 6
            iii = 9
            """, """
            a    = 1
            bbbb = 2

            cc = 3
            # narrative between
            d = 4
            check d > 1
            eeeee = 5
            section "Next"
            ff = 6
            # indented lines after narrative start statements of their own
              gg = 7
              h  = 8
            f   = 6
            iii = 9
            """);
    }

    @Test
    void codeCommentsKeepTheirTextAndTheBlanksBeforeThem() {
        check("""
            L_w = 3.2 m   # whip length, drawing W-1
            d_w=12 mm\t#\tdiameter
            """, """
            L_w = 3.2 m   # whip length, drawing W-1
            d_w = 12 mm\t#\tdiameter
            """);
    }

    @Test
    void lineBreaksAreKept() {
        check("a=1\r\nbb = 2 in m\r\n", "a  = 1\r\nbb = 2  in m\r\n");
        check("a=1\rbb = 2\r", "a  = 1\rbb = 2\r");
    }

    // ---- left alone ------------------------------------------------------------------

    @Test
    void continuedStatementsAreLeftAloneAndEndTheBlock() {
        check("""
            input μ_ref = 1.716e-5 Pa·s
                "Sutherland reference viscosity, property sheet"
            q=0.5 * ρ *
                V^2      in Pa
            a = 1
            bb = 2
            """, """
            input μ_ref = 1.716e-5 Pa·s
                "Sutherland reference viscosity, property sheet"
            q=0.5 * ρ *
                V^2      in Pa
            a  = 1
            bb = 2
            """);
    }

    @Test
    void correlationAndTableBlocksAreLeftAlone() {
        unchanged("""
            correlation cd_whip(Re)
                title  "Drag coefficient of the whip, invented"
                source "Invented for this test"
                basis  frontal
                valid  1e3 <= Re <= 1e5
                =   1.1 + 0.2 * log10(Re / 1e3)
            end

            table cd_plate(AR)
                source "Invented for this test"
                AR   Cd
                1    1.18
                5      1.20
            end
            """);
    }

    @Test
    void aDefinitionTypedInsideABlockIsLeftAlone() {
        check("""
            correlation cd_whip(Re)
                source "Invented for this test"
                x=3   in mm
                = 1.1
            end
            a=1
            """, """
            correlation cd_whip(Re)
                source "Invented for this test"
                x=3   in mm
                = 1.1
            end
            a = 1
            """);
    }

    @Test
    void brokenLinesAreLeftAloneAndTheRestIsStillFormatted() {
        check("""
            a=1 @ 2
            bb=2
            c =  3
            x = 5.
            """, """
            a=1 @ 2
            bb = 2
            c  = 3
            x = 5.
            """);
    }

    @Test
    void functionsFindAndHeadersAreLeftAlone() {
        unchanged("""
            title   "Survey buoy whip"
            drag(Cd, A, q)=Cd * A * q    "drag on a reference area"
            seek V in 1 mm/s .. 10 m/s where drag = W    in mm/s
            """);
    }

    @Test
    void quotedTextKeepsItsBlanks() {
        check("note_x =  1   \"  two   blanks  \"\n", "note_x = 1  \"  two   blanks  \"\n");
    }

    @Test
    void clauseWordsThatAreUnitsStayUnits() {
        // `5 in` is five inches and `2 as` two attoseconds: no clause to line up.
        check("a = 5 in\nbb = 2 as \"note\"\nc = 5 in in mm\n", "a  = 5 in\nbb = 2 as  \"note\"\nc  = 5 in  in mm\n");
    }

    // ---- the invariant ---------------------------------------------------------------

    @Test
    void randomDocumentsKeepTheirMeaningAndFormatOnce() {
        RandomCalc calcs = new RandomCalc(20_240_611L);
        int changed = 0;
        int changedWithoutErrors = 0;
        for (int i = 0; i < 4000; i++) {
            String text = calcs.document();
            Outcome outcome = assertKeepsMeaning(text);
            if (!outcome.edits().isEmpty()) {
                changed++;
                if (outcome.parsed().diagnostics().isEmpty()) changedWithoutErrors++;
            }
        }
        // The corpus must exercise the formatter, not just pass through it.
        assertTrue(changed > 2000, "only " + changed + " documents changed");
        assertTrue(changedWithoutErrors > 500, "only " + changedWithoutErrors + " clean documents changed");
    }

    @Test
    void theSamplesAndTheStandardLibraryKeepTheirMeaning() throws IOException {
        List<Path> files;
        try (Stream<Path> all = Stream.concat(Files.walk(Path.of("../samples")),
            Files.walk(Path.of("src/main/resources/stdlib")))) {
            files = all.filter(p -> p.toString().endsWith(".plumb")).toList();
        }
        assertTrue(files.size() > 10, "found only " + files);
        for (Path f : files) assertKeepsMeaning(Files.readString(f));
    }

    /**
     * Formats the text and asserts the invariant: the same characters apart from blanks, the same
     * statements and syntax diagnostics, and nothing more to do on a second pass. Returns the
     * edits and the text's parse.
     */
    private static Outcome assertKeepsMeaning(String text) {
        ParsedSource before = SourceParser.parse(text);
        List<Edit> edits = Formatter.format(before);
        String formatted = Formatter.apply(text, edits);
        String shown = "\n--- before ---\n" + text + "\n--- after ---\n" + formatted;
        int previousEnd = 0;
        for (Edit e : edits) {
            assertTrue(e.offset() >= previousEnd, "edits out of order or overlapping at " + e + shown);
            assertTrue(isBlanks(text.substring(e.offset(), e.end())) && isBlanks(e.replacement()), "edit " + e + shown);
            previousEnd = e.end();
        }
        assertEquals(withoutBlanks(text), withoutBlanks(formatted), "characters other than blanks changed" + shown);
        ParsedSource after = SourceParser.parse(formatted);
        assertEquals(dump(before), dump(after), "statements changed" + shown);
        assertEquals(codes(before), codes(after), "diagnostics changed" + shown);
        assertEquals(List.of(), Formatter.format(after), "a second pass changes more" + shown);
        return new Outcome(edits, before);
    }

    private record Outcome(List<Edit> edits, ParsedSource parsed) {
    }

    private static boolean isBlanks(String s) {
        return s.chars().allMatch(c -> c == ' ' || c == '\t');
    }

    /** Line breaks count: the formatter only ever changes spaces and tabs. */
    private static String withoutBlanks(String s) {
        return s.replace(" ", "").replace("\t", "");
    }

    /** The statements as their records print, without where they stand. */
    private static List<String> dump(ParsedSource p) {
        return p.statements().stream().map(s -> s.toString().replaceAll("Span\\[start=\\d+, end=\\d+]", "@")).toList();
    }

    private static List<String> codes(ParsedSource p) {
        return p.diagnostics().stream().map(Diagnostic::code).map(Object::toString).toList();
    }
}
