package aequa.wording;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.charset.CharacterCodingException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import aequa.findings.Finding;
import aequa.findings.Findings;

/**
 * The wording of each language a site is published in: the shipped messages with the project's overrides
 * from {@code wording/TAG.txt} (the tag as written in the project file, or its first subtag:
 * {@code wording/pt.txt} serves {@code pt-BR} unless {@code wording/pt-BR.txt} exists). Checked in the load
 * step, so {@code audit} and {@code publish} report the same findings: a language aequa has no messages for,
 * a line that is not {@code key = message}, a key no shipped bundle has, an invalid ICU pattern, an override
 * whose named arguments differ from the shipped message's, and an override file for a language the site does
 * not publish. A line with a problem is left out; the shipped message stands.
 */
public final class SiteWording {

    /** The project folder holding override files. */
    public static final String FOLDER = "wording";

    private SiteWording() {
    }

    /** One wording per usable language tag, in the project's order (English when none is usable). */
    public static List<Wording> load(Path projectDir, List<String> tags, Findings findings) {
        List<Wording> wordings = new ArrayList<>();
        List<String> seen = new ArrayList<>();
        for (String tag : tags) {
            var language = Language.parse(tag);
            if (language.isEmpty()) {
                findings.add(Finding.error("site-language-unknown", "aequa.yaml", "site",
                        "aequa has no messages for the language \"" + tag + "\".",
                        "Use one of " + String.join(", ", Language.SHIPPED) + " (a region may follow, as in pt-BR or ar-EG)."));
                continue;
            }
            if (seen.contains(language.get().tag())) {
                findings.add(Finding.error("site-language-twice", "aequa.yaml", "site",
                        "The language \"" + tag + "\" is listed twice.", "List each language once."));
                continue;
            }
            seen.add(language.get().tag());
            wordings.add(Wording.withOverrides(language.get(), overrides(projectDir, language.get(), findings)));
        }
        reportUnusedFiles(projectDir, seen, findings);
        return wordings.isEmpty() ? List.of(Wording.english()) : wordings;
    }

    private static Map<String, String> overrides(Path projectDir, Language language, Findings findings) {
        Path file = projectDir.resolve(FOLDER).resolve(language.tag() + ".txt");
        if (!Files.isRegularFile(file)) {
            file = projectDir.resolve(FOLDER).resolve(language.bundleName() + ".txt");
        }
        if (!Files.isRegularFile(file)) {
            return Map.of();
        }
        String name = FOLDER + "/" + file.getFileName();
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().decode(java.nio.ByteBuffer.wrap(Files.readAllBytes(file))).toString();
        } catch (CharacterCodingException e) {
            findings.add(Finding.error("wording-file-unreadable", name, "", "The file is not UTF-8 text.",
                    "Save it as UTF-8."));
            return Map.of();
        } catch (IOException e) {
            findings.add(Finding.error("wording-file-unreadable", name, "", "The file cannot be read: " + e.getMessage(),
                    "Check its permissions."));
            return Map.of();
        }
        MessageFile parsed = MessageFile.parse(text);
        for (MessageFile.Problem problem : parsed.problems()) {
            findings.add(Finding.error(problem.message().contains("ICU pattern") ? "wording-pattern-invalid" : "wording-line-invalid",
                    name, "line " + problem.line(), "This line cannot be used: " + problem.message() + ".",
                    "Write key = message; braces hold a named argument, as in the shipped messages/" + language.bundleName() + ".txt."));
        }
        Wording shipped = Wording.of(language);
        MessageFile bundle = Wording.bundle(language.bundleName());
        Map<String, String> usable = new LinkedHashMap<>();
        parsed.messages().forEach((key, message) -> {
            if (!shipped.has(key)) {
                findings.add(Finding.error("wording-key-unknown", name, "line " + message.line(),
                        "aequa has no message called " + key + ".",
                        "Copy the key from messages/" + language.bundleName() + ".txt in aequa's source; keys are case-sensitive."));
            } else if (!MessageArguments.of(message.pattern()).equals(MessageArguments.of(bundle.messages().get(key).pattern()))) {
                findings.add(Finding.error("wording-arguments-differ", name, "line " + message.line(),
                        "The message " + key + " uses the arguments " + MessageArguments.of(message.pattern())
                                + " but aequa fills in " + MessageArguments.of(bundle.messages().get(key).pattern()) + ".",
                        "Use exactly the named arguments of the shipped message."));
            } else {
                usable.put(key, message.pattern());
            }
        });
        return usable;
    }

    private static void reportUnusedFiles(Path projectDir, List<String> tags, Findings findings) {
        Path folder = projectDir.resolve(FOLDER);
        if (!Files.isDirectory(folder)) {
            return;
        }
        try (Stream<Path> files = Files.list(folder)) {
            for (Path file : files.filter(f -> f.getFileName().toString().endsWith(".txt")).sorted().toList()) {
                String stem = file.getFileName().toString().replaceFirst("\\.txt$", "");
                boolean used = tags.stream().anyMatch(t -> t.equalsIgnoreCase(stem) || Language.parse(t)
                        .map(Language::bundleName).filter(b -> b.equalsIgnoreCase(stem)).isPresent());
                if (!used) {
                    findings.add(Finding.warning("wording-language-unused", FOLDER + "/" + file.getFileName(), "",
                            "The site is not published in \"" + stem + "\", so these messages are not used.",
                            "Add the language to site: languages, or remove the file."));
                }
            }
        } catch (IOException e) {
            findings.add(Finding.warning("wording-file-unreadable", FOLDER, "", "The folder cannot be listed: " + e.getMessage(),
                    "Check its permissions."));
        }
    }
}
