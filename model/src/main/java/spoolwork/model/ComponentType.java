package spoolwork.model;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import spoolwork.model.SpoolPosition.FlowPath;

/**
 * The component catalogue. Each type declares, in this one place, its ports, numeric parameters (SI, with
 * default, valid range and meaning), named options (variants) and — for directional valves — its spool
 * positions. Defaults are common-practice values of the trade, not data of any particular product.
 */
public enum ComponentType {
    RESERVOIR("reservoir", "Reservoir", "T", Category.SUPPLY, b -> b
            .port("S", "suction outlet to a pump inlet")
            .port("T", "return inlet, below the fluid surface")
            .param("volume", Quantity.VOLUME, 0.1, 1e-4, 100, "oil volume in the reservoir")),
    PRIME_MOVER("prime_mover", "Prime mover", "M", Category.SUPPLY, b -> b
            .shaft("drive shaft to the pump")
            .option("kind", "electric motor or combustion engine", "electric", "engine")
            .param("speed", Quantity.SPEED, 1450.0 / 60, 0, 100, "shaft speed (4-pole motor at 50 Hz: 1450 rpm)")
            .param("rated_power", Quantity.POWER, 7500, 1, 5e6, "rated shaft power")),
    FIXED_PUMP("fixed_pump", "Fixed-displacement pump", "P", Category.PUMPS_AND_MOTORS, b -> b
            .port("S", "suction inlet").port("P", "pressure outlet").shaft("drive shaft")
            .param("displacement", Quantity.DISPLACEMENT, 16e-6, 1e-8, 1e-2, "geometric displacement per revolution")
            .param("speed", Quantity.SPEED, 1450.0 / 60, 0, 100, "shaft speed when no prime mover drives it")
            .param("volumetric_efficiency", Quantity.RATIO, 0.93, 0.5, 1, "delivered/geometric flow at the reference pressure")
            .param("overall_efficiency", Quantity.RATIO, 0.85, 0.3, 1, "hydraulic output/shaft input power")
            .param("reference_pressure", Quantity.PRESSURE, 200e5, 1e5, 1000e5, "pressure at which the volumetric efficiency applies")),
    COMPENSATED_PUMP("compensated_pump", "Pressure-compensated variable pump", "P", Category.PUMPS_AND_MOTORS, b -> b
            .port("S", "suction inlet").port("P", "pressure outlet").port("L", "case drain").shaft("drive shaft")
            .param("displacement", Quantity.DISPLACEMENT, 28e-6, 1e-8, 1e-2, "maximum displacement per revolution")
            .param("speed", Quantity.SPEED, 1450.0 / 60, 0, 100, "shaft speed when no prime mover drives it")
            .param("volumetric_efficiency", Quantity.RATIO, 0.93, 0.5, 1, "delivered/geometric flow at the reference pressure")
            .param("overall_efficiency", Quantity.RATIO, 0.88, 0.3, 1, "hydraulic output/shaft input power")
            .param("reference_pressure", Quantity.PRESSURE, 200e5, 1e5, 1000e5, "pressure at which the volumetric efficiency applies")
            .param("compensator_setting", Quantity.PRESSURE, 180e5, 1e5, 1000e5, "pressure at which the pump starts to destroke")
            .param("compensator_band", Quantity.PRESSURE, 5e5, 1e3, 100e5, "pressure rise from start of destroking to zero displacement")),
    HYDRAULIC_MOTOR("hydraulic_motor", "Hydraulic motor", "HM", Category.PUMPS_AND_MOTORS, b -> b
            .port("A", "inlet (forward rotation)").port("B", "outlet (forward rotation)").shaft("output shaft")
            .option("directions", "one or two directions of rotation", "two", "one")
            .param("displacement", Quantity.DISPLACEMENT, 32e-6, 1e-8, 1e-1, "geometric displacement per revolution")
            .param("volumetric_efficiency", Quantity.RATIO, 0.93, 0.5, 1, "geometric/supplied flow at the reference pressure")
            .param("mechanical_efficiency", Quantity.RATIO, 0.9, 0.3, 1, "shaft/ideal torque")
            .param("reference_pressure", Quantity.PRESSURE, 200e5, 1e5, 1000e5, "pressure at which the volumetric efficiency applies")),
    DOUBLE_ACTING_CYLINDER("double_acting_cylinder", "Double-acting cylinder", "C", Category.CYLINDERS, b -> b
            .port("A", "cap-end port (extends)").port("B", "rod-end port (retracts)")
            .param("bore", Quantity.LENGTH, 0.063, 0.005, 2, "piston diameter")
            .param("rod", Quantity.LENGTH, 0.036, 0.003, 1.9, "rod diameter")
            .param("stroke", Quantity.LENGTH, 0.5, 0.001, 20, "full stroke")
            .param("friction", Quantity.FORCE, 0, 0, 1e7, "seal friction force opposing motion")),
    SINGLE_ACTING_CYLINDER("single_acting_cylinder", "Single-acting cylinder", "C", Category.CYLINDERS, b -> b
            .port("A", "cap-end port (extends)")
            .option("return", "what retracts the piston", "spring", "load")
            .param("bore", Quantity.LENGTH, 0.05, 0.005, 2, "piston diameter")
            .param("rod", Quantity.LENGTH, 0.028, 0.003, 1.9, "rod diameter")
            .param("stroke", Quantity.LENGTH, 0.2, 0.001, 20, "full stroke")
            .param("friction", Quantity.FORCE, 0, 0, 1e7, "seal friction force opposing motion")
            .param("spring_preload", Quantity.FORCE, 500, 0, 1e6, "return spring force when retracted")
            .param("spring_rate", Quantity.STIFFNESS, 2000, 0, 1e8, "return spring stiffness")),
    DOUBLE_ROD_CYLINDER("double_rod_cylinder", "Double-rod cylinder", "C", Category.CYLINDERS, b -> b
            .port("A", "left chamber port (moves the rod right)").port("B", "right chamber port (moves the rod left)")
            .param("bore", Quantity.LENGTH, 0.05, 0.005, 2, "piston diameter")
            .param("rod", Quantity.LENGTH, 0.028, 0.003, 1.9, "rod diameter, both ends")
            .param("stroke", Quantity.LENGTH, 0.3, 0.001, 20, "full stroke")
            .param("friction", Quantity.FORCE, 0, 0, 1e7, "seal friction force opposing motion")),
    RELIEF_VALVE("relief_valve", "Relief valve, direct", "V", Category.PRESSURE_VALVES, b -> b
            .port("P", "inlet, the protected line").port("T", "outlet to the reservoir")
            .param("cracking_pressure", Quantity.PRESSURE, 160e5, 1e4, 1000e5, "inlet pressure at which the valve starts to open")
            .param("override", Quantity.PRESSURE, 10e5, 0, 200e5, "pressure rise from cracking to rated flow (0 = ideal)")
            .param("rated_flow", Quantity.FLOW, 60.0 / 60000, 1e-6, 1, "flow at cracking pressure plus override")),
    REDUCING_VALVE("reducing_valve", "Pressure-reducing valve", "V", Category.PRESSURE_VALVES, b -> b
            .port("P", "inlet").port("A", "reduced outlet").port("Y", "spring-chamber drain")
            .param("setting", Quantity.PRESSURE, 50e5, 1e4, 1000e5, "outlet pressure held")
            .param("override", Quantity.PRESSURE, 5e5, 0, 200e5, "outlet pressure fall from closed to rated flow")
            .param("rated_flow", Quantity.FLOW, 40.0 / 60000, 1e-6, 1, "flow at the setting less the override")),
    SEQUENCE_VALVE("sequence_valve", "Sequence valve", "V", Category.PRESSURE_VALVES, b -> b
            .port("P", "inlet").port("A", "outlet to the second actuator").port("Y", "external drain")
            .param("cracking_pressure", Quantity.PRESSURE, 80e5, 1e4, 1000e5, "inlet pressure at which the valve opens")
            .param("override", Quantity.PRESSURE, 5e5, 0, 200e5, "pressure rise from opening to rated flow")
            .param("rated_flow", Quantity.FLOW, 40.0 / 60000, 1e-6, 1, "flow at cracking pressure plus override")),
    COUNTERBALANCE_VALVE("counterbalance_valve", "Counterbalance valve", "V", Category.PRESSURE_VALVES, b -> b
            .port("A", "load side (cylinder port)").port("B", "valve side").port("X", "pilot, from the opposite line")
            .param("setting", Quantity.PRESSURE, 120e5, 1e4, 1000e5, "opening pressure at the load side with no pilot")
            .param("pilot_ratio", Quantity.RATIO, 3, 0.5, 20, "area ratio of pilot to load-side pressure")
            .param("override", Quantity.PRESSURE, 10e5, 0, 200e5, "pressure rise from opening to rated flow")
            .param("rated_flow", Quantity.FLOW, 40.0 / 60000, 1e-6, 1, "flow at opening pressure plus override")
            .param("check_cracking", Quantity.PRESSURE, 0.5e5, 0, 50e5, "cracking pressure of the free-flow check B to A")),
    CHECK_VALVE("check_valve", "Check valve", "V", Category.CHECK_VALVES, b -> b
            .port("A", "inlet (free flow A to B)").port("B", "outlet")
            .param("cracking_pressure", Quantity.PRESSURE, 0.5e5, 0, 50e5, "pressure difference to lift the poppet")
            .param("rated_flow", Quantity.FLOW, 40.0 / 60000, 1e-6, 1, "flow at rated pressure drop")
            .param("rated_drop", Quantity.PRESSURE, 2e5, 1e3, 50e5, "pressure drop above cracking at rated flow")),
    PILOT_CHECK_VALVE("pilot_check_valve", "Pilot-operated check valve", "V", Category.CHECK_VALVES, b -> b
            .port("A", "inlet (free flow A to B)").port("B", "outlet, load side").port("X", "pilot to open B to A")
            .param("cracking_pressure", Quantity.PRESSURE, 1e5, 0, 50e5, "pressure difference to lift the poppet")
            .param("pilot_ratio", Quantity.RATIO, 3, 0.5, 40, "pilot piston area / poppet seat area")
            .param("rated_flow", Quantity.FLOW, 40.0 / 60000, 1e-6, 1, "flow at rated pressure drop")
            .param("rated_drop", Quantity.PRESSURE, 2e5, 1e3, 50e5, "pressure drop above cracking at rated flow")),
    ORIFICE("orifice", "Fixed orifice", "V", Category.FLOW_VALVES, b -> b
            .port("A", "one side").port("B", "other side")
            .param("diameter", Quantity.LENGTH, 0.002, 1e-5, 0.2, "bore of the sharp-edged orifice")
            .param("discharge_coefficient", Quantity.RATIO, 0.61, 0.1, 1, "Cd of the orifice (sharp-edged ≈ 0.61)")),
    THROTTLE("throttle", "Adjustable throttle", "V", Category.FLOW_VALVES, b -> b
            .port("A", "one side").port("B", "other side")
            .param("diameter", Quantity.LENGTH, 0.003, 1e-5, 0.2, "equivalent bore at the present setting")
            .param("discharge_coefficient", Quantity.RATIO, 0.65, 0.1, 1, "Cd of the throttling section")),
    FLOW_CONTROL("flow_control", "Pressure-compensated flow control", "V", Category.FLOW_VALVES, b -> b
            .port("A", "inlet").port("B", "regulated outlet")
            .param("set_flow", Quantity.FLOW, 10.0 / 60000, 1e-8, 1, "flow held while the drop is above the minimum")
            .param("minimum_drop", Quantity.PRESSURE, 8e5, 1e4, 100e5, "drop needed across the valve to regulate")),
    DIRECTIONAL_2_2("directional_2_2", "Directional valve 2/2", "V", Category.DIRECTIONAL_VALVES, b -> b
            .port("P", "supply").port("A", "work port")
            .option("normal", "rest position: closed or open", "closed", "open")
            .directionalOptions(false)
            .directionalParams()),
    DIRECTIONAL_3_2("directional_3_2", "Directional valve 3/2", "V", Category.DIRECTIONAL_VALVES, b -> b
            .port("P", "supply").port("A", "work port").port("T", "return")
            .option("normal", "rest position: A to T (closed) or P to A (open)", "closed", "open")
            .directionalOptions(false)
            .directionalParams()),
    DIRECTIONAL_4_2("directional_4_2", "Directional valve 4/2", "V", Category.DIRECTIONAL_VALVES, b -> b
            .port("P", "supply").port("T", "return").port("A", "work port A").port("B", "work port B")
            .directionalOptions(false)
            .directionalParams()),
    DIRECTIONAL_4_3("directional_4_3", "Directional valve 4/3", "V", Category.DIRECTIONAL_VALVES, b -> b
            .port("P", "supply").port("T", "return").port("A", "work port A").port("B", "work port B")
            .option("centre", "centre condition", "closed", "open", "tandem", "float")
            .directionalOptions(true)
            .directionalParams()),
    ACCUMULATOR("accumulator", "Gas-charged accumulator", "AC", Category.CONDITIONING, b -> b
            .port("P", "oil port")
            .param("precharge", Quantity.PRESSURE, 90e5, 1e5, 1000e5, "gas precharge pressure (gauge) with no oil")
            .param("volume", Quantity.VOLUME, 4e-3, 1e-5, 1, "nominal gas volume")),
    FILTER("filter", "Filter with bypass check", "F", Category.CONDITIONING, b -> b
            .port("A", "inlet").port("B", "outlet")
            .param("clean_drop", Quantity.PRESSURE, 1e5, 1e3, 20e5, "pressure drop of the clean element at rated flow")
            .param("rated_flow", Quantity.FLOW, 60.0 / 60000, 1e-6, 1, "rated flow")
            .param("bypass_cracking", Quantity.PRESSURE, 3e5, 1e4, 50e5, "drop at which the bypass check opens")),
    COOLER("cooler", "Cooler", "HX", Category.CONDITIONING, b -> b
            .port("A", "inlet").port("B", "outlet")
            .param("rated_drop", Quantity.PRESSURE, 0.5e5, 1e3, 20e5, "pressure drop at rated flow")
            .param("rated_flow", Quantity.FLOW, 60.0 / 60000, 1e-6, 1, "rated flow")),
    PRESSURE_GAUGE("pressure_gauge", "Pressure gauge", "G", Category.MEASUREMENT, b -> b
            .port("P", "gauge connection")
            .param("full_scale", Quantity.PRESSURE, 250e5, 1e4, 2000e5, "top of the dial")),
    FLOW_METER("flow_meter", "Flow meter", "FM", Category.MEASUREMENT, b -> b
            .port("A", "inlet").port("B", "outlet")
            .param("full_scale", Quantity.FLOW, 100.0 / 60000, 1e-6, 1, "top of the scale")),
    PLUG("plug", "Plug", "PL", Category.MEASUREMENT, b -> b
            .port("A", "plugged port"));

