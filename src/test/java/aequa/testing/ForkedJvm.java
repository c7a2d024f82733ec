package aequa.testing;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Runs a test class's {@code main} in a new JVM that differs from the test's in what output must not depend
 * on: one worker thread in the common fork/join pool, another default locale (Turkish, whose dotless i
 * breaks naive case mapping; decimal comma) and another time zone. A test compares what it prints (as UTF-8,
 * see {@link #print}) with the same computation done in its own JVM, so determinism is checked against a run
 * that shares nothing with it but the code.
 */
public final class ForkedJvm {

    private ForkedJvm() {
    }

    /** Prints {@code text} as UTF-8, whatever the forked JVM's default encoding: the counterpart of {@link #output}. */
    public static void print(String text) {
        java.io.PrintStream out = new java.io.PrintStream(System.out, true, StandardCharsets.UTF_8);
        out.print(text);
        out.flush();
    }

    /** The standard output of {@code main} with {@code args}; fails when it exits with another code than 0. */
    public static String output(Class<?> main, String... args) throws IOException, InterruptedException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<String> command = new ArrayList<>(List.of(java, "-Djava.awt.headless=true",
                "-Djava.util.concurrent.ForkJoinPool.common.parallelism=1",
                "-Duser.language=tr", "-Duser.country=TR", "-Duser.timezone=Pacific/Chatham",
                "-cp", System.getProperty("java.class.path"), main.getName()));
        command.addAll(List.of(args));
        Process process = new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.INHERIT).start();
        String out = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!process.waitFor(120, TimeUnit.SECONDS)) {
            process.destroyForcibly();
            throw new IllegalStateException(main.getName() + " did not finish in 120 s");
        }
        if (process.exitValue() != 0) {
            throw new IllegalStateException(main.getName() + " exited with " + process.exitValue());
        }
        return out;
    }
}
