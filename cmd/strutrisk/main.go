// Command strutrisk runs reliability and sensitivity studies of columns.
package main

import (
	"fmt"
	"os"
)

func main() {
	fmt.Fprintln(os.Stderr, "strutrisk: not built yet")
	os.Exit(3)
}
