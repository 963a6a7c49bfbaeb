package org.tracegas.quantify.internal;

/** A vector-valued model with its Jacobian, for non-linear least squares. */
public interface ModelFunction {

    /**
     * @param parameters current parameters
     * @param values     receives the model value at each point
     * @param jacobian   receives d value[i] / d parameter[j] as jacobian[i][j]
     */
    void evaluate(double[] parameters, double[] values, double[][] jacobian);
}
