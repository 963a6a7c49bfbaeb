package org.tracegas.ui.parts;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import org.eclipse.core.runtime.RegistryFactory;
import org.eclipse.emf.common.command.CommandStackListener;
import org.eclipse.emf.common.command.CompoundCommand;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.edit.command.AddCommand;
import org.eclipse.emf.edit.command.RemoveCommand;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.jface.fieldassist.ControlDecoration;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;
import org.tracegas.library.io.FileFormatException;
import org.tracegas.method.MethodVersions;
import org.tracegas.method.StoredMethod;
import org.tracegas.model.AnalysisMethod;
import org.tracegas.model.AnalysisRegion;
import org.tracegas.model.ContentVersion;
import org.tracegas.model.MethodVersion;
import org.tracegas.model.WorkspaceFactory;
import org.tracegas.model.WorkspacePackage.Literals;
import org.tracegas.model.edit.ModelEditor;
import org.tracegas.preprocess.StepRegistry;
import org.tracegas.store.Session;
import org.tracegas.store.WorkspaceStore;

/**
 * Edits a draft method version in the model through the editing domain: the method's name, the settings of its
 * text's head (path length, path source, nonlinearity, tolerance, iteration limit, maximum absorbance, shift term,
 * reporting unit, fit algorithm), the processing steps of its recipe, a line-list method's cell conditions, the
 * regions (added and removed) and, region by region, the compound, the analyte's interferents, the span and the
 * baseline order. Every accepted change is one command, so Undo and Redo
 * walk back and forth through them. Fields are checked as they are typed; a
 * wrong field is marked and named below the form and the model keeps its last good value. The comparison
 * below shows the version as opened (A) beside the draft (B), both in the text of a method file. Saving
 * records the draft as a new version of the method, revised from the opened one with the reason given, in
 * the stored text the runner reads ({@link MethodVersions#save}).
 */
public final class MethodEditorPanel extends Composite {

    /**
     * The width the form's fields ask for: they fill what the view gives them but do not widen the form beyond
     * it, where their right part would be cut off.
     */
    private static final int NARROW = 60;

    /** The keys a block of the method text repeats, one value a line. */
    private static final Set<String> REPEATED = Set.of("region", "step", "gas");

    private final ModelEditor editor;
    private final Text name;
    private final Combo region;
    private final Text compound;
    private final Text interferents;
    private final Text lower;
    private final Text upper;
    private final Text baseline;
    private final Text pathLength;
    private final Text maxIterations;
    private final Combo algorithm;
    private final Combo pathSource;
    private final Button nonlinearity;
    private final Text tolerance;
    private final Text maxAbsorbance;
    private final Combo shift;
    private final Combo reportingUnit;
    private final Combo cellConditions;
    private final Text recipe;
    /** The steps the desk runs methods with, which a recipe's steps must be. */
    private final StepRegistry steps = StepRegistry.fromExtensions(RegistryFactory.getRegistry());
    private final Button addRegion;
    private final Button removeRegion;
    private final Label problems;
    private final Button undo;
    private final Button redo;
    private final Text reason;
    private final Button save;
    private final VersionComparisonPanel comparison;
    private final Map<Text, ControlDecoration> decorations = new LinkedHashMap<>();
    private final Image errorMark;
    private final CommandStackListener stackListener = e -> getDisplay().asyncExec(this::afterCommand);
    private AnalysisMethod method;
    private MethodVersion version;
    private StoredMethod stored;
    private String opened;
    private List<ContentVersion> line = List.of();
    private boolean filling;
    private WorkspaceStore store;
    private Session actor;
    /** Told after each saved version, so that views showing the workspace read it again. */
    private Runnable onSaved = () -> {
    };

