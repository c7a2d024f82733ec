package aequa.publish;

import java.util.List;

/**
 * Where one map's files go, relative to the output root ('/'-separated). All names derive from the map's
 * file-safe id ({@link SafePaths#fileSafeId}), never from raw user text.
 */
record MapFiles(String fileId, String page, String figures, String printSvg, String pdf, String webSvg, String png,
                String pngDouble, String csv, String embed, String fragment) {

    static MapFiles of(String fileId) {
        return of("", fileId);
    }

    /** The files of a map in one language's folder: {@code prefix} is "" for the first language, else "TAG/". */
    static MapFiles of(String prefix, String fileId) {
        String dir = prefix + "maps/" + fileId + "/";
        return new MapFiles(fileId, dir + "index.html", dir + "figures.html", dir + fileId + ".svg", dir + fileId + ".pdf",
                dir + fileId + "-web.svg", dir + fileId + ".png", dir + fileId + "-2x.png", dir + fileId + ".csv",
                dir + "embed.html", dir + fileId + "-fragment.html");
    }

    /** The language folder these files are in: "" for the first language, else "TAG/". */
    String languagePrefix() {
        return page.substring(0, page.length() - ("maps/" + fileId + "/index.html").length());
    }

    /** The files the drawing stage makes. */
    List<String> drawn() {
        return List.of(webSvg, printSvg, pdf, png, pngDouble);
    }

    /** The files made from the model and templates, without drawing. */
    List<String> written() {
        return List.of(page, figures, csv, embed, fragment);
    }
}