    private final String key;
    private final String label;
    private final String tagPrefix;
    private final Category category;
    private final List<PortSpec> ports;
    private final int hydraulicPorts;
    private final List<String> hydraulicPortNames;
    private final Map<String, ParameterSpec> params;
    private final Map<String, OptionSpec> options;

    ComponentType(String key, String label, String tagPrefix, Category category,
                  java.util.function.UnaryOperator<Builder> spec) {
        Builder b = spec.apply(new Builder());
        this.key = key;
        this.label = label;
        this.tagPrefix = tagPrefix;
        this.category = category;
        this.ports = List.copyOf(b.ports);
        this.hydraulicPortNames = ports.stream().filter(p -> !p.mechanical()).map(PortSpec::name).toList();
        this.hydraulicPorts = hydraulicPortNames.size();
        this.params = Collections.unmodifiableMap(b.params);
        this.options = Collections.unmodifiableMap(b.options);
    }

    /** The stable name used in files, e.g. "relief_valve". */
    public String key() {
        return key;
    }

    /** The name shown to users. */
    public String label() {
        return label;
    }

    /** Prefix of automatically assigned tags, e.g. "P" for pumps. */
    public String tagPrefix() {
        return tagPrefix;
    }

    public Category category() {
        return category;
    }

    /** Declared ports in drawing order. */
    public List<PortSpec> ports() {
        return ports;
    }

