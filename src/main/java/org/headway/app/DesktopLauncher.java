package org.headway.app;

import java.awt.GraphicsEnvironment;
import java.util.Locale;
import java.util.Map;
import javafx.application.Application;

/**
 * Decides whether the desktop window can open and opens it. Called by {@code org.headway.Launcher}
 * for no arguments or {@code gui}; the command line stays free of JavaFX.
 */
public final class DesktopLauncher {

    private DesktopLauncher() {}

    /** Whether this process can show a window. */
    public static boolean displayAvailable() {
        return displayAvailable(System.getProperty("os.name", ""), System.getenv(), GraphicsEnvironment.isHeadless());
    }

    /**
     * @param osName value of {@code os.name}
     * @param env the environment
     * @param awtHeadless whether Java was told it has no display ({@code java.awt.headless})
     */
    static boolean displayAvailable(String osName, Map<String, String> env, boolean awtHeadless) {
        if (awtHeadless) {
            return false;
        }
        String os = osName.toLowerCase(Locale.ROOT);
        if (os.startsWith("windows") || os.startsWith("mac")) {
            return true;
        }
        // X11 and Wayland desktops announce themselves through these; a bare terminal or CI job has neither.
        return notBlank(env.get("DISPLAY")) || notBlank(env.get("WAYLAND_DISPLAY"));
    }

    private static boolean notBlank(String s) {
        return s != null && !s.isBlank();
    }

    /** Opens the window and returns when it is closed. */
    public static void launch(String... args) {
        // The catalog files are read and parsed while the toolkit starts, on the other core, instead of
        // after it on the FX thread (decision 0050); the window then finds them loaded.
        Thread preload = new Thread(org.headway.pipe.Catalog::bundled, "headway-preload");
        preload.setDaemon(true);
        preload.start();
        Application.launch(HeadwayApp.class, args);
    }
}
