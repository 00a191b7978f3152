package study

import "fmt"

// CellText returns the quantity text of a cell of a CSV file (an
// inventory, a test database) whose header gives unit ("member.length
// (m)"; "" or "-" for none): a bare number takes the header's unit ("1_000"
// as in the study file); a cell with a unit of its own keeps it when it
// is the header's unit in another spelling, and is an error when it is
// another unit, since then the header or the cell is a slip (a modulus
// "210 MPa" under "(GPa)"). Other text ("L/500", a choice) is returned as
// it is, for the study's checks to read.
func CellText(cell, unit string) (string, error) {
	if unit == "" || unit == "-" {
		return cell, nil
	}
	if _, ok := parseNumber(cell); ok {
		return cell + " " + unit, nil
	}
	num, own := splitValue(cell)
	if _, ok := parseNumber(num); !ok || own == "" {
		return cell, nil
	}
	a, aok := units[own]
	b, bok := units[unit]
	if own == unit || !aok || !bok || a == b {
		return cell, nil // an unknown unit is reported where the cell is read
	}
	return "", fmt.Errorf("%q gives the unit %s but the column's header gives %s: write the number alone, or in %s", cell, own, unit, unit)
}
