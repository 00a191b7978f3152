package report

import "fmt"

// figures builds every picture the bundle has data for, in report order.
// A picture whose data are missing, empty or not finite is left out; a
// picture whose construction fails is left out and its error returned in
// skipped, so that one bad series never costs the whole report.
func figures(b *Bundle) (figs []*figure, skipped []error) {
	builders := []struct {
		name  string
		build func() *figure
	}{
		{"capacity-demand", func() *figure { return capacityDemandFigure(b) }},
		{"margin", func() *figure { return marginFigure(b) }},
		{"convergence", func() *figure { return convergenceFigure(b) }},
		{"tornado", func() *figure { return tornadoFigure(b) }},
		{"tornado-beta", func() *figure { return tornadoBetaFigure(b) }},
		{"sobol", func() *figure { return sobolFigure(b) }},
		{"sobol-capacity", func() *figure { return sobolCapacityFigure(b) }},
		{"slenderness", func() *figure { return slendernessFigure(b) }},
		{"interaction", func() *figure { return interactionFigure(b) }},
		{"sweep", func() *figure { return sweepFigure(b) }},
		{"heatmap", func() *figure { return heatmapFigure(b) }},
		{"variants", func() *figure { return variantsFigure(b) }},
		{"calibration", func() *figure { return calibrationFigure(b) }},
		{"inventory-ranked", func() *figure { return inventoryRankedFigure(b) }},
		{"inventory-against", func() *figure { return inventoryAgainstFigure(b) }},
		{"life", func() *figure { return lifeFigure(b) }},
		{"beam-column", func() *figure { return traceFigure(b) }},
	}
	for k, u := range b.Updates {
		builders = append(builders, struct {
			name  string
			build func() *figure
		}{"update " + u.Variable, func() *figure { return updateFigure(u, k) }})
	}
	for _, bl := range builders {
		f, err := safeBuild(bl.name, bl.build)
		if err != nil {
			skipped = append(skipped, err)
			continue
		}
		if f != nil {
			figs = append(figs, f)
		}
	}
	return figs, skipped
}

// safeBuild calls build, turning a panic into an error.
func safeBuild(name string, build func() *figure) (f *figure, err error) {
	defer func() {
		if r := recover(); r != nil {
			f, err = nil, fmt.Errorf("report: picture %s left out: %v", name, r)
		}
	}()
	return build(), nil
}
