package org.meridian.io;

import org.meridian.core.BadInputException;

/**
 * A problem in an input file, located as precisely as the reader knows it: the file, the line
 * (counted from 1, comment lines included) and the column (the cell, counted from 1). The
 * message reads {@code data/p07_rare.tsv line 212 column 40: "1.2.3" is not a number}.
 */
public final class ReadException extends BadInputException {
    private static final long serialVersionUID = 1L;

    private final String file;
    private final int line;
    private final int column;
    private final String problem;

    /**
     * @param file    the file as the user knows it
     * @param line    the line, or 0 when the problem concerns the whole file
     * @param column  the cell, or 0 when the problem concerns the whole line
     * @param problem what is wrong, written for the researcher
     */
    public ReadException(String file, int line, int column, String problem) {
        super(where(file, line, column) + ": " + problem);
        this.file = file;
        this.line = line;
        this.column = column;
        this.problem = problem;
    }

    /** {@code file}, {@code file line L} or {@code file line L column C}. */
    static String where(String file, int line, int column) {
        StringBuilder sb = new StringBuilder(file);
        if (line > 0) {
            sb.append(" line ").append(line);
            if (column > 0) {
                sb.append(" column ").append(column);
            }
        }
        return sb.toString();
    }

    public String file() {
        return file;
    }

    /** The line counted from 1, or 0 when the problem concerns the whole file. */
    public int line() {
        return line;
    }

    /** The cell counted from 1, or 0 when the problem concerns a whole line or file. */
    public int column() {
        return column;
    }

    /** The message without the location. */
    public String problem() {
        return problem;
    }
}
