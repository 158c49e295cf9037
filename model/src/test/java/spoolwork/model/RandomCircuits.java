package spoolwork.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;

/** Seeded random circuits that are valid by construction: every value in range, every reference resolved. */
public final class RandomCircuits {
    private RandomCircuits() {
    }

    public static Circuit generate(long seed) {
        Random r = new Random(seed);
        Circuit c = Circuit.empty().withTitle(new TitleBlock(text(r, 12), text(r, 6), "R" + r.nextInt(9),
                        text(r, 8), "2026-" + (1 + r.nextInt(12)) + "-" + (1 + r.nextInt(28))))
                .withFluid(new Fluid(List.of(22.0, 32.0, 46.0, 68.0, 100.0).get(r.nextInt(5)), 80 + r.nextInt(80),
                        10 + r.nextDouble() * 60, 840 + r.nextDouble() * 50));
        int n = r.nextInt(12);
        ComponentType[] types = ComponentType.values();
        for (int i = 0; i < n; i++) {
            ComponentType t = types[r.nextInt(types.length)];
            Component k = Component.of(c.freshId("c"), c.freshTag(t), t, r.nextInt(200) - 50, r.nextDouble() * 100)
                    .withRotation(90 * r.nextInt(4)).withMirrored(r.nextBoolean());
            for (ParameterSpec p : t.params().values()) {
                if (r.nextInt(3) == 0) {
                    double v = p.min() + (p.max() - p.min()) * r.nextDouble();
                    if (p.key().equals("rod")) {
                        v = Math.min(v, k.param("bore") * 0.9);
                    }
                    if (p.key().equals("bore")) {
                        v = Math.max(v, k.param("rod") * 1.1);
                    }
                    k = k.withParam(p.key(), v);
                }
            }
            for (OptionSpec o : t.options().values()) {
                k = k.withOption(o.key(), o.choices().get(r.nextInt(o.choices().size())));
            }
            if (r.nextBoolean()) {
                k = k.withRatedPressure(1e6 + r.nextDouble() * 4e7);
            }
            c = c.withComponent(k);
        }
        int nj = r.nextInt(3);
        for (int i = 0; i < nj; i++) {
            c = c.withJunction(new Junction(c.freshId("j"), r.nextInt(100), r.nextInt(100)));
        }
        List<Endpoint> fluidEnds = new ArrayList<>();
        List<Endpoint> shaftEnds = new ArrayList<>();
        for (Component k : c.components()) {
            for (PortSpec p : k.type().ports()) {
                (p.mechanical() ? shaftEnds : fluidEnds).add(Endpoint.port(k.id(), p.name()));
            }
        }
        c.junctions().forEach(j -> fluidEnds.add(Endpoint.junction(j.id())));
        int nl = fluidEnds.size() < 2 ? 0 : r.nextInt(2 * fluidEnds.size());
        LineKind[] kinds = {LineKind.PRESSURE, LineKind.RETURN, LineKind.SUCTION, LineKind.PILOT, LineKind.DRAIN};
        for (int i = 0; i < nl; i++) {
            Endpoint a = fluidEnds.get(r.nextInt(fluidEnds.size()));
            Endpoint b = fluidEnds.get(r.nextInt(fluidEnds.size()));
            if (a.equals(b)) {
                continue;
            }
            List<Point> bends = new ArrayList<>();
            int nb = r.nextInt(4);
            for (int k = 0; k < nb; k++) {
                bends.add(new Point(r.nextInt(100), r.nextDouble() * 80));
            }
            c = c.withLine(new Line(c.freshId("l"), a, b, bends, 0.004 + r.nextDouble() * 0.03,
                    0.1 + r.nextDouble() * 10, kinds[r.nextInt(kinds.length)], r.nextInt(4) == 0));
        }
        if (shaftEnds.size() >= 2 && r.nextBoolean()) {
            c = c.withLine(new Line(c.freshId("l"), shaftEnds.get(0), shaftEnds.get(1), List.of(), 0, 0,
                    LineKind.SHAFT, true));
        }
        int nn = r.nextInt(3);
        for (int i = 0; i < nn; i++) {
            c = c.withNote(new Note(c.freshId("n"), r.nextInt(100), r.nextInt(100), text(r, 30) + "\n°C ±Δ \"q\""));
        }
        List<OperatingState> states = new ArrayList<>();
        int ns = 1 + r.nextInt(3);
        for (int i = 0; i < ns; i++) {
            OperatingState s = new OperatingState("State " + i + " " + text(r, 4), text(r, 10), Map.of(), Map.of(),
                    Map.of());
            for (Component k : c.components()) {
                if (k.type().isDirectionalValve() && r.nextBoolean()) {
                    List<SpoolPosition> ps = k.type().spoolPositions(k.options());
                    s = s.withPosition(k.id(), ps.get(r.nextInt(ps.size())).name());
                }
                if (k.type().isActuator() && r.nextBoolean()) {
                    s = s.withActuator(k.id(), new ActuatorState(ActuatorState.Mode.values()[r.nextInt(3)],
                            ActuatorState.LoadKind.values()[r.nextInt(2)], (r.nextDouble() - 0.3) * 1e5));
                }
                if (k.type() == ComponentType.PRIME_MOVER && r.nextBoolean()) {
                    s = s.withSpeed(k.id(), r.nextDouble() * 50);
                }
            }
            states.add(s);
        }
        return c.withStates(states);
    }

    private static String text(Random r, int max) {
        String alphabet = "abcdefghijklmnopqrstuvwxyz ABCXYZ0123456789-/äöü";
        StringBuilder sb = new StringBuilder();
        int n = 1 + r.nextInt(max);
        for (int i = 0; i < n; i++) {
            sb.append(alphabet.charAt(r.nextInt(alphabet.length())));
        }
        return sb.toString();
    }
}
