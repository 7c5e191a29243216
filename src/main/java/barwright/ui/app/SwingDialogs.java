package barwright.ui.app;

import barwright.ui.action.Dialogs;

import javax.swing.JFileChooser;
import javax.swing.JOptionPane;
import javax.swing.filechooser.FileNameExtensionFilter;
import java.awt.Component;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;

/** The commands' questions as ordinary Swing dialogs. */
final class SwingDialogs implements Dialogs {
    private final Component owner;
    private File folder;

    SwingDialogs(Component owner) {
        this.owner = owner;
    }

    @Override
    public Path chooseFileToOpen() {
        JFileChooser chooser = chooser("Open a vehicle file");
        chooser.setFileFilter(new FileNameExtensionFilter("Barwright vehicle files (*.json)", "json"));
        if (chooser.showOpenDialog(owner) != JFileChooser.APPROVE_OPTION) {
            return null;
        }
        folder = chooser.getCurrentDirectory();
        return chooser.getSelectedFile().toPath();
    }

    @Override
    public Path chooseDataFileToOpen(String title, String description, String extension) {
        JFileChooser chooser = chooser(title);
        chooser.setFileFilter(new FileNameExtensionFilter(description, extension));
        if (chooser.showOpenDialog(owner) != JFileChooser.APPROVE_OPTION) {
            return null;
        }
        folder = chooser.getCurrentDirectory();
        return chooser.getSelectedFile().toPath();
    }

    @Override
    public Path chooseFileToSave(String suggested, String extension) {
        JFileChooser chooser = chooser("Save as");
        chooser.setFileFilter(new FileNameExtensionFilter(extension.toUpperCase(java.util.Locale.ROOT) + " files (*."
                + extension + ")", extension));
        chooser.setSelectedFile(new File(folder, suggested));
        while (chooser.showSaveDialog(owner) == JFileChooser.APPROVE_OPTION) {
            folder = chooser.getCurrentDirectory();
            Path target = chooser.getSelectedFile().toPath();
            if (!Files.exists(target) || JOptionPane.showConfirmDialog(owner, target.getFileName()
                            + " already exists. Replace it?", "Replace the file?", JOptionPane.YES_NO_OPTION,
                    JOptionPane.WARNING_MESSAGE) == JOptionPane.YES_OPTION) {
                return target;
            }
        }
        return null;
    }

    private JFileChooser chooser(String title) {
        JFileChooser chooser = new JFileChooser(folder);
        chooser.setDialogTitle(title);
        return chooser;
    }

    @Override
    public UnsavedChoice askAboutUnsavedChanges(String documentName) {
        Object[] options = {"Save", "Don't save", "Cancel"};
        int answer = JOptionPane.showOptionDialog(owner, documentName + " has changes that are not saved.\n"
                        + "Save them first?", "Unsaved changes", JOptionPane.YES_NO_CANCEL_OPTION,
                JOptionPane.WARNING_MESSAGE, null, options, options[0]);
        return switch (answer) {
            case 0 -> UnsavedChoice.SAVE;
            case 1 -> UnsavedChoice.DISCARD;
            default -> UnsavedChoice.CANCEL;
        };
    }

    @Override
    public void showError(String title, String message) {
        JOptionPane.showMessageDialog(owner, message, title, JOptionPane.ERROR_MESSAGE);
    }

    @Override
    public void showInformation(String title, String message) {
        JOptionPane.showMessageDialog(owner, message, title, JOptionPane.INFORMATION_MESSAGE);
    }
}
