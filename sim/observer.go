package sim

// Observer follows a running estimate from outside the algorithm, as
// gonum's optimize.Recorder follows an optimisation: every method reports
// its progress and each point of its convergence trace to the run's
// tracer, which records the trace in Result.Convergence and passes both
// on to Settings.Observer and Settings.Progress. An Observer changes no
// number of the result.
type Observer interface {
	// Progress is called from time to time with the state of the run,
	// never concurrently.
	Progress(Progress)
	// Point is called with each point of the convergence trace of the
	// method named, in order, never concurrently. auto reports the points
	// of each estimator it runs.
	Point(Method, ConvergencePoint)
}

// tracer is what a method reports to: it keeps the convergence trace of
// one result and passes progress and points on to the observers of the
// settings.
type tracer struct {
	res      *Result
	obs      Observer
	progress func(Progress)
}

// newTracer returns the tracer of res under the observers of s.
func newTracer(s *Settings, res *Result) *tracer {
	return &tracer{res: res, obs: s.Observer, progress: s.Progress}
}

// point adds p to the trace of the result and tells the observer.
func (t *tracer) point(p ConvergencePoint) {
	t.res.Convergence = append(t.res.Convergence, p)
	if t.obs != nil {
		t.obs.Point(t.res.Method, p)
	}
}

// report passes the progress p on.
func (t *tracer) report(p Progress) {
	if t.progress != nil {
		t.progress(p)
	}
	if t.obs != nil {
		t.obs.Progress(p)
	}
}

// watching reports whether anyone follows the progress, so that a method
// can skip building reports nobody reads.
func (t *tracer) watching() bool { return t.progress != nil || t.obs != nil }
