package lamella.cli;

import lamella.api.guard.GuardedGeometry;
import lamella.api.guard.GuardedTechnique;
import lamella.api.guard.PluginFault;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.lang.reflect.Field;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import lamella.api.FrequencyResponse;
import lamella.api.GeometryModel;
import lamella.api.HeatingGeometry;
import lamella.api.ModelEvaluationException;
import lamella.api.ParameterSpec;
import lamella.api.Parameters;
import lamella.api.ResponseUnit;
import lamella.api.StackKernel;
import lamella.api.Technique;
import lamella.api.TechniqueModel;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.casefile.CaseFileReader;
import lamella.engine.Engine;
import lamella.geometry.gaussian.GaussianBeams;
import lamella.technique.fdtr.FrequencyDomain;
import lamella.technique.sstr.SteadyState;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * A plug-in that throws, returns null or returns NaN or ∞ fails one {@code simulate} run with exit status 2 and a
 * message naming it and its bundle; the command, and the process, carry on.
 */
class FaultyPluginTest {

    static final String FAULTY_BUNDLE = "lab.faulty";
    static final String FAULTY_VERSION = "1.2.3";
    static final String FROM_BUNDLE = " from bundle " + FAULTY_BUNDLE + " " + FAULTY_VERSION;
    static final String FDTR = "{\"type\": \"fdtr\", \"frequencies_hz\": [1e3, 1e5]}";

    /** The ways a plug-in goes wrong, and what the message must then say. */
    enum Fault {
        THROWS_IN_BIND("failed: java.lang.IllegalStateException: bind broke"),
        RETURNS_NO_MODEL("failed: bind() returned null"),
        THROWS_IN_EVALUATION("failed: java.lang.ArrayIndexOutOfBoundsException: evaluation broke"),
        MISSES_A_CLASS("failed: java.lang.NoClassDefFoundError: lab/faulty/Missing"),
        RETURNS_NAN("failed: a non-finite"),
        RETURNS_INFINITY("failed: a non-finite"),
        REFUSES_POLITELY("the model does not apply here (");

        final String says;

        Fault(String says) {
            this.says = says;
        }

        /** What a faulty plug-in does where it evaluates. */
        double[] evaluate() {
            return switch (this) {
                case THROWS_IN_EVALUATION -> throw new ArrayIndexOutOfBoundsException("evaluation broke");
                case MISSES_A_CLASS -> throw new NoClassDefFoundError("lab/faulty/Missing");
                case RETURNS_NAN -> new double[] {Double.NaN, 0};
                case RETURNS_INFINITY -> new double[] {1, Double.NEGATIVE_INFINITY};
                case REFUSES_POLITELY -> throw new ModelEvaluationException("the model does not apply here");
                default -> new double[] {1, -1};
            };
        }

        /** What a faulty plug-in does where it binds; null is the model it returns instead of one. */
        boolean binds() {
            return switch (this) {
                case THROWS_IN_BIND -> throw new IllegalStateException("bind broke");
                case RETURNS_NO_MODEL -> false;
                default -> true;
            };
        }
    }

    /** A K/W geometry with no parameters that fails as told. */
    static class FaultyGeometry implements HeatingGeometry {
        final Fault fault;

        FaultyGeometry(Fault fault) {
            this.fault = fault;
        }

        @Override
        public String type() {
            return "faulty";
        }

        @Override
        public String summary() {
            return "a geometry that fails";
        }

        @Override
        public List<ParameterSpec> parameters() {
            return List.of();
        }

        @Override
        public ResponseUnit unit() {
            return ResponseUnit.KELVIN_PER_WATT;
        }

        @Override
        public GeometryModel bind(Parameters parameters, StackKernel stack) {
            if (!fault.binds()) {
                return null;
            }
            return (f, out) -> {
                double[] v = fault.evaluate();
                out[0] = v[0];
                out[1] = v[1];
            };
        }
    }

