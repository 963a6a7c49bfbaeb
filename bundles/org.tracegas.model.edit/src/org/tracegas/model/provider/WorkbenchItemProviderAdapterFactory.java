package org.tracegas.model.provider;

import java.math.BigDecimal;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;

import org.eclipse.emf.common.notify.Adapter;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.AnalysisRegion;
import org.tracegas.model.Client;
import org.tracegas.model.EmissionSource;
import org.tracegas.model.Instrument;
import org.tracegas.model.Measurement;
import org.tracegas.model.MeasurementKind;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.ProcessedSpectrum;
import org.tracegas.model.Project;
import org.tracegas.model.ReferenceLibrary;
import org.tracegas.model.ReferenceOrigin;
import org.tracegas.model.ReferenceSpectrum;
import org.tracegas.model.Report;
import org.tracegas.model.Site;
import org.tracegas.model.SpectralContent;
import org.tracegas.model.WorkBatch;

/**
 * The generated item providers with the labels the workbench shows: a client, a site and an emission source by
 * their names, a campaign by its code, name and measurement count, a measurement by its kind and start (UTC),
 * a processed spectrum by its content and point count, an instrument by its name and serial number, a reference
 * spectrum by its compound and amount (and whether it was computed), a report by its id and issue time, a method
 * version by its number and whether results use it, a work batch by its unit count and when it was created
 * (UTC). The generated labels put the type's name first ("Client Eastfield Cement"),
 * which the tree's structure already says; the generated code stays as the genmodel makes it, so the labels
 * are given here, by overriding only {@code getText} of the generated providers.
 */
public class WorkbenchItemProviderAdapterFactory extends WorkspaceItemProviderAdapterFactory {

    private static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'")
            .withZone(ZoneOffset.UTC);

    @Override
    public Adapter createClientAdapter() {
        if (clientItemProvider == null) {
            clientItemProvider = new ClientItemProvider(this) {
                @Override
                public String getText(Object object) {
                    return ((Client) object).getName();
                }
            };
        }
        return clientItemProvider;
    }

    @Override
    public Adapter createProjectAdapter() {
        if (projectItemProvider == null) {
            projectItemProvider = new ProjectItemProvider(this) {
                @Override
                public String getText(Object object) {
                    Project p = (Project) object;
                    return p.getCode() + "  " + p.getName() + "  (" + p.getMeasurements().size() + " measurements)";
                }
            };
        }
        return projectItemProvider;
    }

    @Override
    public Adapter createMeasurementAdapter() {
        if (measurementItemProvider == null) {
            measurementItemProvider = new MeasurementItemProvider(this) {
                @Override
                public String getText(Object object) {
                    Measurement m = (Measurement) object;
                    return kind(m.getKind()) + "  " + time(m.getTime());
                }
            };
        }
        return measurementItemProvider;
    }

    @Override
    public Adapter createSiteAdapter() {
        if (siteItemProvider == null) {
            siteItemProvider = new SiteItemProvider(this) {
                @Override
                public String getText(Object object) {
                    return ((Site) object).getName();
                }
            };
        }
        return siteItemProvider;
    }

    @Override
    public Adapter createEmissionSourceAdapter() {
        if (emissionSourceItemProvider == null) {
            emissionSourceItemProvider = new EmissionSourceItemProvider(this) {
                @Override
                public String getText(Object object) {
                    return ((EmissionSource) object).getName();
                }
            };
        }
        return emissionSourceItemProvider;
    }

    @Override
    public Adapter createInstrumentAdapter() {
        if (instrumentItemProvider == null) {
            instrumentItemProvider = new InstrumentItemProvider(this) {
                @Override
                public String getText(Object object) {
                    Instrument i = (Instrument) object;
                    return i.getName() + "  (serial " + i.getSerialNumber() + ")";
                }
            };
        }
        return instrumentItemProvider;
    }

    @Override
    public Adapter createProcessedSpectrumAdapter() {
        if (processedSpectrumItemProvider == null) {
            processedSpectrumItemProvider = new ProcessedSpectrumItemProvider(this) {
                @Override
                public String getText(Object object) {
                    ProcessedSpectrum s = (ProcessedSpectrum) object;
                    return content(s.getContent()) + "  " + (s.getSpectrum() == null ? "(values not read)"
                            : s.getSpectrum().size() + " points");
                }
            };
        }
        return processedSpectrumItemProvider;
    }

