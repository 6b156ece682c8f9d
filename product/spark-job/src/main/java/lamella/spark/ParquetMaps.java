package lamella.spark;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.Iterator;
import java.util.List;
import java.util.stream.Stream;
import lamella.api.InputException;
import lamella.api.ParameterRef;
import lamella.api.fit.CurveFit;
import lamella.map.MapData;
import lamella.map.MapEngine;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.sql.types.DataType;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructField;

/**
 * Map data and results in Parquet: the same long table as the CSV (x_m, y_m, the technique's x column, the signal,
 * optionally its sigma_ column, numbers of any numeric type) read through Spark and checked by the same rules as the
 * CSV reader; and the map's table written as {@code map.parquet}, a Parquet dataset folder with the columns of
 * {@code map.csv}.
 */
final class ParquetMaps {

    static final String TABLE = "map.parquet";

    private ParquetMaps() {
    }

    static MapData read(SparkSession spark, Path file, String xColumn, String signal) throws InputException {
        if (!Files.exists(file)) {
            throw new InputException(file, null, -1, "no such map data file or folder");
        }
        Dataset<Row> table;
        try {
            table = spark.read().parquet(file.toString());
        } catch (RuntimeException e) {
            throw new InputException(file, null, -1, "not a readable Parquet file: " + SparkMain.firstLine(e));
        }
        List<String> header = Arrays.asList(table.columns());
        int[] at = MapData.columns(file, 0, header, xColumn, signal);
        StructField[] fields = table.schema().fields();
        for (int c : at) {
            if (c >= 0 && !isNumber(fields[c].dataType())) {
                throw new InputException(file, null, -1, "column '" + fields[c].name() + "' holds "
                        + fields[c].dataType().simpleString() + "; a map's columns are numbers");
            }
        }
        MapData.Collector rows = new MapData.Collector(file, xColumn, signal, at[4] >= 0, "row", 0);
        int n = 0;
        try {
            Iterator<Row> it = table.toLocalIterator();
            while (it.hasNext()) {
                Row r = it.next();
                n++;
                double xm = finite(r, at[0], "x_m", file, n);
                double ym = finite(r, at[1], "y_m", file, n);
                double xv = finite(r, at[2], xColumn, file, n);
                double yv = number(r, at[3]);
                double sv = at[4] < 0 ? Double.NaN : number(r, at[4]);
                rows.add(xm, ym, xv, yv, text(r, at[3]), sv, at[4] < 0 ? "" : text(r, at[4]), n);
            }
        } catch (RuntimeException e) {
            throw new InputException(file, null, -1, "row " + (n + 1) + ": cannot be read: "
                    + SparkMain.firstLine(e));
        }
        return rows.finish();
    }

    /** Writes the map's table as the Parquet dataset {@code out/map.parquet}, complete or not at all. */
    static void write(SparkSession spark, Path out, MapData data, MapEngine.Result[] results, CurveFit fit)
            throws IOException {
        List<StructField> fields = new ArrayList<>();
        fields.add(DataTypes.createStructField("x_m", DataTypes.DoubleType, false));
        fields.add(DataTypes.createStructField("y_m", DataTypes.DoubleType, false));
        for (ParameterRef p : fit.free()) {
            fields.add(DataTypes.createStructField(p.toString(), DataTypes.DoubleType, false));
            fields.add(DataTypes.createStructField("sigma_" + p, DataTypes.DoubleType, false));
        }
        fields.add(DataTypes.createStructField("reduced_chi_square", DataTypes.DoubleType, false));
        fields.add(DataTypes.createStructField("status", DataTypes.StringType, false));
        fields.add(DataTypes.createStructField("message", DataTypes.StringType, false));
        List<Row> rows = new ArrayList<>(results.length);
        for (int i = 0; i < results.length; i++) {
            MapData.Position p = data.positions.get(i);
            MapEngine.Result r = results[i];
            Object[] cells = new Object[fields.size()];
            int k = 0;
            cells[k++] = p.xM();
            cells[k++] = p.yM();
            for (int a = 0; a < r.values().length; a++) {
                cells[k++] = r.values()[a];
                cells[k++] = r.sigmas()[a];
            }
            cells[k++] = r.reducedChiSquare();
            cells[k++] = r.status().word();
            cells[k] = r.message();
            rows.add(RowFactory.create(cells));
        }
        Path target = out.resolve(TABLE);
        Path partial = out.resolve("." + TABLE + ".part");
        delete(partial);
        spark.createDataFrame(rows, DataTypes.createStructType(fields)).coalesce(1).write()
                .parquet(partial.toString());
        delete(target);
        Files.move(partial, target);
    }

    static void delete(Path folder) throws IOException {
        if (!Files.exists(folder)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(folder)) {
            for (Path p : (Iterable<Path>) walk.sorted(Comparator.reverseOrder())::iterator) {
                Files.delete(p);
            }
        }
    }

    private static boolean isNumber(DataType t) {
        return t.equals(DataTypes.DoubleType) || t.equals(DataTypes.FloatType) || t.equals(DataTypes.LongType)
                || t.equals(DataTypes.IntegerType) || t.equals(DataTypes.ShortType) || t.equals(DataTypes.ByteType)
                || t.typeName().startsWith("decimal");
    }

    private static double number(Row r, int c) {
        return r.isNullAt(c) ? Double.NaN : ((Number) r.get(c)).doubleValue();
    }

    private static String text(Row r, int c) {
        return r.isNullAt(c) ? "(empty)" : String.valueOf(r.get(c));
    }

    private static double finite(Row r, int c, String column, Path file, int n) throws InputException {
        double v = number(r, c);
        if (!Double.isFinite(v)) {
            throw new InputException(file, null, -1, "row " + n + ": column '" + column + "': '" + text(r, c)
                    + "' is not a finite number");
        }
        return v;
    }
}
