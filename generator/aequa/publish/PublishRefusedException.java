package aequa.publish;

import java.io.IOException;

/** A publish that would be unsafe and was not started: the output folder or a template is not acceptable. */
public final class PublishRefusedException extends IOException {

    private static final long serialVersionUID = 1L;

    PublishRefusedException(String message) {
        super(message);
    }
}
