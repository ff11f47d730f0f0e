package trailcross.forecast;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Path;
import java.util.Locale;
import trailcross.ephemeris.Ephemeris;
import trailcross.stream.StreamDefinition;
import trailcross.stream.StreamFileReader;

/**
 * Times whole forecasts: the demo (the invented comet of {@code streams/lysandre.toml} in 2027, its default
 * returns) and the 1999 Leonid case (55P since 1890), each on the thread counts asked. Figures: particles,
 * particle-years propagated (particles × years from their return to the window's end) per CPU-second
 * of the process, wall time, and the peak heap in use (the JVM's memory pools' peak usage, reset before each
 * run). The command runs each workload once with a few particles first (cache fitted, JIT warm).
 */
public final class ForecastBenchmark {

    /**
     * One figure.
     *
     * @param workload the workload's name
     * @param threads threads
     * @param particles particles ejected
     * @param particleYearsPerCpuSecond particle-years per CPU-second
     * @param wallSeconds wall time
     * @param peakHeapMb peak heap in use, MB
     */
    public record Figure(String workload, int threads, long particles, double particleYearsPerCpuSecond,
            double wallSeconds, double peakHeapMb) {
        /** @return the machine-readable line */
        public String line() {
            return String.format(Locale.ROOT, "bench forecast %s threads=%d particles=%d particle_years_per_cpu_s=%.0f "
                    + "wall_s=%.1f peak_heap_mb=%.0f", workload, threads, particles, particleYearsPerCpuSecond,
                    wallSeconds, peakHeapMb);
        }
    }

    private ForecastBenchmark() {
    }

    /**
     * @param workload "demo" or "leonids-1999"
     * @param particles particles per return
     * @param threads threads
     * @param ephemeris the planets
     * @return the figure
     */
    public static Figure measure(String workload, int particles, int threads, Ephemeris ephemeris) {
        return measure(workload, particles, threads, ephemeris, CloudEngine.LOCAL);
    }

    /**
     * @param workload "demo" or "leonids-1999"
     * @param particles particles per return
     * @param threads threads of this machine
     * @param ephemeris the planets
     * @param engine where the sampling stages run
     * @return the figure (CPU time is this JVM's: with a cluster in local mode it includes the tasks)
     */
    public static Figure measure(String workload, int particles, int threads, Ephemeris ephemeris, CloudEngine engine) {
        boolean demo = workload.equals("demo");
        StreamDefinition d = StreamFileReader.read(Path.of(demo ? "streams/lysandre.toml" : "validation/55p-tempel-tuttle.toml"));
        ForecastRun.Settings s = demo ? new ForecastRun.Settings(2027, 1777, 4, true, particles, 1, threads)
                : new ForecastRun.Settings(1999, 1890, 0, false, particles, 1, threads);
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            pool.resetPeakUsage();
        }
        long cpu0 = cpuNanos();
        long t0 = System.nanoTime();
        ForecastRun.Result r = ForecastRun.run(d, ephemeris, s, line -> { }, Progress.NONE, null, engine);
        double wall = (System.nanoTime() - t0) / 1e9;
        double cpu = (cpuNanos() - cpu0) / 1e9;
        double end = ParentReturns.yearStart(s.year() + 1);
        double py = 0;
        long n = 0;
        for (ForecastRun.Trail t : r.trails()) {
            py += t.particles() * (end - t.perihelion().t()) / 365.25;
            n += t.particles();
        }
        double peak = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        return new Figure(workload, threads, n, py / cpu, wall, peak / 1048576.0);
    }

    /**
     * The precision of the forecast's figure that matters against the work it costs: the 1999 Leonids from
     * 55P's returns since 1898 (the 1899 trail), or the demo's most recent return (the 1993 trail in 2027); the
     * trail's peak σ (resampling, minutes) and the process CPU time, for one sampling. Since σ falls as 1/√(particles), σ² × CPU-minutes is a figure independent of the particle
     * count; its ratio between plain and targeted sampling is the gain in efficiency.
     *
     * @param workload "leonids-1999" or "demo"
     * @param particles particles per return
     * @param targeted the sampling
     * @param threads threads
     * @param ephemeris the planets
     * @return sampling, σ (min), CPU minutes, crossings in the trail's section, ESS
     */
    public static Precision precision(String workload, int particles, boolean targeted, int threads, Ephemeris ephemeris) {
        boolean demo = workload.equals("demo");
        StreamDefinition d = StreamFileReader.read(Path.of(demo ? "streams/lysandre.toml" : "validation/55p-tempel-tuttle.toml"));
        ForecastRun.Settings s = demo ? new ForecastRun.Settings(2027, 2027, 1777, 1, false, particles, 1, threads, targeted)
                : new ForecastRun.Settings(1999, 1999, 1898, 0, false, particles, 1, threads, targeted);
        int trail = demo ? 1993 : 1899;
        long cpu0 = cpuNanos();
        ForecastRun.Result r = ForecastRun.run(d, ephemeris, s, line -> { });
        double cpu = (cpuNanos() - cpu0) / 60e9;
        ForecastRun.Meeting m = r.meetings().stream().filter(x -> x.returnYear() == trail && x.cloud() != null)
                .findFirst().orElse(null);
        return new Precision(workload, targeted ? "targeted" : "plain", particles, m == null ? Double.NaN : m.cloud().peakSigmaMin(),
                cpu, m == null ? 0 : m.cloud().particles(), m == null ? 0 : m.cloud().ess());
    }

    /**
     * One precision figure.
     *
     * @param workload the workload
     * @param sampling plain or targeted
     * @param particles particles per return
     * @param sigmaMin the 1899 trail's peak σ, minutes (NaN when the trail is not met)
     * @param cpuMinutes the process CPU time
     * @param section crossings in the trail's section
     * @param ess their effective number
     */
    public record Precision(String workload, String sampling, int particles, double sigmaMin, double cpuMinutes, int section, double ess) {

        /** @return σ² × CPU-minutes (min² CPU-min; lower is better) */
        public double varianceTime() {
            return sigmaMin * sigmaMin * cpuMinutes;
        }

        /** @return the machine-readable line */
        public String line() {
            return String.format(Locale.ROOT, "bench forecast precision-%s-%s threads=2 particles=%d peak_sigma_min=%.2f "
                    + "cpu_min=%.2f sigma2_cpu=%.1f section=%d ess=%.0f ess_per_cpu_min=%.1f", workload, sampling, particles,
                    sigmaMin, cpuMinutes, varianceTime(), section, ess, ess / cpuMinutes);
        }
    }

    private static long cpuNanos() {
        if (ManagementFactory.getOperatingSystemMXBean() instanceof com.sun.management.OperatingSystemMXBean os) {
            return os.getProcessCpuTime();
        }
        throw new IllegalStateException("process CPU time is not available on this JVM");
    }
}
