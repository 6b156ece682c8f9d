package lamella.engine;

import java.util.List;
import lamella.api.BottomBoundary;
import lamella.api.Layer;
import org.apache.commons.math3.complex.Complex;

/**
 * An independent reference for tests: the layered response by explicit 2×2 transfer matrices in cosh/sinh form,
 * [θ_b; f_b] = M [θ_t; f_t] with M = [[cosh qd, −sinh(qd)/(Λz q)], [−Λz q sinh qd, cosh qd]] per layer and
 * [[1, −1/G], [0, 1]] per interface (Feldman, High Temp.–High Press. 31, 293, 1999; Cahill, Rev. Sci. Instrum. 75,
 * 5119, 2004, eqs. 2–4), in Commons Math complex arithmetic. Overflows for thick layers: that is what the engine's
 * impedance form avoids, and why this reference is used only for moderate q·d.
 */
final class TransferMatrixReference {

    private TransferMatrixReference() {
    }

    static Complex response(List<Layer> layers, BottomBoundary bottom, double k, double omega) {
        Complex a = Complex.ONE;
        Complex b = Complex.ZERO;
        Complex c = Complex.ZERO;
        Complex d = Complex.ONE;
        Complex lastGamma = null;
        Complex lastQd = null;
        for (int i = 0; i < layers.size(); i++) {
            Layer l = layers.get(i);
            Complex q = new Complex(l.kInPlaneX() * k * k, omega * l.heatCapacity()).divide(l.kThrough()).sqrt();
            Complex gamma = q.multiply(l.kThrough());
            boolean last = i == layers.size() - 1;
            if (last && bottom == BottomBoundary.SEMI_INFINITE) {
                lastGamma = gamma;
                break;
            }
            Complex qd = q.multiply(l.thickness());
            Complex ch = qd.cosh();
            Complex sh = qd.sinh();
            // layer matrix L = [[ch, −sh/γ], [−γ sh, ch]]; product P ← L · P
            Complex l11 = ch;
            Complex l12 = sh.divide(gamma).negate();
            Complex l21 = gamma.multiply(sh).negate();
            Complex l22 = ch;
            Complex na = l11.multiply(a).add(l12.multiply(c));
            Complex nb = l11.multiply(b).add(l12.multiply(d));
            Complex nc = l21.multiply(a).add(l22.multiply(c));
            Complex nd = l21.multiply(b).add(l22.multiply(d));
            a = na;
            b = nb;
            c = nc;
            d = nd;
            if (!l.hasPerfectContactBelow()) {
                double r = 1 / l.conductanceBelow();
                // interface R = [[1, −r], [0, 1]]
                a = a.subtract(c.multiply(r));
                b = b.subtract(d.multiply(r));
            }
            lastQd = qd;
        }
        switch (bottom) {
            case SEMI_INFINITE:
                // bottom of the last finite layer feeds a half-space: f_b = γ θ_b ⇒ (c − γ a) θ_t + (d − γ b) f_t = 0
                return b.multiply(lastGamma).subtract(d).divide(c.subtract(a.multiply(lastGamma)));
            case ADIABATIC:
                // f_b = 0 ⇒ c θ_t + d f_t = 0
                return d.divide(c).negate();
            default:
                // θ_b = 0 ⇒ a θ_t + b f_t = 0
                return b.divide(a).negate();
        }
    }
}
