// An eyewear inventory in CSV (store::parseEyewearCsv): whatever it accepts must also pass the lab export's checks.
#include "fuzzsupport.hpp"
#include "promises.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size)
{
    fuzzsupport::require(fuzzpromise::eyewearCsv(fuzzsupport::text(data, size)));
    return 0;
}
