package org.meridian.ui;

import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import javax.swing.BorderFactory;
import javax.swing.Box;
import javax.swing.BoxLayout;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.Scrollable;
import javax.swing.SwingConstants;

/**
 * The study on the left of the window: its loaded conditions and the contrasts written so far,
 * each with a check box (shown or not) and its colour; the contrast editor; and the participants
 * with a check box each (included in every grand average or not). Everything here is a request
 * to the {@link ViewState} or the {@link ViewModel}; the panel redraws from their events.
 */
final class StudyPanel extends JPanel {
    private final Workbench bench;
    private final Content content = new Content();
    private final JPanel conditions = column();
    private final JPanel contrasts = column();
    private final JPanel participants = column();
    private final JLabel included = new JLabel(" ");
    private final List<JCheckBox> waveBoxes = new ArrayList<>();
    private final List<JCheckBox> participantBoxes = new ArrayList<>();
    private boolean updating;

    StudyPanel(Workbench bench) {
        super(new BorderLayout());
        this.bench = bench;
        setName("study");
        setMinimumSize(new Dimension(190, 200));
        content.setLayout(new BoxLayout(content, BoxLayout.Y_AXIS));
        content.setBorder(BorderFactory.createEmptyBorder(6, 8, 8, 8));
        content.add(heading("Conditions"));
        content.add(conditions);
        content.add(Box.createVerticalStrut(8));
        content.add(heading("Contrasts"));
        content.add(contrasts);
        ContrastEditor editor = new ContrastEditor(bench, e -> bench.model().addContrast(e));
        editor.setAlignmentX(Component.LEFT_ALIGNMENT);
        editor.setMaximumSize(new Dimension(Integer.MAX_VALUE, editor.getPreferredSize().height + 20));
        content.add(editor);
        content.add(Box.createVerticalStrut(8));
        content.add(heading("Participants"));
        included.setName("study.included");
        included.setAlignmentX(Component.LEFT_ALIGNMENT);
        content.add(included);
        content.add(participantButtons());
        content.add(participants);
        JScrollPane scroll = new JScrollPane(content);
        scroll.setBorder(BorderFactory.createEmptyBorder());
        scroll.getVerticalScrollBar().setUnitIncrement(16);
        add(scroll, BorderLayout.CENTER);

        bench.model().addListener((m, what) -> {
            if (what.contains(ViewModel.Change.SESSION) || what.contains(ViewModel.Change.CATALOGUE)) {
                rebuild();
            }
        });
        bench.state().addListener((s, what) -> {
            if (what.contains(ViewState.Aspect.WAVES) || what.contains(ViewState.Aspect.PARTICIPANTS)
                    || what.contains(ViewState.Aspect.MAP_WAVE)) {
                refresh();
            }
        });
        bench.addThemeListener(t -> repaint());
    }

    private static JPanel column() {
        JPanel p = new JPanel();
        p.setLayout(new BoxLayout(p, BoxLayout.Y_AXIS));
        p.setAlignmentX(Component.LEFT_ALIGNMENT);
        p.setOpaque(false);
        return p;
    }

    private static JLabel heading(String text) {
        JLabel l = new JLabel(text);
        l.putClientProperty("FlatLaf.styleClass", "h4");
        l.setAlignmentX(Component.LEFT_ALIGNMENT);
        l.setBorder(BorderFactory.createEmptyBorder(2, 0, 3, 0));
        return l;
    }

    private JPanel participantButtons() {
        JPanel row = new JPanel(new FlowLayout(FlowLayout.LEFT, 0, 0));
        row.setOpaque(false);
        row.setAlignmentX(Component.LEFT_ALIGNMENT);
        JButton all = new JButton("All");
        all.setName("study.participants.all");
        all.putClientProperty("JButton.buttonType", "toolBarButton");
        all.addActionListener(e -> bench.state().setExcludedParticipants(Set.of()));
        row.add(all);
        row.add(new JLabel(" · "));
        JLabel hint = new JLabel("untick to leave out");
        hint.setEnabled(false);
        row.add(hint);
        row.setMaximumSize(new Dimension(Integer.MAX_VALUE, row.getPreferredSize().height));
        return row;
    }

