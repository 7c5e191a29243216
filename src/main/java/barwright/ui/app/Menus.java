package barwright.ui.app;

import barwright.report.ProgramVersion;
import barwright.ui.action.CommandAction;
import barwright.ui.action.RecentFiles;
import barwright.ui.action.WindowContribution;
import barwright.ui.document.Samples;
import barwright.ui.panel.HelpDialog;
import barwright.units.UnitSystem;

import javax.swing.Action;
import javax.swing.ButtonGroup;
import javax.swing.JButton;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JMenuItem;
import javax.swing.JRadioButtonMenuItem;
import javax.swing.JToggleButton;
import javax.swing.JToolBar;
import javax.swing.KeyStroke;
import javax.swing.event.MenuEvent;
import javax.swing.event.MenuListener;
import java.awt.Toolkit;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The window's commands: menus with keys and mnemonics, and the toolbar, sharing the same actions. */
final class Menus {
    private final MainWindow window;
    private final int shortcut = Toolkit.getDefaultToolkit().getMenuShortcutKeyMaskEx();
    private final CommandAction open;
    private final CommandAction save;
    private final CommandAction saveAs;
    private final CommandAction undo;
    private final CommandAction redo;
    private final CommandAction exportPng;
    private final CommandAction exportSvg;
    private final CommandAction help;
    private final List<CommandAction> stateful;
    private final JMenu recent = new JMenu("Open recent");
    private final List<WindowContribution> contributions;

    Menus(MainWindow window, List<WindowContribution> contributions) {
        this.window = window;
        this.contributions = contributions;
        var files = window.files();
        var document = window.document();
        open = new CommandAction("Open…", "Open a vehicle file", key(KeyEvent.VK_O), KeyEvent.VK_O, files::open);
        save = new CommandAction("Save", "Save the vehicle file", key(KeyEvent.VK_S), KeyEvent.VK_S,
                () -> files.save());
        saveAs = new CommandAction("Save as…", "Save the vehicle file under a new name",
                KeyStroke.getKeyStroke(KeyEvent.VK_S, shortcut | InputEvent.SHIFT_DOWN_MASK), KeyEvent.VK_A,
                () -> files.saveAs());
        undo = new CommandAction("Undo", "Take back the last change", key(KeyEvent.VK_Z), KeyEvent.VK_U,
                document::undo, document::canUndo);
        redo = new CommandAction("Redo", "Make the change taken back again", key(KeyEvent.VK_Y), KeyEvent.VK_R,
                document::redo, document::canRedo);
        exportPng = new CommandAction("Export chart as PNG…", "Write the chart shown to a PNG picture",
                key(KeyEvent.VK_E), KeyEvent.VK_P, () -> export("png"), () -> window.tabs().selectedChart() != null);
        exportSvg = new CommandAction("Export chart as SVG…", "Write the chart shown to an SVG drawing",
                KeyStroke.getKeyStroke(KeyEvent.VK_E, shortcut | InputEvent.SHIFT_DOWN_MASK), KeyEvent.VK_V,
                () -> export("svg"), () -> window.tabs().selectedChart() != null);
        help = new CommandAction("Help and cautions", "How to use Barwright, what it leaves out, and cautions",
                KeyStroke.getKeyStroke(KeyEvent.VK_F1, 0), KeyEvent.VK_H, () -> HelpDialog.show(window, helpIndex()));
        stateful = List.of(undo, redo, exportPng, exportSvg);
        document.addListener(event -> refresh());
        window.tabs().addChangeListener(event -> refresh());
        refresh();
    }

    /**
     * @return a line for every page and command the contributions add, with its own description, so that
     * Help names every view and tool of this window, those added later included
     */
    List<String> helpIndex() {
        List<String> lines = new java.util.ArrayList<>();
        for (WindowContribution contribution : contributions) {
            for (WindowContribution.Page page : contribution.pages()) {
                lines.add("Tab \"" + page.title() + "\": " + page.tooltip());
            }
            for (WindowContribution.Command command : contribution.commands()) {
                Object name = command.action().getValue(javax.swing.Action.NAME);
                Object about = command.action().getValue(javax.swing.Action.SHORT_DESCRIPTION);
                lines.add("\"" + String.valueOf(name).replace("…", "") + "\"" + (about != null ? ": " + about : ""));
            }
        }
        return lines;
    }

