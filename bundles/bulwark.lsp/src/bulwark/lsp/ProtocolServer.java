package bulwark.lsp;

import java.util.concurrent.CompletableFuture;

import org.eclipse.emf.common.util.URI;
import org.eclipse.lsp4j.InitializeParams;
import org.eclipse.lsp4j.SemanticTokens;
import org.eclipse.lsp4j.SemanticTokensParams;
import org.eclipse.lsp4j.SemanticTokensWithRegistrationOptions;
import org.eclipse.lsp4j.ServerCapabilities;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.eclipse.xtext.ide.server.LanguageServerImpl;
import org.eclipse.xtext.util.CancelIndicator;

import bulwark.lang.ide.highlight.SemanticRanges;

/**
 * Xtext's language server, answering a request for a method it does not have with the protocol's "method not
 * found", taking the working folder as the root when a client names none, and giving semantic tokens for the
 * names of a design.
 */
public class ProtocolServer extends LanguageServerImpl {
	/**
	 * A client that names no root folder gets the server's working folder, rather than an internal error.
	 * The root URI is deprecated in the protocol but still what older clients send and the framework reads.
	 */
	@SuppressWarnings("deprecation")
	@Override
	public CompletableFuture<org.eclipse.lsp4j.InitializeResult> initialize(org.eclipse.lsp4j.InitializeParams params) {
		if (params.getRootUri() == null && (params.getWorkspaceFolders() == null || params.getWorkspaceFolders().isEmpty())) {
			params.setRootUri(java.nio.file.Path.of("").toAbsolutePath().toUri().toString());
		}
		return super.initialize(params);
	}

	/** Semantic tokens for the design's names (SemanticRanges), full documents only. */
	@Override
	protected ServerCapabilities createServerCapabilities(InitializeParams params) {
		ServerCapabilities capabilities = super.createServerCapabilities(params);
		SemanticTokensWithRegistrationOptions tokens = new SemanticTokensWithRegistrationOptions(SemanticTokensEncoding.legend());
		tokens.setFull(true);
		tokens.setRange(false);
		capabilities.setSemanticTokensProvider(tokens);
		return capabilities;
	}

	@Override
	protected SemanticTokens semanticTokensFull(SemanticTokensParams params, CancelIndicator cancelIndicator) {
		URI uri = getURI(params.getTextDocument());
		return getWorkspaceManager().doRead(uri,
				(document, resource) -> SemanticTokensEncoding.encode(document, SemanticRanges.of(resource)));
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
