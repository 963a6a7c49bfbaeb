package org.tracegas.ui.internal;

import java.util.Map;

import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IConfigurationElement;
import org.eclipse.core.runtime.IExecutableExtension;
import org.eclipse.core.runtime.Status;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.ui.handlers.HandlerUtil;

/**
 * A desk command whose work only the runner does so far: it says so, and which runner command does the work on
 * the open workspace, instead of offering a menu entry that does nothing. The runner command is given after the
 * class name in plugin.xml ({@code class="...RunnerCommandHandler:import"}).
 */
public final class RunnerCommandHandler extends AbstractHandler implements IExecutableExtension {

    /** What each runner command does, as the message names it. */
    private static final Map<String, String> WORK = Map.of(
            "report", "Making a campaign report (PDF with its CSV of results)");

    private String runnerCommand;

    @Override
    public void setInitializationData(IConfigurationElement config, String property, Object data)
            throws CoreException {
        if (!(data instanceof String s) || !WORK.containsKey(s)) {
            throw new CoreException(Status.error("handler " + config.getAttribute("commandId")
                    + " names no known runner command after its class: " + data + " (one of " + WORK.keySet()
                    + ")"));
        }
        runnerCommand = s;
    }

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        MessageDialog.openInformation(HandlerUtil.getActiveShellChecked(event), "Tracegas Workbench",
                message(runnerCommand));
        return null;
    }

    /** The message shown for a runner command. */
    static String message(String runnerCommand) {
        return WORK.get(runnerCommand) + " is not available in the workbench yet. Run 'tracegas " + runnerCommand
                + " --help' for how the runner does it on this workspace; what it stores (and its audit records)"
                + " then shows here when you select the project again.";
    }
}
