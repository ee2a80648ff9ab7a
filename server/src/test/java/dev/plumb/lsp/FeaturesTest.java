package dev.plumb.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionContext;
import org.eclipse.lsp4j.CodeActionParams;
import org.eclipse.lsp4j.CompletionItem;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.DidChangeConfigurationParams;
import org.eclipse.lsp4j.DocumentHighlightParams;
import org.eclipse.lsp4j.FoldingRangeRequestParams;
import org.eclipse.lsp4j.InlayHintCapabilities;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.InlayHintParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.ReferenceContext;
import org.eclipse.lsp4j.ReferenceParams;
import org.eclipse.lsp4j.RenameParams;
import org.eclipse.lsp4j.SemanticTokensParams;
import org.eclipse.lsp4j.SignatureHelpParams;
import org.eclipse.lsp4j.TextDocumentClientCapabilities;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.WorkspaceSymbolParams;
import org.eclipse.lsp4j.services.TextDocumentService;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Completion, signatures, references, rename, folding, semantic tokens, code actions, symbols, settings. */
class FeaturesTest {
    @TempDir
    Path dir;
    private TestClient client;

    @AfterEach
    void stop() throws IOException {
        if (client != null) TestClient.close(client);
    }

    private TextDocumentService open(String name, String text, Object options) throws Exception {
        TextDocumentClientCapabilities td = new TextDocumentClientCapabilities();
        td.setInlayHint(new InlayHintCapabilities());
        ClientCapabilities caps = new ClientCapabilities();
        caps.setTextDocument(td);
        client = new TestClient(caps, options);
        Files.createDirectories(dir.resolve(".git"));
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        client.open(p.toUri().toString(), text);
        return client.remote.getTextDocumentService();
    }

    /** Opens a document and asks for the code actions over a range. */
    private List<CodeAction> actions(String name, String text, Range range) throws Exception {
        TextDocumentService s = open(name, text, null);
        return s.codeAction(new CodeActionParams(doc(uri(name)), range, new CodeActionContext(List.of())))
            .get(10, TimeUnit.SECONDS).stream().map(e -> e.getRight()).toList();
    }

    private String uri(String name) {
        return dir.resolve(name).toUri().toString();
    }

    private static TextDocumentIdentifier doc(String uri) {
        return new TextDocumentIdentifier(uri);
    }

    @Test
    void completionOffersUnitsAfterANumberAndNamesWithValuesElsewhere() throws Exception {
        TextDocumentService s = open("c.plumb", "input rho = 1.2 kg/m^3\ninput V = 12 k\nq = 0.5 * r\n", null);
        List<CompletionItem> units = s.completion(new CompletionParams(doc(uri("c.plumb")), new Position(1, 14)))
            .get(10, TimeUnit.SECONDS).getRight().getItems();
        assertTrue(units.stream().anyMatch(i -> i.getLabel().equals("kN")), "units after a number");
        List<CompletionItem> names = s.completion(new CompletionParams(doc(uri("c.plumb")), new Position(2, 11)))
            .get(10, TimeUnit.SECONDS).getRight().getItems();
        CompletionItem rho = names.stream().filter(i -> i.getLabel().equals("rho")).findFirst().orElseThrow();
        assertEquals("1.2 kg/m³", rho.getDetail());
        CompletionItem reynolds = names.stream().filter(i -> i.getLabel().equals("reynolds")).findFirst().orElseThrow();
        assertTrue(reynolds.getInsertText().startsWith("reynolds(${1:rho}"), reynolds.getInsertText());
    }

    @Test
    void completionAfterAsOffersTheTagsThatFit() throws Exception {
        TextDocumentService s = open("tags.plumb", "input b = 2 m\nA = b * 1 m   as \nrho_s = 2650 kg/m^3   as b\n", null);
        List<String> all = s.completion(new CompletionParams(doc(uri("tags.plumb")), new Position(1, 17)))
            .get(10, TimeUnit.SECONDS).getRight().getItems().stream().map(CompletionItem::getLabel).toList();
        assertEquals(List.of("frontal", "wetted", "planform", "fluid", "body"), all);
        List<String> b = s.completion(new CompletionParams(doc(uri("tags.plumb")), new Position(2, 26)))
            .get(10, TimeUnit.SECONDS).getRight().getItems().stream().map(CompletionItem::getLabel).toList();
        assertEquals(List.of("body"), b);
    }

    @Test
    void signatureHelpShowsParametersAndTheValidRange() throws Exception {
        TextDocumentService s = open("sig.plumb", "x = cd_sphere_sn(\n", null);
        var help = s.signatureHelp(new SignatureHelpParams(doc(uri("sig.plumb")), new Position(0, 17)))
            .get(10, TimeUnit.SECONDS);
        assertEquals("cd_sphere_sn(Re: dimensionless)", help.getSignatures().get(0).getLabel());
        String docs = help.getSignatures().get(0).getDocumentation().getRight().getValue();
        assertTrue(docs.contains("valid:"), docs);
    }

