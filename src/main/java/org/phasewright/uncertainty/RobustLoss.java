package org.phasewright.uncertainty;

import java.util.Locale;

/**
 * Robust loss functions for M-estimation, with the tuning constants that give 95% efficiency at the
 * normal distribution (Huber 1964, Ann. Math. Stat. 35, 73: k = 1.345; Beaton and Tukey 1974,
 * Technometrics 16, 147: bisquare c = 4.685). Residuals are in units of the robust scale.
 */
public enum RobustLoss {
    HUBER("huber", 1.345),
    BISQUARE("bisquare", 4.685);

    private final String id;
    private final double tuning;

    RobustLoss(String id, double tuning) {
        this.id = id;
        this.tuning = tuning;
    }

    public String id() {
        return id;
    }

    public double defaultTuning() {
        return tuning;
    }

    public static RobustLoss parse(String text) {
        String k = text.trim().toLowerCase(Locale.ROOT);
        for (RobustLoss l : values()) {
            if (l.id.equals(k) || l.name().equalsIgnoreCase(k) || (l == BISQUARE && k.equals("tukey"))) {
                return l;
            }
        }
        throw new IllegalArgumentException("unknown robust loss '" + text + "'; choose huber or bisquare");
    }

    /** psi(r) for tuning constant c. */
    double psi(double r, double c) {
        if (this == HUBER) {
            return Math.max(-c, Math.min(c, r));
        }
        if (Math.abs(r) >= c) {
            return 0;
        }
        double u = 1 - (r / c) * (r / c);
        return r * u * u;
    }

    /** psi'(r). */
    double psiPrime(double r, double c) {
        if (this == HUBER) {
            return Math.abs(r) <= c ? 1 : 0;
        }
        if (Math.abs(r) >= c) {
            return 0;
        }
        double q = (r / c) * (r / c);
        return (1 - q) * (1 - 5 * q);
    }

    /** IRLS weight psi(r) / r. */
    double weight(double r, double c) {
        if (r == 0) {
            return 1;
        }
        return psi(r, c) / r;
    }
}
