package org.sightwork.geo.chart;

import java.io.ByteArrayOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.locationtech.jts.geom.Envelope;

/**
 * A cache of prepared chart files: the layers of one file, projected and generalised for every zoom
 * band, kept in a binary file in the user's cache directory so that the next opening of the same
 * chart needs neither the GeoPackage reader nor the generalisation.
 *
 * <p><b>Why by hand:</b> measured on the build machine (2 cores, shared), opening the bundled demo
 * region through SQLite, the NGA GeoPackage library and SIS cost about 0.6 s of CPU on a cold start
 * (0.17 s loading SQLite's native library, 0.25 s opening the GeoPackage, the rest reading), and
 * generalising the world base 1.4 s more in the background; reading the same layers back from this
 * file costs a few tens of milliseconds. The GeoPackage stays the source of truth: a cache entry is
 * found by the SHA-256 of the chart file's bytes, the mask and this format's version, so any change
 * to the file (or to how it is prepared, which bumps {@link #FORMAT}) simply misses and the file is
 * read again.
 *
 * <p>Format (big-endian): magic {@code SWPREP}, format version, the key string, the number of
 * layers; per layer its name, class, extents in degrees and metres, labels, a table of its distinct
 * parts (point count, closed flag, feature index, envelope width and height, the packed coordinates),
 * and for each of {@link PreparedLayer#bandCount()} bands the indices of its parts in that table
 * (bands share the parts their simplification left unchanged); the magic again at the end. Any unreadable or
 * truncated entry is a miss.
 *
 * <p>Only files read without any problem are cached (a cached file reports no problems when read
 * back). Entries are written to a temporary file and renamed.
 *
 * <p><b>Thread safety:</b> stateless; call from a worker thread.
 */
final class PreparedCache {

    /** Version of the format and of the preparation; bump when either changes. */
    static final int FORMAT = 1;
    private static final byte[] MAGIC = "SWPREP".getBytes(StandardCharsets.US_ASCII);
    /**
     * System property naming the cache directory; {@code none} turns the cache off. Default:
     * {@code $XDG_CACHE_HOME/sightwork/prepared}, else {@code ~/.cache/sightwork/prepared}.
     */
    static final String DIRECTORY_PROPERTY = "sightwork.cache";

    private PreparedCache() {
    }

    /**
     * The cache directory.
     *
     * @return the directory, or empty when the cache is off
     */
    static Optional<Path> directory() {
        String p = System.getProperty(DIRECTORY_PROPERTY);
        if (p != null && !p.isBlank()) {
            return p.strip().equalsIgnoreCase("none") ? Optional.empty() : Optional.of(Path.of(p.strip()));
        }
        String xdg = System.getenv("XDG_CACHE_HOME");
        Path base = xdg != null && !xdg.isBlank() ? Path.of(xdg) : Path.of(System.getProperty("user.home"), ".cache");
        return Optional.of(base.resolve("sightwork").resolve("prepared"));
    }