    @Test
    void referencesHighlightsAndRename() throws Exception {
        String text = "input b = 2 m\nA = b * b\nP = 2 * b\n";
        TextDocumentService s = open("r.plumb", text, null);
        String u = uri("r.plumb");
        var refs = s.references(new ReferenceParams(doc(u), new Position(1, 4), new ReferenceContext(true)))
            .get(10, TimeUnit.SECONDS);
        List<Range> everyB = List.of(range(0, 6, 7), range(1, 4, 5), range(1, 8, 9), range(2, 8, 9));
        assertEquals(everyB, sorted(refs.stream().map(l -> l.getRange()).toList()), "the definition and three uses");
        var usesOnly = s.references(new ReferenceParams(doc(u), new Position(1, 4), new ReferenceContext(false)))
            .get(10, TimeUnit.SECONDS);
        assertEquals(everyB.subList(1, 4), sorted(usesOnly.stream().map(l -> l.getRange()).toList()),
            "without the declaration");
        var prepared = s.prepareRename(new org.eclipse.lsp4j.PrepareRenameParams(doc(u), new Position(2, 8)))
            .get(10, TimeUnit.SECONDS);
        assertEquals("b", prepared.getSecond().getPlaceholder());
        var highlights = s.documentHighlight(new DocumentHighlightParams(doc(u), new Position(0, 6))).get(10, TimeUnit.SECONDS);
        assertEquals(everyB, sorted(highlights.stream().map(h -> h.getRange()).toList()));
        var edit = s.rename(new RenameParams(doc(u), new Position(2, 8), "width")).get(10, TimeUnit.SECONDS);
        assertEquals("input width = 2 m\nA = width * width\nP = 2 * width\n", AppliedEdits.apply(text, edit.getChanges().get(u)));
        ExecutionException clash = assertThrows(ExecutionException.class,
            () -> s.rename(new RenameParams(doc(u), new Position(2, 8), "A")).get(10, TimeUnit.SECONDS));
        assertTrue(clash.getCause().getMessage().contains("already defined"), clash.getCause().getMessage());
        // The failed request was answered with an error; the server carries on.
        assertEquals(everyB, sorted(s.references(new ReferenceParams(doc(u), new Position(1, 4), new ReferenceContext(true)))
            .get(10, TimeUnit.SECONDS).stream().map(l -> l.getRange()).toList()));
    }

    private static Range range(int line, int from, int to) {
        return new Range(new Position(line, from), new Position(line, to));
    }

    private static List<Range> sorted(List<Range> ranges) {
        return ranges.stream().sorted(java.util.Comparator.comparingInt((Range r) -> r.getStart().getLine())
            .thenComparingInt(r -> r.getStart().getCharacter())).toList();
    }

    @Test
    void foldingSemanticTokensAndWorkspaceSymbols() throws Exception {
        String text = "section \"Air\"\ninput rho = 1.2 kg/m^3\nq = rho * (3 m/s)^2\nsection \"End\"\nz = 1\n";
        TextDocumentService s = open("f.plumb", text, null);
        String u = uri("f.plumb");
        var folds = s.foldingRange(new FoldingRangeRequestParams(doc(u))).get(10, TimeUnit.SECONDS);
        assertEquals(0, folds.get(0).getStartLine());
        assertEquals(2, folds.get(0).getEndLine());
        List<Integer> data = s.semanticTokensFull(new SemanticTokensParams(doc(u))).get(10, TimeUnit.SECONDS).getData();
        // First token: the unit kg/m^3 on line 1 at character 16, length 6, type 3 (unit).
        assertEquals(List.of(1, 16, 6, 3, 0), data.subList(0, 5));
        // Then rho on line 2 at 4, an input (type 0).
        assertEquals(List.of(1, 4, 3, 0, 0), data.subList(5, 10));
        var symbols = client.remote.getWorkspaceService().symbol(new WorkspaceSymbolParams("rh")).get(10, TimeUnit.SECONDS);
        assertEquals(List.of("rho"), symbols.getRight().stream().map(w -> w.getName()).toList());
    }