    /**
     * Number of hydraulic (non-mechanical) ports: the netlist gives a component this many consecutive node
     * numbers, in port order.
     */
    public int hydraulicPortCount() {
        return hydraulicPorts;
    }

    /** Names of the hydraulic ports in port order, the order of a component's consecutive node numbers. */
    public List<String> hydraulicPorts() {
        return hydraulicPortNames;
    }

    /**
     * Position of the named port among the hydraulic ports ({@link #hydraulicPorts}), or −1 when the type has
     * no hydraulic port of that name. A plain scan of at most four names, without the iterator a walk over
     * {@link #ports} would make.
     */
    public int hydraulicPortIndex(String name) {
        for (int k = 0; k < hydraulicPorts; k++) {
            if (hydraulicPortNames.get(k).equals(name)) {
                return k;
            }
        }
        return -1;
    }

    public Optional<PortSpec> port(String name) {
        return ports.stream().filter(p -> p.name().equals(name)).findFirst();
    }

    /** Numeric parameters by key, in declaration order (unmodifiable view). */
    public Map<String, ParameterSpec> params() {
        return params;
    }

    /** Options (variants) by key, in declaration order (unmodifiable view). */
    public Map<String, OptionSpec> options() {
        return options;
    }

    public boolean isDirectionalValve() {
        return category == Category.DIRECTIONAL_VALVES;
    }