    private KeyStroke key(int code) {
        return KeyStroke.getKeyStroke(code, shortcut);
    }

    private void export(String type) {
        var chart = window.tabs().selectedChart();
        if (chart != null) {
            window.files().exportChart(chart, type);
        }
    }

    private void refresh() {
        stateful.forEach(CommandAction::refreshEnabled);
    }

    JMenuBar menuBar() {
        JMenuBar bar = new JMenuBar();
        bar.add(fileMenu());
        bar.add(editMenu());
        bar.add(viewMenu());
        List<Action> tools = contributed(WindowContribution.Place.TOOLS);
        if (!tools.isEmpty()) {
            JMenu toolsMenu = menu("Tools", KeyEvent.VK_T);
            toolsMenu.setName("menu.tools");
            tools.forEach(toolsMenu::add);
            bar.add(toolsMenu);
        }
        JMenu helpMenu = menu("Help", KeyEvent.VK_H);
        helpMenu.add(help);
        helpMenu.add(new CommandAction("About Barwright", "Version and licence", null, KeyEvent.VK_A,
                () -> window.files().dialogs().showInformation("About Barwright", aboutText())));
        bar.add(helpMenu);
        return bar;
    }

    private JMenu fileMenu() {
        JMenu file = menu("File", KeyEvent.VK_F);
        JMenu fromSample = new JMenu("New from a sample");
        fromSample.setMnemonic(KeyEvent.VK_N);
        for (Samples.Sample sample : Samples.ALL) {
            fromSample.add(new CommandAction(sample.label() + " (invented example)",
                    "Start a new, unsaved document from this sample", null, 0,
                    () -> window.files().newFromSample(sample)));
        }
        file.add(fromSample);
        file.add(open);
        recent.setMnemonic(KeyEvent.VK_R);
        file.add(recent);
        file.addMenuListener(new MenuListener() {
            @Override
            public void menuSelected(MenuEvent event) {
                fillRecent();
            }

            @Override
            public void menuDeselected(MenuEvent event) {
            }

            @Override
            public void menuCanceled(MenuEvent event) {
            }
        });
        fillRecent();
        file.addSeparator();
        file.add(save);
        file.add(saveAs);
        file.addSeparator();
        file.add(exportPng);
        file.add(exportSvg);
        contributed(WindowContribution.Place.FILE_EXPORTS).forEach(file::add);
        file.addSeparator();
        file.add(new CommandAction("Quit", "Close Barwright", key(KeyEvent.VK_Q), KeyEvent.VK_Q, window::close));
        return file;
    }

    /** @return the contributed commands for one place, in the contributions' order */
    private List<Action> contributed(WindowContribution.Place place) {
        List<Action> actions = new ArrayList<>();
        for (WindowContribution contribution : contributions) {
            for (WindowContribution.Command command : contribution.commands()) {
                if (command.place() == place) {
                    actions.add(command.action());
                }
            }
        }
        return actions;
    }

    private void fillRecent() {
        recent.removeAll();
        List<Path> files = new RecentFiles(window.settings()).list();
        if (files.isEmpty()) {
            JMenuItem none = new JMenuItem("No recent files");
            none.setEnabled(false);
            recent.add(none);
        }
        int index = 1;
        for (Path path : files) {
            JMenuItem item = new JMenuItem(new CommandAction(index + "  " + path.getFileName() + "   (" + path.getParent()
                    + ")", "Open " + path, null, index <= 9 ? KeyEvent.VK_0 + index : 0,
                    () -> window.files().openRecent(path)));
            recent.add(item);
            index++;
        }
    }

    private JMenu editMenu() {
        JMenu edit = menu("Edit", KeyEvent.VK_E);
        edit.add(undo);
        edit.add(redo);
        return edit;
    }

