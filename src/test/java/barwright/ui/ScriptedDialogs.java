package barwright.ui;

import barwright.ui.action.Dialogs;

import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;

/** Answers the commands' questions from a script, and records the errors shown. */
public final class ScriptedDialogs implements Dialogs {
    public final Deque<Path> filesToOpen = new ArrayDeque<>();
    public final Deque<Path> filesToSave = new ArrayDeque<>();
    public final Deque<UnsavedChoice> unsavedAnswers = new ArrayDeque<>();
    public final List<String> errors = new ArrayList<>();
    public final List<String> information = new ArrayList<>();
    public int unsavedQuestions;

    @Override
    public Path chooseFileToOpen() {
        return filesToOpen.poll();
    }

    @Override
    public Path chooseFileToSave(String suggested, String extension) {
        return filesToSave.poll();
    }

    @Override
    public UnsavedChoice askAboutUnsavedChanges(String documentName) {
        unsavedQuestions++;
        UnsavedChoice answer = unsavedAnswers.poll();
        return answer != null ? answer : UnsavedChoice.CANCEL;
    }

    @Override
    public void showError(String title, String message) {
        errors.add(title + ": " + message);
    }

    @Override
    public void showInformation(String title, String message) {
        information.add(title + ": " + message);
    }
}
