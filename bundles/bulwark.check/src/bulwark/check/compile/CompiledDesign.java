package bulwark.check.compile;

import java.util.Map;
import java.util.Set;

import bulwark.engine.circuit.Circuit;
import bulwark.lang.design.Design;
import bulwark.lang.design.Part;
import bulwark.check.parts.Values;

/**
 * A design together with the engine circuit made from it; {@code parts} maps device names back to the text,
 * {@code usedNets} names the nets some pin connects to, {@code values} where its parameter values came from.
 */
public record CompiledDesign(Design design, Circuit circuit, Map<String, Part> parts, Set<String> usedNets,
		Values values) {
}
