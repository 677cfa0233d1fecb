package bulwark.check.compile;

import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.Set;
import java.util.Map;
import java.util.Optional;

import bulwark.engine.circuit.Bjt;
import bulwark.engine.circuit.Bjt.Polarity;
import bulwark.engine.circuit.Circuit;
import bulwark.engine.circuit.Capacitor;
import bulwark.engine.circuit.Comparator;
import bulwark.engine.circuit.Fuse;
import bulwark.engine.circuit.Indicator;
import bulwark.engine.circuit.Inductor;
import bulwark.engine.circuit.Mosfet;
import bulwark.engine.circuit.Mosfet.Channel;
import bulwark.engine.circuit.Potentiometer;
import bulwark.engine.circuit.Protector;
import bulwark.engine.circuit.CurrentSource;
import bulwark.engine.circuit.Resistor;
import bulwark.engine.circuit.VoltageSource;
import bulwark.lang.design.Design;
import bulwark.lang.design.Member;
import bulwark.lang.design.Net;
import bulwark.lang.design.Part;
import bulwark.lang.design.PartKind;
import bulwark.lang.design.PinBinding;
import bulwark.lang.design.Terminal;
import bulwark.lang.design.Action;
import bulwark.lang.design.Case;
import bulwark.check.parts.Settings;
import bulwark.check.parts.Values;

/**
 * Turns a validated design into the engine's circuit. Only nets that some pin uses become circuit nets:
 * a declared but unused net has no voltage to solve for.
 */
public final class DesignCompiler {
	private DesignCompiler() {
	}

	/** Compiles the design; call only when the language reported no error, so every value is present. */
	public static CompiledDesign compile(Design design) {
		return compile(design, Values.WRITTEN);
	}

