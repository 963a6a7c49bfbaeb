package org.tracegas.ui.dialogs;

import java.nio.file.Path;
import java.time.DateTimeException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.eclipse.jface.wizard.WizardPage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.tracegas.pipeline.FileMeasurements;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.model.MeasurementKind;
import org.tracegas.store.ProjectInfo;

/**
 * The import wizard's page: the project, the files with the reader that recognises each, and the kind, time and
 * cell conditions for records whose files state none. Each file is read as the import will read it when it is
 * added, and again when the values change if it takes them, so that a file the import would refuse is named here
 * with the reason.
 */
public final class ImportFilesPage extends WizardPage {

    private final ReaderRegistry readers;
    private final List<ProjectInfo> projects;
    private final ProjectInfo selected;
    private final Map<Path, ImportPreview> previews = new LinkedHashMap<>();
    private Combo project;
    private Table table;
    private Text temperature;
    private Text pressure;
    private Text time;
    private Combo kind;

    ImportFilesPage(ReaderRegistry readers, List<ProjectInfo> projects, ProjectInfo selected) {
        super("files", "Files to import", null);
        setDescription("Each file is kept whole under the SHA-256 of its bytes; a file the project holds already"
                + " adds nothing.");
        this.readers = readers;
        this.projects = List.copyOf(projects);
        this.selected = selected;
    }

