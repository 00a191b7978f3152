package study

// ByMagnitude returns the names of the random variables that act by their
// magnitude: the bow and the eccentricity, whose sign only says on which
// side of the member they lie. A low fractile of such a variable can be a
// large magnitude of the other sign, so both of its fractiles can move a
// result the same way.
func (md *Model) ByMagnitude() []string {
	var names []string
	for i, v := range md.Sim.Vars {
		if q := md.quantity(i); q == md.Study.Bow || q == md.Study.Ecc {
			names = append(names, v.Name)
		}
	}
	return names
}
