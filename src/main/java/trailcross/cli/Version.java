package trailcross.cli;

import picocli.CommandLine;

/** The version shown by {@code --version}: the jar's implementation version, or "development". */
public final class Version implements CommandLine.IVersionProvider {

    @Override
    public String[] getVersion() {
        String v = Main.class.getPackage().getImplementationVersion();
        return new String[] {"trailcross " + (v == null ? "development build" : v)};
    }
}
