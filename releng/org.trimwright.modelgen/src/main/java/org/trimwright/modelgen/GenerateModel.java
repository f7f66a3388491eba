package org.trimwright.modelgen;

import java.io.File;

import org.eclipse.emf.codegen.ecore.generator.Generator;
import org.eclipse.emf.codegen.ecore.genmodel.GenModel;
import org.eclipse.emf.codegen.ecore.genmodel.GenModelPackage;
import org.eclipse.emf.codegen.ecore.genmodel.generator.GenBaseGeneratorAdapter;
import org.eclipse.emf.codegen.ecore.genmodel.generator.GenModelGeneratorAdapterFactory;
import org.eclipse.emf.common.util.BasicMonitor;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EcorePackage;
import org.eclipse.emf.ecore.plugin.EcorePlugin;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.xmi.impl.EcoreResourceFactoryImpl;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceFactoryImpl;

/**
 * Runs EMF's model code generator outside Eclipse: maps platform:/resource/&lt;bundle&gt;/ to the bundle folder,
 * reconciles the genmodel and generates the model project code (JMerge keeps {@code @generated NOT} members).
 */
public final class GenerateModel {

    private GenerateModel() {
    }

    public static void main(String[] args) {
        File bundles = new File(args[0]).getAbsoluteFile();
        String genModelPath = args[1];
        EcorePackage.eINSTANCE.eClass();
        GenModelPackage.eINSTANCE.eClass();
        ResourceSet rs = new ResourceSetImpl();
        rs.getResourceFactoryRegistry().getExtensionToFactoryMap().put("ecore", new EcoreResourceFactoryImpl());
        rs.getResourceFactoryRegistry().getExtensionToFactoryMap().put("genmodel", new XMIResourceFactoryImpl());
        File[] dirs = bundles.listFiles(File::isDirectory);
        for (File dir : dirs == null ? new File[0] : dirs) {
            URI platform = URI.createPlatformResourceURI(dir.getName() + "/", true);
            URI local = URI.createFileURI(dir.getAbsolutePath() + "/");
            rs.getURIConverter().getURIMap().put(platform, local);
            EcorePlugin.getPlatformResourceMap().put(dir.getName(), local);
        }
        Resource res = rs.getResource(URI.createPlatformResourceURI(genModelPath, true), true);
        GenModel genModel = (GenModel) res.getContents().get(0);
        genModel.reconcile();
        genModel.setCanGenerate(true);
        genModel.setValidateModel(true);
        Generator generator = new Generator();
        generator.getAdapterFactoryDescriptorRegistry().addDescriptor(GenModelPackage.eNS_URI,
                GenModelGeneratorAdapterFactory.DESCRIPTOR);
        generator.setInput(genModel);
        Diagnostic d = generator.generate(genModel, GenBaseGeneratorAdapter.MODEL_PROJECT_TYPE,
                new BasicMonitor.Printing(System.out));
        System.out.println("EMF generation: " + (d.getSeverity() == Diagnostic.OK ? "OK" : d.toString()));
        if (d.getSeverity() >= Diagnostic.ERROR) {
            System.exit(1);
        }
    }
}
