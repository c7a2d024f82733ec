package aequa.cli;

/** The exit codes aequa documents in its README; {@link Main} is the only place that turns outcomes into them. */
enum ExitCode {
    OK(0),
    /** The data has problems that the project file treats as errors. */
    DATA_PROBLEMS(1),
    /** The command line or the project file is wrong. */
    USAGE(2),
    /** aequa itself failed: a bug, an unrecoverable I/O error, or too little memory. */
    INTERNAL(3),
    /** Another publish holds the output folder's lock (after {@code --wait}, if given). */
    LOCKED(4);

    final int code;

    ExitCode(int code) {
        this.code = code;
    }
}
