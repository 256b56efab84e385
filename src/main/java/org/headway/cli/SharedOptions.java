package org.headway.cli;

import java.nio.file.Path;
import picocli.CommandLine.Option;

/**
 * Options several commands share, declared once as picocli mixins so their names, wording and
 * defaults cannot drift apart. A command whose option means something else (the sheet's units are
 * the PDF's, the rig's apply to text and CSV, the fluid command's are an enum of its own) keeps its
 * own declaration.
 */
final class SharedOptions {

    private SharedOptions() {}

    /** {@code --catalog DIR}: the user's own catalog folder. */
    static final class CatalogFolder {
        @Option(
                names = "--catalog",
                paramLabel = "DIR",
                description = "Folder of your own catalog files laid over the bundled ones.")
        Path catalogFolder;
    }

    /** {@code --force}: replace files the command writes. */
    static final class Force {
        @Option(names = "--force", description = "Replace existing files this command writes.")
        boolean force;
    }

    /** {@code --units}: the unit system of text output. */
    static final class TextUnits {
        @Option(
                names = "--units",
                defaultValue = "si",
                description = "Text output units: si, us or process (m³/h and bar) (default ${DEFAULT-VALUE}).")
        String units;
    }

    /** {@code --format text|json}. */
    static final class TextOrJson {
        @Option(names = "--format", defaultValue = "text", description = "text or json (default: ${DEFAULT-VALUE})")
        String format;
    }
}
