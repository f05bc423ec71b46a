// EN 208 alignment-eyewear markings (eyewear::parseEn208), and their printing back.
#include "fuzzsupport.hpp"
#include "promises.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size)
{
    fuzzsupport::require(fuzzpromise::en208(fuzzsupport::text(data, size)));
    return 0;
}
