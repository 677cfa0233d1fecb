package bulwark.lang.ide.server;

import java.util.concurrent.CompletableFuture;

import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.eclipse.xtext.ide.server.LanguageServerImpl;

/** Xtext's language server, answering a request for a method it does not have with the protocol's "method not found". */
public class ProtocolServer extends LanguageServerImpl {
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
