package aequa.cli;

import java.util.Locale;

/** What to tell a user whose build ran out of memory: how much the JVM had, and how to give it more. */
final class MemoryAdvice {

    private MemoryAdvice() {
    }

    /** The message for an {@link OutOfMemoryError} in a JVM whose heap could grow to {@code maxHeapBytes}. */
    static String outOfMemory(long maxHeapBytes) {
        long maxMb = maxHeapBytes / (1024 * 1024);
        long suggestedGb = Math.max(2, (2 * maxMb + 1023) / 1024); // twice what it had, in whole gigabytes
        return String.format(Locale.ROOT, "aequa: out of memory: Java could use at most %d MB for this run, and the"
                + " inputs needed more. Nothing was published; the previous site is unchanged.%n"
                + "Give Java more memory, for example: JAVA_OPTS=-Xmx%dg ./aequa ...  (the ./aequa launcher adds"
                + " JAVA_OPTS to the java command), or java -Xmx%dg -jar target/aequa.jar ...;"
                + " or split the regions into smaller files.", maxMb, suggestedGb, suggestedGb);
    }
}
