package org.meridian.ui;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.Font;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.UIManager;

/**
 * The strip along the bottom of the window: on the left what lies under the mouse (time,
 * channel, value — the value first, then which wave it belongs to; each field as wide as its
 * text), in the middle the last message, on the right the running task with its progress bar and
 * Cancel.
 */
final class StatusBar extends JPanel implements Tasks.Observer {
    private final JLabel time = new FieldLabel(7);
    private final JLabel channel = new FieldLabel(5);
    private final JLabel value = new FieldLabel(12);
    private final JLabel message = new JLabel(" ");
    private final JLabel taskLabel = new JLabel();
    private final JProgressBar progress = new JProgressBar(0, 1000);
    private final JButton cancel = new JButton("Cancel");
    private Tasks.Task shown;

    StatusBar() {
        super(new BorderLayout(12, 0));
        setBorder(BorderFactory.createCompoundBorder(
                BorderFactory.createMatteBorder(1, 0, 0, 0, UIManager.getColor("Separator.foreground")),
                BorderFactory.createEmptyBorder(3, 8, 3, 8)));
        time.setName("status.time");
        channel.setName("status.channel");
        value.setName("status.value");
        message.setName("status.message");
        progress.setName("status.progress");
        cancel.setName("status.cancel");
        Font mono = new Font(Font.MONOSPACED, Font.PLAIN, time.getFont().getSize());
        for (JLabel l : new JLabel[] {time, channel, value}) {
            l.setFont(mono);
        }
        JPanel under = new JPanel(new FlowLayout(FlowLayout.LEFT, 10, 0));
        under.setOpaque(false);
        under.add(time);
        under.add(channel);
        under.add(value);
        add(under, BorderLayout.WEST);
        add(message, BorderLayout.CENTER);
        JPanel work = new JPanel(new FlowLayout(FlowLayout.RIGHT, 6, 0));
        work.setOpaque(false);
        progress.setPreferredSize(new Dimension(160, progress.getPreferredSize().height));
        cancel.putClientProperty("JButton.buttonType", "borderless");
        cancel.setToolTipText("Stop the running task");
        cancel.addActionListener(e -> {
            Tasks.Task task = shown;
            if (task != null) {
                task.cancel();
                showMessage(task.label() + ": cancelled");
            }
        });
        work.add(taskLabel);
        work.add(progress);
        work.add(cancel);
        add(work, BorderLayout.EAST);
        showing(null);
    }

    /**
     * A field of the pointer readout: at least {@code columns} characters wide, so short readouts
     * do not make the line jump, and as wide as its text, so a long one is never cut off.
     */
    private static final class FieldLabel extends JLabel {
        private final int columns;

        FieldLabel(int columns) {
            super(" ");
            this.columns = columns;
        }

        @Override
        public Dimension getPreferredSize() {
            Dimension d = super.getPreferredSize();
            int least = getFontMetrics(getFont()).charWidth('0') * columns;
            return new Dimension(Math.max(d.width, least), d.height);
        }

        @Override
        public Dimension getMinimumSize() {
            return getPreferredSize();
        }
    }

    /** The readout of what lies under the mouse as shown: time, channel and value (for tests). */
    String pointerText() {
        return (time.getText() + "  " + channel.getText() + "  " + value.getText()).trim();
    }

    /** Shows what lies under the mouse; empty strings clear a field. */
    void showPointer(String timeText, String channelText, String valueText) {
        time.setText(timeText.isEmpty() ? " " : timeText);
        channel.setText(channelText.isEmpty() ? " " : channelText);
        value.setText(valueText.isEmpty() ? " " : valueText);
    }

    void showMessage(String text) {
        message.setText(text == null || text.isEmpty() ? " " : text);
        message.setToolTipText(text);
    }

    String messageText() {
        return message.getText();
    }

    @Override
    public void showing(Tasks.Task task) {
        shown = task;
        boolean on = task != null;
        taskLabel.setVisible(on);
        progress.setVisible(on);
        cancel.setVisible(on);
        if (on) {
            taskLabel.setText(task.label());
            double f = task.fraction();
            progress.setIndeterminate(f < 0);
            if (f >= 0) {
                progress.setValue((int) Math.round(f * 1000));
            }
        }
        revalidate();
        repaint();
    }
}
