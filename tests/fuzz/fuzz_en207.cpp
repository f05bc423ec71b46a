// EN 207 markings as printed on filters and frames (eyewear::parseEn207), and their printing back.
#include "fuzzsupport.hpp"
#include "promises.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size)
{
    fuzzsupport::require(fuzzpromise::en207(fuzzsupport::text(data, size)));
    return 0;
}
