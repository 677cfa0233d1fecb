package bulwark.lsp;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import com.google.inject.Singleton;

import bulwark.check.DesignChecker;
import bulwark.check.DesignResult;
import bulwark.check.load.DesignLoader;
import bulwark.lang.BulwarkStandaloneSetup;

/**
 * The language server's checker and the newest result of each open document, which hover and code actions
 * read. The checker parses with the plain runtime (no IDE services), so that checking never re-enters the
 * server's own validator.
 */
@Singleton
public class OpenDesigns {
	/** A document's text and what its check found. */
	public record Checked(String text, DesignResult result) {
	}

	private final DesignChecker checker;
	private final Map<String, Checked> latest = new ConcurrentHashMap<>();

	/** With a checker of its own (tests, and a server started without one). */
	public OpenDesigns() {
		this(new DesignChecker(new DesignLoader(new BulwarkStandaloneSetup().createInjector(),
				bulwark.lang.install.Installation.fromLaunch())));
	}

	/** With the checker the server made from the language's plain runtime. */
	public OpenDesigns(DesignChecker checker) {
		this.checker = checker;
	}

	public DesignChecker checker() {
		return checker;
	}

	void put(String uri, Checked checked) {
		latest.put(uri, checked);
	}

	/** The newest result for the document, or null before its first check. */
	public Checked get(String uri) {
		return latest.get(uri);
	}
}
