package dev.plumb.lsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.CodeLensCapabilities;
import org.eclipse.lsp4j.CodeLensParams;
import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DocumentDiagnosticParams;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.GeneralClientCapabilities;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.InlayHintCapabilities;
import org.eclipse.lsp4j.InlayHintParams;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentClientCapabilities;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextDocumentItem;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The language server in process, over real JSON-RPC: one test per feature. */
class LanguageServerTest {
    @TempDir
    Path dir;
    private TestClient client;

    private static ClientCapabilities capabilities(boolean inlay, boolean lens, List<String> encodings) {
        TextDocumentClientCapabilities td = new TextDocumentClientCapabilities();
        if (inlay) td.setInlayHint(new InlayHintCapabilities());
        if (lens) td.setCodeLens(new CodeLensCapabilities());
        ClientCapabilities c = new ClientCapabilities();
        c.setTextDocument(td);
        if (encodings != null) {
            GeneralClientCapabilities g = new GeneralClientCapabilities();
            g.setPositionEncodings(encodings);
            c.setGeneral(g);
        }
        return c;
    }

    private TestClient start(ClientCapabilities caps) throws Exception {
        client = new TestClient(caps, null);
        return client;
    }

    @AfterEach
    void stop() throws IOException {
        if (client != null) TestClient.close(client);
    }

    private String uri(String name, String text) throws IOException {
        Files.createDirectories(dir.resolve(".git"));
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p.toUri().toString();
    }

    /** A fixture with a `$0` cursor: the text without it, and the cursor's protocol position. */
    private record Cursor(String text, Position at) {
        static Cursor of(String marked) {
            int i = marked.indexOf("$0");
            String text = marked.substring(0, i) + marked.substring(i + 2);
            return new Cursor(text, Positions.position(text, i, Positions.Encoding.UTF16));
        }
    }

    @Test
    void diagnosticsArePublishedWithUtf16Ranges() throws Exception {
        start(capabilities(true, true, null));
        assertEquals("utf-16", client.initialized.getCapabilities().getPositionEncoding());
        String text = "# wind 😀 load\n𝑥 = 1 m + 2 s\n";
        String uri = uri("a.plumb", text);
        client.open(uri, text);
        List<Diagnostic> ds = client.diagnostics(uri, 1).getDiagnostics();
        assertEquals(1, ds.size(), ds.toString());
        assertEquals("unit.mismatch", ds.get(0).getCode().getLeft());
        // 𝑥 is two UTF-16 units: the sum starts at character 5 of line 1 and ends at 14.
        assertEquals(new Range(new Position(1, 5), new Position(1, 14)), ds.get(0).getRange());
    }

    @Test
    void utf8PositionsWhenTheClientAsksForThem() throws Exception {
        start(capabilities(true, true, List.of("utf-8", "utf-16")));
        assertEquals("utf-8", client.initialized.getCapabilities().getPositionEncoding());
        String text = "𝑥 = 1 m + 2 s\n";
        String uri = uri("u.plumb", text);
        client.open(uri, text);
        Diagnostic d = client.diagnostics(uri, 1).getDiagnostics().get(0);
        assertEquals(new Position(0, 7), d.getRange().getStart(), "𝑥 is four bytes in UTF-8");
    }

    @Test
    void incrementalEditsUpdateTheDiagnostics() throws Exception {
        start(capabilities(true, true, null));
        String text = "input L = 2 m\nx = L + 2 s\n";
        String uri = uri("b.plumb", text);
        client.open(uri, text);
        assertEquals(List.of("unit.mismatch"), client.diagnostics(uri, 1).getDiagnostics().stream()
            .map(d -> d.getCode().getLeft()).toList());
        TextDocumentContentChangeEvent fix = new TextDocumentContentChangeEvent(
            new Range(new Position(1, 10), new Position(1, 11)), "m");
        client.remote.getTextDocumentService().didChange(new DidChangeTextDocumentParams(
            new VersionedTextDocumentIdentifier(uri, 2), List.of(fix)));
        assertEquals(List.of(), client.diagnostics(uri, 2).getDiagnostics());
        assertEquals("input L = 2 m\nx = L + 2 m\n", client.server.documents().get(uri).text());
    }

