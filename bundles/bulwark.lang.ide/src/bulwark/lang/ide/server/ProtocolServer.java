package bulwark.lang.ide.server;

import java.util.concurrent.CompletableFuture;

import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.eclipse.xtext.ide.server.LanguageServerImpl;

/**
 * Xtext's language server, answering a request for a method it does not have with the protocol's "method not
 * found", and taking the working folder as the root when a client names none.
 */
public class ProtocolServer extends LanguageServerImpl {
	/** A client that names no root folder gets the server's working folder, rather than an internal error. */
	@Override
	public CompletableFuture<org.eclipse.lsp4j.InitializeResult> initialize(org.eclipse.lsp4j.InitializeParams params) {
		if (params.getRootUri() == null && (params.getWorkspaceFolders() == null || params.getWorkspaceFolders().isEmpty())) {
			params.setRootUri(java.nio.file.Path.of("").toAbsolutePath().toUri().toString());
		}
		return super.initialize(params);
	}

	@Override
	public CompletableFuture<?> request(String method, Object parameter) {
		try {
			return super.request(method, parameter);
		} catch (UnsupportedOperationException e) {
			CompletableFuture<Object> refused = new CompletableFuture<>();
			refused.completeExceptionally(new ResponseErrorException(
					new ResponseError(ResponseErrorCode.MethodNotFound, "Bulwark's server has no method " + method, null)));
			return refused;
		}
	}
}
