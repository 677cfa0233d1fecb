package bulwark.check.compile;

import java.util.List;

import bulwark.engine.circuit.Device;

/**
 * A condition the design is solved under: the design as written plus the devices the case adds at the
 * terminals (none for the normal condition with the terminals open).
 */
public record FaultCase(String name, String kind, List<Device> added) {
	public static FaultCase normalOpen() {
		return new FaultCase("normal, terminals open", "normal", List.of());
	}
}