    /** An FDTR-like technique with a fixed frequency and one column that fails as told. */
    static class FaultyTechnique implements Technique {
        final Fault fault;

        FaultyTechnique(Fault fault) {
            this.fault = fault;
        }

        @Override
        public String type() {
            return "faulty-fdtr";
        }

        @Override
        public String summary() {
            return "a technique that fails";
        }

        @Override
        public List<ParameterSpec> parameters() {
            return List.of();
        }

        @Override
        public ResponseUnit requiredUnit() {
            return ResponseUnit.KELVIN_PER_WATT;
        }

        @Override
        public Optional<String> xColumn() {
            return Optional.of("frequency_hz");
        }

        @Override
        public List<String> signalColumns() {
            return List.of("re_k_per_w");
        }

        @Override
        public TechniqueModel bind(Parameters parameters) {
            if (!fault.binds()) {
                return null;
            }
            return new TechniqueModel() {
                @Override
                public double[] xValues() {
                    return new double[] {1e3};
                }

                @Override
                public double[][] evaluate(double[] x, FrequencyResponse response) {
                    return new double[][] {{fault.evaluate()[1]}};
                }
            };
        }
    }

    @TempDir
    Path dir;
    private SimulateCommand command;

    record Run(int status, String out, String err) {
    }

    @BeforeEach
    void wire() throws ReflectiveOperationException {
        command = new SimulateCommand();
        inject("caseFormat", new CaseFileReader());
        inject("kernels", new Engine());
        command.addGeometry(Registrations.shipped("lamella.geometry.gaussian"), new GaussianBeams());
        command.addTechnique(Registrations.shipped("lamella.technique.fdtr"), new FrequencyDomain());
    }

    private void inject(String field, Object value) throws ReflectiveOperationException {
        Field f = SimulateCommand.class.getDeclaredField(field);
        f.setAccessible(true);
        f.set(command, value);
    }

    private Run simulate(String geometry, String measurement) throws IOException {
        Files.writeString(dir.resolve("case.json"), SimulateCommandTest.caseOf(geometry, measurement));
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int status = command.run(List.of("case.json"), new CommandIO(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), dir));
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /** The shipped pair still works: the command survived whatever came before. */
    private void stillSimulates() throws IOException {
        Run ok = simulate(SimulateCommandTest.GAUSSIAN, FDTR);
        assertEquals(Command.OK, ok.status(), ok.err());
        assertTrue(ok.out().startsWith(SimulateCommandTest.HEADERS.get("fdtr") + "\n"), ok.out());
    }

    @ParameterizedTest
    @EnumSource(Fault.class)
    void aFaultyGeometryFailsTheRunWithItsTypeAndBundle(Fault fault) throws IOException {
        command.addGeometry(Registrations.by(FAULTY_BUNDLE, FAULTY_VERSION), new FaultyGeometry(fault));

        Run r = simulate("{\"type\": \"faulty\"}", FDTR);

        assertEquals(Command.BAD_INPUT, r.status(), r.err());
        assertEquals("", r.out());
        assertTrue(r.err().contains("geometry 'faulty'" + FROM_BUNDLE), r.err());
        assertTrue(r.err().contains(fault.says), "expected '" + fault.says + "' in: " + r.err());
        assertFalse(r.err().contains("technique"), "the technique is not to blame: " + r.err());
        stillSimulates();
    }

    @ParameterizedTest
    @EnumSource(value = Fault.class, names = {"THROWS_IN_BIND", "RETURNS_NO_MODEL", "THROWS_IN_EVALUATION",
        "RETURNS_INFINITY", "REFUSES_POLITELY"})
    void aFaultyTechniqueFailsTheRunWithItsTypeAndBundle(Fault fault) throws IOException {
        command.addTechnique(Registrations.by(FAULTY_BUNDLE, FAULTY_VERSION), new FaultyTechnique(fault));

        Run r = simulate(SimulateCommandTest.GAUSSIAN, "{\"type\": \"faulty-fdtr\"}");

        assertEquals(Command.BAD_INPUT, r.status(), r.err());
        assertTrue(r.err().contains("technique 'faulty-fdtr'" + FROM_BUNDLE), r.err());
        assertTrue(r.err().contains(fault.says), "expected '" + fault.says + "' in: " + r.err());
        stillSimulates();
    }

