package org.meridian.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.datatransfer.DataFlavor;
import java.awt.datatransfer.StringSelection;
import java.awt.datatransfer.Transferable;
import java.io.File;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;
import javax.swing.TransferHandler;
import org.junit.jupiter.api.Test;

/** A study dropped on a table or a text field opens; text still goes into the text field. */
class StudyDropTest {
    @Test
    void aFileListOverATextFieldOrATableOpensTheStudyAndTextStaysText() throws Exception {
        List<Path> opened = new ArrayList<>();
        List<Throwable> errors = new ArrayList<>();
        JTextField field = new JTextField(20);
        JTable table = new JTable(3, 3);
        SwingUtilities.invokeAndWait(() -> {
            JPanel root = new JPanel();
            root.add(field);
            root.add(new JScrollPane(table));
            StudyDrop.installOn(root, opened::add, errors::add);

            Transferable files = new FileList(List.of(new File("studies/oddball"), new File("other")));
            assertThat(field.getTransferHandler()).isInstanceOf(StudyDrop.class);
            assertThat(field.getTransferHandler().canImport(new TransferHandler.TransferSupport(field, files))).isTrue();
            assertThat(field.getTransferHandler().importData(new TransferHandler.TransferSupport(field, files))).isTrue();
            assertThat(table.getTransferHandler().importData(new TransferHandler.TransferSupport(table, files))).isTrue();
            assertThat(root.getTransferHandler().importData(new TransferHandler.TransferSupport(root, files))).isTrue();

            // plain text is the field's own business, as before (a paste)
            Transferable text = new StringSelection("rare - frequent");
            assertThat(field.getTransferHandler().importData(new TransferHandler.TransferSupport(field, text))).isTrue();
            assertThat(field.getText()).isEqualTo("rare - frequent");
            assertThat(root.getTransferHandler().canImport(new TransferHandler.TransferSupport(root, text))).isFalse();
        });
        assertThat(opened).containsExactly(Path.of("studies/oddball"), Path.of("studies/oddball"),
                Path.of("studies/oddball"));
        assertThat(errors).isEmpty();
    }

    /** A file list as a file manager offers it. */
    private record FileList(List<File> files) implements Transferable {
        @Override
        public DataFlavor[] getTransferDataFlavors() {
            return new DataFlavor[] {DataFlavor.javaFileListFlavor};
        }

        @Override
        public boolean isDataFlavorSupported(DataFlavor flavor) {
            return DataFlavor.javaFileListFlavor.equals(flavor);
        }

        @Override
        public Object getTransferData(DataFlavor flavor) {
            return files;
        }
    }
}
