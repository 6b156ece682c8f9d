package lamella.map;

import java.io.Serializable;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.IntConsumer;
import lamella.api.ModelEvaluationException;
import lamella.api.fit.CurveFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;

/**
 * Fits every position of a map on this machine's cores. Positions are grouped in square tiles of about
 * {@value #TILE_SIDE}×{@value #TILE_SIDE} position spacings; a worker fits one tile at a time, row by row in
 * alternating direction, and starts each position from the nearest position of its tile already fitted well (within
 * {@value #NEIGHBOUR_REACH} spacings) — neighbours have nearly the same values, so the fit needs fewer steps. Where a
 * neighbour's start does not help (the fit fails, does not converge, or ends with a much larger χ² than the
 * neighbour's), the position is fitted again from the case's initial values and the better fit is kept. The result of
 * a position depends only on its tile, never on the number of threads.
 */
public final class MapEngine {

    public static final int TILE_SIDE = 8;
    public static final double NEIGHBOUR_REACH = 2.5;

    /** What became of one position. */
    public enum Status {
        OK, WARNING, FAILED;

        public String word() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    /**
     * One position's result.
     *
     * @param values          fitted values (NaN when failed)
     * @param sigmas          their total 1σ (NaN when failed, ∞ where not identifiable)
     * @param reducedChiSquare of the fit (NaN when failed)
     * @param status          ok, warning (the fit's warnings in the message) or failed (the reason)
     * @param message         warnings or the problem, empty when none
     * @param fromNeighbour   whether the kept fit started from a neighbour's values
     * @param converged       whether the fit converged
     */
    public record Result(double[] values, double[] sigmas, double reducedChiSquare, Status status, String message,
                         boolean fromNeighbour, boolean converged) implements Serializable {
    }

    private final CurveFit fit;
    private final double[] x;
    private final int threads;

    /** Fits curves measured at the map's x values {@code x} on {@code threads} workers. */
    public MapEngine(CurveFit fit, double[] x, int threads) {
        this.fit = fit;
        this.x = x.clone();
        this.threads = threads;
    }

    /**
     * Fits every position; {@code progress} hears the count of positions done (from worker threads). Interrupting the
     * calling thread stops the workers and throws CancellationException.
     */
    Result[] run(List<MapData.Position> positions, IntConsumer progress) {
        return run(positions, progress, MapJournal.NONE);
    }

