package org.tracegas.report.campaign;

import org.tracegas.library.io.FileFormatException;
import org.tracegas.model.EmissionSource;
import org.tracegas.model.Project;
import org.tracegas.report.Campaign;

/**
 * Where a reported campaign measured: the one place that maps the workspace's emission source of a project, and
 * its site, to the plant and source the report names. The workspace is what the numbers are stored with, so it
 * wins; a plan that names a plant or source too must agree with it, so that no report names a stack its data
 * did not come from. A project stored without a source (workspaces made before sites were kept) takes them from
 * its plan.
 */
final class CampaignPlace {

    private CampaignPlace() {
    }

    /**
     * @param project the reported project as the store reads it, with its source if it names one
     * @throws FileFormatException naming the plan's key that disagrees with the workspace, or the missing plant
     *                             where neither names it
     */
    static Campaign of(ReportPlan plan, Project project) throws FileFormatException {
        Campaign planned = plan.campaign();
        EmissionSource source = project.getSource();
        if (source == null) {
            if (!planned.placed()) {
                throw new FileFormatException(plan.file(), 0, "plant", "project " + project.getCode()
                        + " names no emission source in the workspace, so the plan must name plant and source");
            }
            return planned;
        }
        String plant = source.getSite().getName();
        if (planned.placed()) {
            agree(plan, "plant", planned.plant(), plant, project);
            agree(plan, "source", planned.source(), source.getName(), project);
        }
        return planned.at(plant, source.getName());
    }

    private static void agree(ReportPlan plan, String key, String planned, String stored, Project project)
            throws FileFormatException {
        if (!planned.equals(stored)) {
            throw new FileFormatException(plan.file(), 0, key, "the plan says '" + planned + "', project "
                    + project.getCode() + " is measured at '" + stored + "' in the workspace");
        }
    }
}
