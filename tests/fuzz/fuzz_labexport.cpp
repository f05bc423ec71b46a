// A .bwlab.json lab export (store::parseLabExport): whatever it accepts must export, import and export again to the
// same bytes.
#include "fuzzsupport.hpp"
#include "promises.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size)
{
    fuzzsupport::require(fuzzpromise::labExport(fuzzsupport::text(data, size)));
    return 0;
}