    /**
     * The key of a chart file prepared with a mask.
     *
     * @param file the chart file
     * @param maskDeg the mask, or null
     * @return the key
     * @throws IOException if the file cannot be read
     */
    static String key(Path file, Envelope maskDeg) throws IOException {
        MessageDigest sha;
        try {
            sha = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
        byte[] buf = new byte[1 << 16];
        try (InputStream in = Files.newInputStream(file)) {
            for (int r; (r = in.read(buf)) > 0;) {
                sha.update(buf, 0, r);
            }
        }
        String mask = maskDeg == null || maskDeg.isNull() ? "none" : String.format(Locale.ROOT, "%.9f,%.9f,%.9f,%.9f",
                maskDeg.getMinX(), maskDeg.getMinY(), maskDeg.getMaxX(), maskDeg.getMaxY());
        return "v" + FORMAT + " sha256 " + HexFormat.of().formatHex(sha.digest()) + " mask " + mask;
    }

    private static Path entry(Path dir, String key) {
        try {
            byte[] h = MessageDigest.getInstance("SHA-256").digest(key.getBytes(StandardCharsets.UTF_8));
            return dir.resolve(HexFormat.of().formatHex(h, 0, 16) + ".prepared");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    /**
     * Reads the prepared layers of a chart file, if the cache holds them for its present content.
     *
     * @param file the chart file
     * @param maskDeg the mask it is to be prepared with, or null
     * @return the layers, generalised, in drawing order; empty on a miss
     */
    static Optional<List<PreparedLayer>> read(Path file, Envelope maskDeg) {
        Optional<Path> dir = directory();
        if (dir.isEmpty() || !Files.isRegularFile(file)) {
            return Optional.empty();
        }
        try {
            String key = key(file, maskDeg);
            Path e = entry(dir.get(), key);
            if (!Files.isRegularFile(e)) {
                return Optional.empty();
            }
            ByteBuffer b = ByteBuffer.wrap(Files.readAllBytes(e));
            expectMagic(b);
            if (b.getInt() != FORMAT || !readString(b).equals(key)) {
                return Optional.empty();
            }
            int nLayers = b.getInt();
            List<PreparedLayer> layers = new ArrayList<>(nLayers);
            for (int l = 0; l < nLayers; l++) {
                String name = readString(b);
                FeatureClass cls = FeatureClass.valueOf(readString(b));
                Envelope extentDeg = readEnvelope(b);
                Envelope extentM = readEnvelope(b);
                int nLabels = b.getInt();
                List<PreparedLayer.NameLabel> labels = new ArrayList<>(nLabels);
                for (int k = 0; k < nLabels; k++) {
                    labels.add(new PreparedLayer.NameLabel(readString(b), b.getDouble(), b.getDouble(), b.getDouble()));
                }
                int nParts = b.getInt();
                PreparedLayer.Part[] table = new PreparedLayer.Part[nParts];
                for (int k = 0; k < nParts; k++) {
                    int n = b.getInt();
                    boolean closed = b.get() != 0;
                    int feature = b.getInt();
                    double w = b.getDouble();
                    double h = b.getDouble();
                    double[] xy = new double[2 * n];
                    b.asDoubleBuffer().get(xy);
                    b.position(b.position() + 16 * n);
                    table[k] = new PreparedLayer.Part(xy, n, closed, feature, w, h);
                }
                List<List<PreparedLayer.Part>> bands = new ArrayList<>();
                for (int band = 0; band < PreparedLayer.bandCount(); band++) {
                    int n = b.getInt();
                    List<PreparedLayer.Part> parts = new ArrayList<>(n);
                    for (int k = 0; k < n; k++) {
                        parts.add(table[b.getInt()]);
                    }
                    bands.add(parts);
                }
                ChartLayer layer = new ChartLayer(name, file, cls, List.of(), extentDeg);
                layers.add(PreparedLayer.restore(layer, extentM, maskDeg, labels, bands));
            }
            expectMagic(b);
            return Optional.of(layers);
        } catch (IOException | RuntimeException e) {
            return Optional.empty(); // unreadable, truncated or foreign: read the chart file itself
        }
    }

    /**
     * Writes the prepared layers of a chart file. Does nothing if the cache is off, a layer is not
     * generalised yet, or the cache directory cannot be written (the cache is only an aid).
     *
     * @param file the chart file
     * @param maskDeg the mask the layers were prepared with, or null
     * @param layers every layer of the file, generalised, in drawing order
     * @return true if written
     */
    static boolean write(Path file, Envelope maskDeg, List<PreparedLayer> layers) {
        Optional<Path> dir = directory();
        if (dir.isEmpty() || layers.isEmpty()) {
            return false;
        }
        for (PreparedLayer l : layers) {
            for (int band = 0; band < PreparedLayer.bandCount(); band++) {
                if (l.parts(band) == null || !l.isGeneralised()) {
                    return false;
                }
            }
        }
        Path tmp = null;
        try {
            String key = key(file, maskDeg);
            ByteArrayOutputStream bytes = new ByteArrayOutputStream(1 << 20);
            try (DataOutputStream out = new DataOutputStream(bytes)) {
                out.write(MAGIC);
                out.writeInt(FORMAT);
                writeString(out, key);
                out.writeInt(layers.size());
                for (PreparedLayer l : layers) {
                    writeString(out, l.layer().name());
                    writeString(out, l.layer().featureClass().name());
                    writeEnvelope(out, l.layer().extentDeg());
                    writeEnvelope(out, l.extentM());
                    out.writeInt(l.labels().size());
                    for (PreparedLayer.NameLabel n : l.labels()) {
                        writeString(out, n.text());
                        out.writeDouble(n.xM());
                        out.writeDouble(n.yM());
                        out.writeDouble(n.sizeM());
                    }
                    // each part once (bands share the parts a simplification left unchanged), then
                    // each band as indices into that table
                    java.util.Map<PreparedLayer.Part, Integer> ids = new java.util.IdentityHashMap<>();
                    List<PreparedLayer.Part> table = new ArrayList<>();
                    for (int band = 0; band < PreparedLayer.bandCount(); band++) {
                        for (PreparedLayer.Part p : l.parts(band)) {
                            if (ids.putIfAbsent(p, table.size()) == null) {
                                table.add(p);
                            }
                        }
                    }
                    out.writeInt(table.size());
                    for (PreparedLayer.Part p : table) {
                        out.writeInt(p.n());
                        out.writeByte(p.closed() ? 1 : 0);
                        out.writeInt(p.featureIndex());
                        out.writeDouble(p.widthM());
                        out.writeDouble(p.heightM());
                        for (int i = 0; i < 2 * p.n(); i++) {
                            out.writeDouble(p.xy()[i]);
                        }
                    }
                    for (int band = 0; band < PreparedLayer.bandCount(); band++) {
                        List<PreparedLayer.Part> parts = l.parts(band);
                        out.writeInt(parts.size());
                        for (PreparedLayer.Part p : parts) {
                            out.writeInt(ids.get(p));
                        }
                    }
                }
                out.write(MAGIC);
            }
            Files.createDirectories(dir.get());
            Path target = entry(dir.get(), key);
            tmp = Files.createTempFile(dir.get(), target.getFileName().toString(), ".tmp");
            Files.write(tmp, bytes.toByteArray());
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
            return true;
        } catch (IOException | RuntimeException e) {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // a stray temporary file in the cache directory is harmless
                }
            }
            return false;
        }
    }

    private static void expectMagic(ByteBuffer b) throws IOException {
        byte[] m = new byte[MAGIC.length];
        b.get(m);
        if (!java.util.Arrays.equals(m, MAGIC)) {
            throw new IOException("not a prepared-chart cache entry");
        }
    }

    private static String readString(ByteBuffer b) {
        byte[] s = new byte[b.getInt()];
        b.get(s);
        return new String(s, StandardCharsets.UTF_8);
    }

    private static void writeString(DataOutputStream out, String s) throws IOException {
        byte[] u = s.getBytes(StandardCharsets.UTF_8);
        out.writeInt(u.length);
        out.write(u);
    }

    private static Envelope readEnvelope(ByteBuffer b) {
        boolean isNull = b.get() != 0;
        double x0 = b.getDouble();
        double x1 = b.getDouble();
        double y0 = b.getDouble();
        double y1 = b.getDouble();
        return isNull ? new Envelope() : new Envelope(x0, x1, y0, y1);
    }

    private static void writeEnvelope(DataOutputStream out, Envelope e) throws IOException {
        out.writeByte(e.isNull() ? 1 : 0);
        out.writeDouble(e.isNull() ? 0 : e.getMinX());
        out.writeDouble(e.isNull() ? 0 : e.getMaxX());
        out.writeDouble(e.isNull() ? 0 : e.getMinY());
        out.writeDouble(e.isNull() ? 0 : e.getMaxY());
    }
}
