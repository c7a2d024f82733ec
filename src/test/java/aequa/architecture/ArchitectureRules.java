package aequa.architecture;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * The architecture rules as DEVELOPERS.md writes them (the table of the dependency graph and the table of
 * library homes), and the check of a source tree against them. Only code counts: comments, text literals
 * and character literals are blanked first, so a Javadoc may point to a later step. Every reference counts:
 * imports (single, wildcard, static) and fully qualified names anywhere in the code.
 *
 * @param mayUse       by package (relative to {@code aequa}, such as {@code inputs.regions}): the packages it may use
 * @param libraryHomes by name prefix of a library (such as {@code com.fasterxml.jackson}): the packages it may appear in
 */
record ArchitectureRules(Map<String, Set<String>> mayUse, Map<String, Set<String>> libraryHomes) {

    private static final Pattern NAME_IN_CELL = Pattern.compile("`([\\w.]+)`");
    /** A reference into one of our packages: the package is the run of lower-case segments before a type or *. */
    private static final Pattern OUR_REFERENCE = Pattern.compile("\\baequa((?:\\.[a-z]\\w*)+)\\s*\\.\\s*(?:[A-Z]|\\*)");

    /** The rules of the two tables of {@code markdown}: the one headed "package | may use" and the one headed "library | prefix | home packages". */
    static ArchitectureRules fromMarkdown(String markdown) {
        Map<String, Set<String>> mayUse = new LinkedHashMap<>();
        for (List<String> row : table(markdown, "| package | may use |")) {
            mayUse.put(single(row.get(0)), names(row.get(1)));
        }
        Map<String, Set<String>> homes = new LinkedHashMap<>();
        for (List<String> row : table(markdown, "| library | prefix | home packages |")) {
            homes.put(single(row.get(1)), names(row.get(2)));
        }
        if (mayUse.isEmpty() || homes.isEmpty()) {
            throw new IllegalArgumentException("DEVELOPERS.md has lost a table of the architecture rules");
        }
        return new ArchitectureRules(mayUse, homes);
    }

    /** Every violation in the {@code .java} files under {@code root} (the folder of package {@code aequa}), sorted. */
    List<String> violations(Path root) throws IOException {
        List<String> violations = new ArrayList<>();
        for (String pkg : mayUse.keySet()) {
            for (String used : mayUse.get(pkg)) {
                if (!mayUse.containsKey(used)) {
                    violations.add("the row of '" + pkg + "' names '" + used + "', which has no row");
                }
            }
        }
        try (Stream<Path> files = Files.walk(root)) {
            for (Path file : files.filter(f -> f.toString().endsWith(".java")).sorted().toList()) {
                check(root, file, violations);
            }
        }
        return violations;
    }

    private void check(Path root, Path file, List<String> violations) throws IOException {
        Path relative = root.relativize(file);
        if (relative.getParent() == null) {
            violations.add(relative + ": a class outside the stage packages");
            return;
        }
        String pkg = relative.getParent().toString().replace(java.io.File.separatorChar, '.');
        Set<String> allowed = mayUse.get(pkg);
        if (allowed == null) {
            violations.add(relative + ": package '" + pkg + "' has no row in the dependency table");
            return;
        }
        String code = codeOnly(Files.readString(file));
        Set<String> used = new TreeSet<>();
        Matcher ours = OUR_REFERENCE.matcher(code);
        while (ours.find()) {
            used.add(ours.group(1).substring(1).replaceAll("\\s", ""));
        }
        for (String other : used) {
            if (!other.equals(pkg) && !allowed.contains(other)) {
                violations.add(relative + ": '" + pkg + "' uses '" + other + "', which its row does not list");
            }
        }
        libraryHomes.forEach((prefix, homes) -> {
            if (!homes.contains(pkg) && Pattern.compile("\\b" + Pattern.quote(prefix) + "\\s*\\.").matcher(code).find()) {
                violations.add(relative + ": " + prefix + " is used in '" + pkg + "', not one of its homes " + homes);
            }
        });
    }

    /** The source with comments, text blocks, text and character literals blanked (line breaks kept). */
    static String codeOnly(String source) {
        StringBuilder code = new StringBuilder(source.length());
        int i = 0;
        while (i < source.length()) {
            char c = source.charAt(i);
            if (source.startsWith("//", i)) {
                i = skipTo(source, i, "\n", code, false);
            } else if (source.startsWith("/*", i)) {
                i = skipTo(source, i + 2, "*/", code, true);
            } else if (source.startsWith("\"\"\"", i)) {
                i = skipTo(source, i + 3, "\"\"\"", code, true);
            } else if (c == '"' || c == '\'') {
                int j = i + 1;
                while (j < source.length() && source.charAt(j) != c) {
                    j += source.charAt(j) == '\\' ? 2 : 1;
                }
                code.append(' ');
                i = j + 1;
            } else {
                code.append(c);
                i++;
            }
        }
        return code.toString();
    }

    /** Skips to the end of {@code end} (or, for a line comment, to the line break, which is kept). */
    private static int skipTo(String source, int from, String end, StringBuilder code, boolean consumeEnd) {
        int at = source.indexOf(end, from);
        if (at < 0) {
            return source.length();
        }
        source.substring(from, at).chars().filter(ch -> ch == '\n').forEach(ch -> code.append('\n'));
        code.append(' ');
        return consumeEnd ? at + end.length() : at;
    }

    private static List<List<String>> table(String markdown, String header) {
        List<String> lines = markdown.lines().toList();
        int start = lines.indexOf(header);
        List<List<String>> rows = new ArrayList<>();
        if (start < 0) {
            return rows;
        }
        for (int i = start + 2; i < lines.size() && lines.get(i).startsWith("|"); i++) {
            String line = lines.get(i);
            List<String> cells = new ArrayList<>(List.of(line.substring(1, line.length() - 1).split("\\|", -1)));
            rows.add(cells);
        }
        return rows;
    }

    private static Set<String> names(String cell) {
        Set<String> names = new TreeSet<>();
        Matcher m = NAME_IN_CELL.matcher(cell);
        while (m.find()) {
            names.add(m.group(1));
        }
        return names;
    }

    private static String single(String cell) {
        Set<String> names = names(cell);
        if (names.size() != 1) {
            throw new IllegalArgumentException("a rule's first cell names one package or prefix: " + cell);
        }
        return names.iterator().next();
    }
}
