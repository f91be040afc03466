package org.kneepoint.tests;

import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAPackage;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.core.importer.Location;
import com.tngtech.archunit.junit.LocationProvider;
import java.net.URI;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.kneepoint.db.Library;
import org.kneepoint.fitter.units.UnitCatalog;
import org.kneepoint.importer.csv.ReadLimits;
import org.kneepoint.server.cli.KneepointCommand;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/**
 * The design's layers and module directions (docs/design.md, DEVELOPERS.md) as rules over the compiled main classes
 * of every module: {@code fitter ← importer ← server → db → fitter}; in {@code server} the front ends ({@code cli},
 * {@code http}, {@code web}) sit on the application layer ({@code app}), with {@code text} and {@code chart}
 * rendering between them; nothing imports upward and no package cycle exists.
 */
@AnalyzeClasses(locations = ArchitectureTest.Modules.class, importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {

    /** The main classes of the four modules (a folder in the build, or a jar), found from one class of each. */
    static final class Modules implements LocationProvider {
        @Override
        public Set<Location> get(Class<?> testClass) {
            return Stream.of(UnitCatalog.class, ReadLimits.class, Library.class, KneepointCommand.class)
                    .map(type -> Location.of(URI.create(type.getProtectionDomain().getCodeSource().getLocation().toString())))
                    .collect(Collectors.toSet());
        }
    }

    private static final String[] FRONT_ENDS = {"org.kneepoint.server.cli..", "org.kneepoint.server.http..", "org.kneepoint.server.web.."};

    @ArchTest
    static final ArchRule front_ends_only_call_the_application_layer = noClasses().that().resideInAnyPackage(FRONT_ENDS)
            .should().dependOnClassesThat().resideInAnyPackage("org.jooq..", "java.sql..", "javax.sql..", "org.kneepoint.db.jooq..")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("org.kneepoint.fitter.loadline.DesignCheck")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("org.kneepoint.fitter.loadline.DutySequence")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("org.kneepoint.fitter.loadline.LocalKneeCheck")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("org.kneepoint.fitter.select.GradeSelection")
            .because("a front end parses input, calls the application layer (server.app) and renders; the use cases,"
                    + " their physics and their storage live below it");

    @ArchTest
    static final ArchRule http_and_web_never_import_cli = noClasses().that()
            .resideInAnyPackage("org.kneepoint.server.http..", "org.kneepoint.server.web..")
            .should().dependOnClassesThat().resideInAPackage("org.kneepoint.server.cli..");

    @ArchTest
    static final ArchRule the_json_api_never_imports_the_pages = noClasses().that().resideInAPackage("org.kneepoint.server.http..")
            .should().dependOnClassesThat().resideInAPackage("org.kneepoint.server.web..");

    @ArchTest
    static final ArchRule the_application_layer_knows_no_front_end_and_no_rendering = noClasses().that()
            .resideInAPackage("org.kneepoint.server.app..")
            .should().dependOnClassesThat().resideInAnyPackage("org.kneepoint.server.cli..", "org.kneepoint.server.http..",
                    "org.kneepoint.server.web..", "org.kneepoint.server.text..", "org.kneepoint.server.chart..", "picocli..",
                    "io.javalin..", "jakarta.servlet..", "org.jfree..");

    @ArchTest
    static final ArchRule tables_and_charts_know_no_front_end = noClasses().that()
            .resideInAnyPackage("org.kneepoint.server.text..", "org.kneepoint.server.chart..")
            .should().dependOnClassesThat().resideInAnyPackage(FRONT_ENDS);

    @ArchTest
    static final ArchRule no_package_cycles_in_server = slices().matching("org.kneepoint.server.(**)").should().beFreeOfCycles();

    @ArchTest
    static final ArchRule no_package_cycles_in_hand_written_code = slices().matching("org.kneepoint.(**)").should().beFreeOfCycles()
            .ignoreDependency(resideInAPackage("org.kneepoint.db.jooq.."), resideInAPackage("org.kneepoint.db.jooq.."))
            .because("jOOQ's generated classes refer to each other by design; every hand-written package points one way");

    @ArchTest
    static final ArchRule fitter_touches_no_io_sql_or_http = noClasses().that().resideInAPackage("org.kneepoint.fitter..")
            .should().dependOnClassesThat().resideInAnyPackage("java.nio.file..", "java.net..", "java.sql..", "javax.sql..",
                    "org.jooq..", "io.javalin..", "jakarta.servlet..", "com.fasterxml.jackson..", "picocli..")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.File")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileInputStream")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileOutputStream")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileReader")
            .orShould().dependOnClassesThat().haveFullyQualifiedName("java.io.FileWriter");

    @ArchTest
    static final ArchRule fitter_depends_on_no_other_module = noClasses().that().resideInAPackage("org.kneepoint.fitter..")
            .should().dependOnClassesThat().resideInAnyPackage("org.kneepoint.importer..", "org.kneepoint.db..", "org.kneepoint.server..");

    @ArchTest
    static final ArchRule importer_depends_only_on_fitter = noClasses().that().resideInAPackage("org.kneepoint.importer..")
            .should().dependOnClassesThat().resideInAnyPackage("org.kneepoint.db..", "org.kneepoint.server..");

    @ArchTest
    static final ArchRule db_depends_only_on_fitter = noClasses().that().resideInAPackage("org.kneepoint.db..")
            .should().dependOnClassesThat().resideInAnyPackage("org.kneepoint.importer..", "org.kneepoint.server..", "io.javalin..");

    @ArchTest
    static final ArchRule generated_jooq_classes_never_leave_db = noClasses().that().resideOutsideOfPackage("org.kneepoint.db..")
            .should().dependOnClassesThat().resideInAPackage("org.kneepoint.db.jooq..");
}
