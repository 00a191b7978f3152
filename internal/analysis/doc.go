// Package analysis is the pipeline of a strutrisk run, from a study file
// to a typed outcome: it loads and builds the study (Load), runs the
// estimate, FORM, the sensitivity measures, the reserve factor and the
// cases of a sweep and variants (Run), and turns the outcome into the
// result document and the report bundle, from which internal/report
// writes the summary and the reports. It takes a
// context, and tells an Observer of its steps; it writes no files and
// knows no flags or exit statuses (cmd/strutrisk does).
package analysis

// Version is the tool version written into every result document.
const Version = "0.1.0"
