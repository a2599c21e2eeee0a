package org.phasewright.io;

import static org.phasewright.io.InputException.Kind.BAD_MODEL;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.phasewright.io.write.AtomicFile;
import org.phasewright.model.Covariate;
import org.phasewright.model.HarmonicSeries;
import org.phasewright.model.Intercept;
import org.phasewright.model.KnotPlacement;
import org.phasewright.model.ModelSpec;
import org.phasewright.model.PolynomialTrend;
import org.phasewright.model.Sinusoid;
import org.phasewright.model.SplineTrend;
import org.phasewright.model.Step;
import org.phasewright.model.TermSpec;

/**
 * Saves and loads a {@link ModelSpec} as a small JSON file, so that a fit can be repeated on
 * new records. The layout (our own):
 *
 * <pre>
 * {
 *   "format": "phasewright-model",
 *   "format_version": 1,
 *   "terms": [
 *     {"kind": "intercept"},
 *     {"kind": "polynomial_trend", "degree": 2},
 *     {"kind": "spline_trend", "interior_knots": 4, "placement": "even", "natural": false},
 *     {"kind": "sinusoid", "frequency_hz": 172.2},
 *     {"kind": "harmonic_series", "fundamental_hz": 24.6, "harmonics": 6, "skip": [4]},
 *     {"kind": "step", "time_s": 3.5},
 *     {"kind": "covariate", "column": "load", "power": 1}
 *   ]
 * }
 * </pre>
 *
 * "format", "format_version", "description", "skip", "placement", "natural" and "power" may be
 * left out. Loading is strict: malformed JSON is reported at its line and column, and a missing,
 * unknown or mistyped field by its path (e.g. {@code terms[2].frequency_hz}), each as an
 * {@link InputException} of kind {@code BAD_MODEL}.
 */
public final class ModelFile {

