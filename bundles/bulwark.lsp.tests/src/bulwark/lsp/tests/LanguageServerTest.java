package bulwark.lsp.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PipedInputStream;
import java.io.PipedOutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;

import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionContext;
import org.eclipse.lsp4j.CodeActionParams;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DidOpenTextDocumentParams;
import org.eclipse.lsp4j.DocumentFormattingParams;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.FormattingOptions;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.InitializeParams;
import org.eclipse.lsp4j.InitializedParams;
import org.eclipse.lsp4j.MessageActionItem;
import org.eclipse.lsp4j.MessageParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.PublishDiagnosticsParams;
import org.eclipse.lsp4j.ShowMessageRequestParams;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextDocumentItem;
import org.eclipse.lsp4j.jsonrpc.Launcher;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.launch.LSPLauncher;
import org.eclipse.lsp4j.services.LanguageClient;
import org.eclipse.lsp4j.services.LanguageServer;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import bulwark.lsp.BulwarkLanguageServer;

/** The language server in process, driven by an LSP4J client: one test per feature. */
class LanguageServerTest {
	private static final LinkedBlockingQueue<PublishDiagnosticsParams> DIAGNOSTICS = new LinkedBlockingQueue<>();
	private static LanguageServer server;
	private static Launcher<LanguageServer> client;
	private static Path dir;
	private static String uri;
	private static String text;
	private static List<Diagnostic> diagnostics;

	@BeforeAll
	static void start() throws Exception {
		dir = Files.createTempDirectory("bulwark-lsp");
		Files.copy(root().resolve("examples/teaching-lab.bulwark-policy"), dir.resolve("teaching-lab.bulwark-policy"));
		Path lab = dir.resolve("lab.bulwark");
		text = Files.readString(root().resolve("examples/lab-indicator-seeded.bulwark"));
		Files.writeString(lab, text);
		uri = lab.toUri().toString();
		PipedInputStream serverIn = new PipedInputStream(1 << 16), clientIn = new PipedInputStream(1 << 16);
		PipedOutputStream toServer = new PipedOutputStream(serverIn), toClient = new PipedOutputStream(clientIn);
		BulwarkLanguageServer.start(serverIn, toClient);
		client = LSPLauncher.createClientLauncher(new Client(), clientIn, toServer);
		client.startListening();
		server = client.getRemoteProxy();
		InitializeParams init = new InitializeParams();
		init.setCapabilities(new ClientCapabilities());
		setRoot(init, dir);
		server.initialize(init).get(60, TimeUnit.SECONDS);
		server.initialized(new InitializedParams());
		server.getTextDocumentService().didOpen(new DidOpenTextDocumentParams(new TextDocumentItem(uri, "bulwark", 1, text)));
		diagnostics = diagnosticsFor(uri, "resistor-power");
	}

	@AfterAll
	static void stop() throws Exception {
		server.shutdown().get(30, TimeUnit.SECONDS);
	}

	private static List<Diagnostic> diagnosticsFor(String document, String code) throws InterruptedException {
		long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
		List<PublishDiagnosticsParams> seen = new java.util.ArrayList<>();
		while (System.nanoTime() < deadline) {
			PublishDiagnosticsParams p = DIAGNOSTICS.poll(1, TimeUnit.SECONDS);
			if (p != null) {
				seen.add(p);
			}
			if (p != null && p.getUri().equals(document)
					&& p.getDiagnostics().stream().anyMatch(d -> d.getCode() != null && code.equals(d.getCode().getLeft()))) {
				return p.getDiagnostics();
			}
		}
		throw new AssertionError("no diagnostics with " + code + " for " + document + "; seen: " + seen);
	}

	private static Position at(String word) {
		int offset = text.indexOf(word);
		String before = text.substring(0, offset);
		int line = (int) before.chars().filter(c -> c == '\n').count();
		return new Position(line, offset - before.lastIndexOf('\n') - 1 + 1);
	}

	@Test
	void diagnosticsCarryEveryRuleWithItsCode() {
		Diagnostic d = diagnostics.stream().filter(x -> "resistor-power".equals(x.getCode().getLeft())).findFirst().orElseThrow();
		assertEquals(21, d.getRange().getStart().getLine()); // line 22, where R_DROP is declared
		assertTrue(d.getMessage().contains("960 mW"), d.getMessage());
		assertTrue(!d.getMessage().contains("resistor-power"), "the rule is the code, not repeated in the text: " + d.getMessage());
	}

