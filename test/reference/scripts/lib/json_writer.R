# JSON writing shared by the panel_*.R fixture scripts: numbers with sprintf("%.17g") so the
# files are byte-reproducible, strings with double quotes turned into single quotes.
num <- function(x) {
  stopifnot(all(is.finite(x)))
  sprintf("%.17g", x)
}
str <- function(s) paste0("\"", gsub("\"", "'", s), "\"")
arr <- function(x) paste0("[", paste(num(x), collapse = ", "), "]")
strs <- function(x) paste0("[", paste(str(x), collapse = ", "), "]")
obj <- function(fields, indent) {
  body <- paste0(indent, "  ", str(names(fields)), ": ", unlist(fields), collapse = ",\n")
  paste0("{\n", body, "\n", indent, "}")
}
list_of <- function(items, indent) {
  paste0("[\n", indent, "  ", paste(items, collapse = paste0(",\n", indent, "  ")), "\n", indent, "]")
}
