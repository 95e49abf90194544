# Times R's glm on the data of limen.bench.FitBench (P-HERON yes/no, 8 levels x 50 trials), the
# two-parameter logistic fit that FitBench.twoParameterLogisticLikeGlm computes. Prints the median time per
# glm() call and per glm.fit() call (the bare IRLS without formula handling), in microseconds.
#   Rscript bench/r/glm_timing.R
x <- c(10, 15, 20, 25, 30, 35, 40, 45)
k <- c(5, 7, 12, 20, 31, 40, 45, 47)
n <- rep(50, 8)
y <- cbind(k, n - k)
X <- cbind(1, x)
time_us <- function(f, reps = 2000, rounds = 7) {
  per <- numeric(rounds)
  for (r in seq_len(rounds)) {
    t0 <- proc.time()[["elapsed"]]
    for (i in seq_len(reps)) f()
    per[r] <- (proc.time()[["elapsed"]] - t0) / reps * 1e6
  }
  median(per)
}
m <- glm(y ~ x, family = binomial("logit"))
cat(sprintf("R %s\n", R.version.string))
cat(sprintf("glm coefficients: %.10g %.10g (mid %.10g, scale %.10g)\n", coef(m)[1], coef(m)[2], -coef(m)[1] / coef(m)[2], 1 / coef(m)[2]))
cat(sprintf("glm(): median %.1f us per call\n", time_us(function() glm(y ~ x, family = binomial("logit")))))
cat(sprintf("glm.fit(): median %.1f us per call\n",
            time_us(function() glm.fit(X, k / n, weights = n, family = binomial("logit")))))
