package org.tracegas.releng.emfgen;

import java.io.File;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.codegen.ecore.generator.Generator;
import org.eclipse.emf.codegen.ecore.generator.GeneratorAdapterFactory;
import org.eclipse.emf.codegen.ecore.genmodel.GenModel;
import org.eclipse.emf.codegen.ecore.genmodel.GenModelPackage;
import org.eclipse.emf.codegen.ecore.genmodel.generator.GenBaseGeneratorAdapter;
import org.eclipse.emf.codegen.ecore.genmodel.generator.GenModelGeneratorAdapterFactory;
import org.eclipse.emf.common.util.BasicDiagnostic;
import org.eclipse.emf.common.util.BasicMonitor;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EcorePackage;
import org.eclipse.emf.ecore.plugin.EcorePlugin;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.xmi.impl.EcoreResourceFactoryImpl;

/**
 * Generates the model code and the edit code (item providers) of a genmodel without an IDE.
 * <p>
 * Arguments: the bundle folder and the genmodel path relative to it. The genmodel's modelDirectory and
 * editDirectory are platform:/resource paths whose first segment is a bundle's name; since there is no
 * workspace to resolve them, each name is mapped to the folder of that name beside the model's bundle.
 */
public final class GenerateModel {

    private GenerateModel() {
    }

    public static void main(String[] args) {
        if (args.length != 2) {
            System.err.println("usage: GenerateModel <bundle folder> <genmodel path inside the bundle>");
            System.exit(2);
        }
        File bundle = new File(args[0]).getAbsoluteFile().toPath().normalize().toFile();
        File genmodelFile = new File(bundle, args[1]);
        if (!genmodelFile.isFile()) {
            System.err.println("genmodel not found: " + genmodelFile);
            System.exit(2);
        }
        Diagnostic result = generate(bundle, genmodelFile);
        if (result.getSeverity() >= Diagnostic.ERROR) {
            System.err.println(describe(result, ""));
            System.exit(1);
        }
    }

    static Diagnostic generate(File bundle, File genmodelFile) {
        // Register the packages and factories an IDE would register through plugin.xml.
        EcorePackage.eINSTANCE.eClass();
        GenModelPackage.eINSTANCE.eClass();
        ResourceSet resources = new ResourceSetImpl();
        Map<String, Object> factories = resources.getResourceFactoryRegistry().getExtensionToFactoryMap();
        factories.put("ecore", new EcoreResourceFactoryImpl());
        factories.put("genmodel", new EcoreResourceFactoryImpl());
        GeneratorAdapterFactory.Descriptor.Registry.INSTANCE
                .addDescriptor(GenModelPackage.eNS_URI, GenModelGeneratorAdapterFactory.DESCRIPTOR);

        Resource resource = resources.getResource(URI.createFileURI(genmodelFile.getPath()), true);
        GenModel genModel = (GenModel) resource.getContents().get(0);
        File bundles = bundle.getParentFile();
        for (String directory : List.of(genModel.getModelDirectory(), genModel.getEditDirectory())) {
            String name = URI.createURI(directory).segment(0);
            EcorePlugin.getPlatformResourceMap().put(name,
                    URI.createFileURI(new File(bundles, name).getPath()).appendSegment(""));
        }
        Diagnostic status = genModel.diagnose();
        if (status.getSeverity() >= Diagnostic.ERROR) {
            return status;
        }
        genModel.reconcile();
        // Without this flag the generator does nothing and still reports OK.
        genModel.setCanGenerate(true);

        Generator generator = new Generator();
        generator.setInput(genModel);
        BasicDiagnostic result = new BasicDiagnostic(GenModel.class.getName(), 0, "generated", null);
        for (String projectType : List.of(GenBaseGeneratorAdapter.MODEL_PROJECT_TYPE,
                GenBaseGeneratorAdapter.EDIT_PROJECT_TYPE)) {
            result.add(generator.generate(genModel, projectType, new BasicMonitor()));
        }
        return result;
    }

    private static String describe(Diagnostic d, String indent) {
        StringBuilder text = new StringBuilder(indent).append(d.getMessage());
        for (Diagnostic child : d.getChildren()) {
            text.append('\n').append(describe(child, indent + "  "));
        }
        return text.toString();
    }
}
