package org.meridian.ui;

import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.nio.file.Path;
import javax.swing.ButtonGroup;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.JRadioButtonMenuItem;
import javax.swing.KeyStroke;
import org.meridian.maps.ColourScale;
import org.meridian.maps.ColourScales;

/** File (open, demo, recent studies, export, close), View (theme, scale, polarity) and Help. */
final class MenuBar extends JMenuBar {
    private final MainWindow window;
    private final JMenu recent = new JMenu("Recent studies");

    MenuBar(Workbench bench, MainWindow window) {
        this.window = window;
        int menuKey = java.awt.Toolkit.getDefaultToolkit().getMenuShortcutKeyMaskEx();
        JMenu file = new JMenu("File");
        file.setMnemonic(KeyEvent.VK_F);
        file.add(item("Open study…", "menu.open", KeyStroke.getKeyStroke(KeyEvent.VK_O, menuKey),
                window::chooseAndOpen));
        file.add(item("Open the demo study", "menu.demo", null, () -> window.openDemo(ViewOptions.defaults())));
        recent.setName("menu.recent");
        file.add(recent);
        file.addSeparator();
        file.add(item("Export measures…", "menu.export", KeyStroke.getKeyStroke(KeyEvent.VK_E, menuKey),
                () -> window.measuresPanel().exportTable()));
        file.addSeparator();
        file.add(item("Close window", "menu.close", KeyStroke.getKeyStroke(KeyEvent.VK_W, menuKey), () -> {
            window.saveLayout();
            window.dispose();
        }));
        add(file);

        JMenu view = new JMenu("View");
        view.setMnemonic(KeyEvent.VK_V);
        view.add(item("Processing…", "menu.processing", null, window::openProcessing));
        view.add(item("Switch light / dark theme", "menu.theme", null, window::toggleTheme));
        view.add(item("Potential / CSD  (key C)", "menu.quantity", null, window::toggleQuantity));
        view.add(item("Positive up / negative up", "menu.polarity", null,
                () -> bench.state().setPolarity(bench.state().polarity().other())));
        view.addSeparator();
        ButtonGroup scales = new ButtonGroup();
        for (ColourScale s : ColourScales.all()) {
            String label = s == ColourScales.DIVERGING ? "Colour scale: diverging (blue–red)"
                    : "Colour scale: " + s.name() + " (colour-blind safe)";
            JRadioButtonMenuItem r = new JRadioButtonMenuItem(label, s == bench.state().colourScale());
            r.setName("menu.scale." + s.name());
            r.addActionListener(e -> bench.state().setColourScale(s));
            scales.add(r);
            view.add(r);
        }
        add(view);

        JMenu help = new JMenu("Help");
        help.add(item("Keys", "menu.keys", null, () -> JOptionPane.showMessageDialog(window,
                "<html><table>"
                + "<tr><td>← / →</td><td>time cursor one sample back / forward</td></tr>"
                + "<tr><td>Shift + ← / →</td><td>time cursor 10 ms back / forward</td></tr>"
                + "<tr><td>Home / End</td><td>time cursor to the window's start / end</td></tr>"
                + "<tr><td>C</td><td>scalp map and span view: potential ↔ CSD</td></tr>"
                + "<tr><td>click, drag</td><td>move the time cursor (waveforms, span view)</td></tr>"
                + "<tr><td>drag a band edge</td><td>move that edge of the window</td></tr>"
                + "<tr><td>Shift + drag</td><td>sweep out a new window</td></tr>"
                + "<tr><td>click an electrode</td><td>make its channel current (Ctrl: add to the selection)</td></tr>"
                + "</table></html>", "Keys and gestures", JOptionPane.PLAIN_MESSAGE)));
        add(help);
        refreshRecent();
    }

    void refreshRecent() {
        recent.removeAll();
        for (Path p : window.prefs().recentStudies()) {
            recent.add(item(p.toString(), "menu.recent." + p.getFileName(), null,
                    () -> window.open(p, ViewOptions.defaults())));
        }
        recent.setEnabled(recent.getItemCount() > 0);
    }

    private static JMenuItem item(String text, String name, KeyStroke key, Runnable r) {
        JMenuItem i = new JMenuItem(new javax.swing.AbstractAction(text) {
            @Override
            public void actionPerformed(ActionEvent e) {
                r.run();
            }
        });
        i.setName(name);
        if (key != null) {
            i.setAccelerator(key);
        }
        return i;
    }
}
