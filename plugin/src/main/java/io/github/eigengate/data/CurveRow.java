package io.github.eigengate.data;

import io.github.eigengate.arith.WeierstrassModel;

/**
 * One row of {@code curves.csv}: an elliptic curve over Q named beside a rational weight-2 newform.
 *
 * @param form     the form id (a form over Q of weight 2 with the trivial character)
 * @param model    the integral Weierstrass model, nonsingular, not necessarily minimal
 * @param torsion  the claimed order of E(Q)_tors, or {@code null} when the cell is absent or empty
 * @param at       the row
 * @param curveAt  the {@code curve} cell
 * @param torsionAt the {@code torsion} cell (column 0 when the table has no such column)
 */
public record CurveRow(String form, WeierstrassModel model, Integer torsion, SourceLocation at,
                       SourceLocation curveAt, SourceLocation torsionAt) {
}
