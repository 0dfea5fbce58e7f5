package rule

import (
	"strings"
	"testing"
	"testing/fstest"
)

func TestCatalogActionHoldsOneTarget(t *testing.T) {
	t.Parallel()
	fsys := fstest.MapFS{"catalog.yaml": {Data: []byte("remedies:\n  - id: twice\n    action: \"{target} and {target}\"\n")}}
	if _, _, err := loadCatalog(fsys, "catalog.yaml"); err == nil || !strings.Contains(err.Error(), "at most one {target}") {
		t.Errorf("two {target}: got %v", err)
	}
}