    public boolean isCylinder() {
        return category == Category.CYLINDERS;
    }

    /** Actuators are cylinders and hydraulic motors: they carry a load in every operating state. */
    public boolean isActuator() {
        return isCylinder() || this == HYDRAULIC_MOTOR;
    }

    public boolean isPump() {
        return this == FIXED_PUMP || this == COMPENSATED_PUMP;
    }

    /** Looks up a type by its file key. */
    public static Optional<ComponentType> byKey(String key) {
        for (ComponentType t : values()) {
            if (t.key.equals(key)) {
                return Optional.of(t);
            }
        }
        return Optional.empty();
    }

    /**
     * The spool positions of a directional valve with the given options, left envelope first; empty for
     * other types. Option values missing from the map take their defaults.
     */
    public List<SpoolPosition> spoolPositions(Map<String, String> chosen) {
        if (!isDirectionalValve()) {
            return List.of();
        }
        String key = spoolOption();
        String choice = key == null ? null : option(chosen, key);
        List<SpoolPosition> known = SpoolTable.BY_CHOICE.get(this).get(choice);
        return known != null ? known : spoolPositions(choice);
    }

    /** The one option a directional valve's spool positions depend on; null when they depend on none. */
    private String spoolOption() {
        switch (this) {
            case DIRECTIONAL_2_2:
            case DIRECTIONAL_3_2:
                return "normal";
            case DIRECTIONAL_4_3:
                return "centre";
            default:
                return null;
        }
    }

