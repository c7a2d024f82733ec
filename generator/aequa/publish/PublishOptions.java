package aequa.publish;

import java.time.Duration;
import java.util.Objects;

/**
 * How to publish.
 *
 * @param pngWidthPx width of the PNG download and thumbnail, in pixels (at least 16)
 * @param lockWait   how long to wait for another publish of the same output to finish; {@link Duration#ZERO}
 *                   fails at once with {@link SiteLockedException}
 * @param progress   where progress goes
 */
public record PublishOptions(int pngWidthPx, Duration lockWait, PublishProgress progress) {

    /** Wide enough for a sharp map on a 2x screen in a 800 px column (common practice for social previews). */
    public static final int DEFAULT_PNG_WIDTH_PX = 1600;

    public PublishOptions {
        if (pngWidthPx < 16) {
            throw new IllegalArgumentException("pngWidthPx must be at least 16: " + pngWidthPx);
        }
        Objects.requireNonNull(lockWait, "lockWait");
        Objects.requireNonNull(progress, "progress");
        if (lockWait.isNegative()) {
            throw new IllegalArgumentException("lockWait must not be negative: " + lockWait);
        }
    }

    /** PNG {@value #DEFAULT_PNG_WIDTH_PX} px, fail at once when locked, no progress. */
    public static PublishOptions defaults() {
        return new PublishOptions(DEFAULT_PNG_WIDTH_PX, Duration.ZERO, PublishProgress.silent());
    }

    public PublishOptions withLockWait(Duration wait) {
        return new PublishOptions(pngWidthPx, wait, progress);
    }

    public PublishOptions withProgress(PublishProgress newProgress) {
        return new PublishOptions(pngWidthPx, lockWait, newProgress);
    }
}