    @Override
    public void createControl(Composite parent) {
        Composite area = new Composite(parent, SWT.NONE);
        area.setLayout(new GridLayout(3, false));
        new Label(area, SWT.NONE).setText("Project");
        project = new Combo(area, SWT.READ_ONLY);
        project.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        for (ProjectInfo p : projects) {
            project.add(p.code() + " — " + p.name());
            if (selected != null && p.id().equals(selected.id())) {
                project.select(project.getItemCount() - 1);
            }
        }
        if (project.getSelectionIndex() < 0 && !projects.isEmpty()) {
            project.select(0);
        }
        project.addListener(SWT.Selection, e -> validate());

        table = new Table(area, SWT.BORDER | SWT.MULTI | SWT.FULL_SELECTION);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        GridData td = new GridData(SWT.FILL, SWT.FILL, true, true, 2, 2);
        td.heightHint = 160;
        td.widthHint = 760;
        table.setLayoutData(td);
        column("File", 190);
        column("Read by", 170);
        column("Records", 60);
        column("Time and cell conditions", 330);
        Button add = new Button(area, SWT.PUSH);
        add.setText("Add files…");
        add.setLayoutData(new GridData(SWT.FILL, SWT.TOP, false, false));
        add.addListener(SWT.Selection, e -> browse());
        Button remove = new Button(area, SWT.PUSH);
        remove.setText("Remove");
        remove.setLayoutData(new GridData(SWT.FILL, SWT.TOP, false, false));
        remove.addListener(SWT.Selection, e -> {
            for (TableItem item : table.getSelection()) {
                previews.remove((Path) item.getData());
            }
            refresh();
        });

        Group given = new Group(area, SWT.NONE);
        given.setText("For records whose files state none");
        given.setLayout(new GridLayout(4, false));
        given.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 3, 1));
        temperature = field(given, "Cell temperature (K)");
        pressure = field(given, "Cell pressure (hPa)");
        time = field(given, "Measured at (UTC, e.g. 2026-03-17T08:00:00Z)");
        new Label(given, SWT.NONE).setText("Kind");
        kind = new Combo(given, SWT.READ_ONLY);
        for (MeasurementKind k : MeasurementKind.VALUES) {
            kind.add(k.getName().toLowerCase(Locale.ROOT).replace('_', '-'));
        }
        kind.select(MeasurementKind.VALUES.indexOf(MeasurementKind.SAMPLE));
        kind.addListener(SWT.Selection, e -> recheck());
        setControl(area);
        validate();
    }

    private void column(String title, int width) {
        TableColumn c = new TableColumn(table, SWT.LEFT);
        c.setText(title);
        c.setWidth(width);
    }

    private Text field(Composite parent, String label) {
        new Label(parent, SWT.NONE).setText(label);
        Text t = new Text(parent, SWT.BORDER);
        t.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        t.addListener(SWT.Modify, e -> recheck());
        return t;
    }

    private void browse() {
        FileDialog d = new FileDialog(getShell(), SWT.OPEN | SWT.MULTI);
        d.setText("Measurement files");
        if (d.open() == null) {
            return;
        }
        List<Path> chosen = new ArrayList<>();
        for (String name : d.getFileNames()) {
            chosen.add(Path.of(d.getFilterPath(), name));
        }
        addFiles(chosen);
    }

    /** Adds files to the list (a file listed already stays once) and reads each as the import will. */
    public void addFiles(List<Path> files) {
        for (Path f : files) {
            previews.put(f.toAbsolutePath().normalize(), null);
        }
        recheck();
    }

    /**
     * Reads again, with the values now given, every file not read yet and every file that takes those values; a
     * file stating its own conditions is read once, not on every keystroke in the value fields.
     */
    private void recheck() {
        if (table == null) {
            return;
        }
        FileMeasurements.Defaults d = defaults();
        previews.replaceAll((f, p) -> p != null && p.independentOfValuesGiven() ? p
                : ImportPreview.of(readers, f, d == null ? FileMeasurements.Defaults.none() : d));
        refresh();
    }

    private void refresh() {
        table.removeAll();
        previews.forEach((f, p) -> {
            TableItem item = new TableItem(table, SWT.NONE);
            item.setData(f);
            item.setText(new String[] {f.getFileName().toString(), p.reader(),
                    p.error() == null ? Integer.toString(p.records()) : "",
                    p.error() == null ? p.conditions() : p.error()});
            item.setForeground(3, p.error() == null ? null : table.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        });
        validate();
    }

    private void validate() {
        String problem = null;
        if (project.getSelectionIndex() < 0) {
            problem = "There is no project you may import into.";
        } else if (previews.isEmpty()) {
            problem = "Add the files to import.";
        } else if (defaults() == null) {
            problem = valueProblem();
        } else {
            for (Map.Entry<Path, ImportPreview> e : previews.entrySet()) {
                if (e.getValue().error() != null) {
                    problem = e.getKey().getFileName() + " cannot be imported: " + e.getValue().error();
                    break;
                }
            }
        }
        setErrorMessage(previews.isEmpty() ? null : problem);
        setPageComplete(problem == null);
    }

    /** The project chosen, or null. */
    public ProjectInfo project() {
        int i = project.getSelectionIndex();
        return i < 0 ? null : projects.get(i);
    }

    /** The files listed, in the order added. */
    public List<Path> files() {
        return List.copyOf(previews.keySet());
    }

    /** What each listed file will give, as the table shows it: reader, records, conditions or error. */
    public List<String> rows() {
        List<String> rows = new ArrayList<>();
        for (TableItem item : table.getItems()) {
            rows.add(item.getText(0) + " | " + item.getText(1) + " | " + item.getText(2) + " | " + item.getText(3));
        }
        return rows;
    }

    public Text temperatureField() {
        return temperature;
    }

    public Text pressureField() {
        return pressure;
    }

    public Text timeField() {
        return time;
    }

    /** The values given for records whose files state none; null while one of them is not valid. */
    public FileMeasurements.Defaults defaults() {
        if (valueProblem() != null) {
            return null;
        }
        return new FileMeasurements.Defaults(MeasurementKind.VALUES.get(kind.getSelectionIndex()),
                time.getText().isBlank() ? null : Instant.parse(time.getText().strip()),
                positive(temperature.getText()), positive(pressure.getText()));
    }

    /** What is wrong with a value given, naming the field; null when all are empty or valid. */
    private String valueProblem() {
        if (!temperature.getText().isBlank() && positive(temperature.getText()) == null) {
            return "Cell temperature: '" + temperature.getText() + "' is not a positive number of kelvin.";
        }
        if (!pressure.getText().isBlank() && positive(pressure.getText()) == null) {
            return "Cell pressure: '" + pressure.getText() + "' is not a positive number of hectopascal.";
        }
        if (!time.getText().isBlank()) {
            try {
                Instant.parse(time.getText().strip());
            } catch (DateTimeException e) {
                return "Measured at: '" + time.getText() + "' is not an ISO-8601 instant such as"
                        + " 2026-03-17T08:00:00Z.";
            }
        }
        return null;
    }

    private static Double positive(String text) {
        if (text.isBlank()) {
            return null;
        }
        try {
            double v = Double.parseDouble(text.strip());
            return v > 0 && Double.isFinite(v) ? v : null;
        } catch (NumberFormatException e) {
            return null;
        }
    }
}