    @Override
    public Adapter createReportAdapter() {
        if (reportItemProvider == null) {
            reportItemProvider = new ReportItemProvider(this) {
                @Override
                public String getText(Object object) {
                    Report r = (Report) object;
                    return "report " + r.getReportId() + "  issued " + time(r.getIssued());
                }
            };
        }
        return reportItemProvider;
    }

    @Override
    public Adapter createReferenceLibraryAdapter() {
        if (referenceLibraryItemProvider == null) {
            referenceLibraryItemProvider = new ReferenceLibraryItemProvider(this) {
                @Override
                public String getText(Object object) {
                    ReferenceLibrary l = (ReferenceLibrary) object;
                    return l.getName() + (l.getDescription() == null ? "" : "  — " + l.getDescription());
                }
            };
        }
        return referenceLibraryItemProvider;
    }

    @Override
    public Adapter createReferenceSpectrumAdapter() {
        if (referenceSpectrumItemProvider == null) {
            referenceSpectrumItemProvider = new ReferenceSpectrumItemProvider(this) {
                @Override
                public String getText(Object object) {
                    ReferenceSpectrum r = (ReferenceSpectrum) object;
                    // a computed spectrum is never to be taken for a measured one
                    return r.getCompound() + (Double.isNaN(r.getPpmMetres()) ? ""
                            : "  " + number(r.getPpmMetres()) + " ppm\u00b7m")
                            + (r.getOrigin() == ReferenceOrigin.SYNTHETIC ? "  (synthetic)" : "");
                }
            };
        }
        return referenceSpectrumItemProvider;
    }

    @Override
    public Adapter createAnalysisMethodAdapter() {
        if (analysisMethodItemProvider == null) {
            analysisMethodItemProvider = new AnalysisMethodItemProvider(this) {
                @Override
                public String getText(Object object) {
                    return ((AnalysisMethod) object).getName();
                }
            };
        }
        return analysisMethodItemProvider;
    }

    @Override
    public Adapter createMethodVersionAdapter() {
        if (methodVersionItemProvider == null) {
            methodVersionItemProvider = new MethodVersionItemProvider(this) {
                @Override
                public String getText(Object object) {
                    MethodVersion v = (MethodVersion) object;
                    return "version " + v.getNumber() + (v.isFrozen() ? " (frozen)" : " (draft)");
                }
            };
        }
        return methodVersionItemProvider;
    }

    @Override
    public Adapter createAnalysisRegionAdapter() {
        if (analysisRegionItemProvider == null) {
            analysisRegionItemProvider = new AnalysisRegionItemProvider(this) {
                @Override
                public String getText(Object object) {
                    AnalysisRegion r = (AnalysisRegion) object;
                    return r.getCompound() + "  " + number(r.getLowerWavenumber()) + "–"
                            + number(r.getUpperWavenumber()) + " cm-1";
                }
            };
        }
        return analysisRegionItemProvider;
    }

    @Override
    public Adapter createWorkBatchAdapter() {
        if (workBatchItemProvider == null) {
            workBatchItemProvider = new WorkBatchItemProvider(this) {
                @Override
                public String getText(Object object) {
                    WorkBatch b = (WorkBatch) object;
                    // the description is the creating command's multi-line text: the properties show it
                    return "work batch of " + b.getUnitCount() + (b.getUnitCount() == 1 ? " unit  " : " units  ")
                            + time(b.getCreatedAt());
                }
            };
        }
        return workBatchItemProvider;
    }

    /** A measurement's kind as the properties show it too (plugin.properties: "calibration transfer standard"). */
    public static String kind(MeasurementKind kind) {
        return WorkspaceEditPlugin.INSTANCE.getString("_UI_MeasurementKind_" + kind.getName() + "_literal");
    }

    /** What spectral values are, as the properties show it too (plugin.properties: "single beam"). */
    public static String content(SpectralContent content) {
        return WorkspaceEditPlugin.INSTANCE.getString("_UI_SpectralContent_" + content.getName() + "_literal");
    }

    /** A point in time as the tree shows it, in UTC to the second; "time unknown" for none. */
    public static String time(Instant time) {
        return time == null ? "time unknown" : TIME.format(time);
    }

    private static String number(double value) {
        return BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }
}
