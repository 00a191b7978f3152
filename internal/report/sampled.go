package report

// sampled reports whether the estimate of d comes from sampling, and so
// has a sampling interval and CoV worth showing. A FORM estimate is a
// first-order approximation: the document still carries its (zero-width)
// interval, but the report does not show it as if it were one.
func sampled(d *Document) bool { return d.Method != "form" }