    @Test
    void signalsOfTheWrongShapeAreTheTechniquesFault() throws IOException {
        Technique tooFew = new FaultyTechnique(Fault.RETURNS_NAN) {
            @Override
            public List<String> signalColumns() {
                return List.of("re_k_per_w", "im_k_per_w");
            }
        };
        command.addTechnique(Registrations.by(FAULTY_BUNDLE, FAULTY_VERSION), tooFew);

        Run r = simulate(SimulateCommandTest.GAUSSIAN, "{\"type\": \"faulty-fdtr\"}");

        assertEquals(Command.BAD_INPUT, r.status(), r.err());
        assertTrue(r.err().contains("technique 'faulty-fdtr'" + FROM_BUNDLE
                + " failed: 1 signal arrays for the 2 columns [re_k_per_w, im_k_per_w]"), r.err());
    }

    @Test
    void aShippedGeometryThatRefusesKeepsItsMessageAndGetsItsBundle() throws IOException {
        Files.writeString(dir.resolve("adiabatic.json"), SimulateCommandTest.adiabaticSstr());
        command.addTechnique(Registrations.shipped("lamella.technique.sstr"),
                new SteadyState());
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int status = command.run(List.of("adiabatic.json"), new CommandIO(new PrintStream(new ByteArrayOutputStream()),
                new PrintStream(err, true, StandardCharsets.UTF_8), dir));

        assertEquals(Command.BAD_INPUT, status);
        String message = err.toString(StandardCharsets.UTF_8);
        assertTrue(message.contains("no steady state exists"), message);
        assertTrue(message.contains("(geometry 'gaussian' from bundle lamella.geometry.gaussian 0.1.0)"), message);
    }

    @Test
    void aGeometryRemovedIsGoneEvenThoughItWasHeldBehindAGuard() throws IOException {
        FaultyGeometry faulty = new FaultyGeometry(Fault.RETURNS_NAN);
        command.addGeometry(Registrations.by(FAULTY_BUNDLE, FAULTY_VERSION), faulty);
        command.removeGeometry(faulty);

        Run r = simulate("{\"type\": \"faulty\"}", FDTR);

        assertEquals(Command.BAD_INPUT, r.status(), r.err());
        assertTrue(r.err().contains("unknown geometry 'faulty'; live geometry types: gaussian"), r.err());
    }

    @Test
    void aGeometryWhoseTypeFailsIsRefusedAtBindingNamingItsBundle() throws IOException {
        HeatingGeometry nameless = new FaultyGeometry(Fault.RETURNS_NAN) {
            @Override
            public String type() {
                throw new UnsupportedOperationException("no name");
            }
        };

        PluginFault e = assertThrows(PluginFault.class,
                () -> command.addGeometry(Registrations.by(FAULTY_BUNDLE, FAULTY_VERSION), nameless));

        assertEquals("a geometry" + FROM_BUNDLE + " failed: java.lang.UnsupportedOperationException: no name",
                e.getMessage());
        stillSimulates();
    }

    /** Default methods too: one the guard did not override would answer for the plug-in without asking it. */
    @Test
    void everyMethodOfTheInterfacesIsGuarded() throws NoSuchMethodException {
        for (Class<?>[] pair : new Class<?>[][] {{HeatingGeometry.class, GuardedGeometry.class},
            {Technique.class, GuardedTechnique.class}}) {
            for (var method : pair[0].getMethods()) {
                var guarded = pair[1].getMethod(method.getName(), method.getParameterTypes());
                assertEquals(pair[1], guarded.getDeclaringClass(), "not overridden, so not guarded: " + guarded);
            }
        }
    }
}