	/** Compiles the design with its parameters taken from {@code values} (a tolerance corner, a sample). */
	public static CompiledDesign compile(Design design, Values values) {
		Net reference = design.getMembers().stream().filter(Net.class::isInstance).map(Net.class::cast)
				.filter(Net::isReference).findFirst()
				.orElseThrow(() -> new IllegalArgumentException("design has no reference net"));
		Circuit.Builder builder = Circuit.withReference(reference.getName());
		Map<String, Part> parts = new LinkedHashMap<>();
		for (Member m : design.getMembers()) {
			if (!(m instanceof Part part)) {
				continue;
			}
			parts.put(part.getName(), part);
			switch (part.getKind()) {
			case RESISTOR:
				builder.add(new Resistor(part.getName(), pin(builder, part, "a"), pin(builder, part, "b"),
						required(values, part, "value")));
				break;
			case SOURCE:
				builder.add(new VoltageSource(part.getName(), pin(builder, part, "plus"), pin(builder, part, "minus"),
						required(values, part, "voltage"), values.parameter(part, "resistance").orElse(0.0)));
				break;
			case CURRENT_SOURCE:
				// the engine's source drives its current out of its second pin: plus
				builder.add(new CurrentSource(part.getName(), pin(builder, part, "minus"), pin(builder, part, "plus"),
						required(values, part, "current")));
				break;
			case BATTERY:
				builder.add(new VoltageSource(part.getName(), pin(builder, part, "plus"), pin(builder, part, "minus"),
						required(values, part, "emf"), values.parameter(part, "resistance").orElse(0.0)));
				break;
			case DIODE:
			case ZENER:
			case LED:
				builder.diode(part.getName(), pin(builder, part, "anode"), pin(builder, part, "cathode"),
						DeviceModels.diode(part, values));
				break;
			case NPN:
			case PNP:
				builder.add(new Bjt(part.getName(), pin(builder, part, "collector"), pin(builder, part, "base"),
						pin(builder, part, "emitter"), part.getKind() == PartKind.NPN ? Polarity.NPN : Polarity.PNP,
						DeviceModels.bjt(part, values)));
				break;
			case NMOS:
			case PMOS:
				builder.add(new Mosfet(part.getName(), pin(builder, part, "drain"), pin(builder, part, "gate"),
						pin(builder, part, "source"), part.getKind() == PartKind.NMOS ? Channel.N : Channel.P,
						DeviceModels.mosfet(part, values)));
				break;
			case CAPACITOR:
				double farads = required(values, part, "value");
				builder.add(new Capacitor(part.getName(), pin(builder, part, "a"), pin(builder, part, "b"), farads,
						values.parameter(part, "leakage").orElse(DeviceModels.capacitorLeakage(farads))));
				break;
			case INDUCTOR:
				builder.add(new Inductor(part.getName(), pin(builder, part, "a"), pin(builder, part, "b"),
						required(values, part, "value")));
				break;
			case POTENTIOMETER:
				builder.add(new Potentiometer(part.getName(), pin(builder, part, "a"), pin(builder, part, "b"),
						pin(builder, part, "wiper"), required(values, part, "value"),
						values.parameter(part, "position").orElse(0.5)));
				break;
			case PROTECTOR:
				builder.add(new Protector(part.getName(), pin(builder, part, "a"), pin(builder, part, "b"),
						DeviceModels.protector(part, values)));
				break;
			case FUSE:
			case RESETTABLE_FUSE:
				boolean resettable = part.getKind() == PartKind.RESETTABLE_FUSE;
				builder.add(new Fuse(part.getName(), pin(builder, part, "a"), pin(builder, part, "b"),
						values.parameter(part, "resistance").orElse(DeviceModels.FUSE_COLD_OHMS),
						Settings.rating(part, resettable ? "hold" : "current").orElse(Double.POSITIVE_INFINITY),
						resettable));
				break;
			case LINK:
				builder.add(new Resistor(part.getName(), pin(builder, part, "a"), pin(builder, part, "b"),
						values.parameter(part, "resistance").orElse(DeviceModels.LINK_OHMS)));
				break;
			case INDICATOR:
				builder.add(new Indicator(part.getName(), pin(builder, part, "a"), pin(builder, part, "b"),
						required(values, part, "resistance"),
						values.parameter(part, "activation").orElse(DeviceModels.INDICATOR_ACTIVATION)));
				break;
			case COMPARATOR:
				builder.add(new Comparator(part.getName(), pin(builder, part, "in_plus"), pin(builder, part, "in_minus"),
						pin(builder, part, "out"), pin(builder, part, "supply_plus"), pin(builder, part, "supply_minus"),
						DeviceModels.comparator(part, values)));
				break;
			default:
				throw new IllegalArgumentException("no engine model for " + part.getKind());
			}
		}
		Set<String> usedNets = new HashSet<>();
		Circuit pinsOnly = builder.build();
		for (int i = 0; i < pinsOnly.netCount(); i++) {
			usedNets.add(pinsOnly.netName(i));
		}
		// nets of the terminals the designer's cases act on, even where no pin does (a net nothing uses
		// stays out: in the normal case it would float)
		for (Member m : design.getMembers()) {
			if (m instanceof Case c) {
				for (Action a : c.getActions()) {
					for (Terminal t : new Terminal[] { a.getFrom(), a.getTo() }) {
						builder.net(t.getNet().getName());
					}
				}
			}
		}
		return new CompiledDesign(design, builder.build(), parts, Set.copyOf(usedNets), values);
	}

	private static int pin(Circuit.Builder builder, Part part, String pin) {
		Optional<PinBinding> binding = part.getPins().stream().filter(b -> pin.equals(b.getPin())).findFirst();
		return builder.net(binding.orElseThrow(() -> new IllegalArgumentException(part.getName() + "." + pin))
				.getNet().getName());
	}

	private static double required(Values values, Part part, String name) {
		return values.parameter(part, name)
				.orElseThrow(() -> new IllegalArgumentException(part.getName() + " has no " + name));
	}
}
