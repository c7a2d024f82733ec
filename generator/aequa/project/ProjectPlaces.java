package aequa.project;

/** Finds where a value stands in the project file, so any stage can point the user at the right line. */
public interface ProjectPlaces {

    /**
     * "line L, column C" of the value at a JSON Pointer such as {@code /maps/2/classes/method}, or of its
     * nearest ancestor that exists in the file (a default value has no line of its own); empty if none.
     */
    String place(String pointer);
}