	@Test
	void hoverShowsAPartsWorstStress() throws Exception {
		Hover h = server.getTextDocumentService().hover(new HoverParams(new TextDocumentIdentifier(uri), at("R_DROP (")))
				.get(30, TimeUnit.SECONDS);
		String md = h.getContents().getRight().getValue();
		assertTrue(md.contains("**R_DROP**") && md.contains("- power: 960 mW in case 'normal, LAMP_OUT shorted to LAMP_RET', 1280 % of 75 mW"), md);
		assertTrue(md.contains("*resistor-power*: In some case, a resistor turns more power into heat"), md); // the rule's explanation
	}

	@Test
	void codeActionsAreTheVerifiedQuickFixes() throws Exception {
		Diagnostic d = diagnostics.stream().filter(x -> "resistor-power".equals(x.getCode().getLeft())).findFirst().orElseThrow();
		var actions = server.getTextDocumentService()
				.codeAction(new CodeActionParams(new TextDocumentIdentifier(uri), d.getRange(), new CodeActionContext(List.of(d))))
				.get(60, TimeUnit.SECONDS);
		CodeAction action = actions.get(0).getRight();
		assertEquals("raise R_DROP's rated power 125 mW → 2 W (1280 % → 80 % of the limit)", action.getTitle());
		assertEquals("2 W", action.getEdit().getChanges().get(uri).get(0).getNewText());
	}

	@Test
	void formattingDocumentSymbolsAndDefinition() throws Exception {
		var edits = server.getTextDocumentService()
				.formatting(new DocumentFormattingParams(new TextDocumentIdentifier(uri), new FormattingOptions(2, true)))
				.get(30, TimeUnit.SECONDS);
		assertTrue(edits != null);
		var symbols = server.getTextDocumentService().documentSymbol(new DocumentSymbolParams(new TextDocumentIdentifier(uri)))
				.get(30, TimeUnit.SECONDS);
		assertTrue(symbols.toString().contains("R_DROP"), symbols.toString());
		// the net 'lamp' used by R_DROP's pin b: its definition is the 'net lamp' line
		Position use = at("b: lamp");
		use.setCharacter(use.getCharacter() + 3);
		var definition = server.getTextDocumentService().definition(new DefinitionParams(new TextDocumentIdentifier(uri), use))
				.get(30, TimeUnit.SECONDS);
		int line = definition.getLeft().get(0).getRange().getStart().getLine();
		assertEquals("net lamp", text.lines().toList().get(line).strip());
	}

	@Test
	void completionOffersPinsSettingsAndUnitsOfTheKind() throws Exception {
		String probe = "design \"probe\"\nreference net gnd\nnet a\nled D1 (";
		String probeUri = dir.resolve("probe.bulwark").toUri().toString();
		server.getTextDocumentService().didOpen(new DidOpenTextDocumentParams(new TextDocumentItem(probeUri, "bulwark", 1, probe)));
		var pins = server.getTextDocumentService().completion(new org.eclipse.lsp4j.CompletionParams(
				new TextDocumentIdentifier(probeUri), new Position(3, 8))).get(30, TimeUnit.SECONDS);
		List<String> labels = pins.getRight().getItems().stream().map(i -> i.getLabel()).toList();
		assertTrue(labels.contains("anode: ") && labels.contains("cathode: "), labels.toString());
		String withBlock = "design \"probe\"\nreference net gnd\nnet a\nled D1 (anode: a, cathode: gnd) { rated ";
		server.getTextDocumentService().didChange(new org.eclipse.lsp4j.DidChangeTextDocumentParams(
				new org.eclipse.lsp4j.VersionedTextDocumentIdentifier(probeUri, 2),
				List.of(new org.eclipse.lsp4j.TextDocumentContentChangeEvent(withBlock))));
		var ratings = server.getTextDocumentService().completion(new org.eclipse.lsp4j.CompletionParams(
				new TextDocumentIdentifier(probeUri), new Position(3, withBlock.lines().toList().get(3).length())))
				.get(30, TimeUnit.SECONDS);
		List<String> names = ratings.getRight().getItems().stream().map(i -> i.getLabel()).toList();
		assertTrue(names.contains("reverse ") && names.contains("forward "), names.toString());
		// after 'require', the figures a design can require
		String requiring = "design \"probe\"\nreference net gnd\nrequire ";
		server.getTextDocumentService().didChange(new org.eclipse.lsp4j.DidChangeTextDocumentParams(
				new org.eclipse.lsp4j.VersionedTextDocumentIdentifier(probeUri, 3),
				List.of(new org.eclipse.lsp4j.TextDocumentContentChangeEvent(requiring))));
		var figures = server.getTextDocumentService().completion(new org.eclipse.lsp4j.CompletionParams(
				new TextDocumentIdentifier(probeUri), new Position(2, "require ".length()))).get(30, TimeUnit.SECONDS);
		List<String> required = figures.getRight().getItems().stream().map(i -> i.getLabel()).toList();
		assertTrue(required.contains("switch_on_voltage ") && required.contains("threshold "), required.toString());
	}