    @Test
    void hoverShowsTheValueItsSiFormAndTheFormulaWithValues() throws Exception {
        start(capabilities(true, true, null));
        Cursor c = Cursor.of("input b = 4 m\ninput h = 1.5 m\nA = b * h\nF = A$0 * 2 Pa\n");
        String uri = uri("h.plumb", c.text());
        client.open(uri, c.text());
        var hover = client.remote.getTextDocumentService().hover(new HoverParams(new TextDocumentIdentifier(uri), c.at()))
            .get(10, TimeUnit.SECONDS);
        String md = hover.getContents().getRight().getValue();
        assertTrue(md.contains("**A** = 6 m²"), md);
        assertTrue(md.contains("an area"), md);
        assertTrue(md.contains("`A = b * h`"), md);
        assertTrue(md.contains("(4 m) * (1.5 m)"), md);
    }

    @Test
    void hoverSaysWhoseDensityATaggedDensityIs() throws Exception {
        start(capabilities(true, true, null));
        Cursor c = Cursor.of("input rho_s = 2650 kg/m^3   as body\ninput rho_w = 1000 kg/m^3   as fluid\nr = rho_s$0 / rho_w\n");
        String uri = uri("hd.plumb", c.text());
        client.open(uri, c.text());
        String md = client.remote.getTextDocumentService().hover(new HoverParams(new TextDocumentIdentifier(uri), c.at()))
            .get(10, TimeUnit.SECONDS).getContents().getRight().getValue();
        assertTrue(md.contains("`as body`: the density of the body"), md);
    }

    @Test
    void hoverOnACorrelationCallSaysWhereTheArgumentSits() throws Exception {
        start(capabilities(true, true, null));
        Cursor c = Cursor.of("a = cd_sph$0ere_sn(100)\nb = cd_sphere_sn(5000)\n");
        String uri = uri("hc.plumb", c.text());
        client.open(uri, c.text());
        var service = client.remote.getTextDocumentService();
        String inside = service.hover(new HoverParams(new TextDocumentIdentifier(uri), c.at())).get(10, TimeUnit.SECONDS)
            .getContents().getRight().getValue();
        assertTrue(inside.contains("source:"), inside);
        assertTrue(inside.contains("at this call: Re = 100 — inside its range"), inside);
        String outside = service.hover(new HoverParams(new TextDocumentIdentifier(uri), new Position(1, 8)))
            .get(10, TimeUnit.SECONDS).getContents().getRight().getValue();
        assertTrue(outside.contains("at this call: Re = 5000 — outside: valid for"), outside);
    }

    @Test
    void hoverOnASelectorCallSaysWhichFitGaveTheValue() throws Exception {
        // cd_sphere uses Morrison from Re = 2e5 (stdlib/sphere.plumb).
        start(capabilities(true, true, null));
        Cursor c = Cursor.of("a = cd_sph$0ere(3e5)\n");
        String uri = uri("hs.plumb", c.text());
        client.open(uri, c.text());
        String md = client.remote.getTextDocumentService().hover(new HoverParams(new TextDocumentIdentifier(uri), c.at()))
            .get(10, TimeUnit.SECONDS).getContents().getRight().getValue();
        assertTrue(md.contains("used here: cd_sphere_morrison"), md);
        assertTrue(md.contains("domain: Re > 0 (outside it: an error, nothing computed)"), md);
    }

    @Test
    void goToDefinitionInTheFileInAUsedFileAndInTheLibrary() throws Exception {
        start(capabilities(true, true, null));
        uri("site.plumb", "input V = 30 m/s\n");
        Cursor c = Cursor.of("use \"site.plumb\"\nq = 0.5 * 1.2 kg/m^3 * V$0^2\nCd = cd_sphere(1e4)\n");
        String uri = uri("main.plumb", c.text());
        client.open(uri, c.text());
        var service = client.remote.getTextDocumentService();
        List<? extends Location> site = service.definition(new DefinitionParams(new TextDocumentIdentifier(uri), c.at()))
            .get(10, TimeUnit.SECONDS).getLeft();
        assertEquals(1, site.size());
        assertTrue(site.get(0).getUri().endsWith("site.plumb"));
        assertEquals(new Position(0, 6), site.get(0).getRange().getStart());
        List<? extends Location> lib = service.definition(new DefinitionParams(new TextDocumentIdentifier(uri),
            new Position(2, 7))).get(10, TimeUnit.SECONDS).getLeft();
        assertEquals(1, lib.size());
        Path copy = Path.of(java.net.URI.create(lib.get(0).getUri()));
        assertTrue(Files.readString(copy).contains("correlation cd_sphere("), "the library file, copied out read-only");
    }

