/** Information criteria of a least-squares model. */
export interface InformationCriteria {
  /** Number of observations. */
  n: number;
  /** Number of estimated parameters, σ included. */
  k: number;
  /** AIC = n·ln(RSS/n) + 2k. */
  aic: number;
  /** AICc = AIC + 2k(k + 1)/(n − k − 1); NaN when n ≤ k + 1. */
  aicc: number;
}

/** AIC and small-sample AICc of a Gaussian least-squares fit from its RSS; k must count σ as a parameter, so a straight line has k = 3 (Burnham & Anderson 2002, Model Selection and Multimodel Inference, eqs. 2.13–2.14). Compare only models fitted to the same response on the same scale. */
export function aicc(rss: number, n: number, k: number): InformationCriteria {
  const aic = n * Math.log(rss / n) + 2 * k;
  const aiccValue = n - k - 1 > 0 ? aic + (2 * k * (k + 1)) / (n - k - 1) : NaN;
  return { n, k, aic, aicc: aiccValue };
}
