package org.kneepoint.server.cli;

import java.util.List;
import java.util.concurrent.Callable;
import org.kneepoint.db.Library;
import org.kneepoint.server.app.demo.DemoLoader;
import org.kneepoint.server.app.imports.ImportPlan;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code kneepoint demo}: loads the invented demo library (12 grades, 4 susceptibility tables). */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "Load the demo library: invented grades and susceptibility tables, labelled DEMO.")
final class DemoCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private LibraryOption libraryOption;

    @Override
    public Integer call() {
        List<ImportPlan> plans;
        try (Library library = libraryOption.open()) {
            plans = DemoLoader.load(library);
        }
        long loaded = plans.stream().filter(plan -> !plan.alreadyImported()).count();
        var out = spec.commandLine().getOut();
        out.println(loaded == 0 ? "The demo data were already loaded; nothing changed."
                : "Loaded " + loaded + " demo files (invented data, names start with DEMO) into " + libraryOption.location().describe() + ".");
        out.println("Try: kneepoint grades");
        out.flush();
        return 0;
    }

}
