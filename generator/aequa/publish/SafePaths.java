package aequa.publish;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * File names from user text, and the guard that keeps every write inside the output folder.
 *
 * <p>File-safe ids use only {@code a-z 0-9 - _}: safe on every common file system and in URLs without
 * encoding, never hidden (no leading dot), never a Windows device name, at most {@value #MAX_ID_LENGTH}
 * characters.
 */
public final class SafePaths {

    static final int MAX_ID_LENGTH = 60;

    /** Names Windows reserves for devices in any folder (Microsoft, "Naming Files, Paths, and Namespaces"). */
    private static final Set<String> WINDOWS_DEVICES = Set.of("con", "prn", "aux", "nul",
            "com1", "com2", "com3", "com4", "com5", "com6", "com7", "com8", "com9",
            "lpt1", "lpt2", "lpt3", "lpt4", "lpt5", "lpt6", "lpt7", "lpt8", "lpt9");

    private SafePaths() {
    }

    /** A file-safe form of {@code id}: lower case, other characters replaced by '-', never empty. */
    public static String fileSafeId(String id) {
        StringBuilder out = new StringBuilder();
        for (char c : id.toLowerCase(Locale.ROOT).toCharArray()) {
            boolean keep = (c >= 'a' && c <= 'z') || (c >= '0' && c <= '9') || c == '_' || c == '-';
            char next = keep ? c : '-';
            if (next == '-' && (out.length() == 0 || out.charAt(out.length() - 1) == '-')) {
                continue;
            }
            out.append(next);
        }
        String safe = out.toString().replaceAll("-+$", "");
        if (safe.length() > MAX_ID_LENGTH) {
            safe = safe.substring(0, MAX_ID_LENGTH).replaceAll("-+$", "");
        }
        if (safe.isEmpty()) {
            return "map";
        }
        return WINDOWS_DEVICES.contains(safe) ? "map-" + safe : safe;
    }

    /** File-safe ids for {@code ids}, in order, made distinct by appending -2, -3, ... to later duplicates. */
    public static List<String> distinctFileSafeIds(List<String> ids) {
        Set<String> taken = new HashSet<>();
        List<String> out = new ArrayList<>();
        for (String id : ids) {
            String base = fileSafeId(id);
            String candidate = base;
            for (int n = 2; !taken.add(candidate); n++) {
                candidate = base + "-" + n;
            }
            out.add(candidate);
        }
        return out;
    }

    /**
     * Resolves a relative, '/'-separated path inside {@code root}.
     *
     * @throws IllegalArgumentException if the path is absolute or, once normalised, leaves {@code root}
     */
    public static Path inside(Path root, String relative) {
        Path base = root.toAbsolutePath().normalize();
        Path rel = base.getFileSystem().getPath(relative);
        Path resolved = base.resolve(rel).normalize();
        if (rel.isAbsolute() || relative.contains("\\") || !resolved.startsWith(base) || resolved.equals(base)) {
            throw new IllegalArgumentException("refusing to write outside the output folder: " + relative);
        }
        return resolved;
    }
}