    public static final String FORMAT = "phasewright-model";
    public static final int FORMAT_VERSION = 1;

    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(SerializationFeature.INDENT_OUTPUT)
            .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION);
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private ModelFile() {
    }

    /** Writes {@code model} to {@code file} atomically. */
    public static void save(Path file, ModelSpec model, boolean replace) {
        String json = toJson(model);
        AtomicFile.writeText(file, replace, w -> w.write(json));
    }

    /** The model file's text. */
    public static String toJson(ModelSpec model) {
        ObjectNode root = NODES.objectNode();
        root.put("format", FORMAT);
        root.put("format_version", FORMAT_VERSION);
        root.set("terms", termsNode(model));
        try {
            return MAPPER.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot happen for a tree of plain nodes", e);
        }
    }

    /** The list of terms as JSON nodes (also used in the result JSON). */
    public static ArrayNode termsNode(ModelSpec model) {
        ArrayNode terms = NODES.arrayNode();
        for (TermSpec t : model.terms()) {
            terms.add(termNode(t));
        }
        return terms;
    }

    /** One term as a JSON object. */
    public static ObjectNode termNode(TermSpec t) {
        ObjectNode n = NODES.objectNode();
        n.put("kind", t.kind());
        if (t instanceof PolynomialTrend p) {
            n.put("degree", p.degree());
        } else if (t instanceof SplineTrend s) {
            n.put("interior_knots", s.interiorKnots());
            n.put("placement", s.placement().name().toLowerCase(Locale.ROOT));
            n.put("natural", s.natural());
        } else if (t instanceof Sinusoid s) {
            n.put("frequency_hz", s.frequencyHz());
        } else if (t instanceof HarmonicSeries h) {
            n.put("fundamental_hz", h.fundamentalHz());
            n.put("harmonics", h.harmonics());
            ArrayNode skip = n.putArray("skip");
            h.skip().forEach(skip::add);
        } else if (t instanceof Step s) {
            n.put("time_s", s.timeSeconds());
        } else if (t instanceof Covariate c) {
            n.put("column", c.column());
            n.put("power", c.power());
        }
        return n;
    }

    /** Reads a model file. */
    public static ModelSpec load(Path file) {
        String text;
        try {
            if (!Files.isRegularFile(file)) {
                throw InputException.inFile(InputException.Kind.UNREADABLE, file, Files.exists(file) ? "not a regular file" : "no such file");
            }
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw InputException.inFile(InputException.Kind.UNREADABLE, file, "cannot be read: " + e.getMessage(), e);
        }
        return fromJson(text, file);
    }

    /** Parses model-file text; {@code source} names it in errors (may be null). */
    public static ModelSpec fromJson(String text, Path source) {
        if (text.isBlank()) {
            throw InputException.inFile(InputException.Kind.EMPTY_FILE, source, "the model file is empty");
        }
        JsonNode root;
        try {
            root = MAPPER.readTree(text);
        } catch (JsonProcessingException e) {
            long line = e.getLocation() == null ? -1 : e.getLocation().getLineNr();
            int col = e.getLocation() == null ? -1 : e.getLocation().getColumnNr();
            throw InputException.atField(BAD_MODEL, source, null, line, col, "not valid JSON: " + e.getOriginalMessage());
        }
        return new Decoder(source).model(root);
    }

    /** Turns a JSON tree into terms, naming the field of every problem. */
    private static final class Decoder {
        private final Path source;

        Decoder(Path source) {
            this.source = source;
        }

        private InputException bad(String field, String detail) {
            return InputException.atField(BAD_MODEL, source, field, -1, -1, detail);
        }

        ModelSpec model(JsonNode root) {
            if (!root.isObject()) {
                throw bad("(top level)", "expected a JSON object with a \"terms\" list, found " + describe(root));
            }
            allowOnly(root, "", Set.of("format", "format_version", "description", "terms"));
            JsonNode format = root.get("format");
            if (format != null && !(format.isTextual() && format.asText().equals(FORMAT))) {
                throw bad("format", "expected \"" + FORMAT + "\", found " + describe(format));
            }
            JsonNode version = root.get("format_version");
            if (version != null && !(version.isIntegralNumber() && version.asInt() == FORMAT_VERSION)) {
                throw bad("format_version", "this Phasewright reads model files of version " + FORMAT_VERSION
                        + ", found " + describe(version));
            }
            JsonNode terms = root.get("terms");
            if (terms == null) {
                throw bad("terms", "missing; list the model's terms");
            }
            if (!terms.isArray()) {
                throw bad("terms", "expected a list of terms, found " + describe(terms));
            }
            if (terms.isEmpty()) {
                throw bad("terms", "the list is empty; a model needs at least one term");
            }
            List<TermSpec> out = new ArrayList<>();
            for (int i = 0; i < terms.size(); i++) {
                out.add(term(terms.get(i), "terms[" + i + "]"));
            }
            try {
                return new ModelSpec(out);
            } catch (IllegalArgumentException e) {
                throw bad("terms", e.getMessage());
            }
        }

        private TermSpec term(JsonNode n, String at) {
            if (!n.isObject()) {
                throw bad(at, "expected an object such as {\"kind\": \"sinusoid\", \"frequency_hz\": 50}, found " + describe(n));
            }
            String kind = text(n, at, "kind");
            try {
                switch (kind) {
                    case "intercept":
                        allowOnly(n, at, Set.of("kind"));
                        return new Intercept();
                    case "polynomial_trend":
                        allowOnly(n, at, Set.of("kind", "degree"));
                        return new PolynomialTrend(whole(n, at, "degree", null));
                    case "spline_trend": {
                        allowOnly(n, at, Set.of("kind", "interior_knots", "placement", "natural"));
                        int knots = whole(n, at, "interior_knots", null);
                        KnotPlacement placement = KnotPlacement.EVEN;
                        if (n.has("placement")) {
                            String p = text(n, at, "placement");
                            try {
                                placement = KnotPlacement.valueOf(p.toUpperCase(Locale.ROOT));
                            } catch (IllegalArgumentException e) {
                                throw bad(at + ".placement", "expected \"even\" or \"quantile\", found \"" + p + "\"");
                            }
                        }
                        return new SplineTrend(knots, placement, bool(n, at, "natural", false));
                    }
                    case "sinusoid":
                        allowOnly(n, at, Set.of("kind", "frequency_hz"));
                        return new Sinusoid(number(n, at, "frequency_hz"));
                    case "harmonic_series": {
                        allowOnly(n, at, Set.of("kind", "fundamental_hz", "harmonics", "skip"));
                        double f = number(n, at, "fundamental_hz");
                        int h = whole(n, at, "harmonics", null);
                        List<Integer> skip = new ArrayList<>();
                        JsonNode s = n.get("skip");
                        if (s != null) {
                            if (!s.isArray()) {
                                throw bad(at + ".skip", "expected a list of harmonic numbers, found " + describe(s));
                            }
                            for (int k = 0; k < s.size(); k++) {
                                JsonNode e = s.get(k);
                                if (!e.isIntegralNumber() || !e.canConvertToInt()) {
                                    throw bad(at + ".skip[" + k + "]", "expected a whole number, found " + describe(e));
                                }
                                skip.add(e.asInt());
                            }
                        }
                        return new HarmonicSeries(f, h, skip);
                    }
                    case "step":
                        allowOnly(n, at, Set.of("kind", "time_s"));
                        return new Step(number(n, at, "time_s"));
                    case "covariate":
                        allowOnly(n, at, Set.of("kind", "column", "power"));
                        return new Covariate(text(n, at, "column"), whole(n, at, "power", 1));
                    default:
                        throw bad(at + ".kind", "unknown kind \"" + kind + "\"; expected one of intercept, polynomial_trend,"
                                + " spline_trend, sinusoid, harmonic_series, step, covariate");
                }
            } catch (IllegalArgumentException e) {
                throw bad(at, e.getMessage());
            }
        }

        private void allowOnly(JsonNode n, String at, Set<String> allowed) {
            Iterator<String> names = n.fieldNames();
            while (names.hasNext()) {
                String f = names.next();
                if (!allowed.contains(f)) {
                    throw bad(at.isEmpty() ? f : at + "." + f, "unknown field; "
                            + (at.isEmpty() ? "a model file holds " : "this kind of term takes ")
                            + String.join(", ", allowed.stream().sorted().toList()));
                }
            }
        }

        private JsonNode required(JsonNode n, String at, String field) {
            JsonNode v = n.get(field);
            if (v == null || v.isNull()) {
                throw bad(at + "." + field, "missing");
            }
            return v;
        }

        private String text(JsonNode n, String at, String field) {
            JsonNode v = required(n, at, field);
            if (!v.isTextual()) {
                throw bad(at + "." + field, "expected text, found " + describe(v));
            }
            return v.asText();
        }

        private double number(JsonNode n, String at, String field) {
            JsonNode v = required(n, at, field);
            if (!v.isNumber()) {
                throw bad(at + "." + field, "expected a number, found " + describe(v));
            }
            double d = v.asDouble();
            if (!Double.isFinite(d)) {
                throw bad(at + "." + field, "expected a finite number, found " + v);
            }
            return d;
        }

        private int whole(JsonNode n, String at, String field, Integer fallback) {
            JsonNode v = n.get(field);
            if ((v == null || v.isNull()) && fallback != null) {
                return fallback;
            }
            v = required(n, at, field);
            if (!v.isIntegralNumber() || !v.canConvertToInt()) {
                throw bad(at + "." + field, "expected a whole number, found " + describe(v));
            }
            return v.asInt();
        }

        private boolean bool(JsonNode n, String at, String field, boolean fallback) {
            JsonNode v = n.get(field);
            if (v == null || v.isNull()) {
                return fallback;
            }
            if (!v.isBoolean()) {
                throw bad(at + "." + field, "expected true or false, found " + describe(v));
            }
            return v.asBoolean();
        }

        private static String describe(JsonNode v) {
            String text = v.toString();
            if (text.length() > 40) {
                text = text.substring(0, 37) + "...";
            }
            String type = switch (v.getNodeType()) {
                case STRING -> "text";
                case NUMBER -> "the number";
                case BOOLEAN -> "the value";
                case ARRAY -> "a list";
                case OBJECT -> "an object";
                case NULL -> "";
                default -> "";
            };
            return (type.isEmpty() ? "" : type + " ") + text;
        }
    }
}
