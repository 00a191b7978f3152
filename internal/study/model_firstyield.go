package study

// perryRobertson is capacity model "perry-robertson": first yield of the
// member with its initial bow (and any eccentricity), column.PerryRobertson
// through column.FirstYield.
type perryRobertson struct{}

func (perryRobertson) String() string { return "perry-robertson" }

// Traits of the first-yield formula.
func (m perryRobertson) Traits(*Study) Traits {
	return Traits{NoResidual: "model " + m.String() + " (first yield with a geometric imperfection alone)"}
}

func (perryRobertson) keys() []string          { return nil }
func (perryRobertson) options(*parser, *table) {}
func (perryRobertson) kernel() kernel          { return kernelFirstYield }

// check asks for an imperfection to yield from.
func (perryRobertson) check(p *parser) {
	st := p.st
	if st.Bow == nil && st.Sway == nil && st.Imperfection != "equivalent" {
		p.errorf("imperfection.bow", "missing: model perry-robertson needs an initial bow, e.g. [imperfection] bow = \"Lcr/1000\", or [capacity] imperfection = \"equivalent\" (or choose another capacity.model)")
	}
}

// secant is capacity model "secant": first yield of the member loaded at
// an end eccentricity (and any bow), column.Secant through
// column.FirstYield.
type secant struct{}

func (secant) String() string { return "secant" }

// Traits of the secant formula.
func (m secant) Traits(*Study) Traits {
	return Traits{NoResidual: "model " + m.String() + " (first yield with a geometric imperfection alone)"}
}

func (secant) keys() []string          { return nil }
func (secant) options(*parser, *table) {}
func (secant) kernel() kernel          { return kernelFirstYield }

// check asks for the eccentricity.
func (secant) check(p *parser) {
	if p.st.Ecc == nil {
		p.errorf("imperfection.eccentricity", "missing: model secant needs a load eccentricity, e.g. [imperfection] eccentricity = \"10 mm\"")
	}
}
