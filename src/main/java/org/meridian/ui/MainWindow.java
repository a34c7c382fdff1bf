package org.meridian.ui;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.KeyboardFocusManager;
import java.awt.Rectangle;
import java.awt.event.ActionEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import javax.swing.AbstractAction;
import javax.swing.ActionMap;
import javax.swing.BorderFactory;
import javax.swing.InputMap;
import javax.swing.JComponent;
import javax.swing.JFileChooser;
import javax.swing.JFrame;
import javax.swing.JPanel;
import javax.swing.JSplitPane;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;
import javax.swing.text.JTextComponent;
import org.meridian.core.Study;

/**
 * The main window (DESIGN §10): the study on the left; the waveform view with the span view
 * beneath in the centre; the scalp map with the measures beneath on the right; the toolbar above
 * and the status bar below. All panels share one {@link Workbench}. The window opens studies
 * (File → Open, drag and drop, recent studies) in a background task, remembers its layout and
 * theme ({@link UiPrefs}), and binds the keys: ←/→ one sample, Shift+←/→ 10 ms, Home/End the
 * window's edges, C potential/CSD.
 */
public final class MainWindow extends JFrame {
    static final String TITLE = "Meridian";
    private static final double SHIFT_STEP_MS = 10;

    private final Workbench bench;
    private final UiPrefs prefs;
    private final StudyPanel studyPanel;
    private final WaveformPanel waveformPanel;
    private final SpanPanel spanPanel;
    private final ScalpMapPanel mapPanel;
    private final MeasuresPanel measuresPanel;
    private final JSplitPane outer;
    private final JSplitPane inner;
    private final JSplitPane centre;
    private final JSplitPane right;
    private final Toolbar toolbar;
    private final MenuBar menus;
    private ProcessingDialog processingDialog;
    private long openStartedNanos;
    private long lastOpenMillis = -1;

