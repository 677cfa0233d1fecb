package bulwark.cli;

import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;

import bulwark.lsp.BulwarkLanguageServer;
import picocli.CommandLine.Command;

@Command(name = "lsp", description = { "Runs the Bulwark language server on standard input and output (the Language "
		+ "Server Protocol), for editors that speak it: diagnostics from every rule and case, hovers, quick fixes, "
		+ "formatting, symbols, go to definition. See docs/editors.md." })
final class LspCommand implements Callable<Integer> {
	@picocli.CommandLine.Mixin
	HelpOption help;

	@Override
	public Integer call() throws Exception {
		try {
			BulwarkLanguageServer.start(System.in, System.out).get();
		} catch (ExecutionException e) {
			// the client closed its end: nothing left to serve
		}
		return ExitCodes.CLEAN;
	}
}
