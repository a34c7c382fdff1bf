package org.meridian.ui;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.awt.Window;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JDialog;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSpinner;
import javax.swing.JTextField;
import javax.swing.SpinnerNumberModel;
import javax.swing.UIManager;
import javax.swing.text.JTextComponent;
import org.meridian.core.BadInputException;
import org.meridian.core.Study;
import org.meridian.signal.Processing;
import org.meridian.signal.Processing.BaselineChoice;
import org.meridian.signal.Processing.ReferenceChoice;

/**
 * Chooses the processing of every participant's averages ({@link Processing}): a restored
 * recording reference, a new reference, a zero-phase Butterworth high-, low- or band-pass filter
 * and a baseline window. Checked as the researcher types — the syntax, and a trial run on one
 * participant's average of the open study (a cut-off above Nyquist, an unknown channel, a
 * baseline outside the data) — with the reason shown in the dialog; Apply puts it in the
 * {@link ViewState}, and the window recomputes everything from the processed averages.
 */
final class ProcessingDialog extends JDialog {
    private final Workbench bench;
    private final JTextField restore = new JTextField(8);
    private final JComboBox<String> reference = new JComboBox<>(new String[] {"none", "average", "average-all"});
    private final JTextField highPass = new JTextField(6);
    private final JTextField lowPass = new JTextField(6);
    private final JSpinner order = new JSpinner(new SpinnerNumberModel(Processing.DEFAULT_FILTER_ORDER, 1, 12, 1));
    private final JComboBox<String> baseline = new JComboBox<>(new String[] {"none", "pre", "-200:0", "-100:0"});
    private final JLabel error = new JLabel(" ");
    private final JLabel caption = new JLabel(" ");
    private final JButton apply = new JButton("Apply");
    private Processing chosen;

