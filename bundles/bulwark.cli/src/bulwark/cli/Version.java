package bulwark.cli;

import picocli.CommandLine.IVersionProvider;

/** The tool's version, from the bundle manifest when there is one. */
public final class Version implements IVersionProvider {
	public static String get() {
		String v = Version.class.getPackage().getImplementationVersion();
		return v != null ? v : "0.1.0";
	}

	@Override
	public String[] getVersion() {
		return new String[] { "bulwark " + get() };
	}
}
