package aequa.cli;

/** Entry point. */
public final class Main {
    public static void main(String[] args) {
        System.out.println("aequa");
    }
}
