"""The invented scenario every example workbook shares, in one place.

Client, site, climate, collector, tank and hot-water use are all INVENTED for
these examples: no real client, no measured climate data of any real place,
no real product's test report. The figures are chosen to be plausible for a
small commercial laundry at a mid-latitude inland site.
"""

CLIENT = "Brackenridge Wash House"
TOWN = "Orrin Bay"
SCENARIO = ("Invented client and site: {client}, a small laundry in the invented town of {town}, plans a roof "
            "collector field and a hot-water store. Every input in this workbook is invented for the example.").format(
                client=CLIENT, town=TOWN)

# Site (invented coordinates on a plausible mid-latitude site).
LATITUDE = 46.4          # ° north
LONGITUDE = 8.9          # ° east
UTC_OFFSET = 1           # h, winter time all year
ALBEDO = 0.2             # – (common practice for grass and gravel)

# Collector plane on the roof.
TILT = 40                # ° from horizontal
AZIMUTH = 190            # ° clockwise from north: 10° west of south

# Invented monthly climate, January..December.
MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"]
DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31]
H_HORIZONTAL_MJ = [4.6, 7.6, 11.8, 15.6, 18.9, 21.0, 22.1, 18.7, 14.0, 9.1, 5.2, 3.9]   # MJ/(m²·day), monthly mean
T_AMBIENT_MEAN = [0.4, 2.1, 6.3, 10.2, 14.6, 18.1, 20.6, 19.9, 15.8, 10.9, 5.1, 1.4]    # °C, monthly mean
T_MAINS = [7.0, 6.8, 7.5, 9.0, 11.0, 13.0, 14.5, 15.0, 14.0, 12.0, 9.5, 8.0]            # °C, cold water

# Invented collector: a glazed flat plate with test coefficients in the
# EN ISO 9806 form, on the gross area of one module.
MODULE_AREA = 2.35       # m² per module
ETA0 = 0.77              # – peak efficiency
A1 = 3.45                # W/(m²·K)
A2 = 0.016               # W/(m²·K²)
B0 = 0.11                # – incidence angle modifier coefficient
FLOW_PER_M2 = 0.015      # kg/(s·m²) collector-loop flow, a common low-flow design value
MODULES = 12             # the proposed field: 28.2 m²

# Invented hot-water use of the laundry.
DAILY_DRAW_LITRES = 1500           # l/day at the delivery set-point
T_SET = 60                         # °C delivery set-point
HOURLY_DRAW_SHARE = [0, 0, 0, 0, 0, 0, 0.04, 0.10, 0.12, 0.11, 0.09, 0.07,
                     0.06, 0.08, 0.09, 0.08, 0.07, 0.05, 0.04, 0, 0, 0, 0, 0]  # of the daily draw, sums to 1

# Invented store.
TANK_VOLUME = 2.0        # m³
TANK_HEIGHT = 2.1        # m (of the water)
TANK_INSULATION = 0.10   # m
TANK_INSULATION_K = 0.038  # W/(m·K) (common practice for mineral wool or PU foam jackets)
T_PLANT_ROOM = 15        # °C around the tank
