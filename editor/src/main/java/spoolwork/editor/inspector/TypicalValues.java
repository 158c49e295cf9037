package spoolwork.editor.inspector;

import java.util.Map;
import java.util.Optional;

import spoolwork.model.ComponentType;

/**
 * Typical values of the trade shown beside a parameter's meaning on hover. These are common practice,
 * from memory, meant as orientation for the user, never as data of a product.
 */
final class TypicalValues {
    private static final Map<String, String> BY_KEY = Map.ofEntries(
            Map.entry("cracking_pressure", "set above the highest working pressure; systems run at 70–250 bar industrial, 200–350 bar mobile"),
            Map.entry("setting", "below the system relief setting by 10–20 bar"),
            Map.entry("override", "5–15 % of the setting from cracking to rated flow"),
            Map.entry("volumetric_efficiency", "gear pumps 0.90–0.95, piston units 0.93–0.97"),
            Map.entry("overall_efficiency", "well-kept pumps 0.80–0.90, piston units up to 0.92"),
            Map.entry("mechanical_efficiency", "0.85–0.95"),
            Map.entry("speed", "4-pole electric motor 1450 rpm at 50 Hz, 1750 rpm at 60 Hz"),
            Map.entry("bore", "ISO 3320 series: 25, 32, 40, 50, 63, 80, 100, 125, 160, 200 mm"),
            Map.entry("rod", "ISO 3320 series: 12, 16, 20, 25, 28, 32, 36, 40, 45, 50, 56, 63, 70 mm"),
            Map.entry("friction", "2–5 % of the rated force"),
            Map.entry("rated_drop", "about 5–10 bar per path for a directional valve"),
            Map.entry("clean_drop", "0.5–1.5 bar at rated flow"),
            Map.entry("bypass_cracking", "2–3.5 bar on a return filter, higher on a pressure filter"),
            Map.entry("leakage", "a few cm³/min per 100 bar per path"),
            Map.entry("compensator_setting", "the working pressure wanted, below the relief setting; industrial systems 70–250 bar"),
            Map.entry("discharge_coefficient", "sharp-edged orifice about 0.61"),
            Map.entry("reference_pressure", "the pressure of the pump's rating, often 200–250 bar"),
            Map.entry("volume", "reservoir about 3× the pump flow per minute"),
            Map.entry("precharge", "about 0.9× the lowest working pressure"));

    private TypicalValues() {
    }

    static Optional<String> of(ComponentType type, String key) {
        if (type == ComponentType.CHECK_VALVE && key.equals("cracking_pressure")) {
            return Optional.of("0.3–0.5 bar plain, 3–5 bar as a back-pressure check");
        }
        if (type == ComponentType.PILOT_CHECK_VALVE && key.equals("cracking_pressure")) {
            return Optional.of("0.5–2 bar");
        }
        if (type == ComponentType.ACCUMULATOR && key.equals("volume")) {
            return Optional.empty();
        }
        return Optional.ofNullable(BY_KEY.get(key));
    }
}
