package org.meridian.ui;

import java.awt.BorderLayout;
import java.awt.Color;
import java.awt.Dimension;
import java.util.function.Consumer;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextField;
import javax.swing.UIManager;
import javax.swing.text.BadLocationException;
import javax.swing.text.DefaultHighlighter;
import org.meridian.core.BadInputException;
import org.meridian.signal.ConditionExpression;
import org.meridian.signal.ExpressionSyntaxException;

/**
 * A field for a new contrast, e.g. {@code rare - frequent} or {@code 0.5*a + 0.5*b - c}, checked
 * as it is typed ({@link ConditionExpression#parse}): the characters at fault are marked and the
 * reason, with the nearest condition name for a misspelt one, shows right under the field. Enter
 * or Add puts a valid contrast in the list.
 */
final class ContrastEditor extends JPanel {
    private final Workbench bench;
    private final JTextField field = new JTextField();
    private final JButton add = new JButton("Add");
    private final JLabel error = new JLabel(" ");
    private final Consumer<ConditionExpression> onAdd;
    private final DefaultHighlighter.DefaultHighlightPainter mark;

    ContrastEditor(Workbench bench, Consumer<ConditionExpression> onAdd) {
        super(new BorderLayout(4, 2));
        this.bench = bench;
        this.onAdd = onAdd;
        Color errorColour = UIManager.getColor("Component.error.focusedBorderColor");
        if (errorColour == null) {
            errorColour = new Color(0xd0, 0x30, 0x30);
        }
        mark = new DefaultHighlighter.DefaultHighlightPainter(new Color(errorColour.getRed(),
                errorColour.getGreen(), errorColour.getBlue(), 90));
        field.setName("study.contrast.field");
        field.putClientProperty("JTextField.placeholderText", "e.g. rare - frequent");
        field.setToolTipText("<html>A difference wave or any linear combination of conditions:<br>"
                + "<tt>rare - frequent</tt>, <tt>0.5*a + 0.5*b - c</tt>, <tt>'go left' - 'go right'</tt></html>");
        add.setName("study.contrast.add");
        error.setName("study.contrast.error");
        error.setForeground(errorColour);
        error.setFont(error.getFont().deriveFont(error.getFont().getSize2D() - 1f));
        error.setMinimumSize(new Dimension(10, error.getPreferredSize().height));
        add(field, BorderLayout.CENTER);
        add(add, BorderLayout.EAST);
        add(error, BorderLayout.SOUTH);
        setBorder(BorderFactory.createEmptyBorder(2, 0, 2, 0));
        TextEdits.onEveryEdit(field, this::check);
        field.addActionListener(e -> commit());
        add.addActionListener(e -> commit());
        add.setEnabled(false);
    }

    /** Checks the text; returns the expression when it is valid, else null (and shows why). */
    private ConditionExpression check() {
        field.getHighlighter().removeAllHighlights();
        String text = field.getText();
        if (text.isBlank() || bench.model().session() == null) {
            showError("");
            add.setEnabled(false);
            return null;
        }
        try {
            ConditionExpression e = ConditionExpression.parse(text, bench.model().session().study());
            if (e.isSingleCondition()) {
                showError("a single condition is already listed; write a contrast such as a - b");
                add.setEnabled(false);
                return null;
            }
            showError("");
            add.setEnabled(true);
            return e;
        } catch (ExpressionSyntaxException ex) {
            int from = Math.min(ex.position(), text.length());
            int to = Math.min(text.length(), from + Math.max(1, ex.length()));
            try {
                if (to > from) {
                    field.getHighlighter().addHighlight(from, to, mark);
                }
            } catch (BadLocationException ignored) {
                // the text changed under us; the next keystroke checks again
            }
            showError("character " + (ex.position() + 1) + ": " + ex.reason());
            add.setEnabled(false);
            return null;
        } catch (BadInputException ex) {
            showError(ex.getMessage());
            add.setEnabled(false);
            return null;
        }
    }

    private void showError(String text) {
        error.setText(text.isEmpty() ? " " : text);
        error.setToolTipText(text.isEmpty() ? null : text);
        field.putClientProperty("JComponent.outline", text.isEmpty() ? null : "error");
    }

    private void commit() {
        ConditionExpression e = check();
        if (e != null) {
            onAdd.accept(e);
            field.setText("");
        }
    }
}
