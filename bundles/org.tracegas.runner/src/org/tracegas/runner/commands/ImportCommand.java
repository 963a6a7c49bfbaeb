package org.tracegas.runner.commands;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.tracegas.importer.ImportException;
import org.tracegas.importer.ImportOptions;
import org.tracegas.importer.ImportedData;
import org.tracegas.importer.ImportedInterferogram;
import org.tracegas.importer.ImportedRecord;
import org.tracegas.importer.ImportedSpectrum;
import org.tracegas.importer.ReaderRegistry;
import org.tracegas.model.SpectralContent;
import org.tracegas.runner.Command;
import org.tracegas.runner.ExitCode;
import org.tracegas.runner.RunnerContext;
import org.tracegas.runner.UsageException;
import org.tracegas.spectrum.AxisUnit;
import org.tracegas.spectrum.Interferogram;
import org.tracegas.spectrum.Ordinate;
import org.tracegas.spectrum.SpectralAxis;
import org.tracegas.spectrum.Spectrum;
import org.tracegas.store.ProjectInfo;
import org.tracegas.store.Session;
import org.tracegas.store.SpectrumInput;
import org.tracegas.store.WorkspaceStore;

/**
 * Imports files into a project: the reader that recognises each file's content reads it, and each file's
 * spectra or interferograms are stored in one transaction, so a bad file leaves nothing behind.
 */
public final class ImportCommand implements Command {

    private final ReaderRegistry readers;

    public ImportCommand(ReaderRegistry readers) {
        this.readers = readers;
    }

    @Override
    public String name() {
        return "import";
    }

    @Override
    public String summary() {
        return "import spectra or interferograms from files (JCAMP-DX, delimited text, container, contributed)";
    }

    @Override
    public String usage() {
        return "usage: tracegas import <workspace and --as options> --project <code> --file <file> [--file ...]\n"
                + WorkspaceLogin.USAGE + "\n"
                + "  Each file is read by the reader that recognises its content; its records are stored in one\n"
                + "  transaction. A file that cannot be read is named with the line and field at fault.\n"
                + "exit codes: 0 all imported, 2 wrong arguments, 3 a file could not be read (earlier files stay),"
                + " 5 failure";
    }

    @Override
    public int run(List<String> arguments, RunnerContext context) throws UsageException {
        List<Path> files = new ArrayList<>();
        List<String> rest = new ArrayList<>();
        for (int i = 0; i < arguments.size(); i++) {
            if (arguments.get(i).equals("--file") && i + 1 < arguments.size()) {
                files.add(Path.of(arguments.get(++i)));
            } else {
                rest.add(arguments.get(i));
            }
        }
        if (files.isEmpty()) {
            throw new UsageException("give at least one --file");
        }
        Options options = Options.parse(rest, WorkspaceLogin.optionsWith("--project"));
        try (WorkspaceStore store = WorkspaceLogin.open(options, context)) {
            Session actor = WorkspaceLogin.logIn(store, options, context);
            String code = options.text("--project");
            ProjectInfo project = store.projects().findByCode(actor, code)
                    .orElseThrow(() -> new UsageException("no project with code " + code));
            context.progress().begin("import");
            for (int i = 0; i < files.size(); i++) {
                Path file = files.get(i);
                ImportedData data;
                try {
                    data = readers.read(file, ImportOptions.defaults());
                } catch (ImportException e) {
                    context.err().println("tracegas import: " + e.getMessage());
                    return ExitCode.BAD_INPUT;
                }
                List<SpectrumInput> inputs = new ArrayList<>();
                for (ImportedRecord r : data.records()) {
                    SpectrumInput input = toInput(r);
                    if (input == null) {
                        context.err().println("tracegas import: " + file + " lines " + r.firstLine() + "-"
                                + r.lastLine() + ": the values' meaning (absorbance, transmittance, single beam) is"
                                + " not stated; nothing of this file was imported");
                        return ExitCode.BAD_INPUT;
                    }
                    inputs.add(input);
                }
                store.spectra().storeAll(actor, project.id(), inputs);
                context.out().println(file + ": " + inputs.size() + " record(s) as " + data.format());
                context.progress().update(i + 1, files.size());
            }
            return ExitCode.OK;
        }
    }

    /** @return null when a spectrum does not say what its values are */
    private static SpectrumInput toInput(ImportedRecord record) {
        if (record instanceof ImportedSpectrum s) {
            Spectrum spectrum = s.spectrum();
            SpectralContent content = switch (spectrum.ordinate()) {
                case ABSORBANCE -> SpectralContent.ABSORBANCE;
                case TRANSMITTANCE -> SpectralContent.TRANSMITTANCE;
                case SINGLE_BEAM -> SpectralContent.SINGLE_BEAM;
                case INTERFEROGRAM -> SpectralContent.INTERFEROGRAM;
                case ARBITRARY -> null;
            };
            return content == null ? null : SpectrumInput.of(content, spectrum);
        }
        Interferogram igm = ((ImportedInterferogram) record).interferogram();
        return SpectrumInput.of(SpectralContent.INTERFEROGRAM, new Spectrum(
                SpectralAxis.uniform(AxisUnit.SAMPLE_INDEX, 0, 1, igm.size()), igm.toArray(), Ordinate.INTERFEROGRAM));
    }
}
