package trailcross.architecture;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * The package flow of DESIGN.md, locked: no package depends on one above it, and the command line holds no
 * physics (no numerical library, no integrator, no force model, no trigonometry of its own). The order, low
 * to high, as the code stands (DEVELOPERS.md): time, frames, orbit, io (file helpers every stage may use),
 * stream, ephemeris, dynamics, ejection, encounter, forecast, report, cluster, cli.
 */
class LayersTest {

    /** Low to high. */
    static final String[] LAYERS = {"time", "frames", "orbit", "io", "stream", "ephemeris", "dynamics", "ejection",
        "encounter", "forecast", "report", "cluster", "cli"};

    private static final JavaClasses CLASSES = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS).importPackages("trailcross");

    @Test
    void noPackageReachesUpTheFlow() {
        for (int k = 0; k < LAYERS.length - 1; k++) {
            String[] above = Arrays.stream(LAYERS, k + 1, LAYERS.length).map(p -> "trailcross." + p + "..")
                    .toArray(String[]::new);
            noClasses().that().resideInAPackage("trailcross." + LAYERS[k] + "..").should().dependOnClassesThat()
                    .resideInAnyPackage(above)
                    .because("DESIGN.md: no package reaches up the flow (" + LAYERS[k] + " sits below "
                            + String.join(", ", Arrays.copyOfRange(LAYERS, k + 1, LAYERS.length)) + ")")
                    .allowEmptyShould(true).check(CLASSES);
        }
    }

    @Test
    void everyPackageIsALayer() {
        for (var c : CLASSES) {
            String p = c.getPackageName();
            if (p.equals("trailcross")) {
                continue;
            }
            String top = p.substring("trailcross.".length()).split("\\.")[0];
            org.assertj.core.api.Assertions.assertThat(LAYERS).as(c.getName() + " is in a package of the flow").contains(top);
        }
    }

    @Test
    void theCommandLineHoldsNoPhysics() {
        noClasses().that().resideInAPackage("trailcross.cli..").should().dependOnClassesThat()
                .resideInAnyPackage("org.hipparchus..", "org.apache.commons.math3..")
                .because("DESIGN.md: cli holds no physics").check(CLASSES);
        noClasses().that().resideInAPackage("trailcross.cli..").should().dependOnClassesThat()
                .haveNameMatching("trailcross\\.dynamics\\.(GaussRadau15|ForceModel|Acceleration|CompositeForceModel|SunGravity|PlanetaryPerturbations)(\\$.*)?")
                .because("the integrator and the forces are reached through the stages, not from the command line")
                .check(CLASSES);
        for (String f : new String[] {"sin", "cos", "tan", "asin", "acos", "atan", "atan2", "sqrt", "cbrt", "pow", "exp", "log", "hypot"}) {
            noClasses().that().resideInAPackage("trailcross.cli..").should().callMethodWhere(
                    com.tngtech.archunit.core.domain.JavaCall.Predicates.target(
                            com.tngtech.archunit.core.domain.properties.HasOwner.Predicates.With.owner(
                                    com.tngtech.archunit.base.DescribedPredicate.describe("java.lang.Math or StrictMath",
                                            o -> o.getName().equals("java.lang.Math") || o.getName().equals("java.lang.StrictMath"))))
                            .and(com.tngtech.archunit.core.domain.JavaCall.Predicates.target(
                                    com.tngtech.archunit.core.domain.properties.HasName.Predicates.name(f))))
                    .because("cli formats and dispatches; computations belong to the stages").check(CLASSES);
        }
    }

    @Test
    void sparkStaysInTheClusterPackageAndItsEntryPoints() {
        // Spark is a provided dependency: the local command line must load none of it, so only the cluster
        // package and the two classes of cli that start it (the spark-submit entry point, the benchmark's
        // Spark run) may use it.
        noClasses().that().resideOutsideOfPackage("trailcross.cluster..")
                .and().doNotHaveFullyQualifiedName("trailcross.cli.ClusterMain")
                .and().doNotHaveFullyQualifiedName("trailcross.cli.SparkBench")
                .should().dependOnClassesThat().resideInAnyPackage("org.apache.spark..", "scala..")
                .because("./trailcross runs without Spark on its class path").check(CLASSES);
    }
}
