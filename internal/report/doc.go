// Package report turns a study's results into files a person reads: the
// result document (JSON), a bounded sample table (CSV), charts (SVG and PNG,
// drawn with gonum/plot), a self-contained HTML report and text summaries,
// each carrying the cautions that go with the numbers.
package report
