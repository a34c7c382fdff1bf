package org.meridian.ui;

import java.awt.Component;
import java.awt.Container;
import java.awt.datatransfer.Clipboard;
import java.awt.datatransfer.DataFlavor;
import java.awt.datatransfer.Transferable;
import java.awt.datatransfer.UnsupportedFlavorException;
import java.awt.event.InputEvent;
import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;
import javax.swing.Icon;
import javax.swing.JComponent;
import javax.swing.JTable;
import javax.swing.TransferHandler;
import javax.swing.text.JTextComponent;

/**
 * Opens a study dropped on the window: a file list (a study folder, a manifest, a waveform file
 * or a long table; the first one is opened) is taken wherever it lands. Swing hands a drop to the
 * deepest component with a transfer handler of its own, and tables and text fields have one that
 * refuses file lists (or takes a path in as text), so this handler is put on them too, wrapping
 * theirs: a file list opens the study, every other drop, paste, copy or drag goes to the
 * component's own handler as before.
 */
final class StudyDrop extends TransferHandler {
    private final TransferHandler own;
    private final Consumer<Path> open;
    private final Consumer<Throwable> errors;

    StudyDrop(TransferHandler own, Consumer<Path> open, Consumer<Throwable> errors) {
        this.own = own;
        this.open = open;
        this.errors = errors;
    }

    /**
     * Puts the handler on a container and on every table and text component inside it (each
     * wrapping the handler it has).
     */
    static void installOn(JComponent root, Consumer<Path> open, Consumer<Throwable> errors) {
        root.setTransferHandler(new StudyDrop(root.getTransferHandler(), open, errors));
        wrapChildren(root, open, errors);
    }

    private static void wrapChildren(Container parent, Consumer<Path> open, Consumer<Throwable> errors) {
        for (Component c : parent.getComponents()) {
            if ((c instanceof JTable || c instanceof JTextComponent)
                    && !(((JComponent) c).getTransferHandler() instanceof StudyDrop)) {
                JComponent j = (JComponent) c;
                j.setTransferHandler(new StudyDrop(j.getTransferHandler(), open, errors));
            }
            if (c instanceof Container k) {
                wrapChildren(k, open, errors);
            }
        }
    }

    @Override
    public boolean canImport(TransferSupport support) {
        if (support.isDataFlavorSupported(DataFlavor.javaFileListFlavor)) {
            return true;
        }
        return own != null && own.canImport(support);
    }

    @Override
    public boolean importData(TransferSupport support) {
        if (!support.isDataFlavorSupported(DataFlavor.javaFileListFlavor)) {
            return own != null && own.importData(support);
        }
        try {
            @SuppressWarnings("unchecked")
            List<File> files = (List<File>) support.getTransferable().getTransferData(DataFlavor.javaFileListFlavor);
            if (files.isEmpty()) {
                return false;
            }
            open.accept(files.get(0).toPath());
            return true;
        } catch (UnsupportedFlavorException | IOException | RuntimeException e) {
            errors.accept(e);
            return false;
        }
    }

    @Override
    public int getSourceActions(JComponent c) {
        return own == null ? NONE : own.getSourceActions(c);
    }

    @Override
    public void exportAsDrag(JComponent comp, InputEvent e, int action) {
        if (own != null) {
            own.exportAsDrag(comp, e, action);
        }
    }

    @Override
    public void exportToClipboard(JComponent comp, Clipboard clip, int action) {
        if (own != null) {
            own.exportToClipboard(comp, clip, action);
        }
    }

    @Override
    public Icon getVisualRepresentation(Transferable t) {
        return own == null ? null : own.getVisualRepresentation(t);
    }
}