    public MethodEditorPanel(Composite parent, int style, ModelEditor editor) {
        super(parent, style);
        this.editor = editor;
        errorMark = errorMark(getDisplay());
        addDisposeListener(e -> errorMark.dispose());
        setLayout(new GridLayout(1, false));
        SashForm sash = new SashForm(this, SWT.VERTICAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        // the form scrolls where the view is too low for all its fields
        ScrolledComposite scroll = new ScrolledComposite(sash, SWT.V_SCROLL);
        Composite form = new Composite(scroll, SWT.NONE);
        form.setLayout(new GridLayout(4, false));
        name = field(form, "Method name");
        pathLength = field(form, "Path length (m)");
        maxIterations = field(form, "Max. fit iterations");
        algorithm = choice(form, "Fit algorithm", Literals.METHOD_VERSION__ALGORITHM);
        pathSource = choice(form, "Path source", Literals.METHOD_VERSION__PATH_SOURCE);
        pathSource.setToolTipText("nominal: the path length; cts-derived: the effective path the campaign's"
                + " calibration transfer standard readings measure");
        new Label(form, SWT.NONE).setText("Nonlinearity");
        nonlinearity = new Button(form, SWT.CHECK);
        // a short text: the view beside the spectrum is narrow
        nonlinearity.setText("interpolate");
        nonlinearity.setToolTipText("interpolate between references of several amounts of a compound");
        nonlinearity.setLayoutData(fieldData());
        nonlinearity.addListener(SWT.Selection, e -> {
            if (!filling && version != null && nonlinearity.getSelection() != version.isNonlinearity()) {
                editor.set(version, Literals.METHOD_VERSION__NONLINEARITY, nonlinearity.getSelection());
                afterCommand();
            }
        });
        tolerance = field(form, "Fit tolerance");
        tolerance.setMessage("relative change at which the fit stops");
        maxAbsorbance = field(form, "Max. absorbance");
        shift = choice(form, "Shift term", Literals.METHOD_VERSION__SHIFT_TERM);
        shift.setToolTipText("curve-of-growth offers scale; classical least squares shift and shift-and-width");
        reportingUnit = choice(form, "Reporting unit", Literals.METHOD_VERSION__REPORTING_UNIT);
        // what the runner and the desk store and report stays in ppm, whatever the method names here
        reportingUnit.setToolTipText("kept with the method; the desk and the runner store and report results in"
                + " ppm");
        cellConditions = choice(form, "Cell conditions", Literals.METHOD_VERSION__CELL_CONDITIONS);
        cellConditions.setToolTipText("line-list methods: spectra computed at the method's stated cell conditions"
                + " or at each measurement's measured ones");
        new Label(form, SWT.NONE).setText("Recipe steps");
        recipe = new Text(form, SWT.MULTI | SWT.BORDER | SWT.V_SCROLL);
        recipe.setMessage("processing steps before the fit, one a line");
        recipe.setToolTipText("one step a line, as a method file's [recipe] writes it after 'step = ',"
                + " e.g. baseline degree=1;regions=2000:2010,2390:2400");
        GridData recipeData = fieldData();
        GC lines = new GC(recipe);
        recipeData.heightHint = 3 * lines.getFontMetrics().getHeight();
        lines.dispose();
        recipe.setLayoutData(recipeData);
        decorate(recipe);
        new Label(form, SWT.NONE).setText("Analysis region");
        region = new Combo(form, SWT.READ_ONLY);
        GridData cd = new GridData(SWT.FILL, SWT.CENTER, true, false, 3, 1);
        cd.widthHint = NARROW;
        region.setLayoutData(cd);
        region.addListener(SWT.Selection, e -> fill());
        // the buttons on a line of their own below the choice, which keeps the narrow view's width
        new Label(form, SWT.NONE);
        Composite regionButtons = new Composite(form, SWT.NONE);
        GridLayout rl = new GridLayout(2, true);
        rl.marginWidth = 0;
        rl.marginHeight = 0;
        regionButtons.setLayout(rl);
        regionButtons.setLayoutData(new GridData(SWT.BEGINNING, SWT.CENTER, false, false, 3, 1));
        addRegion = new Button(regionButtons, SWT.PUSH);
        addRegion.setText("Add");
        addRegion.setToolTipText("Adds a region of the selected region's analyte beside it");
        addRegion.addListener(SWT.Selection, e -> addRegion());
        removeRegion = new Button(regionButtons, SWT.PUSH);
        removeRegion.setText("Remove");
        removeRegion.addListener(SWT.Selection, e -> removeRegion());
        compound = field(form, "Compound");
        interferents = field(form, "Interferents");
        interferents.setMessage("compounds fitted with it, separated by commas");
        lower = field(form, "Lower wavenumber (cm⁻¹)");
        upper = field(form, "Upper wavenumber (cm⁻¹)");
        baseline = field(form, "Baseline order");
        baseline.setMessage("0 offset, 1 sloping line, up to " + org.tracegas.quantify.AnalysisRegion.MAX_BASELINE_ORDER);
        scroll.setContent(form);
        scroll.setExpandHorizontal(true);
        scroll.setExpandVertical(true);
        scroll.addListener(SWT.Resize, e -> scroll.setMinSize(form.computeSize(scroll.getClientArea().width,
                SWT.DEFAULT)));
        comparison = new VersionComparisonPanel(sash, SWT.NONE);
        // the problems, the reason and the buttons below both, in sight however far the form is scrolled
        problems = new Label(this, SWT.WRAP);
        problems.setForeground(getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        GridData pd = new GridData(SWT.FILL, SWT.TOP, true, false);
        pd.widthHint = NARROW;
        // two lines kept for the message, so that one appearing does not need the panel laid out again
        GC metrics = new GC(problems);
        pd.heightHint = 2 * metrics.getFontMetrics().getHeight();
        metrics.dispose();
        problems.setLayoutData(pd);
        // the reason on a line of its own and the buttons below it: the view beside the spectrum is narrow
        Composite buttons = new Composite(this, SWT.NONE);
        buttons.setLayout(new GridLayout(3, false));
        buttons.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        reason = new Text(buttons, SWT.BORDER);
        reason.setMessage("Reason for the new version");
        GridData rd = new GridData(SWT.FILL, SWT.CENTER, true, false, 3, 1);
        rd.widthHint = NARROW;
        reason.setLayoutData(rd);
        undo = new Button(buttons, SWT.PUSH);
        undo.setText("Undo");
        undo.addListener(SWT.Selection, e -> {
            editor.undo();
            listRegions(region.getSelectionIndex());
        });
        redo = new Button(buttons, SWT.PUSH);
        redo.setText("Redo");
        redo.addListener(SWT.Selection, e -> {
            editor.redo();
            listRegions(region.getSelectionIndex());
        });
        save = new Button(buttons, SWT.PUSH);
        save.setText("Save as new version");
        save.addListener(SWT.Selection, e -> save());
        sash.setWeights(1, 1);
        // the form gets the height it needs (at most three fifths: with the whole head of the method text it is
        // taller than most views and scrolls), the comparison the rest
        sash.addListener(SWT.Resize, e -> {
            org.eclipse.swt.graphics.Rectangle area = sash.getClientArea();
            if (area.height > 0) {
                int top = Math.min(form.computeSize(area.width, SWT.DEFAULT).y, area.height * 3 / 5);
                sash.setWeights(top, Math.max(1, area.height - top));
            }
        });
        editor.domain().getCommandStack().addCommandStackListener(stackListener);
        addDisposeListener(e -> editor.domain().getCommandStack().removeCommandStackListener(stackListener));
        name.addListener(SWT.Modify, e -> apply(name, method, Literals.ANALYSIS_METHOD__NAME,
                FieldCheck.text("Method name", name.getText()), name.getText()));
        compound.addListener(SWT.Modify, e -> apply(compound, selectedRegion(), Literals.ANALYSIS_REGION__COMPOUND,
                FieldCheck.text("Compound", compound.getText()), compound.getText().trim()));
        interferents.addListener(SWT.Modify, e -> applyInterferents());
        lower.addListener(SWT.Modify, e -> applyBound(lower, Literals.ANALYSIS_REGION__LOWER_WAVENUMBER,
                "Lower wavenumber"));
        upper.addListener(SWT.Modify, e -> applyBound(upper, Literals.ANALYSIS_REGION__UPPER_WAVENUMBER,
                "Upper wavenumber"));
        number(baseline, this::selectedRegion, Literals.ANALYSIS_REGION__BASELINE_ORDER, FieldCheck::baselineOrder,
                Integer::valueOf);
        number(pathLength, () -> version, Literals.METHOD_VERSION__PATH_LENGTH, FieldCheck::pathLength,
                Double::valueOf);
        number(maxIterations, () -> version, Literals.METHOD_VERSION__MAX_ITERATIONS, FieldCheck::maxIterations,
                Integer::valueOf);
        number(tolerance, () -> version, Literals.METHOD_VERSION__TOLERANCE, FieldCheck::tolerance, Double::valueOf);
        number(maxAbsorbance, () -> version, Literals.METHOD_VERSION__MAX_ABSORBANCE, FieldCheck::maxAbsorbance,
                Double::valueOf);
        recipe.addListener(SWT.Modify, e -> {
            List<String> typed = FieldCheck.lines(recipe.getText());
            apply(recipe, version, Literals.METHOD_VERSION__RECIPE_STEPS, FieldCheck.recipeSteps(typed, steps),
                    typed);
        });
        updateButtons();
    }

    /** A number typed into a field sets a feature of its owner once the check finds nothing wrong with it. */
    private void number(Text field, java.util.function.Supplier<org.eclipse.emf.ecore.EObject> owner,
            EStructuralFeature feature, java.util.function.UnaryOperator<String> check,
            java.util.function.Function<String, Object> value) {
        field.addListener(SWT.Modify, e -> {
            String problem = check.apply(field.getText());
            apply(field, owner.get(), feature, problem, problem == null ? value.apply(field.getText().trim()) : null);
        });
    }

    /** The layout of a field or choice: the three columns right of its label, as wide as the view gives. */
    private static GridData fieldData() {
        GridData gd = new GridData(SWT.FILL, SWT.CENTER, true, false, 3, 1);
        gd.horizontalIndent = 8;
        gd.widthHint = NARROW;
        return gd;
    }

    private Text field(Composite form, String label) {
        new Label(form, SWT.NONE).setText(label);
        Text t = new Text(form, SWT.BORDER);
        t.setLayoutData(fieldData());
        decorate(t);
        return t;
    }

    /** The mark a field shows while its text is refused. */
    private void decorate(Text t) {
        ControlDecoration d = new ControlDecoration(t, SWT.LEFT | SWT.CENTER);
        d.setImage(errorMark);
        d.hide();
        decorations.put(t, d);
    }

    /** A read-only choice of a method version's feature: choosing sets it through one command. */
    private Combo choice(Composite form, String label, EStructuralFeature feature) {
        new Label(form, SWT.NONE).setText(label);
        Combo c = new Combo(form, SWT.READ_ONLY);
        c.setLayoutData(fieldData());
        c.addListener(SWT.Selection, e -> {
            if (!filling && version != null && !c.getText().equals(version.eGet(feature))) {
                editor.set(version, feature, c.getText());
                afterCommand();
            }
        });
        return c;
    }

    /** A small red disc with a white bar, drawn here so it needs no image files. */
    private static Image errorMark(Display display) {
        Image img = new Image(display, 9, 9);
        GC gc = new GC(img);
        gc.setBackground(display.getSystemColor(SWT.COLOR_WIDGET_BACKGROUND));
        gc.fillRectangle(0, 0, 9, 9);
        gc.setBackground(Palette.BROKEN);
        gc.fillOval(0, 0, 9, 9);
        gc.setBackground(display.getSystemColor(SWT.COLOR_WHITE));
        gc.fillRectangle(2, 4, 5, 1);
        gc.dispose();
        return img;
    }

    /** Where Save records new versions, and as whom; without it Save stays disabled. */
    public void saveTo(WorkspaceStore store, Session actor) {
        this.store = store;
        this.actor = actor;
        updateButtons();
    }

    /** {@code action} runs after each version Save records (on the UI thread). */
    public void whenSaved(Runnable action) {
        onSaved = action;
    }

    /**
     * Opens a stored method version afresh from the store given to {@link #saveTo}; an unsaved draft of another
     * version is dropped. A version whose text cannot be read is named below the form, and nothing is opened.
     */
    public void openStored(String versionId) {
        StoredMethod read;
        ContentVersion info;
        try {
            info = store.versions().version(versionId);
            read = StoredMethod.parse(store.versions().content(versionId), "method version " + versionId);
        } catch (FileFormatException | RuntimeException e) {
            problems.setText("The method version cannot be opened: " + e.getMessage());
            return;
        }
        AnalysisMethod opened = MethodVersions.model(info, read);
        editor.createResource("desk:/method/" + versionId).getContents().add(opened);
        editor.domain().getCommandStack().flush();
        open(opened, opened.getVersions().get(0), read);
    }

    /**
     * Opens a method version (it must sit in a resource of the editor's resource set) with the method its stored
     * text holds.
     */
    public void open(AnalysisMethod method, MethodVersion version, StoredMethod stored) {
        this.method = method;
        this.version = version;
        this.stored = stored;
        this.opened = stored.declaration();
        this.line = readLine();
        algorithm.setItems(MethodVersions.algorithms(stored).toArray(String[]::new));
        pathSource.setItems(MethodVersions.pathSources().toArray(String[]::new));
        shift.setItems(MethodVersions.shiftTerms().toArray(String[]::new));
        reportingUnit.setItems(MethodVersions.reportingUnits().toArray(String[]::new));
        cellConditions.setItems(MethodVersions.cellConditions().toArray(String[]::new));
        listRegions(0);
    }

    /** Lists the draft's regions, selects the one at the index (or the last) and fills the form. */
    private void listRegions(int select) {
        region.removeAll();
        for (AnalysisRegion r : version.getRegions()) {
            region.add(r.getCompound() + "  " + Math.round(r.getLowerWavenumber()) + "–"
                    + Math.round(r.getUpperWavenumber()) + " cm⁻¹");
        }
        region.select(Math.max(0, Math.min(select, region.getItemCount() - 1)));
        fill();
    }

    /**
     * Adds, right after the selected region, a region of its analyte (compound, interferents, baseline order) over
     * a span of the same width 1 cm⁻¹ above it (an analyte's regions must not touch): one command.
     */
    private void addRegion() {
        AnalysisRegion r = selectedRegion();
        if (r == null) {
            return;
        }
        AnalysisRegion added = WorkspaceFactory.eINSTANCE.createAnalysisRegion();
        added.setCompound(r.getCompound());
        added.getInterferents().addAll(r.getInterferents());
        added.setBaselineOrder(r.getBaselineOrder());
        added.setLowerWavenumber(r.getUpperWavenumber() + 1);
        added.setUpperWavenumber(Math.min(FieldCheck.HIGHEST, 2 * r.getUpperWavenumber() - r.getLowerWavenumber() + 1));
        int at = region.getSelectionIndex() + 1;
        editor.domain().getCommandStack().execute(AddCommand.create(editor.domain(), version,
                Literals.METHOD_VERSION__REGIONS, added, at));
        listRegions(at);
    }

    /** Removes the selected region (one command); the method keeps at least one. */
    private void removeRegion() {
        AnalysisRegion r = selectedRegion();
        if (r == null) {
            return;
        }
        if (version.getRegions().size() == 1) {
            problems.setText("Regions: a method needs at least one region; add another before removing this one");
            return;
        }
        int at = region.getSelectionIndex();
        editor.domain().getCommandStack().execute(RemoveCommand.create(editor.domain(), version,
                Literals.METHOD_VERSION__REGIONS, r));
        listRegions(at);
    }

    private AnalysisRegion selectedRegion() {
        int i = region.getSelectionIndex();
        return version == null || i < 0 ? null : version.getRegions().get(i);
    }

    private void fill() {
        filling = true;
        try {
            name.setText(method.getName());
            pathLength.setText(Double.toString(version.getPathLength()));
            maxIterations.setText(Integer.toString(version.getMaxIterations()));
            algorithm.select(algorithm.indexOf(version.getAlgorithm()));
            pathSource.select(pathSource.indexOf(version.getPathSource()));
            nonlinearity.setSelection(version.isNonlinearity());
            tolerance.setText(Double.toString(version.getTolerance()));
            maxAbsorbance.setText(Double.toString(version.getMaxAbsorbance()));
            shift.select(shift.indexOf(version.getShiftTerm()));
            reportingUnit.select(reportingUnit.indexOf(version.getReportingUnit()));
            cellConditions.select(cellConditions.indexOf(version.getCellConditions()));
            recipe.setText(String.join("\n", version.getRecipeSteps()));
            AnalysisRegion r = selectedRegion();
            compound.setText(r == null ? "" : r.getCompound());
            interferents.setText(r == null ? "" : String.join(", ", r.getInterferents()));
            lower.setText(r == null ? "" : number(r.getLowerWavenumber()));
            upper.setText(r == null ? "" : number(r.getUpperWavenumber()));
            baseline.setText(r == null ? "" : Integer.toString(r.getBaselineOrder()));
        } finally {
            filling = false;
        }
        decorations.forEach((t, d) -> {
            d.hide();
            t.setBackground(null);
        });
        problems.setText("");
        refreshComparison();
        updateButtons();
    }

    private void applyBound(Text field, EStructuralFeature feature, String label) {
        String problem = FieldCheck.wavenumber(label, field.getText());
        if (problem == null) {
            problem = FieldCheck.order(lower.getText(), upper.getText());
        }
        apply(field, selectedRegion(), feature, problem, problem == null ? Double.valueOf(field.getText().trim()) : null);
    }

    /**
     * The interferents belong to the analyte: one command sets them on every region of the selected region's
     * analyte, so that one Undo takes the whole change back.
     */
    private void applyInterferents() {
        AnalysisRegion r = selectedRegion();
        if (filling || r == null) {
            return;
        }
        Set<String> known = new TreeSet<>();
        stored.method().references().forEach(ref -> known.add(ref.compound()));
        String problem = FieldCheck.interferents(interferents.getText(), r.getCompound(), known);
        if (mark(interferents, problem)) {
            return;
        }
        List<String> value = FieldCheck.split(interferents.getText());
        if (value.equals(r.getInterferents())) {
            return;
        }
        CompoundCommand change = new CompoundCommand("Interferents of " + r.getCompound());
        for (AnalysisRegion same : analyteRegions(r)) {
            change.append(SetCommand.create(editor.domain(), same, Literals.ANALYSIS_REGION__INTERFERENTS, value));
        }
        editor.domain().getCommandStack().execute(change);
        afterCommand();
    }

    /** The regions of the analyte a region belongs to: the run of regions of its compound around it. */
    private List<AnalysisRegion> analyteRegions(AnalysisRegion r) {
        List<AnalysisRegion> all = version.getRegions();
        int first = all.indexOf(r);
        int last = first;
        while (first > 0 && all.get(first - 1).getCompound().equals(r.getCompound())) {
            first--;
        }
        while (last < all.size() - 1 && all.get(last + 1).getCompound().equals(r.getCompound())) {
            last++;
        }
        return List.copyOf(all.subList(first, last + 1));
    }

    /** Marks a field and names its problem below the form, or clears the mark; true when marked. */
    private boolean mark(Text field, String problem) {
        ControlDecoration d = decorations.get(field);
        if (problem != null) {
            d.setDescriptionText(problem);
            d.show();
            field.setBackground(Palette.FAIL);
            problems.setText(problem);
            return true;
        }
        d.hide();
        field.setBackground(null);
        problems.setText("");
        return false;
    }

    private void apply(Text field, org.eclipse.emf.ecore.EObject owner, EStructuralFeature feature, String problem,
            Object value) {
        if (filling || owner == null || mark(field, problem)) {
            return;
        }
        if (!value.equals(owner.eGet(feature))) {
            editor.set(owner, feature, value);
            afterCommand();
        }
    }

    /** After any command: the fields being typed in stay as they are, buttons and comparison follow. */
    private void afterCommand() {
        if (!isDisposed() && method != null) {
            updateButtons();
            refreshComparison();
        }
    }

    /**
     * Offers the draft and every version of the method's line (the opened one, its ancestors and, from the store,
     * those revised from it up to the newest) to compare, in the key=value fields of the whole method text; at
     * first the version as opened beside the draft.
     */
    private void refreshComparison() {
        String draft;
        try {
            draft = MethodVersions.edited(stored, method, version).declaration();
        } catch (IllegalArgumentException e) {
            draft = opened;
            problems.setText(e.getMessage());
        }
        String asOpened = "Version " + version.getNumber() + " as opened";
        Map<String, String> texts = new LinkedHashMap<>();
        texts.put("Draft", draft);
        texts.put(asOpened, opened);
        for (ContentVersion v : line) {
            if (!v.getId().equals(version.getId())) {
                texts.put("Version " + v.getNumber(), v.getId());
            }
        }
        String drafted = draft;
        comparison.offer(List.copyOf(texts.keySet()), label -> fields(label.equals("Draft") ? drafted
                : label.equals(asOpened) ? opened : declaration(texts.get(label))), asOpened, "Draft");
    }

    /**
     * The stored versions of the method from the newest back to the first, newest first; none without a store.
     * Read when a version is opened, not at every keystroke.
     */
    private List<ContentVersion> readLine() {
        if (store == null || version.getId() == null) {
            return List.of();
        }
        List<ContentVersion> found = new java.util.ArrayList<>();
        try {
            ContentVersion v = store.versions().latest(org.tracegas.model.VersionKind.METHOD, method.getName())
                    .orElse(null);
            while (v != null) {
                found.add(v);
                v = v.getParentId() == null ? null : store.versions().version(v.getParentId());
            }
        } catch (RuntimeException e) {
            // the versions that could be read are offered; the reason is named below the form
            problems.setText("The method's versions could not all be read: " + e.getMessage());
        }
        return found;
    }

    /**
     * The method text of a stored version.
     *
     * @throws IllegalArgumentException naming the version whose stored text cannot be read
     */
    private String declaration(String versionId) {
        try {
            return StoredMethod.parse(store.versions().content(versionId), "method version " + versionId)
                    .declaration();
        } catch (FileFormatException e) {
            throw new IllegalArgumentException("The version cannot be compared: " + e.getMessage(), e);
        }
    }

    /**
     * A method file's text as one key=value line per value, each key made unique by its block and the value's
     * place: "analyte.2.region.1=...", "recipe.1.step.2=...".
     */
    static String fields(String methodText) {
        StringBuilder s = new StringBuilder();
        Map<String, Integer> blocks = new LinkedHashMap<>();
        Map<String, Integer> keys = new LinkedHashMap<>();
        String prefix = "";
        for (String line : methodText.split("\n")) {
            String t = line.strip();
            if (t.startsWith("[") && t.endsWith("]")) {
                String block = t.substring(1, t.length() - 1);
                prefix = block + "." + blocks.merge(block, 1, Integer::sum) + ".";
                keys.clear();
            } else if (t.contains("=")) {
                String key = t.substring(0, t.indexOf('=')).strip();
                String value = t.substring(t.indexOf('=') + 1).strip();
                String unique = REPEATED.contains(key) ? key + "." + keys.merge(key, 1, Integer::sum) : key;
                s.append(prefix).append(unique).append('=').append(value).append('\n');
            }
        }
        return s.toString();
    }

    private void save() {
        ContentVersion next;
        StoredMethod edited;
        try {
            edited = MethodVersions.edited(stored, method, version);
            next = MethodVersions.save(store, actor, method, version, reason.getText());
        } catch (IllegalArgumentException | FileFormatException e) {
            problems.setText(e.getMessage());
            return;
        }
        // the opened version stays as it was stored; the draft becomes the new version, opened afresh
        MethodVersions.fillRegions(version, stored);
        MethodVersion saved = MethodVersions.model(next, edited).getVersions().get(0);
        method.getVersions().add(saved);
        editor.domain().getCommandStack().flush();
        reason.setText("");
        open(method, saved, edited);
        problems.setText("Saved as version " + next.getNumber() + ".");
        onSaved.run();
    }

    private void updateButtons() {
        undo.setEnabled(editor.canUndo());
        redo.setEnabled(editor.canRedo());
        removeRegion.setEnabled(version != null && version.getRegions().size() > 1);
        // only a line-list method computes its spectra at cell conditions; other algorithms do not read them
        cellConditions.setEnabled(version != null && !version.getCellConditions().isEmpty()
                && version.getAlgorithm().equals(stored.method().algorithm().name()));
        save.setEnabled(store != null && editor.canUndo());
    }

    private static String number(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }

    public Text nameField() {
        return name;
    }

    public Text lowerField() {
        return lower;
    }

    public Text upperField() {
        return upper;
    }

    public Text interferentsField() {
        return interferents;
    }

    public Text compoundField() {
        return compound;
    }

    public Text baselineField() {
        return baseline;
    }

    public Text pathLengthField() {
        return pathLength;
    }

    public Text maxIterationsField() {
        return maxIterations;
    }

    public Combo algorithmChooser() {
        return algorithm;
    }

    public Combo pathSourceChooser() {
        return pathSource;
    }

    public Button nonlinearityCheck() {
        return nonlinearity;
    }

    public Text toleranceField() {
        return tolerance;
    }

    public Text maxAbsorbanceField() {
        return maxAbsorbance;
    }

    public Combo shiftChooser() {
        return shift;
    }

    public Combo reportingUnitChooser() {
        return reportingUnit;
    }

    public Combo cellConditionsChooser() {
        return cellConditions;
    }

    public Text recipeField() {
        return recipe;
    }

    public Button addRegionButton() {
        return addRegion;
    }

    public Button removeRegionButton() {
        return removeRegion;
    }

    public Combo regionChooser() {
        return region;
    }

    public Label problems() {
        return problems;
    }

    public Button undoButton() {
        return undo;
    }

    public Button redoButton() {
        return redo;
    }

    public Text reasonField() {
        return reason;
    }

    public Button saveButton() {
        return save;
    }

    public VersionComparisonPanel comparison() {
        return comparison;
    }

    public boolean decorated(Text field) {
        return decorations.get(field).isVisible();
    }
}
