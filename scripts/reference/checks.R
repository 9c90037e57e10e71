# Reference values for the residual checks of issue #16: the exact Durbin–Watson distribution,
# Shapiro–Wilk (Royston's AS R94), the Bonferroni outlier test and lack of fit against pure error.
#
# Data: only R's own packages: datasets (cars, mtcars, LakeHuron, precip, rivers, islands, faithful,
# ChickWeight, warpbreaks, InsectSprays, stackloss) and carData::Duncan; seeded samples from R's default
# generator (Mersenne-Twister, Inversion) are written into the output, so the tests need no R.
# Sources of the numbers: lmtest's dwtest and its Fortran routine pan (Farebrother 1980, AS 153),
# stats::shapiro.test (AS R94), car::outlierTest, and anova() of two nested lm() fits.
#
# Run from the repository root:  Rscript scripts/reference/checks.R
# It writes test/engine/infer/fixtures/checks.json.

suppressPackageStartupMessages({ library(lmtest); library(car) })

num <- function(x) ifelse(is.finite(x), sprintf("%.17g", x), "null")
vec <- function(x) paste0("[", paste(num(x), collapse = ", "), "]")
mat <- function(m) paste0("[", paste(apply(m, 1, vec), collapse = ", "), "]")
text <- function(x) paste0("\"", x, "\"")
obj <- function(...) {
  fields <- list(...)
  paste0("{ ", paste(paste0(text(names(fields)), ": ", unlist(fields)), collapse = ", "), " }")
}
array_of <- function(items) paste0("[\n    ", paste(items, collapse = ",\n    "), "\n  ]")

# ---- Durbin–Watson -------------------------------------------------------------------------------
# Eigenvalues of M·A restricted to the residual space, as dwtest forms them (its own code, with its
# 1e-10 cut-off of zero eigenvalues); pan evaluates P(d <= x) from them. P(d >= x) is taken from pan
# with every eigenvalue and x reflected about 2 (4 - λ), so the upper tail is computed directly
# rather than as 1 - P(d <= x).
dw_eigenvalues <- function(X) {
  n <- nrow(X)
  k <- ncol(X)
  A <- diag(c(1, rep(2, n - 2), 1))
  A[abs(row(A) - col(A)) == 1] <- -1
  MA <- (diag(n) - X %*% chol2inv(qr.R(qr(X))) %*% t(X)) %*% A
  ev <- Re(eigen(MA)$values[1:(n - k)])
  ev[ev > 1e-10]
}
pan <- function(x, ev, iterations) {
  .Fortran("pan", as.double(c(x, ev)), as.integer(length(ev)), as.double(0), as.integer(iterations),
           x = double(1), PACKAGE = "lmtest")$x
}
# Imhof's (1961) inversion integrated by R's integrate(): an independent check with absolute accuracy
# near 1e-14, which pan lacks near the centre of the distribution once m = n - p is large (its value at
# the median of the LakeHuron design moves in the third digit with its number of terms).
imhof <- function(x, ev, upper = FALSE) {
  c <- ev - x
  f <- function(u) vapply(u, function(v) sin(0.5 * sum(atan(c * v))) / (v * prod((1 + c^2 * v^2)^0.25)), 0)
  integral <- integrate(f, 0, Inf, rel.tol = 1e-13, abs.tol = 1e-17, subdivisions = 10000L)$value / pi
  if (upper) 0.5 + integral else 0.5 - integral
}
dw_case <- function(name, y, X, grid) {
  fit <- lm.fit(X, y)
  ev <- dw_eigenvalues(X)
  d <- sum(diff(fit$residuals)^2) / sum(fit$residuals^2)
  greater <- dwtest(y ~ X - 1, exact = TRUE)
  two <- dwtest(y ~ X - 1, exact = TRUE, alternative = "two.sided")
  lower <- sapply(grid, function(x) pan(x, ev, 400))
  upper <- sapply(grid, function(x) pan(4 - x, 4 - ev, 400))
  lower100 <- sapply(grid, function(x) pan(x, ev, 100))
  imhof_lower <- sapply(grid, function(x) imhof(x, ev))
  imhof_upper <- sapply(grid, function(x) imhof(x, ev, upper = TRUE))
  obj(
    name = text(name), y = vec(y), design = mat(X), intercept = tolower(all(X[, 1] == 1)),
    residuals = vec(fit$residuals), statistic = num(d),
    eigenvalues = vec(sort(ev)),
    dwtestGreater = num(greater$p.value), dwtestTwoSided = num(two$p.value),
    panBelowStatistic = num(pan(d, ev, 400)), panAboveStatistic = num(pan(4 - d, 4 - ev, 400)),
    grid = vec(grid), panBelow = vec(lower), panAbove = vec(upper), panBelow100 = vec(lower100),
    imhofBelow = vec(imhof_lower), imhofAbove = vec(imhof_upper)
  )
}
few <- mtcars[1:12, ]
dw_cases <- c(
  dw_case("lm(dist ~ speed, cars)", cars$dist, model.matrix(~ speed, cars),
          c(0.5, 0.8, 1, 1.3, 1.6, 2, 2.4, 2.8, 3.1, 3.4)),
  dw_case("lm(mpg ~ wt + hp, mtcars)", mtcars$mpg, model.matrix(~ wt + hp, mtcars),
          c(0.6, 0.9, 1.2, 1.5, 2, 2.5, 3, 3.3)),
  dw_case("lm(mpg ~ wt + hp + disp + drat + qsec, mtcars[1:12, ])", few$mpg,
          model.matrix(~ wt + hp + disp + drat + qsec, few), c(0.7, 1, 1.5, 2, 2.5, 3, 3.3)),
  dw_case("lm(dist ~ speed - 1, cars)", cars$dist, model.matrix(~ speed - 1, cars), c(0.8, 1.2, 1.6, 2, 2.4, 3)),
  dw_case("lm(LakeHuron ~ time(LakeHuron))", as.numeric(LakeHuron), cbind(1, as.numeric(time(LakeHuron))),
          c(0.44, 0.9, 1.1, 1.3, 2, 2.7, 2.9, 3.1))
)

