package lamella.spark;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.fit.CurveFit;
import lamella.api.material.MaterialLibrary;
import lamella.casefile.CaseFileReader;
import lamella.engine.Engine;
import lamella.fit.Fitter;
import lamella.materials.PlainLibraries;

/**
 * Lamella's services wired by hand, once per JVM and settings (the driver's, and each executor's): the case reader
 * with every material library, the fitter with every geometry and technique on the class path. A case's curve fit is
 * made once per JVM and shared by the tasks running there (it is safe for concurrent fits, as the local engine's
 * threads use it).
 */
final class JobModels {

    private static final Map<JobSettings, JobModels> BY_SETTINGS = new ConcurrentHashMap<>();

    final CaseFileReader reader = new CaseFileReader();
    final Fitter fitter;
    final PlainServices services;
    private final Map<String, CurveFit> curves = new ConcurrentHashMap<>();

    private JobModels(JobSettings settings) throws IOException {
        ClassLoader loader = Thread.currentThread().getContextClassLoader();
        if (loader == null) {
            loader = JobModels.class.getClassLoader();
        }
        List<MaterialLibrary> libraries = new ArrayList<>(PlainLibraries.onClassPath(loader));
        libraries.addAll(PlainLibraries.configured(settings.facility(), settings.user(), Path.of(settings.base()),
                Path.of(settings.home())));
        libraries.forEach(reader::addLibrary);
        services = PlainServices.find(loader);
        fitter = new Fitter(new Engine(), services.geometries, services.techniques);
    }

    static JobModels of(JobSettings settings) {
        return BY_SETTINGS.computeIfAbsent(settings.withFailTask(-1), s -> {
            try {
                return new JobModels(s);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
    }

    /** The curve fit of a case file's fit block for one signal, made once per JVM. */
    CurveFit curves(String caseFile, String signal) throws InputException {
        String key = caseFile + "\u0000" + signal;
        CurveFit f = curves.get(key);
        if (f == null) {
            CaseDocument doc = reader.read(Path.of(caseFile));
            f = fitter.curves(doc, signal);
            CurveFit earlier = curves.putIfAbsent(key, f);
            if (earlier != null) {
                f = earlier;
            }
        }
        return f;
    }
}