    @Test
    void quickFixesAndTheSiRefactorAreEdits() throws Exception {
        String text = "input Cd = 1.1\ninput A = 2 m^2\nF = Cd A\nL = 3 mtr\nC = cd_sphere_stokes(50)\nq = 2 kPa\n"
            + "P = q * A in m\n";
        String u = uri("x.plumb");
        List<CodeAction> all = actions("x.plumb", text, new Range(new Position(2, 0), new Position(6, 14)));
        // Each repair is judged by the line it makes, not by its title.
        assertEquals(List.of("F = Cd * A"), linesChanged(text, u, all, "Insert '*'"));
        assertEquals(List.of("L = 3 m"), linesChanged(text, u, all, "Change to 'm'"));
        assertEquals(List.of("C = cd_sphere_sn(50)"), linesChanged(text, u, all, "Use cd_sphere_sn"));
        assertEquals(List.of("q = 2 kPa in Pa"), linesChanged(text, u, all, "Show q in SI"));
        assertEquals(List.of("q = 2 kPa in psi"), linesChanged(text, u, all, "Show q in psi"));
        assertEquals(List.of("P = q * A in N"), linesChanged(text, u, all, "Show it in N"));
    }

    /** The lines that the one action whose title starts with {@code title} changes, as they read after it. */
    private static List<String> linesChanged(String text, String uri, List<CodeAction> actions, String title) {
        List<CodeAction> matching = actions.stream().filter(a -> a.getTitle().startsWith(title)).toList();
        assertEquals(1, matching.size(), () -> "one action " + title + " among "
            + actions.stream().map(CodeAction::getTitle).toList());
        List<String> before = List.of(text.split("\n"));
        List<String> after = List.of(AppliedEdits.apply(text, matching.get(0).getEdit().getChanges().get(uri)).split("\n"));
        assertEquals(before.size(), after.size(), "a repair keeps the document's lines");
        java.util.ArrayList<String> changed = new java.util.ArrayList<>();
        for (int i = 0; i < before.size(); i++) if (!before.get(i).equals(after.get(i))) changed.add(after.get(i));
        return changed;
    }

    @Test
    void formattingAlignsADefinitionBlock() throws Exception {
        String text = "input b = 2 m \"width\"\ninput rho_air = 1.2 kg/m^3 \"air\"\n";
        TextDocumentService s = open("fmt.plumb", text, null);
        var edits = s.formatting(new org.eclipse.lsp4j.DocumentFormattingParams(doc(uri("fmt.plumb")),
            new org.eclipse.lsp4j.FormattingOptions(4, true))).get(10, TimeUnit.SECONDS);
        assertEquals("input b       = 2 m         \"width\"\ninput rho_air = 1.2 kg/m^3  \"air\"\n",
            AppliedEdits.apply(text, edits));
    }

    @Test
    void aLateralSurfaceIsSwappedForTheProjectedArea() throws Exception {
        String text = "input d = 0.3 m\ninput L = 2 m\nq = 500 Pa\nCd = cd_cylinder(1e5)\nA_side = pi * d * L   \"tube\"\n"
            + "F = Cd * A_side * q\n";
        String u = uri("area.plumb");
        var swap = actions("area.plumb", text, new Range(new Position(5, 0), new Position(5, 18))).stream()
            .filter(a -> a.getTitle().startsWith("Use the frontal area")).findFirst().orElseThrow();
        assertEquals("Use the frontal area d * L for A_side", swap.getTitle());
        var edit = swap.getEdit().getChanges().get(u).get(0);
        assertEquals("d * L", edit.getNewText());
        assertEquals(new Range(new Position(4, 9), new Position(4, 19)), edit.getRange());
    }

    @Test
    void aBodysDensityPassedForTheFluidsIsSwappedForTheFluids() throws Exception {
        String text = "input rho_air = 1.2 kg/m^3   as fluid\ninput rho_ice = 900 kg/m^3   as body\ninput V = 25 m/s\n"
            + "q = dynamic_pressure(rho_ice, V)\n";
        String u = uri("density.plumb");
        var swap = actions("density.plumb", text, new Range(new Position(3, 21), new Position(3, 21))).stream()
            .filter(a -> a.getTitle().startsWith("Use rho_")).toList();
        assertEquals(List.of("Use rho_air (tagged fluid)"), swap.stream().map(a -> a.getTitle()).toList());
        var edit = swap.get(0).getEdit().getChanges().get(u).get(0);
        assertEquals("rho_air", edit.getNewText());
        assertEquals(new Range(new Position(3, 21), new Position(3, 28)), edit.getRange());
    }

    @Test
    void aUsedFileChangedOnDiskIsPickedUp() throws Exception {
        Files.createDirectories(dir.resolve(".git"));
        Files.writeString(dir.resolve("site.plumb"), "input V = 30 m/s\n");
        open("w.plumb", "use \"site.plumb\"\nx = V + 1 m/s\n", null);
        String u = uri("w.plumb");
        assertEquals(List.of(), client.diagnostics(u, 1).getDiagnostics());
        Files.writeString(dir.resolve("site.plumb"), "input V = 30 s\n");
        client.remote.getWorkspaceService().didChangeWatchedFiles(new org.eclipse.lsp4j.DidChangeWatchedFilesParams(
            List.of(new org.eclipse.lsp4j.FileEvent(uri("site.plumb"), org.eclipse.lsp4j.FileChangeType.Changed))));
        var after = client.diagnostics(u, 1).getDiagnostics();
        assertEquals("unit.mismatch", after.get(0).getCode().getLeft());
    }