    /** The spool positions of a directional valve given the choice of its {@link #spoolOption}. */
    private List<SpoolPosition> spoolPositions(String choice) {
        switch (this) {
            case DIRECTIONAL_2_2: {
                SpoolPosition open = new SpoolPosition("a", List.of(new FlowPath("P", "A")), Set.of());
                SpoolPosition shut = new SpoolPosition("a", List.of(), Set.of("P", "A"));
                return "open".equals(choice)
                        ? List.of(rename(shut, "a"), rename(open, SpoolPosition.REST))
                        : List.of(open, rename(shut, SpoolPosition.REST));
            }
            case DIRECTIONAL_3_2: {
                SpoolPosition supply = new SpoolPosition("a", List.of(new FlowPath("P", "A")), Set.of("T"));
                SpoolPosition vent = new SpoolPosition("a", List.of(new FlowPath("A", "T")), Set.of("P"));
                return "open".equals(choice)
                        ? List.of(vent, rename(supply, SpoolPosition.REST))
                        : List.of(supply, rename(vent, SpoolPosition.REST));
            }
            case DIRECTIONAL_4_2:
                return List.of(parallel("a"), crossed(SpoolPosition.REST));
            case DIRECTIONAL_4_3:
                return List.of(parallel("a"), centre(choice), crossed("b"));
            default:
                throw new IllegalStateException(name());
        }
    }