    ProcessingDialog(Window owner, Workbench bench) {
        super(owner, "Processing of the averages", ModalityType.MODELESS);
        this.bench = bench;
        setName("processing");
        setDefaultCloseOperation(DISPOSE_ON_CLOSE);
        restore.setName("processing.restore");
        restore.setToolTipText("The label of the recording reference, put back as a channel of zeros"
                + " before re-referencing (leave empty for none)");
        reference.setName("processing.reference");
        reference.setEditable(true);
        reference.setToolTipText("<html>none (as recorded), average (of the channels with a scalp position),"
                + "<br>average-all (of every channel), or channels such as Cz or TP9+TP10</html>");
        highPass.setName("processing.highPass");
        highPass.setToolTipText("High-pass cut-off in Hz (empty: none); with a low-pass it makes a band-pass");
        lowPass.setName("processing.lowPass");
        lowPass.setToolTipText("Low-pass cut-off in Hz (empty: none)");
        order.setName("processing.order");
        order.setToolTipText("Butterworth order of each pass; run forwards and backwards (zero phase)");
        baseline.setName("processing.baseline");
        baseline.setEditable(true);
        baseline.setToolTipText("none, pre (every sample before 0 ms), or a window A:B in ms");
        error.setName("processing.error");
        error.setForeground(UIManager.getColor("Component.error.focusedBorderColor") == null
                ? new java.awt.Color(0xc0392b) : UIManager.getColor("Component.error.focusedBorderColor"));
        caption.setName("processing.caption");

        JPanel form = new JPanel(new GridBagLayout());
        form.setBorder(BorderFactory.createEmptyBorder(10, 12, 6, 12));
        row(form, 0, "Restore reference", restore, "label of the omitted recording reference");
        row(form, 1, "Reference", reference, "none, average, average-all, Cz, TP9+TP10");
        row(form, 2, "High-pass (Hz)", highPass, "empty: none");
        row(form, 3, "Low-pass (Hz)", lowPass, "empty: none");
        row(form, 4, "Filter order", order, "Butterworth, each pass; zero-phase");
        row(form, 5, "Baseline", baseline, "none, pre, or A:B in ms");
        GridBagConstraints c = new GridBagConstraints();
        c.gridx = 0;
        c.gridwidth = 3;
        c.anchor = GridBagConstraints.WEST;
        c.insets = new Insets(8, 0, 0, 0);
        c.gridy = 6;
        form.add(caption, c);
        c.gridy = 7;
        c.insets = new Insets(2, 0, 0, 0);
        form.add(error, c);

        JButton none = new JButton("No processing");
        none.setName("processing.none");
        none.addActionListener(e -> fill(Processing.none()));
        apply.setName("processing.apply");
        apply.addActionListener(e -> {
            if (chosen != null) {
                bench.state().setProcessing(chosen);
            }
        });
        JButton close = new JButton("Close");
        close.setName("processing.close");
        close.addActionListener(e -> dispose());
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.RIGHT));
        buttons.add(none);
        buttons.add(apply);
        buttons.add(close);
        getRootPane().setDefaultButton(apply);

        JPanel content = new JPanel(new BorderLayout());
        content.add(form, BorderLayout.CENTER);
        content.add(buttons, BorderLayout.SOUTH);
        setContentPane(content);

        for (JTextComponent t : new JTextComponent[] {restore, highPass, lowPass,
                (JTextComponent) reference.getEditor().getEditorComponent(),
                (JTextComponent) baseline.getEditor().getEditorComponent()}) {
            TextEdits.onEveryEdit(t, this::check);
        }
        reference.addActionListener(e -> check());
        baseline.addActionListener(e -> check());
        order.addChangeListener(e -> check());
        fill(bench.state().processing());
        pack();
        setMinimumSize(getPreferredSize());
        setLocationRelativeTo(owner);
    }

    private static void row(JPanel form, int y, String label, JComponent field, String hint) {
        GridBagConstraints c = new GridBagConstraints();
        c.gridy = y;
        c.insets = new Insets(3, 0, 3, 8);
        c.anchor = GridBagConstraints.WEST;
        form.add(new JLabel(label), c);
        c.gridx = 1;
        c.fill = GridBagConstraints.HORIZONTAL;
        form.add(field, c);
        c.gridx = 2;
        c.fill = GridBagConstraints.NONE;
        JLabel h = new JLabel(hint);
        h.putClientProperty("FlatLaf.styleClass", "small");
        h.setForeground(UIManager.getColor("Label.disabledForeground"));
        form.add(h, c);
    }

    /** Fills the fields from a processing value. */
    private void fill(Processing p) {
        restore.setText(p.restoredReference().orElse(""));
        reference.setSelectedItem(p.reference().text());
        highPass.setText(Double.isNaN(p.highPassHz()) ? "" : trim(p.highPassHz()));
        lowPass.setText(Double.isNaN(p.lowPassHz()) ? "" : trim(p.lowPassHz()));
        order.setValue(p.filterOrder());
        baseline.setSelectedItem(p.baseline().map(BaselineChoice::text).orElse("none"));
        check();
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }

    /** Reads the fields, checks them on the open study, and shows the caption or the reason. */
    private void check() {
        try {
            Processing p = read();
            Study study = bench.model().study();
            if (study != null && !p.isNone()) {
                // a trial run finds what depends on the data: Nyquist, channels, the baseline's samples
                p.apply(study.waveforms(0, 0), study.unpositionedChannels());
            }
            chosen = p;
            caption.setText(p.isNone() ? "As recorded: no processing" : "<html>" + escape(p.describe()) + "</html>");
            error.setText(" ");
            apply.setEnabled(true);
        } catch (BadInputException | IllegalArgumentException e) {
            chosen = null;
            caption.setText(" ");
            error.setText(Workbench.oneLine(e.getMessage()));
            apply.setEnabled(false);
        }
    }

    private Processing read() {
        Processing p = Processing.none().withRestoredReference(restore.getText().trim());
        p = p.withReference(ReferenceChoice.parse(text(reference)));
        p = p.withFilterOrder((Integer) order.getValue());
        if (!lowPass.getText().isBlank()) {
            p = p.withLowPass(number(lowPass.getText(), "low-pass"));
        }
        if (!highPass.getText().isBlank()) {
            p = p.withHighPass(number(highPass.getText(), "high-pass"));
        }
        String b = text(baseline);
        if (!b.isBlank() && !b.equalsIgnoreCase("none")) {
            p = p.withBaseline(BaselineChoice.parse(b));
        }
        return p;
    }

    private static String text(JComboBox<String> box) {
        Object v = box.isEditable() ? box.getEditor().getItem() : box.getSelectedItem();
        return v == null ? "" : v.toString().trim();
    }

    private static double number(String text, String what) {
        try {
            return Double.parseDouble(text.trim().replace(',', '.'));
        } catch (NumberFormatException e) {
            throw new BadInputException(what + " \"" + text.trim() + "\" is not a number of Hz");
        }
    }

    private static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }
}