    @Test
    void documentSymbolsAreSectionsWithTheirDefinitions() throws Exception {
        start(capabilities(true, true, null));
        String text = "section \"Air\"\ninput rho = 1.2 kg/m^3\nsection \"Drag\"\nq = 0.5 * rho * (20 m/s)^2\ncheck q < 1 kPa\n";
        String uri = uri("s.plumb", text);
        client.open(uri, text);
        var symbols = client.remote.getTextDocumentService().documentSymbol(new DocumentSymbolParams(
            new TextDocumentIdentifier(uri))).get(10, TimeUnit.SECONDS);
        assertEquals(List.of("Air", "Drag"), symbols.stream().map(x -> x.getRight().getName()).toList());
        var drag = symbols.get(1).getRight();
        assertEquals("Drag", drag.getName());
        assertEquals(List.of("q", "check q < 1 kPa"), drag.getChildren().stream().map(s -> s.getName()).toList());
    }

    @Test
    void valuesAsInlayHintsCodeLensesOrValueDiagnostics() throws Exception {
        String text = "input rho = 1.2 kg/m^3\nq = 0.5 * rho * (20 m/s)^2\ncheck q < 1 kPa\n";
        start(capabilities(true, true, null));
        String uri = uri("v.plumb", text);
        client.open(uri, text);
        var hints = client.remote.getTextDocumentService().inlayHint(new InlayHintParams(new TextDocumentIdentifier(uri),
            new Range(new Position(0, 0), new Position(3, 0)))).get(10, TimeUnit.SECONDS);
        assertEquals(List.of("  = 240 Pa", "  ✓ 0.24 kPa < 1 kPa"), hints.stream().map(h -> h.getLabel().getLeft()).toList());
        assertEquals(new Position(1, 26), hints.get(0).getPosition());
        TestClient.close(client);

        start(capabilities(false, true, null));
        String uri2 = uri("v2.plumb", text);
        client.open(uri2, text);
        var lenses = client.remote.getTextDocumentService().codeLens(new CodeLensParams(new TextDocumentIdentifier(uri2)))
            .get(10, TimeUnit.SECONDS);
        assertEquals("q = 240 Pa", lenses.get(0).getCommand().getTitle());
        TestClient.close(client);

        start(capabilities(false, false, null));
        String uri3 = uri("v3.plumb", text);
        client.open(uri3, text);
        List<Diagnostic> ds = client.diagnostics(uri3, 1).getDiagnostics();
        assertTrue(ds.stream().anyMatch(d -> d.getCode().getLeft().equals("value") && d.getMessage().getLeft().equals("= 240 Pa")),
            ds.toString());
    }

    @Test
    void diagnosticsCanBePulled() throws Exception {
        start(capabilities(true, true, null));
        String text = "x = 1 m + 2 s\n";
        String uri = uri("p.plumb", text);
        client.open(uri, text);
        var report = client.remote.getTextDocumentService().diagnostic(new DocumentDiagnosticParams(
            new TextDocumentIdentifier(uri))).get(10, TimeUnit.SECONDS);
        var pulled = report.getLeft().getItems();
        assertEquals(List.of("unit.mismatch"), pulled.stream().map(d -> d.getCode().getLeft()).toList());
        assertEquals(new Range(new Position(0, 4), new Position(0, 13)), pulled.get(0).getRange());
    }

    @Test
    void editingAUsedFileReanalysesItsUsers() throws Exception {
        start(capabilities(true, true, null));
        String siteText = "input V = 30 m/s\n";
        String site = uri("site2.plumb", siteText);
        String mainText = "use \"site2.plumb\"\nx = V + 1 m/s\n";
        String main = uri("main2.plumb", mainText);
        client.open(site, siteText);
        client.open(main, mainText);
        assertEquals(List.of(), client.diagnostics(main, 1).getDiagnostics());
        client.remote.getTextDocumentService().didChange(new DidChangeTextDocumentParams(
            new VersionedTextDocumentIdentifier(site, 2), List.of(new TextDocumentContentChangeEvent("input V = 30 s\n"))));
        List<Diagnostic> after = null;
        for (int i = 0; i < 20 && (after == null || after.isEmpty()); i++) after = client.diagnostics(main, 1).getDiagnostics();
        assertNotNull(after);
        assertFalse(after.isEmpty(), "main now adds a time to a speed");
        assertEquals("unit.mismatch", after.get(0).getCode().getLeft());
    }

}
