package aequa.publish;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Where an output folder really is: the path a user gave, with every link along it resolved, so that the
 * lock, the staging folder and the swap all work beside the real folder. An output given through a link
 * (or inside a linked folder) is therefore published into the folder the link leads to, and the link stays
 * a link; two publishes through a link and through the real path share one lock.
 */
final class OutputFolder {

    private OutputFolder() {
    }

    /**
     * The real, absolute path of {@code outDir}; for a folder that does not exist yet, the real path of its
     * nearest existing ancestor with the remaining names appended.
     *
     * @throws PublishRefusedException when the output is the root of a file system (the staging folder and
     *                                 the lock need a parent) or a link that leads nowhere
     */
    static Path realPath(Path outDir) throws IOException {
        Path absolute = outDir.toAbsolutePath().normalize();
        if (Files.isSymbolicLink(absolute) && !Files.exists(absolute)) {
            throw new PublishRefusedException("The output " + absolute + " is a link to a folder that does not exist."
                    + " Create the folder it leads to, or remove the link.");
        }
        Path existing = absolute;
        while (existing != null && !Files.exists(existing)) {
            existing = existing.getParent();
        }
        Path real = existing == null ? absolute : existing.toRealPath().resolve(existing.relativize(absolute));
        if (real.getParent() == null || real.getFileName() == null) {
            throw new PublishRefusedException("The output " + outDir + " is the root of a file system: aequa builds the new"
                    + " site beside the output folder and swaps it in, which needs a parent folder. Choose a folder inside it.");
        }
        return real;
    }
}
