package bulwark.engine.circuit;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The compiled form of a design that the solvers work on: numbered nets and a list of devices.
 * Net 0 is always the reference net (0 V). Built once per check, separate from the language model,
 * so that every case and sweep point reuses it.
 */
public final class Circuit {
	public static final int REFERENCE = 0;

	private final List<String> netNames;
	private final List<Device> devices;
	/** Where each device and net is, by name: built once, shared by copies that keep the names. */
	private final Map<String, Integer> deviceIndices;
	private final Map<String, Integer> netIndices;

	private Circuit(List<String> netNames, List<Device> devices) {
		this.netNames = Collections.unmodifiableList(new ArrayList<>(netNames));
		this.devices = Collections.unmodifiableList(new ArrayList<>(devices));
		this.deviceIndices = indices(this.devices.stream().map(Device::name).toList());
		this.netIndices = indices(this.netNames);
	}

	private Circuit(Circuit names, List<Device> devices) {
		this.netNames = names.netNames;
		this.devices = Collections.unmodifiableList(devices);
		this.deviceIndices = names.deviceIndices;
		this.netIndices = names.netIndices;
	}

	/** Name → first index (a name used twice keeps its first place, as a search from the start would find). */
	private static Map<String, Integer> indices(List<String> names) {
		Map<String, Integer> map = new java.util.HashMap<>();
		for (int i = 0; i < names.size(); i++) {
			map.putIfAbsent(names.get(i), i);
		}
		return Collections.unmodifiableMap(map);
	}

	/** Starts a circuit whose reference net has the given name. */
	public static Builder withReference(String referenceNet) {
		return new Builder(referenceNet);
	}

	public int netCount() {
		return netNames.size();
	}

	public String netName(int net) {
		return netNames.get(net);
	}

	public List<Device> devices() {
		return devices;
	}

	/** A copy of this circuit with more devices, for example the source a fault case applies. */
	public Circuit plus(List<Device> extra) {
		List<Device> all = new ArrayList<>(devices);
		all.addAll(extra);
		return new Circuit(netNames, all);
	}

	/** A copy with the device at {@code index} replaced, for example a swept resistor at its next value. */
	public Circuit withDevice(int index, Device replacement) {
		List<Device> all = new ArrayList<>(devices);
		all.set(index, replacement);
		return replacement.name().equals(devices.get(index).name()) ? new Circuit(this, all) : new Circuit(netNames, all);
	}

	/** Index of the named device, or −1. */
	public int deviceIndex(String name) {
		Integer i = deviceIndices.get(name);
		return i == null ? -1 : i;
	}

	public int netIndex(String name) {
		Integer i = netIndices.get(name);
		if (i == null) {
			throw new IllegalArgumentException("no net named " + name);
		}
		return i;
	}

	public static final class Builder {
		private final Map<String, Integer> nets = new LinkedHashMap<>();
		private final List<Device> devices = new ArrayList<>();

		private Builder(String referenceNet) {
			nets.put(referenceNet, REFERENCE);
		}

		/** Returns the index of the named net, adding it on first use. */
		public int net(String name) {
			return nets.computeIfAbsent(name, n -> nets.size());
		}

		/** A net of the device's own, behind the pins; named after the device so that messages can say whose. */
		public int internalNet(String owner, String role) {
			String name = owner + "." + role;
			if (nets.containsKey(name)) {
				throw new IllegalArgumentException("internal net " + name + " exists already");
			}
			return net(name);
		}

		/** Adds a diode, with the internal net its series resistance needs. */
		public Builder diode(String name, int anode, int cathode, bulwark.engine.device.DiodeModel model) {
			int junction = model.seriesOhms() > 0 ? internalNet(name, "junction") : anode;
			return add(new Diode(name, anode, cathode, junction, model));
		}

		public Builder add(Device device) {
			devices.add(device);
			return this;
		}

		public Circuit build() {
			return new Circuit(new ArrayList<>(nets.keySet()), devices);
		}
	}
}