# ---- Shapiro–Wilk --------------------------------------------------------------------------------
sw_case <- function(name, x) {
  r <- shapiro.test(x)
  obj(name = text(name), x = vec(x), w = num(unname(r$statistic)), p = num(r$p.value))
}
set.seed(20261204)
sizes <- c(3, 4, 5, 11, 12, 20, 50, 500, 5000)
# Samples rounded to 6 decimals so that both sides read exactly the same doubles.
normal_samples <- lapply(sizes, function(n) round(rnorm(n, mean = 10, sd = 2), 6))
skewed_samples <- lapply(sizes, function(n) round(rexp(n), 6))
sw_cases <- c(
  sw_case("residuals of lm(dist ~ speed, cars)", unname(residuals(lm(dist ~ speed, cars)))),
  sw_case("residuals of lm(mpg ~ wt + hp, mtcars)", unname(residuals(lm(mpg ~ wt + hp, mtcars)))),
  sw_case("residuals of lm(stack.loss ~ ., stackloss)", unname(residuals(lm(stack.loss ~ ., stackloss)))),
  sw_case("precip", unname(precip)),
  sw_case("rivers", rivers),
  sw_case("islands", unname(islands)),
  sw_case("faithful$eruptions", faithful$eruptions),
  mapply(function(n, x) sw_case(paste0("round(rnorm(", n, ", 10, 2), 6), set.seed(20261204) sequence"), x),
         sizes, normal_samples),
  mapply(function(n, x) sw_case(paste0("round(rexp(", n, "), 6), set.seed(20261204) sequence"), x),
         sizes, skewed_samples)
)

# ---- Outlier test --------------------------------------------------------------------------------
outlier_case <- function(name, fit) {
  X <- model.matrix(fit)
  t <- rstudent(fit)
  r <- outlierTest(fit, cutoff = Inf, n.max = 1)
  obj(
    name = text(name), y = vec(model.response(model.frame(fit))), design = mat(X),
    studentized = vec(unname(t)), row = which(names(t) == names(r$rstudent)[1]),
    largest = num(unname(r$rstudent[1])), p = num(unname(r$p[1])), bonferroni = num(unname(r$bonf.p[1]))
  )
}
outlier_cases <- c(
  outlier_case("lm(prestige ~ income + education, carData::Duncan)", lm(prestige ~ income + education, carData::Duncan)),
  outlier_case("lm(dist ~ speed, cars)", lm(dist ~ speed, cars)),
  outlier_case("lm(mpg ~ wt + hp, mtcars)", lm(mpg ~ wt + hp, mtcars)),
  outlier_case("lm(stack.loss ~ ., stackloss)", lm(stack.loss ~ ., stackloss))
)

# ---- Lack of fit against pure error ---------------------------------------------------------------
# The saturated model has one mean per distinct combination of the predictors' values.
lack_case <- function(name, fit) {
  X <- model.matrix(fit)
  y <- model.response(model.frame(fit))
  cell <- factor(apply(X, 1, paste, collapse = "|"))
  full <- lm(y ~ cell)
  a <- anova(lm(y ~ X - 1), full)
  obj(
    name = text(name), y = vec(y), design = mat(X), settings = nlevels(cell),
    lackDf = num(a$Df[2]), pureDf = num(a$Res.Df[2]), pureSs = num(a$RSS[2]),
    lackSs = num(a$`Sum of Sq`[2]), f = num(a$F[2]), p = num(a$`Pr(>F)`[2])
  )
}
lack_cases <- c(
  lack_case("lm(dist ~ speed, cars)", lm(dist ~ speed, cars)),
  lack_case("lm(weight ~ Time, ChickWeight)", lm(weight ~ Time, ChickWeight)),
  lack_case("lm(breaks ~ wool + tension, warpbreaks)", lm(breaks ~ wool + tension, warpbreaks)),
  lack_case("lm(mpg ~ cyl, mtcars)", lm(mpg ~ cyl, mtcars))
)

json <- c(
  "{",
  paste0("  \"computedBy\": ", text(paste0(R.version.string, "; lmtest ", packageVersion("lmtest"),
                                           "; car ", packageVersion("car"))), ","),
  paste0("  \"durbinWatson\": ", array_of(dw_cases), ","),
  paste0("  \"shapiroWilk\": ", array_of(sw_cases), ","),
  paste0("  \"outlierTest\": ", array_of(outlier_cases), ","),
  paste0("  \"lackOfFit\": ", array_of(lack_cases)),
  "}"
)
writeLines(json, "test/engine/infer/fixtures/checks.json")