	@Test
	void semanticTokensClassifyTheNames() throws Exception {
		var tokens = server.getTextDocumentService()
				.semanticTokensFull(new org.eclipse.lsp4j.SemanticTokensParams(new TextDocumentIdentifier(uri))).get(30, TimeUnit.SECONDS);
		List<Integer> data = tokens.getData();
		assertEquals(0, data.size() % 5);
		// decoded back to absolute places: "line:character length type modifiers"
		List<String> decoded = new java.util.ArrayList<>();
		int line = 0, character = 0;
		for (int i = 0; i < data.size(); i += 5) {
			character = data.get(i) == 0 ? character + data.get(i + 1) : data.get(i + 1);
			line += data.get(i);
			decoded.add(line + ":" + character + " " + data.get(i + 2) + " " + data.get(i + 3) + " " + data.get(i + 4));
		}
		Position drop = at("R_DROP ("), gnd = at("gnd\n");
		// R_DROP declared: type 2 (class: a part), modifier bit 0 (declaration); at(...) is 1-based in the column
		assertTrue(decoded.contains(drop.getLine() + ":" + (drop.getCharacter() - 1) + " 6 2 1"), decoded.toString());
		assertTrue(decoded.contains(gnd.getLine() + ":" + (gnd.getCharacter() - 1) + " 3 0 1"), decoded.toString()); // net gnd declared
	}

	@Test
	void aSyntaxErrorIsOneDiagnosticInBulwarksWordsAndCode() throws Exception {
		String broken = dir.resolve("broken.bulwark").toUri().toString();
		String source = "design \"x\"\nreference net gnd\n// a note\nnet a\nresistor R1 (a: a, b: gdn) { value 1 kΩ }\n";
		server.getTextDocumentService().didOpen(new DidOpenTextDocumentParams(new TextDocumentItem(broken, "bulwark", 1, source)));
		List<Diagnostic> found = diagnosticsFor(broken, "bulwark.lang.syntax");
		// the comment's two slashes and the word after them are one mistake; the misspelt net waits for the syntax
		assertEquals(1, found.size(), found.toString());
		assertEquals("comments start with '#': write # in place of //", found.get(0).getMessage());
		assertEquals(2, found.get(0).getRange().getStart().getLine());
		// fixed, the name that refers to nothing is named with the nearest one, under Bulwark's code
		server.getTextDocumentService().didChange(new org.eclipse.lsp4j.DidChangeTextDocumentParams(
				new org.eclipse.lsp4j.VersionedTextDocumentIdentifier(broken, 2),
				List.of(new org.eclipse.lsp4j.TextDocumentContentChangeEvent(source.replace("//", "#")))));
		List<Diagnostic> named = diagnosticsFor(broken, "bulwark.lang.unknownName");
		Diagnostic unknown = named.stream().filter(d -> "bulwark.lang.unknownName".equals(d.getCode().getLeft())).findFirst()
				.orElseThrow();
		assertEquals("no net 'gdn' in this design (did you mean 'gnd'?)", unknown.getMessage());
		for (Diagnostic d : named) {
			assertTrue(d.getCode() != null && !d.getCode().getLeft().startsWith("org."), d.toString());
		}
	}

	@Test
	void anUnknownMethodGetsTheProtocolsError() throws Exception {
		CompletableFuture<Object> answer = client.getRemoteEndpoint().request("bulwark/noSuchMethod", null);
		try {
			answer.get(30, TimeUnit.SECONDS);
			throw new AssertionError("an unknown method was answered");
		} catch (ExecutionException e) {
			assertTrue(e.getCause() instanceof ResponseErrorException, e.toString());
			assertEquals(-32601, ((ResponseErrorException) e.getCause()).getResponseError().getCode()); // method not found
		}
	}

	private static final class Client implements LanguageClient {
		@Override
		public void telemetryEvent(Object object) {
		}

		@Override
		public void publishDiagnostics(PublishDiagnosticsParams diagnostics) {
			DIAGNOSTICS.add(diagnostics);
		}

		@Override
		public void showMessage(MessageParams message) {
		}

		@Override
		public CompletableFuture<MessageActionItem> showMessageRequest(ShowMessageRequestParams request) {
			return CompletableFuture.completedFuture(null);
		}

		@Override
		public void logMessage(MessageParams message) {
		}
	}

	/** The repository's root, where the bundled examples are. */
	private static Path root() {
		return Path.of(System.getProperty("bulwark.root", "../..")).toAbsolutePath().normalize();
	}

	/** The folder of the designs, as the root URI the framework reads (deprecated in the protocol, still sent). */
	@SuppressWarnings("deprecation")
	private static void setRoot(InitializeParams init, Path dir) {
		init.setRootUri(dir.toUri().toString());
	}
}