    /**
     * Fits every position whose tile the journal does not already hold, and gives the journal each tile as it is
     * done; {@code progress} hears the count of positions done, those read back included.
     */
    public Result[] run(List<MapData.Position> positions, IntConsumer progress, MapJournal journal) {
        Result[] results = new Result[positions.size()];
        List<int[]> tiles = tiles(positions);
        double reach = NEIGHBOUR_REACH * spacing(positions);
        AtomicInteger done = new AtomicInteger();
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "lamella-map");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<?>> futures = new ArrayList<>();
            for (int t = 0; t < tiles.size(); t++) {
                int[] tile = tiles.get(t);
                Result[] earlier = journal.read(t, tile.length);
                if (earlier != null) {
                    for (int k = 0; k < tile.length; k++) {
                        results[tile[k]] = earlier[k];
                    }
                    progress.accept(done.addAndGet(tile.length));
                    continue;
                }
                final int index = t;
                futures.add(pool.submit(() -> {
                    Result[] r = fitTile(members(positions, tile), reach);
                    journal.write(index, r);
                    for (int k = 0; k < tile.length; k++) {
                        results[tile[k]] = r[k];
                    }
                    progress.accept(done.addAndGet(tile.length));
                    return null;
                }));
            }
            for (Future<?> f : futures) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException("the map was interrupted");
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            if (e.getCause() instanceof java.io.IOException io) {
                throw new UncheckedIOException(io);
            }
            throw new IllegalStateException(e.getCause());
        } finally {
            pool.shutdownNow();
        }
        return results;
    }

    /** The positions of one tile, in the order they are fitted. */
    public static List<MapData.Position> members(List<MapData.Position> positions, int[] tile) {
        List<MapData.Position> members = new ArrayList<>(tile.length);
        for (int i : tile) {
            members.add(positions.get(i));
        }
        return members;
    }

    /** The distance within which a fitted position is a neighbour whose result may start another's fit, m. */
    public static double reach(List<MapData.Position> positions) {
        return NEIGHBOUR_REACH * spacing(positions);
    }

    /** The positions of each tile, in the order they are fitted. */
    public static List<int[]> tiles(List<MapData.Position> positions) {
        int n = positions.size();
        double xMin = Double.POSITIVE_INFINITY;
        double yMin = Double.POSITIVE_INFINITY;
        for (MapData.Position p : positions) {
            xMin = Math.min(xMin, p.xM());
            yMin = Math.min(yMin, p.yM());
        }
        double spacing = spacing(positions);
        double side = TILE_SIDE * spacing;
        Map<Long, List<Integer>> byTile = new HashMap<>();
        for (int i = 0; i < n; i++) {
            MapData.Position p = positions.get(i);
            long tx = (long) Math.floor((p.xM() - xMin) / side);
            long ty = (long) Math.floor((p.yM() - yMin) / side);
            byTile.computeIfAbsent(ty * 1_000_003L + tx, k -> new ArrayList<>()).add(i);
        }
        final double x0 = xMin;
        final double y0 = yMin;
        List<Long> keys = new ArrayList<>(byTile.keySet());
        keys.sort(null);
        List<int[]> tiles = new ArrayList<>();
        for (Long key : keys) {
            List<Integer> members = byTile.get(key);
            members.sort(Comparator.<Integer>comparingLong(i -> row(positions.get(i), y0, spacing))
                    .thenComparingDouble(i -> {
                        MapData.Position p = positions.get(i);
                        return (row(p, y0, spacing) % 2 == 0 ? 1 : -1) * (p.xM() - x0);
                    }));
            tiles.add(members.stream().mapToInt(Integer::intValue).toArray());
        }
        return tiles;
    }

    private static long row(MapData.Position p, double y0, double spacing) {
        return Math.round((p.yM() - y0) / spacing);
    }

    /** The typical distance between neighbouring positions of a map. */
    static double spacing(List<MapData.Position> positions) {
        double xMin = Double.POSITIVE_INFINITY, xMax = Double.NEGATIVE_INFINITY;
        double yMin = Double.POSITIVE_INFINITY, yMax = Double.NEGATIVE_INFINITY;
        for (MapData.Position p : positions) {
            xMin = Math.min(xMin, p.xM());
            xMax = Math.max(xMax, p.xM());
            yMin = Math.min(yMin, p.yM());
            yMax = Math.max(yMax, p.yM());
        }
        return spacing(xMax - xMin, yMax - yMin, positions.size());
    }

    /** The typical distance between neighbouring positions: the side of the area each position covers. */
    static double spacing(double width, double height, int n) {
        if (n < 2) {
            return 1.0;
        }
        if (width > 0 && height > 0) {
            return Math.sqrt(width * height / n);
        }
        double extent = Math.max(width, height);
        return extent > 0 ? extent / (n - 1) : 1.0;
    }

    /**
     * Fits the positions of one tile in the order given, each starting from the nearest position fitted well before
     * it within {@code reach}; the result depends on nothing else, so any engine that fits whole tiles (threads here,
     * Spark tasks) gives the same map.
     */
    public Result[] fitTile(List<MapData.Position> tile, double reach) {
        Result[] results = new Result[tile.size()];
        List<Integer> fittedWell = new ArrayList<>();
        for (int i = 0; i < results.length; i++) {
            MapData.Position p = tile.get(i);
            Result r;
            if (p.problem() != null) {
                r = failed(p.problem());
            } else {
                int neighbour = nearest(tile, fittedWell, p, reach);
                r = fitPosition(p, neighbour < 0 ? null : results[neighbour]);
            }
            results[i] = r;
            if (r.status() == Status.OK) {
                fittedWell.add(i);
            }
        }
        return results;
    }

    private static int nearest(List<MapData.Position> positions, List<Integer> candidates, MapData.Position p,
                               double reach) {
        int best = -1;
        double bestD = reach * reach;
        for (int k = candidates.size() - 1; k >= 0; k--) {
            MapData.Position q = positions.get(candidates.get(k));
            double dx = q.xM() - p.xM();
            double dy = q.yM() - p.yM();
            double d = dx * dx + dy * dy;
            if (d <= bestD) {
                bestD = d;
                best = candidates.get(k);
            }
        }
        return best;
    }

    private Result fitPosition(MapData.Position p, Result neighbour) {
        Result first = null;
        if (neighbour != null) {
            first = attempt(p, neighbour.values(), true);
            boolean helped = first.status() != Status.FAILED && first.converged()
                    && first.reducedChiSquare() <= Math.max(2.0, 2.0 * neighbour.reducedChiSquare());
            if (helped) {
                return first;
            }
        }
        Result plain = attempt(p, null, false);
        if (first == null || first.status() == Status.FAILED) {
            return plain;
        }
        if (plain.status() == Status.FAILED) {
            return first;
        }
        return plain.reducedChiSquare() <= first.reducedChiSquare() ? plain : first;
    }

    private Result attempt(MapData.Position p, double[] start, boolean fromNeighbour) {
        try {
            FitOutcome o = fit.fit(x, p.y(), p.sigma(), start);
            List<FittedParameter> params = o.parameters();
            double[] v = new double[params.size()];
            double[] s = new double[params.size()];
            for (int a = 0; a < v.length; a++) {
                v[a] = params.get(a).value();
                s[a] = params.get(a).sigma();
            }
            Status status = o.warnings().isEmpty() ? Status.OK : Status.WARNING;
            return new Result(v, s, o.reducedChiSquare(), status, String.join("; ", o.warnings()), fromNeighbour,
                    o.converged());
        } catch (ModelEvaluationException | IllegalArgumentException e) {
            return failed("the model cannot be evaluated: " + e.getMessage());
        }
    }

    private Result failed(String why) {
        double[] nan = new double[fit.free().size()];
        Arrays.fill(nan, Double.NaN);
        return new Result(nan, nan.clone(), Double.NaN, Status.FAILED, why, false, false);
    }
}