    /**
     * The spool positions of every directional valve type for every declared choice of its option, built
     * once: they are constants of the catalogue, and the netlist and the solver ask for them once per valve
     * per solve. A choice the type does not declare is not in the table and is built (or refused) as asked.
     */
    private static final class SpoolTable {
        static final Map<ComponentType, Map<String, List<SpoolPosition>>> BY_CHOICE =
                new java.util.EnumMap<>(ComponentType.class);

        static {
            for (ComponentType t : values()) {
                if (!t.isDirectionalValve()) {
                    continue;
                }
                // a HashMap, as a type whose positions depend on no option keys them by null
                Map<String, List<SpoolPosition>> byChoice = new java.util.HashMap<>();
                String key = t.spoolOption();
                for (String choice : key == null ? Collections.<String>singletonList(null)
                        : t.options.get(key).choices()) {
                    byChoice.put(choice, t.spoolPositions(choice));
                }
                BY_CHOICE.put(t, byChoice);
            }
        }
    }

    private String option(Map<String, String> chosen, String key) {
        String v = chosen == null ? null : chosen.get(key);
        return v != null ? v : options.get(key).defaultChoice();
    }

    private static SpoolPosition rename(SpoolPosition p, String name) {
        return new SpoolPosition(name, p.paths(), p.blocked());
    }

    private static SpoolPosition parallel(String name) {
        return new SpoolPosition(name, List.of(new FlowPath("P", "A"), new FlowPath("B", "T")), Set.of());
    }

    private static SpoolPosition crossed(String name) {
        return new SpoolPosition(name, List.of(new FlowPath("P", "B"), new FlowPath("A", "T")), Set.of());
    }

    private static SpoolPosition centre(String condition) {
        String n = SpoolPosition.REST;
        switch (condition) {
            case "closed":
                return new SpoolPosition(n, List.of(), Set.of("P", "T", "A", "B"));
            case "open":
                return new SpoolPosition(n, List.of(new FlowPath("P", "T"), new FlowPath("A", "T"),
                        new FlowPath("B", "T")), Set.of());
            case "tandem":
                return new SpoolPosition(n, List.of(new FlowPath("P", "T")), Set.of("A", "B"));
            case "float":
                return new SpoolPosition(n, List.of(new FlowPath("A", "T"), new FlowPath("B", "T")), Set.of("P"));
            default:
                throw new IllegalArgumentException("unknown centre condition " + condition);
        }
    }

