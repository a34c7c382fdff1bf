package org.meridian.ui;

import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.text.JTextComponent;

/** Fields that are checked as the user types. */
final class TextEdits {
    private TextEdits() {
    }

    /** Runs {@code check} after every insertion, removal or attribute change of the field's text. */
    static void onEveryEdit(JTextComponent field, Runnable check) {
        field.getDocument().addDocumentListener(new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                check.run();
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                check.run();
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                check.run();
            }
        });
    }
}
