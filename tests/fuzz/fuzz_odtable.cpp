// An eyewear's spectral OD table as text (eyewear::parseOdTable), and formatOdTable() read back.
#include "fuzzsupport.hpp"
#include "promises.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size)
{
    fuzzsupport::require(fuzzpromise::odTable(fuzzsupport::text(data, size)));
    return 0;
}
