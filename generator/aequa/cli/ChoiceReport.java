package aequa.cli;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import aequa.projection.DistortionSpread;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionParameter;

/** Says what projection was chosen and why, for a person ({@link #text}) or a script ({@link #json}). */
final class ChoiceReport {

    private ChoiceReport() {
    }

    static String text(String what, int regionCount, ProjectionChoice choice) {
        StringBuilder s = new StringBuilder();
        s.append("Projection for ").append(what).append(" (").append(regionCount).append(regionCount == 1 ? " region" : " regions").append("):\n");
        s.append("  ").append(choice.projection().family().displayName()).append(", WGS 84\n");
        for (ProjectionParameter p : choice.projection().parameters()) {
            s.append("    ").append(p.name()).append(": ").append(format(p.value(), p.unit())).append('\n');
        }
        s.append("  Why: ").append(choice.reason()).append('\n');
        s.append(String.format(Locale.ROOT, "  Angular distortion (omega): largest %.2f deg, at %s; area-weighted mean %.2f deg%n",
                choice.omegaMaxDeg(), place(choice.worstLonDeg(), choice.worstLatDeg()), choice.omegaMeanDeg()));
        DistortionSpread spread = choice.spread();
        s.append(String.format(Locale.ROOT, "  Spread of omega by area: below 1 deg on %.1f %%, below 5 deg on %.1f %%, below 10 deg on %.1f %%;"
                + " 95 %% of the area at most %.2f deg; the largest %s%n", 100 * spread.shareBelow1Deg(), 100 * spread.shareBelow5Deg(),
                100 * spread.shareBelow10Deg(), spread.omegaP95Deg(), spread.worstPlace()));
        s.append("  Areas: true everywhere (equal-area on the ellipsoid)\n");
        if (!choice.runnersUp().isEmpty()) {
            s.append("  Also considered:\n");
            for (ProjectionChoice.Candidate c : choice.runnersUp()) {
                s.append(String.format(Locale.ROOT, "    %s (%s): omega largest %.2f deg, mean %.2f deg%n", c.family().displayName(),
                        parameters(c.parameters()), c.omegaMaxDeg(), c.omegaMeanDeg()));
            }
        }
        s.append("  WKT 2:\n");
        choice.projection().wkt2().lines().forEach(line -> s.append("    ").append(line).append('\n'));
        s.append("  PROJ string (for PROJ's cct and software built on PROJ):\n    ").append(choice.projection().projString()).append('\n');
        return s.toString();
    }

    /** The same facts as a JSON-ready tree (keys in a fixed order). */
    static Map<String, Object> json(String file, int regionCount, ProjectionChoice choice) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("file", file);
        root.put("regions", regionCount);
        root.put("family", choice.projection().family().configName());
        root.put("familyName", choice.projection().family().displayName());
        root.put("parameters", parameterList(choice.projection().parameters()));
        root.put("omegaMaxDeg", choice.omegaMaxDeg());
        root.put("omegaMeanDeg", choice.omegaMeanDeg());
        root.put("omegaMaxAt", Map.of("lonDeg", choice.worstLonDeg(), "latDeg", choice.worstLatDeg()));
        root.put("omegaMaxWhere", choice.spread().worstPlace());
        Map<String, Object> shares = new LinkedHashMap<>();
        shares.put("below1Deg", choice.spread().shareBelow1Deg());
        shares.put("below5Deg", choice.spread().shareBelow5Deg());
        shares.put("below10Deg", choice.spread().shareBelow10Deg());
        root.put("omegaAreaShares", shares);
        root.put("omegaP95Deg", choice.spread().omegaP95Deg());
        root.put("reason", choice.reason());
        root.put("runnersUp", choice.runnersUp().stream().map(c -> {
            Map<String, Object> candidate = new LinkedHashMap<>();
            candidate.put("family", c.family().configName());
            candidate.put("parameters", parameterList(c.parameters()));
            candidate.put("omegaMaxDeg", c.omegaMaxDeg());
            candidate.put("omegaMeanDeg", c.omegaMeanDeg());
            return candidate;
        }).toList());
        root.put("wkt2", choice.projection().wkt2());
        root.put("projString", choice.projection().projString());
        return root;
    }

    static List<Map<String, Object>> parameterList(List<ProjectionParameter> parameters) {
        return parameters.stream().map(p -> {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("name", p.name());
            m.put("key", p.key());
            m.put("value", p.value());
            m.put("unit", p.unit());
            return m;
        }).toList();
    }

    static String parameters(List<ProjectionParameter> parameters) {
        return String.join(", ", parameters.stream().map(p -> p.key() + " " + format(p.value(), p.unit())).toList());
    }

    private static String format(double value, String unit) {
        return "deg".equals(unit) ? String.format(Locale.ROOT, "%.2f deg", value) : String.format(Locale.ROOT, "%.1f %s", value, unit);
    }

    private static String place(double lonDeg, double latDeg) {
        return String.format(Locale.ROOT, "%.1f deg %s, %.1f deg %s", Math.abs(lonDeg), lonDeg < 0 ? "W" : "E",
                Math.abs(latDeg), latDeg < 0 ? "S" : "N");
    }
}