    public MainWindow(UiPrefs prefs) {
        super(TITLE);
        this.prefs = prefs;
        this.bench = new Workbench(prefs.theme());
        setName("main");
        setDefaultCloseOperation(JFrame.DISPOSE_ON_CLOSE);
        setMinimumSize(new Dimension(960, 620));

        studyPanel = new StudyPanel(bench);
        waveformPanel = new WaveformPanel(bench);
        spanPanel = new SpanPanel(bench);
        mapPanel = new ScalpMapPanel(bench);
        measuresPanel = new MeasuresPanel(bench);

        centre = split(JSplitPane.VERTICAL_SPLIT, waveformPanel, spanPanel, "centre", 0.55);
        right = split(JSplitPane.VERTICAL_SPLIT, mapPanel, measuresPanel, "right", 0.5);
        inner = split(JSplitPane.HORIZONTAL_SPLIT, centre, right, "inner", 0.7);
        outer = split(JSplitPane.HORIZONTAL_SPLIT, studyPanel, inner, "outer", 0.0);
        centre.setName("split.centre");
        right.setName("split.right");

        toolbar = new Toolbar(bench, this, mapPanel::limits);
        menus = new MenuBar(bench, this);
        setJMenuBar(menus);
        JPanel content = new JPanel(new BorderLayout());
        content.add(toolbar, BorderLayout.NORTH);
        content.add(outer, BorderLayout.CENTER);
        content.add(bench.statusBar(), BorderLayout.SOUTH);
        setContentPane(content);
        bindKeys(content);
        acceptDrops(content);
        restoreBounds();
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                saveLayout();
            }
        });
    }

    public Workbench workbench() {
        return bench;
    }

    UiPrefs prefs() {
        return prefs;
    }

    WaveformPanel waveformPanel() {
        return waveformPanel;
    }

    ScalpMapPanel mapPanel() {
        return mapPanel;
    }

    SpanPanel spanPanel() {
        return spanPanel;
    }

    MeasuresPanel measuresPanel() {
        return measuresPanel;
    }

    StudyPanel studyPanel() {
        return studyPanel;
    }

    /** How long the last study took to open (read, spline, first averages), or -1. */
    long lastOpenMillis() {
        return lastOpenMillis;
    }

    /** Opens the demo study (bundled folder, or simulated in memory). */
    public void openDemo(ViewOptions options) {
        open(null, options);
    }

    /** Opens a study in the background; a study already open stays until the new one is ready. */
    public void open(Path path, ViewOptions options) {
        String name = path == null ? "the demo study" : StudyOpener.titleOf(path);
        IntervalKind intervals = bench.model().intervals();
        open(name, p -> StudyOpener.run(path, options, intervals, p));
    }

    /** Shows a study held in memory (a simulation, say) under a title. */
    public void open(Study study, String title, ViewOptions options) {
        IntervalKind intervals = bench.model().intervals();
        open(title, p -> StudyOpener.prepare(StudySession.of(study, null, title), options, intervals, p));
    }

    private void open(String name, Tasks.Job<StudyOpener.Opened> job) {
        openStartedNanos = System.nanoTime();
        bench.message("opening " + name + " …");
        bench.tasks().submit("open", "Opening " + name, job,
                opened -> {
                    bench.model().open(opened.session(), opened.entries(), opened.averages(), opened.defaults());
                    lastOpenMillis = (System.nanoTime() - openStartedNanos) / 1_000_000;
                    setTitle(opened.session().title() + " – " + TITLE);
                    opened.session().source().ifPresent(p -> {
                        prefs.opened(p);
                        menus.refreshRecent();
                    });
                    bench.message("opened " + opened.session().title() + ": "
                            + opened.session().study().participants().size() + " participants, "
                            + opened.session().study().conditions().size() + " conditions, "
                            + opened.session().study().channelLabels().size() + " channels ("
                            + lastOpenMillis + " ms)");
                }, bench::report);
    }

    /** File → Open: a study folder, a manifest, a waveform file or a long table. */
    void chooseAndOpen() {
        JFileChooser chooser = new JFileChooser(prefs.lastStudy().map(Path::toFile).orElse(null));
        chooser.setDialogTitle("Open a study (folder, manifest, waveform file or long table)");
        chooser.setFileSelectionMode(JFileChooser.FILES_AND_DIRECTORIES);
        chooser.setName("open.chooser");
        if (chooser.showOpenDialog(this) == JFileChooser.APPROVE_OPTION) {
            open(chooser.getSelectedFile().toPath(), ViewOptions.defaults());
        }
    }

    /** Switches between the light and the dark theme, and remembers the choice. */
    void toggleTheme() {
        Theme next = bench.theme().other();
        next.applyTo(this);
        prefs.setTheme(next);
        bench.setTheme(next);
    }

    /** Opens the processing dialog (or brings the open one to the front). */
    void openProcessing() {
        if (processingDialog == null || !processingDialog.isDisplayable()) {
            processingDialog = new ProcessingDialog(this, bench);
        }
        processingDialog.setVisible(true);
        processingDialog.toFront();
    }

    void openFigureComposer() {
        Optional<FigureComposer> composer = FigureComposer.find();
        composer.ifPresent(c -> c.open(this, bench.state(), bench.model()));
    }

    private JSplitPane split(int orientation, JComponent a, JComponent b, String name, double weight) {
        JSplitPane p = new JSplitPane(orientation, true, a, b);
        p.setResizeWeight(weight);
        p.setBorder(BorderFactory.createEmptyBorder());
        p.putClientProperty("divider", name);
        return p;
    }

    private void bindKeys(JComponent root) {
        InputMap in = root.getInputMap(JComponent.WHEN_IN_FOCUSED_WINDOW);
        ActionMap act = root.getActionMap();
        bind(in, act, "LEFT", "cursor.back", () -> bench.state().stepCursor(-1));
        bind(in, act, "RIGHT", "cursor.forward", () -> bench.state().stepCursor(1));
        bind(in, act, "shift LEFT", "cursor.back10", () -> stepMs(-SHIFT_STEP_MS));
        bind(in, act, "shift RIGHT", "cursor.forward10", () -> stepMs(SHIFT_STEP_MS));
        bind(in, act, "HOME", "cursor.windowStart", () -> bench.state().setCursorMs(bench.state().windowStartMs()));
        bind(in, act, "END", "cursor.windowEnd", () -> bench.state().setCursorMs(bench.state().windowEndMs()));
        bind(in, act, "C", "quantity.toggle", this::toggleQuantity);
    }

    void toggleQuantity() {
        StudySession s = bench.model().session();
        if (s != null && !s.hasCsd() && bench.state().quantity() == MapQuantity.POTENTIAL) {
            bench.message("no CSD for this study: " + (s.hasMaps() ? "the data is CSD already" : s.whyNoMaps()));
            return;
        }
        bench.state().setQuantity(bench.state().quantity().other());
    }

    /** Moves the cursor to the sample nearest to {@code ms} away, and by at least one sample. */
    private void stepMs(double ms) {
        ViewState s = bench.state();
        int before = s.cursorSample();
        s.setCursorMs(s.cursorMs() + ms);
        if (s.cursorSample() == before) {
            s.stepCursor(ms > 0 ? 1 : -1);
        }
    }

    private void bind(InputMap in, ActionMap act, String key, String name, Runnable r) {
        in.put(KeyStroke.getKeyStroke(key), name);
        act.put(name, new AbstractAction(name) {
            @Override
            public void actionPerformed(ActionEvent e) {
                if (KeyboardFocusManager.getCurrentKeyboardFocusManager().getFocusOwner() instanceof JTextComponent) {
                    return;
                }
                r.run();
            }
        });
    }

    /** A study dropped anywhere on the window opens, over tables and text fields too. */
    private void acceptDrops(JComponent root) {
        StudyDrop.installOn(root, path -> open(path, ViewOptions.defaults()), bench::report);
    }

    private void restoreBounds() {
        Optional<int[]> b = prefs.windowBounds();
        if (b.isPresent()) {
            int[] r = b.get();
            setBounds(new Rectangle(r[0], r[1], Math.max(r[2], 960), Math.max(r[3], 620)));
        } else {
            java.awt.Rectangle screen = java.awt.GraphicsEnvironment.getLocalGraphicsEnvironment()
                    .getMaximumWindowBounds();
            setBounds(screen.x, screen.y, Math.min(screen.width, 1760), Math.min(screen.height, 1080));
        }
        SwingUtilities.invokeLater(() -> {
            for (JSplitPane p : new JSplitPane[] {outer, inner, centre, right}) {
                int d = prefs.divider((String) p.getClientProperty("divider"));
                if (d > 0) {
                    p.setDividerLocation(d);
                } else if (p == outer) {
                    p.setDividerLocation(230);
                } else if (p == inner) {
                    p.setDividerLocation(0.6);
                } else {
                    p.setDividerLocation(p == centre ? 0.55 : 0.5);
                }
            }
        });
    }

    void saveLayout() {
        Rectangle r = getBounds();
        prefs.setWindowBounds(r.x, r.y, r.width, r.height);
        for (JSplitPane p : new JSplitPane[] {outer, inner, centre, right}) {
            prefs.setDivider((String) p.getClientProperty("divider"), p.getDividerLocation());
        }
        prefs.flush();
    }
}
