package modelerror

import (
	"fmt"
	"io"
	"os"

	"strutrisk/internal/study"
)

// ReadTestsFile reads the test database at path, in the unit system sys,
// refusing a file larger than a study file may be (study.MaxFileSize).
func ReadTestsFile(path string, sys study.System) ([]Test, error) {
	f, err := os.Open(path)
	if err != nil {
		return nil, err
	}
	defer f.Close()
	if fi, err := f.Stat(); err == nil && fi.Size() > study.MaxFileSize {
		return nil, fmt.Errorf("%s: %d bytes; a test database may have at most %d", path, fi.Size(), study.MaxFileSize)
	}
	return ReadTests(path, io.LimitReader(f, study.MaxFileSize+1), sys)
}
