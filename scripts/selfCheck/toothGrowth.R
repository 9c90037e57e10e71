# Reference values for the self-check workbook's open-data sheet, computed by R on the complete rows.
#
# Data: ToothGrowth from R's datasets package (R Core Team; original data Crampton 1947, J. Nutrition
# 33(5):491-504): tooth length `len` of 60 guinea pigs by supplement `supp` (OJ or VC) and `dose` (mg/day).
# Six cells are emptied or set to #N/A (listed below) so the workbook checks that Plumbline skips exactly
# those rows. R fits len ~ supp + dose on the rows left (lm's default na.omit), with treatment coding
# against the first level (OJ), the coding Plumbline documents for text columns.
#
# Run from the repository root:  Rscript scripts/selfCheck/toothGrowth.R
# It writes scripts/selfCheck/toothGrowth.json, which scripts/make-self-check.ts reads (R is not needed
# to regenerate the workbook or to run the tests).

data <- datasets::ToothGrowth
cells <- data.frame(len = data$len, supp = as.character(data$supp), dose = data$dose, stringsAsFactors = FALSE)

# Row numbers are 1-based positions in ToothGrowth; one of each kind of missing cell in every column.
missing <- data.frame(
  row = c(4, 13, 22, 35, 47, 58),
  column = c("len", "dose", "supp", "len", "supp", "dose"),
  kind = c("blank", "#N/A", "blank", "#N/A", "#N/A", "blank"),
  stringsAsFactors = FALSE
)

model_data <- data.frame(len = cells$len, supp = factor(cells$supp, levels = c("OJ", "VC")), dose = cells$dose)
for (i in seq_len(nrow(missing))) model_data[missing$row[i], missing$column[i]] <- NA

fit <- lm(len ~ supp + dose, data = model_data)
s <- summary(fit)
ci <- confint(fit, level = 0.95)
used <- as.integer(rownames(model.frame(fit)))
f <- s$fstatistic

num <- function(x) sprintf("%.17g", x)
vec <- function(x) paste0("[", paste(num(x), collapse = ", "), "]")
text <- function(x) paste0("\"", x, "\"")
cell_json <- function(i, column) {
  hit <- missing$row == i & missing$column == column
  if (any(hit)) return(if (missing$kind[hit] == "blank") "null" else "{ \"error\": \"#N/A\" }")
  value <- cells[i, column]
  # The data are printed as R holds them to 15 digits (4.2, not 4.2000000000000002): the same doubles.
  if (is.character(value)) text(value) else as.character(value)
}
rows <- vapply(seq_len(nrow(cells)), function(i) {
  paste0("    [", paste(vapply(names(cells), function(col) cell_json(i, col), ""), collapse = ", "), "]")
}, "")

json <- c(
  "{",
  paste0("  \"computedBy\": ", text(paste(R.version.string, "lm() and summary.lm() on the complete rows")), ","),
  "  \"columns\": [\"len\", \"supp\", \"dose\"],",
  "  \"rows\": [",
  paste(rows, collapse = ",\n"),
  "  ],",
  paste0("  \"usedRows\": [", paste(used, collapse = ", "), "],"),
  paste0("  \"terms\": [", paste(text(names(coef(fit))), collapse = ", "), "],"),
  paste0("  \"estimates\": ", vec(coef(fit)), ","),
  paste0("  \"standardErrors\": ", vec(s$coefficients[, "Std. Error"]), ","),
  paste0("  \"tValues\": ", vec(s$coefficients[, "t value"]), ","),
  paste0("  \"pValues\": ", vec(s$coefficients[, "Pr(>|t|)"]), ","),
  paste0("  \"ciLow\": ", vec(ci[, 1]), ","),
  paste0("  \"ciHigh\": ", vec(ci[, 2]), ","),
  paste0("  \"rowsUsed\": ", nobs(fit), ","),
  paste0("  \"rowsSkipped\": ", length(fit$na.action), ","),
  paste0("  \"parameters\": ", length(coef(fit)), ","),
  paste0("  \"residualDf\": ", fit$df.residual, ","),
  paste0("  \"rss\": ", num(deviance(fit)), ","),
  paste0("  \"sigma\": ", num(s$sigma), ","),
  paste0("  \"rSquared\": ", num(s$r.squared), ","),
  paste0("  \"adjustedRSquared\": ", num(s$adj.r.squared), ","),
  paste0("  \"f\": ", num(f[["value"]]), ","),
  paste0("  \"fPValue\": ", num(pf(f[["value"]], f[["numdf"]], f[["dendf"]], lower.tail = FALSE)), ","),
  paste0("  \"logLikelihood\": ", num(as.numeric(logLik(fit))), ","),
  paste0("  \"aic\": ", num(AIC(fit)), ","),
  paste0("  \"bic\": ", num(BIC(fit))),
  "}"
)
writeLines(json, "scripts/selfCheck/toothGrowth.json")
