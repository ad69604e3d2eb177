export { createStockRouter } from './stock.routes';
export { createStockService, type StockService } from './stock.service';
export { createStockDrawService, type StockDrawService } from './stock-draw.service';