    /**
     * Pairs of ports joined inside a component of this type, for connectivity. For a directional valve these
     * are the paths of the given spool position (null = rest); for pressure, check and flow valves the main
     * path, whether or not it is open at the moment; pilot and drain ports join nothing. A cylinder's two
     * chambers are separated by its piston, so it joins nothing.
     */
    public List<List<String>> internalPaths(Map<String, String> chosen, String position) {
        if (isDirectionalValve()) {
            String want = position == null ? SpoolPosition.REST : position;
            List<List<String>> out = new ArrayList<>();
            for (SpoolPosition p : spoolPositions(chosen)) {
                if (p.name().equals(want)) {
                    p.paths().forEach(fp -> out.add(List.of(fp.from(), fp.to())));
                }
            }
            return out;
        }
        return MainPaths.OF[ordinal()];
    }

    /**
     * The internal paths of every type but the directional valves, built once: they are constants of the
     * catalogue, and the netlist asks for them once per component per solve.
     */
    private static final class MainPaths {
        static final List<List<String>>[] OF = table();

        @SuppressWarnings("unchecked")
        private static List<List<String>>[] table() {
            List<List<String>>[] of = new List[values().length];
            for (ComponentType t : values()) {
                of[t.ordinal()] = t.mainPaths();
            }
            return of;
        }
    }

    /** The paths {@link #internalPaths} gives for a type that is not a directional valve. */
    private List<List<String>> mainPaths() {
        switch (this) {
            case RESERVOIR:
                return List.of(List.of("S", "T"));
            case FIXED_PUMP:
            case COMPENSATED_PUMP:
                return List.of(List.of("S", "P"));
            case RELIEF_VALVE:
                return List.of(List.of("P", "T"));
            case REDUCING_VALVE:
            case SEQUENCE_VALVE:
                return List.of(List.of("P", "A"));
            case HYDRAULIC_MOTOR:
            case COUNTERBALANCE_VALVE:
            case CHECK_VALVE:
            case PILOT_CHECK_VALVE:
            case ORIFICE:
            case THROTTLE:
            case FLOW_CONTROL:
            case FILTER:
            case COOLER:
            case FLOW_METER:
                return List.of(List.of("A", "B"));
            default:
                return List.of();
        }
    }

    /** Collects a type's declarations. */
    static final class Builder {
        private final List<PortSpec> ports = new ArrayList<>();
        private final Map<String, ParameterSpec> params = new LinkedHashMap<>();
        private final Map<String, OptionSpec> options = new LinkedHashMap<>();

        Builder port(String name, String meaning) {
            ports.add(PortSpec.fluid(name, meaning));
            return this;
        }

        Builder shaft(String meaning) {
            ports.add(PortSpec.shaft(meaning));
            return this;
        }

        Builder param(String key, Quantity q, double def, double min, double max, String meaning) {
            params.put(key, new ParameterSpec(key, q, def, min, max, meaning));
            return this;
        }

        Builder option(String key, String meaning, String def, String... others) {
            List<String> all = new ArrayList<>();
            all.add(def);
            all.addAll(List.of(others));
            options.put(key, new OptionSpec(key, all, def, meaning));
            return this;
        }

        Builder directionalOptions(boolean threePosition) {
            option("actuation", "how the spool is shifted", "solenoid", "manual", "pilot");
            if (threePosition) {
                option("return", "what brings the spool back", "spring_centred", "detent");
            } else {
                option("return", "what brings the spool back", "spring", "detent");
            }
            return this;
        }

        Builder directionalParams() {
            param("rated_flow", Quantity.FLOW, 40.0 / 60000, 1e-6, 1, "flow per path at the rated drop");
            param("rated_drop", Quantity.PRESSURE, 5e5, 1e3, 50e5, "pressure drop per path at rated flow");
            param("leakage", Quantity.CONDUCTANCE, 1e-14, 0, 1e-9,
                    "internal leakage across the spool per pascal of pressure difference");
            return this;
        }
    }
}
