// TeX sources of every formula the method notes can show (rendered to MathML by renderFormula).

/** TeX of each formula, keyed by id. */
export const FORMULA_TEX = {
  'eos80-conversion': String.raw`c_{\mathrm{kg}} = \frac{c_{\mathrm{L}}}{\rho(S, T, p)} \times 1000\ \mathrm{L\,m^{-3}}`,
  'mdl-relation': String.raw`\log_{10} C = a + b \log_{10} V`,
  'factor-relation': String.raw`C = f\,V`,
  'redfield-carbon': String.raw`C = r_{\mathrm{C:P}}\,P`,
  'fe-c': String.raw`\mathrm{Fe{:}C} = \frac{\mathrm{Fe}}{C} \times 10^{6}\ \mu\mathrm{mol\,mol^{-1}}`,
  'fe-p': String.raw`\mathrm{Fe{:}P} = \frac{\mathrm{Fe}}{P} \times 10^{3}\ \mathrm{mmol\,mol^{-1}}`,
  'ratio-sigma': String.raw`\frac{\sigma_{q}}{q} = \sqrt{\left(\frac{\sigma_{\mathrm{Fe}}}{\mathrm{Fe}}\right)^{2} + \left(\frac{\sigma_{C}}{C}\right)^{2}}`,
  'power-law': String.raw`\log_{10}(\mathrm{Fe{:}C}) = a + b \log_{10}(\mathrm{dFe})`,
  saturating: String.raw`\mathrm{Fe{:}C} = \frac{Q_{\max}\,\mathrm{dFe}}{K + \mathrm{dFe}}`,
  york: String.raw`b = \frac{\sum_i W_i \beta_i V_i}{\sum_i W_i \beta_i U_i},\quad W_i = \frac{\omega(X_i)\,\omega(Y_i)}{\omega(X_i) + b^{2}\omega(Y_i) - 2 b r_i \alpha_i}`,
  sma: String.raw`b_{\mathrm{SMA}} = \operatorname{sign}(r)\,\frac{s_y}{s_x}`,
  aicc: String.raw`\mathrm{AIC_c} = n \ln\!\left(\frac{\mathrm{RSS}}{n}\right) + 2k + \frac{2k(k+1)}{n-k-1}`,
  't-test': String.raw`t = \frac{\bar{r}}{s / \sqrt{m}},\quad \nu = m - 1`,
  bh: String.raw`k = \max\left\{ i : p_{(i)} \le \frac{i}{m}\,q \right\}`,
  'fe-star': String.raw`\mathrm{Fe^{*}} = \mathrm{dFe} - R_{\mathrm{Fe:P}}\,[\mathrm{PO_4}]`,
  'min-detectable': String.raw`\Pr\left(|T_{m-1,\,\lambda}| > t_{1-\alpha/2,\,m-1}\right) = 1-\beta,\quad \lambda = \frac{\delta_{\min}\sqrt{m}}{s}`,
} as const;

/** Id of a formula in FORMULA_TEX. */
export type FormulaId = keyof typeof FORMULA_TEX;