    private JMenu viewMenu() {
        JMenu viewMenu = menu("View", KeyEvent.VK_V);
        JMenu units = new JMenu("Units");
        units.setMnemonic(KeyEvent.VK_U);
        ButtonGroup unitGroup = new ButtonGroup();
        for (UnitSystem system : UnitSystem.values()) {
            JRadioButtonMenuItem item = new JRadioButtonMenuItem(system.label(), window.view().units() == system);
            item.setName("menu.units." + system.name().toLowerCase(Locale.ROOT));
            item.setAccelerator(KeyStroke.getKeyStroke(system == UnitSystem.SI ? KeyEvent.VK_1 : KeyEvent.VK_2,
                    shortcut | InputEvent.SHIFT_DOWN_MASK));
            item.addActionListener(event -> window.setUnits(system));
            window.view().addListener(() -> item.setSelected(window.view().units() == system));
            unitGroup.add(item);
            units.add(item);
        }
        viewMenu.add(units);
        JMenu theme = new JMenu("Theme");
        theme.setMnemonic(KeyEvent.VK_T);
        ButtonGroup themeGroup = new ButtonGroup();
        for (Themes.Theme choice : Themes.Theme.values()) {
            JRadioButtonMenuItem item = new JRadioButtonMenuItem(choice == Themes.Theme.LIGHT ? "Light" : "Dark",
                    window.theme() == choice);
            item.addActionListener(event -> {
                window.settings().put("theme", choice.name().toLowerCase(Locale.ROOT));
                window.applyLook();
            });
            themeGroup.add(item);
            theme.add(item);
        }
        viewMenu.add(theme);
        viewMenu.addSeparator();
        viewMenu.add(new CommandAction("Larger text", "Make all text and controls larger (projector)",
                key(KeyEvent.VK_EQUALS), KeyEvent.VK_L, () -> textSize(Themes.step(window.textSize(), 1))));
        viewMenu.add(new CommandAction("Smaller text", "Make all text and controls smaller", key(KeyEvent.VK_MINUS),
                KeyEvent.VK_S, () -> textSize(Themes.step(window.textSize(), -1))));
        viewMenu.add(new CommandAction("Normal text size", "The system's text size", key(KeyEvent.VK_0),
                KeyEvent.VK_N, () -> textSize(0)));
        return viewMenu;
    }

    private void textSize(int size) {
        window.settings().put("textSize", Integer.toString(size));
        window.applyLook();
    }

    JToolBar toolBar() {
        JToolBar bar = new JToolBar();
        bar.setFloatable(false);
        bar.add(button(open));
        bar.add(button(save));
        bar.addSeparator();
        bar.add(button(undo));
        bar.add(button(redo));
        bar.addSeparator();
        ButtonGroup group = new ButtonGroup();
        for (UnitSystem system : UnitSystem.values()) {
            JToggleButton toggle = new JToggleButton(system == UnitSystem.SI ? "SI units" : "US units",
                    window.view().units() == system);
            toggle.setName("units." + system.name().toLowerCase(Locale.ROOT));
            toggle.setToolTipText("Show every field, figure and chart in " + system.label() + " units");
            toggle.addActionListener(event -> window.setUnits(system));
            window.view().addListener(() -> toggle.setSelected(window.view().units() == system));
            group.add(toggle);
            bar.add(toggle);
        }
        bar.addSeparator();
        bar.add(button(help));
        return bar;
    }

    private static JButton button(CommandAction action) {
        JButton button = new JButton(action);
        button.setName("toolbar." + action.getValue(Action.NAME));
        button.setFocusable(true);
        return button;
    }

    private static JMenu menu(String name, int mnemonic) {
        JMenu menu = new JMenu(name);
        menu.setMnemonic(mnemonic);
        return menu;
    }

    /**
     * @return the About text: the program's version as {@code --version} prints it, the Java it runs on and the
     * licence
     */
    static String aboutText() {
        return ProgramVersion.line() + "\nAnti-roll bars and lateral load transfer.\n"
                + "Running on Java " + System.getProperty("java.version") + " ("
                + System.getProperty("java.vendor", "unknown vendor") + ").\n"
                + "Free software under the MIT licence: see the LICENSE file that came with the program.";
    }
}