    private void rebuild() {
        conditions.removeAll();
        contrasts.removeAll();
        participants.removeAll();
        waveBoxes.clear();
        participantBoxes.clear();
        StudySession session = bench.model().session();
        if (session == null) {
            return;
        }
        for (WaveEntry e : bench.model().catalogue()) {
            JCheckBox box = new JCheckBox(e.name());
            box.setName("study.wave." + e.name());
            box.setIcon(null);
            box.setToolTipText(e.contrast() ? "Difference wave " + e.name() + " (per participant, then averaged)"
                    : "Condition " + e.name());
            box.addActionListener(a -> toggleWave(e.name(), box.isSelected()));
            waveBoxes.add(box);
            JPanel row = new JPanel(new BorderLayout(4, 0));
            row.setOpaque(false);
            row.setAlignmentX(Component.LEFT_ALIGNMENT);
            JLabel swatch = new JLabel(new Swatch(() -> bench.theme().wave(e.colourIndex()), 12));
            row.add(swatch, BorderLayout.WEST);
            row.add(box, BorderLayout.CENTER);
            if (e.contrast()) {
                JButton remove = new JButton("✕");
                remove.setName("study.wave.remove." + e.name());
                remove.setToolTipText("Remove this contrast");
                remove.putClientProperty("JButton.buttonType", "toolBarButton");
                remove.addActionListener(a -> bench.model().removeContrast(e.name()));
                row.add(remove, BorderLayout.EAST);
            }
            row.setMaximumSize(new Dimension(Integer.MAX_VALUE, row.getPreferredSize().height));
            (e.contrast() ? contrasts : conditions).add(row);
        }
        for (String p : session.study().participants()) {
            JCheckBox box = new JCheckBox(p);
            box.setName("study.participant." + p);
            box.addActionListener(a -> toggleParticipant(p, box.isSelected()));
            box.setAlignmentX(Component.LEFT_ALIGNMENT);
            participantBoxes.add(box);
            participants.add(box);
        }
        refresh();
        content.revalidate();
        content.repaint();
    }

    private void refresh() {
        updating = true;
        try {
            ViewState s = bench.state();
            for (JCheckBox b : waveBoxes) {
                String name = b.getText();
                b.setSelected(s.shownWaves().contains(name));
                b.setFont(b.getFont().deriveFont(name.equals(s.mapWave()) ? java.awt.Font.BOLD : java.awt.Font.PLAIN));
            }
            for (JCheckBox b : participantBoxes) {
                b.setSelected(!s.excludedParticipants().contains(b.getText()));
            }
            StudySession session = bench.model().session();
            if (session != null) {
                int n = session.study().participants().size();
                included.setText((n - s.excludedParticipants().size()) + " of " + n
                        + " in the grand average");
            }
        } finally {
            updating = false;
        }
    }

    private void toggleWave(String name, boolean on) {
        if (updating) {
            return;
        }
        List<String> shown = new ArrayList<>(bench.state().shownWaves());
        if (on && !shown.contains(name)) {
            shown.add(name);
        } else if (!on) {
            shown.remove(name);
        }
        bench.state().setShownWaves(shown);
    }

    private void toggleParticipant(String name, boolean included) {
        if (updating) {
            return;
        }
        Set<String> excluded = new HashSet<>(bench.state().excludedParticipants());
        int n = bench.model().session().study().participants().size();
        if (included) {
            excluded.remove(name);
        } else if (excluded.size() + 1 < n) {
            excluded.add(name);
        } else {
            bench.message("at least one participant stays in the grand average");
        }
        bench.state().setExcludedParticipants(excluded);
        refresh();
    }

    /** Tracks the viewport's width so rows never need a horizontal scroll bar. */
    private static final class Content extends JPanel implements Scrollable {
        @Override
        public Dimension getPreferredScrollableViewportSize() {
            return getPreferredSize();
        }

        @Override
        public int getScrollableUnitIncrement(java.awt.Rectangle r, int o, int d) {
            return 16;
        }

        @Override
        public int getScrollableBlockIncrement(java.awt.Rectangle r, int o, int d) {
            return o == SwingConstants.VERTICAL ? r.height : r.width;
        }

        @Override
        public boolean getScrollableTracksViewportWidth() {
            return true;
        }

        @Override
        public boolean getScrollableTracksViewportHeight() {
            return false;
        }
    }
}
