package aequa.demo;

import java.io.IOException;
import java.io.Writer;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/** Writes the demo's invented figures, one CSV per source, each in a different local convention. */
final class DemoFigures {

    private DemoFigures() {
    }

    /** Wide, comma-separated: the share of households on a community microgrid, in %. */
    static void worldZones(Path file, List<DemoGenerator.Place> places, Random random) throws IOException {
        try (Writer out = DemoGenerator.utf8(file)) {
            out.write("code,name,households,microgrid_share\n");
            for (DemoGenerator.Place p : places) {
                int households = 20_000 + random.nextInt(900_000);
                double share = 4 + 70 * DemoGenerator.field(p.lonDeg(), p.latDeg(), 40) + 8 * random.nextGaussian();
                String value = random.nextInt(40) == 0 ? "NA" : fixed(clamp(share, 0.5, 99), 1);
                out.write(p.code() + "," + quoted(p.name()) + "," + households + "," + value + "\n");
            }
        }
    }

    /** Long: clinics and population per province and year; one figure withheld. */
    static void callowayClinics(Path file, List<DemoGenerator.Place> places, Random random) throws IOException {
        try (Writer out = DemoGenerator.utf8(file)) {
            out.write("code,indicator,period,value\n");
            for (DemoGenerator.Place p : places) {
                int population = (int) Math.round(Math.exp(11.5 + 1.4 * random.nextGaussian()));
                double perClinic = 9_000 + 14_000 * DemoGenerator.field(p.lonDeg(), p.latDeg(), 120);
                for (int year = 2023; year <= 2025; year++) {
                    double growth = 1 + 0.04 * (year - 2023) * (0.5 + random.nextDouble());
                    long clinics = Math.max(1, Math.round(population * growth / perClinic));
                    String clinicCell = (year == 2024 && p.code().equals("CL-07")) ? "x" : Long.toString(clinics);
                    out.write(p.code() + ",clinics," + year + "," + clinicCell + "\n");
                    out.write(p.code() + ",population," + year + "," + Math.round(population * (1 + 0.01 * (year - 2023))) + "\n");
                }
            }
        }
    }

    /** Semicolon-separated with decimal commas (a common European convention); ".." marks no data. */
    static void borealBroadband(Path file, List<DemoGenerator.Place> places, Random random) throws IOException {
        try (Writer out = DemoGenerator.utf8(file)) {
            out.write("code;name;households;broadband_share\n");
            for (DemoGenerator.Place p : places) {
                int households = 800 + random.nextInt(60_000);
                double share = 25 + 60 * DemoGenerator.field(p.lonDeg(), p.latDeg(), 200) + 6 * random.nextGaussian();
                String value = random.nextInt(30) == 0 ? ".." : fixed(clamp(share, 1, 99), 1).replace('.', ',');
                out.write(p.code() + ";" + p.name() + ";" + households + ";" + value + "\n");
            }
        }
    }

    /** Wide: first-dose vaccinations and population; small islands give unreliable rates; "c" = confidential. */
    static void tessalyVaccination(Path file, List<DemoGenerator.Place> places, Random random) throws IOException {
        try (Writer out = DemoGenerator.utf8(file)) {
            out.write("code,name,population,vaccinations\n");
            for (DemoGenerator.Place p : places) {
                int population = (int) Math.round(Math.exp(8.5 + 1.3 * random.nextGaussian()));
                double rate = 0.3 + 0.5 * DemoGenerator.field(p.lonDeg(), p.latDeg(), 60);
                long events = Math.round(population * rate * (0.9 + 0.2 * random.nextDouble()));
                String cell = random.nextInt(25) == 0 ? "c" : Long.toString(events);
                out.write(p.code() + "," + quoted(p.name()) + "," + population + "," + cell + "\n");
            }
        }
    }

    /** Wide: change in adult literacy since the baseline survey, in percentage points, with its margin of error. */
    static void serranoLiteracy(Path file, List<DemoGenerator.Place> places, Random random) throws IOException {
        try (Writer out = DemoGenerator.utf8(file)) {
            out.write("code,name,literacy_change,literacy_change_moe\n");
            for (DemoGenerator.Place p : places) {
                double change = 6 - 0.33 * (Math.abs(p.latDeg()) - 18) + 1.5 * random.nextGaussian();
                double margin = 0.4 + 2.5 * random.nextDouble();
                boolean notApplicable = p.code().equals("SD-05");
                out.write(p.code() + "," + quoted(p.name()) + "," + (notApplicable ? "-" : fixed(change, 1)) + ","
                        + (notApplicable ? "-" : fixed(margin, 1)) + "\n");
            }
        }
    }

    /** Wide, comma-separated: the share of adults with a library card, in %. */
    static void marrowLibraries(Path file, List<DemoGenerator.Place> places, Random random) throws IOException {
        try (Writer out = DemoGenerator.utf8(file)) {
            out.write("code,name,library_card_share\n");
            for (DemoGenerator.Place p : places) {
                double share = 18 + 50 * DemoGenerator.field(p.lonDeg(), p.latDeg(), 75) + 6 * random.nextGaussian();
                out.write(p.code() + "," + quoted(p.name()) + "," + fixed(clamp(share, 2, 95), 1) + "\n");
            }
        }
    }

    private static String fixed(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    private static double clamp(double v, double lo, double hi) {
        return Math.max(lo, Math.min(hi, v));
    }

    private static String quoted(String s) {
        return "\"" + s.replace("\"", "\"\"") + "\"";
    }
}