    @Test
    void diagnosticsOnSaveOnly() throws Exception {
        JsonObject options = new JsonObject();
        options.addProperty("diagnosticsOnSaveOnly", true);
        open("save.plumb", "x = 1 m\n", options);
        String u = uri("save.plumb");
        client.diagnostics(u, 1);
        client.remote.getTextDocumentService().didChange(new org.eclipse.lsp4j.DidChangeTextDocumentParams(
            new org.eclipse.lsp4j.VersionedTextDocumentIdentifier(u, 2),
            List.of(new org.eclipse.lsp4j.TextDocumentContentChangeEvent("x = 1 m + 1 s\n"))));
        // A request answered after the change is a barrier: the change has been taken by then.
        client.remote.getTextDocumentService().hover(new HoverParams(doc(u), new Position(0, 0))).get(10, TimeUnit.SECONDS);
        assertTrue(client.published.stream().noneMatch(p -> p.getVersion() != null && p.getVersion() == 2),
            "nothing is published while typing");
        client.remote.getTextDocumentService().didSave(new org.eclipse.lsp4j.DidSaveTextDocumentParams(doc(u)));
        assertEquals("unit.mismatch", client.diagnostics(u, 2).getDiagnostics().get(0).getCode().getLeft());
    }

    @Test
    void inlayHintsAreMadeForTheLinesAskedFor() throws Exception {
        TextDocumentService s = open("lines.plumb", "a = 1 m\nb = 2 m\nc = 3 m\nd = 4 m\n", null);
        var hints = s.inlayHint(new InlayHintParams(doc(uri("lines.plumb")), new Range(new Position(1, 0), new Position(2, 7))))
            .get(10, TimeUnit.SECONDS);
        assertEquals(List.of("  = 2 m", "  = 3 m"), hints.stream().map(h -> h.getLabel().getLeft()).toList());
    }

    @Test
    void aMonteCarloSettingShowsTheSampledSpreadInTheHover() throws Exception {
        // F = 0.6 kg/m · V², V = 20 ± 1 m/s: 240 N ± 24 N to first order; 2000 samples from the default
        // seed agree with it to the digits shown (as the command line's test finds), and the hover says so.
        JsonObject options = new JsonObject();
        options.addProperty("monteCarloSamples", 2000);
        TextDocumentService s = open("mc.plumb", "input V = 20 m/s ± 1 m/s\nF = 0.6 kg/m * V^2 in N\n", options);
        var hover = s.hover(new HoverParams(doc(uri("mc.plumb")), new Position(1, 0))).get(10, TimeUnit.SECONDS);
        String text = hover.getContents().getRight().getValue();
        assertTrue(text.contains("Monte Carlo: 240 N ± 24 N (mean ± standard deviation, 2000 samples, seed 20261202)"), text);
        TestClient.close(client);
        TextDocumentService plain = open("mc0.plumb", "input V = 20 m/s ± 1 m/s\nF = 0.6 kg/m * V^2 in N\n", null);
        String without = plain.hover(new HoverParams(doc(uri("mc0.plumb")), new Position(1, 0))).get(10, TimeUnit.SECONDS)
            .getContents().getRight().getValue();
        assertTrue(!without.contains("Monte Carlo"), "none unless asked: " + without);
    }

    @Test
    void settingsChangeWhatIsShown() throws Exception {
        JsonObject options = new JsonObject();
        options.addProperty("significantFigures", 2);
        TextDocumentService s = open("d.plumb", "x = 2 / 3\n", options);
        String u = uri("d.plumb");
        var hints = s.inlayHint(new InlayHintParams(doc(u), new Range(new Position(0, 0), new Position(1, 0))))
            .get(10, TimeUnit.SECONDS);
        assertEquals("  = 0.67", hints.get(0).getLabel().getLeft());
        JsonObject settings = new JsonObject();
        JsonObject plumb = new JsonObject();
        plumb.addProperty("significantFigures", 5);
        settings.add("plumb", plumb);
        client.remote.getWorkspaceService().didChangeConfiguration(new DidChangeConfigurationParams(settings));
        // The new settings reach the next analysis: ask until they show, within a bound, never a fixed sleep.
        String label = null;
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(10);
        while (System.nanoTime() < deadline && !"  = 0.66667".equals(label)) {
            var again = s.inlayHint(new InlayHintParams(doc(u), new Range(new Position(0, 0), new Position(1, 0))))
                .get(10, TimeUnit.SECONDS);
            assertNotNull(again);
            label = again.get(0).getLabel().getLeft();
        }
        assertEquals("  = 0.66667", label);
    }
}
