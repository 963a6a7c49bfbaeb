package org.tracegas.ui.prefs;

import org.eclipse.jface.preference.FieldEditorPreferencePage;
import org.eclipse.jface.preference.StringFieldEditor;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.IWorkbenchPreferencePage;
import org.eclipse.ui.preferences.ScopedPreferenceStore;
import org.eclipse.core.runtime.preferences.InstanceScope;

/**
 * Workspace folder and lab server. No acceptance criterion is set here: those come with the method and QA plan.
 */
public final class DeskPreferencePage extends FieldEditorPreferencePage implements IWorkbenchPreferencePage {

    public DeskPreferencePage() {
        super(GRID);
        setDescription("Where the desks find the workspace. A changed workspace or server is used at the "
                + "next start. The lab server's database password is taken from the environment variable "
                + DeskPreferences.SERVER_PASSWORD_VARIABLE + ". Acceptance criteria, such as a background's age limit, "
                + "come with the method and QA plan, not from here.");
    }

    @Override
    public void init(IWorkbench workbench) {
        setPreferenceStore(new ScopedPreferenceStore(InstanceScope.INSTANCE, "org.tracegas.ui"));
        DeskPreferences.setDefaults(getPreferenceStore());
    }

    @Override
    protected void createFieldEditors() {
        // a plain text field: the folder may not exist yet, it is created at the next start
        StringFieldEditor folder = new StringFieldEditor(DeskPreferences.WORKSPACE_FOLDER,
                "Workspace folder (created when missing)", getFieldEditorParent());
        folder.setEmptyStringAllowed(false);
        folder.setErrorMessage("Workspace folder: must not be empty");
        addField(folder);
        addField(new ServerUrlEditor(DeskPreferences.SERVER_URL, "Lab server URL (empty: local workspace)",
                getFieldEditorParent()));
        addField(new StringFieldEditor(DeskPreferences.SERVER_USER, "Lab server database user",
                getFieldEditorParent()));
    }

    /** Accepts an empty text or a jdbc:postgresql: URL. */
    static final class ServerUrlEditor extends StringFieldEditor {
        ServerUrlEditor(String name, String label, org.eclipse.swt.widgets.Composite parent) {
            super(name, label, parent);
            setEmptyStringAllowed(true);
            setErrorMessage("Lab server URL: must start with jdbc:postgresql:// or be empty");
        }

        @Override
        protected boolean doCheckState() {
            String v = getStringValue().trim();
            return v.isEmpty() || v.startsWith("jdbc:postgresql://");
        }
    }
}
