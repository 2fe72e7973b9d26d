package org.streetcomb.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * How far apart two colours look, to normal vision and to each kind of dichromacy: the colours are simulated
 * with the matrices of Machado, Oliveira and Fernandes (2009, IEEE TVCG 15(6), severity 1.0; values from memory)
 * on linear sRGB (IEC 61966-2-1), then compared by the CIE 1976 colour difference Delta E*ab in CIE L*a*b* (D65).
 *
 * <p>The target, {@link #AT_A_GLANCE}: differences above about 10 are seen at a glance as different colours
 * rather than shades of one (a common rule of thumb for Delta E*ab, from memory; the just noticeable difference
 * is about 2.3, Sharma, Digital Color Imaging Handbook, from memory).
 */
final class ColourDifference {

    static final double AT_A_GLANCE = 10;

    /** Normal vision, protanopia, deuteranopia, tritanopia. */
    static final Map<String, double[][]> VISIONS = Map.of(
            "normal", new double[][] {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}},
            "protanopia", new double[][] {{0.152286, 1.052583, -0.204868}, {0.114503, 0.786281, 0.099216},
                {-0.003882, -0.048116, 1.051998}},
            "deuteranopia", new double[][] {{0.367322, 0.860646, -0.227968}, {0.280085, 0.672501, 0.047413},
                {-0.011820, 0.042940, 0.968881}},
            "tritanopia", new double[][] {{1.255528, -0.076749, -0.178779}, {-0.078411, 0.930809, 0.147602},
                {0.004733, 0.691367, 0.303900}});

    private ColourDifference() {
    }

    /** The smallest Delta E*ab between two #rrggbb colours over the four visions. */
    static double smallest(String a, String b) {
        double least = Double.POSITIVE_INFINITY;
        for (double[][] vision : VISIONS.values()) {
            least = Math.min(least, deltaE(lab(vision, a), lab(vision, b)));
        }
        return least;
    }

    /** The pairs of named colours closer than {@link #AT_A_GLANCE} for some vision, as readable text. */
    static List<String> tooClose(Map<String, String> named) {
        List<String> close = new ArrayList<>();
        List<Map.Entry<String, String>> entries = new ArrayList<>(named.entrySet());
        for (int i = 0; i < entries.size(); i++) {
            for (int j = i + 1; j < entries.size(); j++) {
                double d = smallest(entries.get(i).getValue(), entries.get(j).getValue());
                if (d < AT_A_GLANCE) {
                    close.add(String.format(java.util.Locale.ROOT, "%s %s and %s %s: %.1f", entries.get(i).getKey(),
                            entries.get(i).getValue(), entries.get(j).getKey(), entries.get(j).getValue(), d));
                }
            }
        }
        return close;
    }

    static double[] lab(double[][] simulation, String hex) {
        int rgb = Integer.parseInt(hex.substring(1), 16);
        double[] linear = {linear((rgb >> 16) & 0xff), linear((rgb >> 8) & 0xff), linear(rgb & 0xff)};
        double[] seen = new double[3];
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                seen[r] += simulation[r][c] * linear[c];
            }
            seen[r] = Math.max(0, Math.min(1, seen[r]));
        }
        // sRGB (D65) to CIE XYZ, IEC 61966-2-1
        double x = 0.4124 * seen[0] + 0.3576 * seen[1] + 0.1805 * seen[2];
        double y = 0.2126 * seen[0] + 0.7152 * seen[1] + 0.0722 * seen[2];
        double z = 0.0193 * seen[0] + 0.1192 * seen[1] + 0.9505 * seen[2];
        double fx = f(x / 0.95047);
        double fy = f(y);
        double fz = f(z / 1.08883);
        return new double[] {116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)};
    }

    private static double f(double t) {
        double d = 6.0 / 29;
        return t > d * d * d ? Math.cbrt(t) : t / (3 * d * d) + 4.0 / 29;
    }

    private static double linear(int channel) {
        double c = channel / 255.0;
        return c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
    }

    static double deltaE(double[] a, double[] b) {
        return Math.sqrt(Math.pow(a[0] - b[0], 2) + Math.pow(a[1] - b[1], 2) + Math.pow(a[2] - b[2], 2));
    }
}
